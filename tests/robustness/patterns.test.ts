/**
 * No text makes a parser's work grow faster than its length: every text is cut off at a length
 * limit (src/textLimits.ts) before any pattern runs, and the patterns themselves are linear. Each
 * parser is timed on the worst inputs we could build for it, both at the longest length it accepts
 * and far beyond (200,000 characters, which must be refused at once). Bound: 50 ms per call, which
 * is generous (a linear pass over 200,000 characters takes well under 1 ms); the quadratic patterns
 * these tests were written against took seconds on the same inputs.
 *
 * Paths: the species reader (couple keys through every key look-up, MOLARMASS's formula), the
 * half-reaction reader, the number readers of CSV import, of the pane's fields and of the worksheet
 * functions' numeric text, and CSV import as a whole (a field that is all line breaks).
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { parseSpecies } from '../../src/chem/formula';
import { speciesMolarMass } from '../../src/faraday/speciesMolarMass';
import { parseHalfReaction } from '../../src/chem/halfReaction';
import { importCsv } from '../../src/store/csv';
import { normalizeCoupleKey } from '../../src/table/keys';
import { validateCoupleRecord } from '../../src/table/table';
import { readNumber } from '../../taskpane/forms';
import { customFunctionsGlobal } from '../taskpane/mockExcel';

const BOUND_MS = 50;
const HUGE = Number(process.env.PATTERNS_HUGE ?? 200_000);
const g = globalThis as Record<string, unknown>;

/** Worst shapes for trailing-sign, bracketed-charge and number patterns, at length n. */
function hostile(n: number): Record<string, string> {
  return {
    plus: '+'.repeat(n),
    'plus then letter': `${'+'.repeat(n - 1)}a`,
    minus: '-'.repeat(n),
    'minus then letter': `${'-'.repeat(n - 1)}a`,
    'bracket then plus': `(${'+'.repeat(n - 1)}`,
    'digits then plus': `${'1'.repeat(n - 1)}+`,
    digits: '9'.repeat(n),
    'digits then x': `${'1'.repeat(n - 1)}x`,
    'digits, point, digits, x': `${'1'.repeat(n >> 1)}.${'1'.repeat((n >> 1) - 2)}x`,
    'digits then comma': `${'1'.repeat(n - 1)},`,
    'element then digits, x': `C${'1'.repeat(n - 2)}x`,
    blanks: `${' '.repeat(n - 1)}+`,
    'element-count runs, x': `${'Zn11111'.repeat(Math.floor((n - 1) / 7))}x`.padEnd(n, '1'),
  };
}

function timeIt(f: () => unknown): number {
  const t0 = performance.now();
  try {
    f();
  } catch {
    /* refusing by throwing is fine for the core readers */
  }
  return performance.now() - t0;
}

/** The parsers, each with the longest text it accepts. */
let MAX: { key: number; formula: number; number: number };
let NERNST: (...a: unknown[]) => unknown;
let MOLARMASS: (...a: unknown[]) => unknown;
let STDPOTENTIAL: (...a: unknown[]) => unknown;

beforeAll(async () => {
  g.CustomFunctions = customFunctionsGlobal;
  const limits = await import('../../src/textLimits').catch(() => null);
  MAX = limits === null ? { key: 1000, formula: 1000, number: 400 } : { key: limits.MAX_KEY_CHARS, formula: limits.MAX_FORMULA_CHARS, number: limits.MAX_NUMBER_CHARS };
  NERNST = (await import('../../functions/families/nernst')).NERNST as never;
  MOLARMASS = (await import('../../functions/families/faraday')).MOLARMASS as never;
  STDPOTENTIAL = (await import('../../functions/families/table')).STDPOTENTIAL as never;
});

const worst: Array<{ parser: string; length: number; input: string; ms: number }> = [];
afterAll(() => {
  // The worst time of each parser, for the record (BENCHMARKS.md / the resolving note).
  const byParser = new Map<string, { ms: number; length: number; input: string }>();
  for (const w of worst) {
    const key = `${w.parser} @ ${w.length === HUGE ? 'huge' : 'limit'}`;
    const b = byParser.get(key);
    if (b === undefined || w.ms > b.ms) byParser.set(key, w);
  }
  for (const [k, v] of byParser) console.log(`worst ${k}: ${v.ms.toFixed(2)} ms (${v.input}, ${v.length} chars)`);
});

function check(parser: string, lengthOf: () => number, run: (text: string) => unknown): void {
  for (const which of ['limit', 'huge'] as const) {
    it(`${parser}: every hostile text ${which === 'limit' ? 'at the longest accepted length' : `of ${HUGE.toLocaleString('en-US')} characters`} in < ${BOUND_MS} ms`, () => {
      const n = which === 'limit' ? lengthOf() : HUGE;
      for (const [name, text] of Object.entries(hostile(n))) {
        // The fastest of three runs (the machine is shared: one run can be held up by other work);
        // a first run over a second is final (quadratic work would take minutes otherwise).
        let ms = timeIt(() => run(text));
        if (ms < 1000) ms = Math.min(ms, timeIt(() => run(text)), timeIt(() => run(text)));
        worst.push({ parser, length: n, input: name, ms });
        expect(ms, `${parser} on "${name}" (${n} characters) took ${ms.toFixed(1)} ms`).toBeLessThan(BOUND_MS);
      }
    });
  }
}

describe('every parser runs in linear time on the worst inputs we could build, and refuses over-long text at once', () => {
  check('species (parseSpecies)', () => MAX.formula, (t) => parseSpecies(t));
  check('couple key look-up (normalizeCoupleKey)', () => MAX.key, (t) => normalizeCoupleKey(`${t}/Cu`));
  check('couple key, Red side', () => MAX.key, (t) => normalizeCoupleKey(`Cu2+/${t}`));
  check('half-reaction (parseHalfReaction)', () => MAX.formula, (t) => parseHalfReaction(`${t} + 2e- -> Cu`));
  check('couple record (validateCoupleRecord)', () => MAX.key, (t) => validateCoupleRecord({ key: `${t}/Cu`, halfReaction: 'Cu2+ + 2e- -> Cu', e0: 0.34, source: 'x' }));
  check('pane number field (readNumber)', () => MAX.number, (t) => readNumber(t, 'E°', { min: -4, max: 4 }, 'V', true));
  check('CSV number (potential_V)', () => MAX.number, (t) => importCsv(`row_type,key,half_reaction,potential_V,source\ncouple,Cu2+/Cu,Cu2+ + 2e- -> Cu,${t},x`));
  check('CSV key', () => MAX.key, (t) => importCsv(`row_type,key,half_reaction,potential_V,source\ncouple,"${t.replace(/"/g, '""')}/Cu",Cu2+ + 2e- -> Cu,0.34,x`));
  check('CSV quoted field of line breaks', () => MAX.formula, (t) => importCsv(`row_type,key,half_reaction,potential_V,source,note\ncouple,Cu2+/Cu,Cu2+ + 2e- -> Cu,0.34,x,"${'\n'.repeat(t.length - 1)}x"`));
  check('worksheet numeric text (NERNST)', () => MAX.number, (t) => NERNST([[t]], [[2]], [[1]], null));
  check('deposition species (speciesMolarMass, with its alloy hint)', () => MAX.formula, (t) => speciesMolarMass(t));
  check('worksheet formula (MOLARMASS)', () => MAX.formula, (t) => MOLARMASS([[t]]));
  check('worksheet couple key (STDPOTENTIAL)', () => MAX.formula, (t) => STDPOTENTIAL([[`${t}/Cu`]], null));
});
