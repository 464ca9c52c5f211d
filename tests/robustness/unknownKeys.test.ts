/**
 * A range of distinct unknown keys: every cell is #N/A with a message naming its own key, the same
 * message the key gets when asked alone, whatever the text holds (quotes, white space, non-ASCII,
 * surrogate pairs, long text, near matches, a couple written the other way round); known keys in the
 * same range, and after a flood of unknown ones, keep their values. The short-cut that builds these
 * messages gives exactly the message of the general path for any text. Speed is measured in the
 * benchmark (BENCHMARKS.md, "Unknown keys"); here only a generous bound.
 */
import fc from 'fast-check';
import { beforeAll, describe, expect, it } from 'vitest';
import { quote } from '../../src/text/quote';
import { FakeCfError, customFunctionsGlobal } from '../taskpane/mockExcel';

const g = globalThis as Record<string, unknown>;
type Fn = (...a: unknown[]) => unknown;
let STDPOTENTIAL: Fn;
let REFPOTENTIAL: Fn;
let errors: typeof import('../../functions/excelErrors');

beforeAll(async () => {
  g.CustomFunctions = customFunctionsGlobal;
  STDPOTENTIAL = (await import('../../functions/families/table')).STDPOTENTIAL as Fn;
  REFPOTENTIAL = (await import('../../functions/families/scales')).REFPOTENTIAL as Fn;
  errors = await import('../../functions/excelErrors');
});

const column = (xs: string[]) => xs.map((x) => [x]);
const cells = (r: unknown) => (r as unknown[][]).map((row) => row[0]);
const na = (v: unknown): string => {
  expect(v).toBeInstanceOf(FakeCfError);
  expect((v as FakeCfError).code).toBe('#N/A');
  return (v as FakeCfError).message!;
};
const TAIL = '; use a key of the potential table such as "Cu2+/Cu"';

