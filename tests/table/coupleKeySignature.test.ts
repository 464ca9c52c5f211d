/**
 * The signature a couple look-up checks before reading species: every spelling of a key shares it,
 * so a look-up refused on it is one the full look-up would have refused too. Checked on every
 * built-in key written in the spellings the key reader accepts (charge brackets, carets, signs
 * before digits, Unicode super- and subscripts, phase marks, white space, sides swapped) and on
 * random text; the reference is the look-up without the signature (normalizeCoupleKey on both
 * sides, compared as text).
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { builtinTable } from '../../src/table/builtin';
import { coupleKeySignature } from '../../src/table/coupleKeySignature';
import { normalizeCoupleKey } from '../../src/table/keys';
import type { CoupleRow } from '../../src/table/types';

const table = builtinTable();
const byNormalKey = new Map<string, CoupleRow>(table.couples.map((c) => [normalizeCoupleKey(c.key), c]));
/** The look-up as it was before the signature: normalize, then compare. */
const reference = (text: string): CoupleRow | undefined => byNormalKey.get(normalizeCoupleKey(text));

const SUPER: Record<string, string> = { '0': '⁰', '1': '¹', '2': '²', '3': '³', '4': '⁴', '5': '⁵', '6': '⁶', '7': '⁷', '8': '⁸', '9': '⁹', '+': '⁺', '-': '⁻' };
const SUB: Record<string, string> = { '0': '₀', '1': '₁', '2': '₂', '3': '₃', '4': '₄', '5': '₅', '6': '₆', '7': '₇', '8': '₈', '9': '₉' };

/** One side of a key respelled: its trailing charge in another accepted form, a phase mark, subscripts. */
function respell(side: string, how: number): string {
  const m = /^(.*?)(\d*)([+-])$/.exec(side);
  let s = side;
  if (m !== null && m[1] !== '') {
    const [, body, digits, sign] = m;
    const forms = [`${body}(${digits}${sign})`, `${body}^${digits}${sign}`, `${body}${[...`${digits}${sign}`].map((c) => SUPER[c]).join('')}`, `${body}${sign}${digits}`, `${body} ${digits}${sign}`];
    s = forms[how % forms.length];
  }
  if (how % 3 === 1) s = s.replace(/(\d)/, (d) => SUB[d]); // a subscript count (or charge digit) read back as ASCII
  if (how % 4 === 2) s = `${s}(aq)`;
  if (how % 5 === 3) s = ` ${s}\t`;
  return s;
}

describe('coupleKeySignature', () => {
  it('is the same for every spelling of a built-in key, and those spellings are still found', () => {
    let checked = 0;
    for (const c of table.couples) {
      const [ox, red] = c.key.split('/');
      for (let how = 0; how < 60; how++) {
        const text = `${respell(ox, how)}/${respell(red, how * 7 + 1)}`;
        expect(coupleKeySignature(text), text).toBe(coupleKeySignature(c.key));
        expect(table.findCouple(text), text).toBe(reference(text));
        if (reference(text) === c) checked++;
      }
    }
    // most respellings are readable (the reference finds the row): the check above is not empty
    expect(checked).toBeGreaterThan(table.couples.length * 30);
    // examples written out: read as the same key (data/couples.json rows)
    expect(table.findCouple('Cu²⁺ / Cu')?.key).toBe('Cu2+/Cu');
    expect(table.findCouple('Fe(3+)/Fe+2')?.key).toBe('Fe3+/Fe2+');
    expect(table.findCouple('O2(g) / H2O(l)')?.key).toBe('O2/H2O');
  });

  it('reversed: the signature of the key written the other way round', () => {
    expect(coupleKeySignature('Zn/Zn2+', true)).toBe(coupleKeySignature('Zn2+/Zn'));
    expect(coupleKeySignature('H2O / O2(g)', true)).toBe(coupleKeySignature('O2/H2O'));
    expect(coupleKeySignature('Cu2+', true)).toBe(coupleKeySignature('Cu2+')); // no "/": as written
    expect(coupleKeySignature('Fe2+/Cu', true)).not.toBe(coupleKeySignature('Fe2+/Cu'));
  });

  it('never refuses a text the full look-up would find (random text and mutated keys)', () => {
    const keys = table.couples.map((c) => c.key);
    const piece = fc.oneof(
      fc.constantFrom(...keys),
      fc.constantFrom('/', ' ', '(', ')', '^', '+', '-', '2', '3', '(aq)', '(s)', '(g)', '²⁺', '₂', '−', 'Cu', 'Fe', 'O', 'H', 'e', 'Qq'),
      fc.string({ maxLength: 4 }),
    );
    const text = fc.oneof(
      fc.array(piece, { maxLength: 6 }).map((p) => p.join('')),
      fc.tuple(fc.constantFrom(...keys), fc.nat(1000)).map(([k, how]) => {
        const [ox, red] = k.split('/');
        return how % 2 ? `${respell(red, how)}/${respell(ox, how + 3)}` : `${respell(ox, how)}/${respell(red, how + 3)}`;
      }),
    );
    let found = 0;
    fc.assert(
      fc.property(text, (t) => {
        expect(coupleKeySignature(t)).toBe(coupleKeySignature(normalizeCoupleKey(t)));
        expect(table.findCouple(t)).toBe(reference(t));
        if (reference(t) !== undefined) found++;
        const parts = t.split('/');
        if (parts.length === 2) expect(coupleKeySignature(t, true)).toBe(coupleKeySignature(`${parts[1].trim()}/${parts[0].trim()}`));
      }),
      { numRuns: 5000, seed: 12 },
    );
    expect(found).toBeGreaterThan(1000); // many of the texts are keys: the comparison is not only of misses
  });
});