describe('a range of distinct unknown couple keys', () => {
  it('each cell names its own key, written as a message quotes text', () => {
    const keys = [
      'Qq1/Cu', // not species
      'Fe123/Cu', // species the table lacks
      'say "hi"/Cu', // quotes doubled
      'Tab\there/Cu', // white space shown as one space
      'Xx2+ /  Yy', // runs of spaces made one
      ' Zz/Cu', // leading space kept inside the quotes
      'Ab'.repeat(30), // longer than 40 characters: shortened with "…"
      `${'Q'.repeat(36)}😀/Cu`, // cut before the surrogate pair, never inside it
      'Cu²⁺/Zn', // non-ASCII
      'Ünknown/Cu',
    ];
    const got = cells(STDPOTENTIAL(column(keys), null)).map(na);
    expect(got).toEqual(keys.map((k) => `unknown couple ${quote(k)}${TAIL}`));
    // written out (common practice: a spreadsheet writes a text constant in double quotes, inner quotes doubled)
    expect(got[0]).toBe('unknown couple "Qq1/Cu"; use a key of the potential table such as "Cu2+/Cu"');
    expect(got[2]).toBe('unknown couple "say ""hi""/Cu"; use a key of the potential table such as "Cu2+/Cu"');
    expect(got[3]).toBe('unknown couple "Tab here/Cu"; use a key of the potential table such as "Cu2+/Cu"');
    expect(got[6]).toBe(`unknown couple "${'Ab'.repeat(18)}A…"${TAIL}`);
    expect(got[7]).toBe(`unknown couple "${'Q'.repeat(36)}…"${TAIL}`);
    for (const m of got) expect(m).not.toMatch(/[\ud800-\udbff](?![\udc00-\udfff])/); // no lone high surrogate
  });

  it('hints stay: a near match, a couple written the other way round', () => {
    const got = cells(STDPOTENTIAL(column(['cu2+/cu', 'Zn/Zn2+', 'Qq9/Cu']), null)).map(na);
    expect(got[0]).toBe('unknown couple "cu2+/cu"; did you mean "Cu2+/Cu"?');
    expect(got[1]).toBe('unknown couple "Zn/Zn2+"; write Ox/Red: Zn2+/Zn');
    expect(got[2]).toBe(`unknown couple "Qq9/Cu"${TAIL}`);
  });

  it('a range gives every key the message it gets alone, and known keys their values', () => {
    const keys = Array.from({ length: 3000 }, (_, i) => (i % 7 === 0 ? ['Cu2+/Cu', 'Zn(2+)/Zn', 'Fe3+ / Fe2+'][i % 3] : i % 2 ? `Qq${i}/Cu` : `Fe${i}/Cu`));
    const range = cells(STDPOTENTIAL(column(keys), null));
    keys.forEach((k, i) => {
      const alone = (STDPOTENTIAL(k, null) as unknown[][])[0][0];
      if (typeof alone === 'number') expect(range[i]).toBe(alone);
      else expect(na(range[i])).toBe(na(alone));
    });
    // values: data/couples.json (Thermoddem V1.10 / MINTEQA2 v4, from the cited log K)
    expect(range[0]).toBe(0.3372);
    expect(range[7]).toBe(-0.7628);
  });

  it('after a flood of distinct unknown keys, known keys and repeated unknown ones answer as before', () => {
    const before = cells(STDPOTENTIAL(column(['Cu2+/Cu', 'Zn2+/Zn', 'Qq/Cu']), null));
    for (let i = 0; i < 5; i++) STDPOTENTIAL(column(Array.from({ length: 5000 }, (_, j) => `Qq${i}x${j}/Cu`)), null);
    const after = cells(STDPOTENTIAL(column(['Cu2+/Cu', 'Zn2+/Zn', 'Qq/Cu']), null));
    expect(after.slice(0, 2)).toEqual(before.slice(0, 2));
    expect(na(after[2])).toBe(na(before[2]));
  });

  it('unknown electrodes too', () => {
    const got = cells(REFPOTENTIAL(column(['XYZ1', 'say "x"', 'ssc', 'Ag/AgCl/KCl[sat]']), null)).map(na);
    expect(got[0]).toBe('unknown reference electrode "XYZ1"; use a key of the electrode table such as "SCE"');
    expect(got[1]).toBe('unknown reference electrode "say ""x"""; use a key of the electrode table such as "SCE"');
    expect(got[2]).toMatch(/^unknown reference electrode "ssc"; Ag\/AgCl needs its filling: /);
    expect(got[3]).toBe('unknown reference electrode "Ag/AgCl/KCl[sat]"; did you mean "Ag/AgCl/KCl(sat)"?');
  });

  it('100,000 distinct unknown keys in one call: every cell named, within a generous bound', () => {
    const keys = Array.from({ length: 100 }, (_, r) => Array.from({ length: 1000 }, (_, c) => `Qq${r * 1000 + c}/Cu`));
    const start = performance.now();
    const r = STDPOTENTIAL(keys, null) as unknown[][];
    const ms = performance.now() - start;
    expect(ms).toBeLessThan(20_000); // about 0.2 s on an idle machine; the bound only catches a return of per-key exceptions at scale
    expect(na(r[99][999])).toBe(`unknown couple "Qq99999/Cu"${TAIL}`);
    expect(na(r[0][0])).toBe(`unknown couple "Qq0/Cu"${TAIL}`);
  });
});

describe('notAvailableNaming', () => {
  it('is notAvailable(before + quote(text) + after) for any text and any fixed parts', () => {
    const fixed = fc.oneof(
      fc.constantFrom('unknown couple ', '; use a key of the potential table such as "Cu2+/Cu"', '', ' ', '  two  spaces ', 'line\nbreak', 'x'.repeat(290)),
      fc.string({ maxLength: 30 }),
    );
    const text = fc.oneof(fc.string({ maxLength: 60 }), fc.string({ unit: 'grapheme', maxLength: 50 }), fc.string({ unit: 'binary', maxLength: 50 }));
    fc.assert(
      fc.property(fixed, text, fixed, (before, t, after) => {
        expect(errors.notAvailableNaming(before, t, after)).toEqual(errors.notAvailable(before + quote(t) + after));
      }),
      { numRuns: 20000, seed: 3 },
    );
  });
});
