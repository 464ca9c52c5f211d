/**
 * Shared pieces of the robustness suite: what Excel may hand a worksheet function, and
 * what a worksheet function may hand back.
 *
 * - `argumentsFor(meta)` generates a full argument list for one function of dist/functions.json:
 *   each argument a single value or a 2-D range, each value either plausible for the parameter
 *   (chosen from its name, so that deep code paths are reached: valid couple keys with valid
 *   activities and temperatures) or wild (extreme numbers, hostile text, booleans, null,
 *   undefined, error values from other cells, objects, malformed ranges).
 * - `problemWith(result, inputs)` says what is wrong with a result, or null when Excel can show it.
 *
 * Sizes: FUZZ_RUNS cases per function (default 1000; `npm run fuzz` sets 100000), FUZZ_SEED to
 * replay a failure (fast-check prints the seed and the shrunk counterexample).
 */
import { existsSync, readdirSync, readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import fc from 'fast-check';
import { ErrorCode, FakeError, type FunctionMetadata } from '../bundle/harness';

export const RUNS = Math.max(1, Number(process.env.FUZZ_RUNS ?? 1000) || 1000);
export const SEED: number | undefined = process.env.FUZZ_SEED ? Number(process.env.FUZZ_SEED) : undefined;
/** A call that takes longer than this is a failure (catastrophic backtracking, runaway loops). */
export const SLOW_CALL_MS = Number(process.env.FUZZ_SLOW_MS ?? 2000);
/** A promise that has not settled after this long is a failure. */
export const SETTLE_MS = 5000;

/* ------------------------------------------------------------------------------------------ */
/* Values Excel (or a hostile workbook) may pass                                              */
/* ------------------------------------------------------------------------------------------ */

/** Error values as they arrive from other cells (passed through unchanged: exempt from the message rules). */
export const INPUT_ERRORS: readonly FakeError[] = [
  new FakeError(ErrorCode.notAvailable, 'from another cell'),
  new FakeError(ErrorCode.notAvailable),
  new FakeError(ErrorCode.invalidValue, 'from another cell'),
  new FakeError(ErrorCode.invalidNumber),
  new FakeError(ErrorCode.divisionByZero),
  new FakeError(ErrorCode.invalidReference),
  new FakeError(ErrorCode.invalidName),
  new FakeError(ErrorCode.nullReference),
];

const EXTREME_NUMBERS = [
  0, -0, 1, -1, 2, 0.5, 1e308, -1e308, Number.MAX_VALUE, -Number.MAX_VALUE, 5e-324, -5e-324, 2.2250738585072014e-308,
  1e-300, 1e300, 1e-30, 1e30, 1e15, 2 ** 53, 2 ** 31, -(2 ** 31), 1e6, 1e6 + 1, 999999, 1.5, 2.5, 7, 8, 14, 20, 20.0001,
  -5, -5.0001, 100, 100.0001, -273.15, -273.15 + 1e-13, -273.1499999999, -273.14, -273.16, -300, -1e-300, 1e-320,
  Number.EPSILON, 1 - Number.EPSILON, 1 + Number.EPSILON, 0.1 + 0.2, Math.PI, 709.78, 710, -745, 3e8, 96485.33212,
];
/** Never sent by Excel, but a function must not turn them into anything Excel cannot show. */
const NON_FINITE = [Number.NaN, Number.POSITIVE_INFINITY, Number.NEGATIVE_INFINITY];

const HOSTILE_TEXT = [
  '', ' ', '   ', '\t', '\n', '\r\n', '\u00a0', '\u200b', '\ufeff', '0', '-0', '+1', '1e308', '1e309', '-1e309', '5e-324',
  '1e-400', 'NaN', 'Infinity', '-Infinity', '0x10', '1,5', '1.5.5', '.', '-', '+', 'e', '1e', '  2  ', '١٢', 'TRUE', 'FALSE',
  'null', 'undefined', '#N/A', '#VALUE!', '=1+1', '=NERNST(1,2,3)', '<img src=x onerror=alert(1)>', '<script>alert(1)</script>',
  '"><svg onload=alert(1)>', "'; DROP TABLE couples; --", '${7*7}', '{{7*7}}', '__proto__', 'constructor', 'prototype',
  'toString', 'hasOwnProperty', '__defineGetter__', 'valueOf', '/', '//', '/Cu', 'Cu/', 'Cu2+/', '/Cu2+', 'Cu2+//Cu',
  'Cu2+/Cu/Cu', 'Cu2+ / Cu', ' Cu2+/Cu ', 'cu2+/cu', 'CU2+/CU', 'Co2+/Co', 'CO2+/CO', 'Cu^^2+/Cu', 'Cu(2+/Cu', 'Cu)2+(/Cu',
  'Cu2+++++/Cu', 'Cu99999999999999999999+/Cu', 'Cu1e400+/Cu', 'Xx/Yy', 'Zz3+/Zz', 'e-/e-', 'e-', 'H+/H+', 'H2O/H2O',
  '->', '=', '<=>', '⇌', 'Cu2+ + 2e- ->', '-> Cu', 'Cu2+ + 2e- -> Cu -> Cu', 'Cu2+ + 3e- -> Cu', 'Cu2+ + 2e- -> Zn',
  '2H+ + 2e- = H2(g)', 'MnO4- + 8H+ + 5e- -> Mn2+ + 4H2O', 'MnO4- + 8H+ + 5e- -> Mn2+', '1/0 O2 + 2e- -> O2-',
  '0 H2 -> 0 H2', '1e308 H2 + 2e- -> H2', '99999999999 Cu2+ + 2e- -> Cu', '(((((((((((', ')))))', '[[[[', '((Cu)', 'Cu((OH)2',
  'Fe2(SO4)3', 'CuSO4·5H2O', 'CuSO4*5H2O', 'CuSO4.5H2O', 'CuSO4··5H2O', '·', '5H2O', 'Cu0', 'H2O0', 'C999999999999',
  'C1000000000000000000000', '[Cu(NH3)4]SO4', 'Uuo', 'Og', 'D2O', 'cu', 'NI', 'Ni', 'Cu', 'Zn', 'Ag', 'Cr', 'H2', 'O2',
  'SHE', 'RHE', 'she', 'SCE', 'sce', ' s c e ', 'CSE', 'Cu/CuSO4(sat)', 'Ag/AgCl/KCl(sat)', 'Ag/AgCl/KCl(9M)', 'DHLL',
  'EDH', 'DAVIES', 'davies', 'Debye', 'Pitzer', 'ü', '🙂', '𝟙', 'Cu²⁺/Cu', 'Cu2＋/Cu', 'Ｃｕ2+/Cu', 'Cu\u0000/Cu',
  'x'.repeat(999), 'x'.repeat(1000), 'x'.repeat(1001), '('.repeat(1000), '('.repeat(5000), 'Cu2+/'.repeat(200),
  `${'H'.repeat(900)}2+/H2`, `${'((('.repeat(300)}Cu`, `${'Cu'.repeat(400)} + 2e- -> Cu`, '+'.repeat(999), '-'.repeat(999),
  '^'.repeat(500), `${'9'.repeat(400)}`, `0.${'0'.repeat(400)}1`, `1${'0'.repeat(400)}`, 'x'.repeat(100_000),
];

/** Keys that exist (so that deep paths are reached), read from the data files when they exist. */
function tableKeys(): { couples: string[]; electrodes: string[] } {
  const couples = new Set([
    'Li+/Li', 'K+/K', 'Na+/Na', 'Mg2+/Mg', 'Al3+/Al', 'Mn2+/Mn', 'Zn2+/Zn', 'Cr3+/Cr', 'Fe2+/Fe', 'Cd2+/Cd', 'Co2+/Co',
    'Ni2+/Ni', 'Sn2+/Sn', 'Pb2+/Pb', 'Fe3+/Fe', 'H+/H2', 'H2O/H2', 'Sn4+/Sn2+', 'Cu2+/Cu+', 'AgCl/Ag', 'Hg2Cl2/Hg',
    'Cu2+/Cu', 'Cu+/Cu', 'O2/OH-', 'I2/I-', 'Fe3+/Fe2+', 'Ag+/Ag', 'Br2/Br-', 'MnO2/Mn2+', 'O2/H2O', 'Cr2O7^2-/Cr3+',
    'Cl2/Cl-', 'Au3+/Au', 'Au+/Au', 'MnO4-/Mn2+', 'PbO2/PbSO4', 'PbSO4/Pb', 'H2O2/H2O', 'Ce4+/Ce3+', 'F2/F-', 'ZnO/Zn',
    'Ni(OH)2/Ni', 'HgO/Hg', 'Hg2SO4/Hg', 'Cu(2+)/Cu', 'Cu^2+/Cu', 'Cu+2/Cu', 'Fe(3+) / Fe+2', 'O2(g)/H2O(l)',
  ]);
  const electrodes = new Set([
    'SCE', 'Hg/Hg2Cl2/KCl(sat)', 'Hg/Hg2Cl2/KCl(1M)', 'Hg/Hg2Cl2/KCl(0.1M)', 'Ag/AgCl/KCl(sat)', 'Ag/AgCl/KCl(3.5M)',
    'Ag/AgCl/KCl(3M)', 'Ag/AgCl/KCl(1M)', 'Ag/AgCl/KCl(0.1M)', 'Ag/AgCl/seawater', 'CSE', 'Cu/CuSO4(sat)',
    'Hg/HgO/NaOH(1M)', 'Hg/HgO/NaOH(0.1M)', 'Hg/Hg2SO4/K2SO4(sat)', 'Hg/Hg2SO4/H2SO4(1M)', 'Zn/seawater', 'SHE', 'RHE',
  ]);
  const dataDir = resolve(__dirname, '../../data');
  if (existsSync(dataDir)) {
    for (const f of readdirSync(dataDir)) {
      if (!f.endsWith('.json')) continue;
      try {
        collectKeys(JSON.parse(readFileSync(resolve(dataDir, f), 'utf8')), couples, electrodes);
      } catch {
        /* another engineer's file in the middle of an edit: the fixed lists still apply */
      }
    }
  }
  return { couples: [...couples], electrodes: [...electrodes] };
}

function collectKeys(x: unknown, couples: Set<string>, electrodes: Set<string>): void {
  if (Array.isArray(x)) {
    for (const v of x) collectKeys(v, couples, electrodes);
  } else if (typeof x === 'object' && x !== null) {
    const r = x as Record<string, unknown>;
    if (typeof r.key === 'string') {
      if (typeof r.halfReaction === 'string') couples.add(r.key);
      else electrodes.add(r.key);
    }
    if (Array.isArray(r.aliases)) for (const a of r.aliases) if (typeof a === 'string') electrodes.add(a);
    for (const v of Object.values(r)) if (typeof v === 'object') collectKeys(v, couples, electrodes);
  }
}

export const KEYS = tableKeys();
const HALF_REACTIONS = [
  'Cu2+ + 2e- -> Cu', 'MnO4- + 8H+ + 5e- -> Mn2+ + 4H2O', '1/2 O2 + 2H+ + 2e- = H2O(l)', 'AgCl(s) + e- ⇌ Ag(s) + Cl-',
  'Cr2O7^2- + 14H+ + 6e- -> 2Cr3+ + 7H2O', 'O2 + 2H2O + 4e- -> 4OH-', '2H2O + 2e- -> H2 + 2OH-',
];
const SPECIES = [
  'Cu', 'Ni', 'Zn', 'Ag', 'Cr', 'Fe', 'Au', 'H2', 'O2', 'Cl2', 'CuSO4·5H2O', 'NiSO4·6H2O', 'Fe2(SO4)3', 'K4[Fe(CN)6]',
  'Cu2+', 'MnO4-', 'H2O', 'Mn2+', 'H+', 'OH-', 'Cr3+', 'Fe3+', 'Fe2+', 'Cr2O7^2-',
];
const MODELS = ['DHLL', 'EDH', 'DAVIES', 'dhll', 'Davies', ' edh '];

const num = {
  extreme: fc.constantFrom(...EXTREME_NUMBERS),
  nonFinite: fc.constantFrom(...NON_FINITE),
  any: fc.double({ noNaN: true, noDefaultInfinity: true }),
  small: fc.double({ min: -1e3, max: 1e3, noNaN: true }),
  int: fc.integer({ min: -10, max: 40 }),
  /** Positive finite numbers over the whole double range, spread evenly over the decades. */
  positive: fc
    .tuple(fc.double({ min: 1, max: 9.99, noNaN: true }), fc.integer({ min: -323, max: 307 }))
    .map(([m, e]) => m * 10 ** e)
    .filter((x) => x > 0 && Number.isFinite(x)),
  /** Positive numbers of everyday size (currents, times, masses, activities). */
  everyday: fc.double({ min: 1e-6, max: 1e4, noNaN: true }).filter((x) => x > 0),
  temperature: fc.oneof(
    fc.constantFrom(25, 0, 37, 100, -273.1499999999, -273.15 + 1e-13, 999999.9, -40, 80, 1e5),
    fc.double({ min: 0, max: 100, noNaN: true }),
    fc.double({ min: -273.14, max: 1200, noNaN: true }),
  ),
  pH: fc.oneof(fc.constantFrom(0, 7, 14, -5, 20, -1, 15), fc.double({ min: -5, max: 20, noNaN: true })),
  fraction: fc.oneof(fc.constantFrom(1, 0.5, 0.95, 5e-324, 1e-300, 1 - 1e-16), fc.double({ min: 1e-9, max: 1, noNaN: true })),
  electrons: fc.oneof(fc.integer({ min: 1, max: 6 }), fc.constantFrom(1e6, 12, 24)),
  charge: fc.oneof(fc.integer({ min: -4, max: 4 }), fc.constantFrom(-1e6, 1e6)),
};

const text = {
  hostile: fc.constantFrom(...HOSTILE_TEXT),
  any: fc.string({ maxLength: 40 }),
  unicode: fc.string({ maxLength: 20, unit: 'grapheme' }),
  /** Text over the characters formulas and keys are made of: reaches the parsers' corners. */
  chemish: fc.string({
    maxLength: 40,
    unit: fc.constantFrom(...'CuMnOHeFeZnAgClNa()[]^+-/ 0123456789·.*e->=⇌(s)(aq)(g)(l)'.split('')),
  }),
  numeric: fc.double({ noNaN: true }).map((x) => String(x)),
  couple: fc.constantFrom(...KEYS.couples),
  electrode: fc.constantFrom(...KEYS.electrodes),
  halfReaction: fc.constantFrom(...HALF_REACTIONS),
  species: fc.constantFrom(...SPECIES),
  model: fc.constantFrom(...MODELS),
};

/** Objects a workbook can hold besides plain values: entity and data-type values, look-alikes of errors. */
const OBJECTS = [
  {},
  { type: 'Double', basicValue: 1 },
  { type: 'String', basicValue: 'Cu2+/Cu' },
  { type: 'Entity', text: 'Copper', properties: {} },
  { code: '#N/A' },
  { code: '#REF!' },
  { code: 'not an error code', message: 'looks like an error' },
  { code: 42 },
  Object.create(null),
  new Date(0),
  [],
];

/** Anything at all, for one cell. */
export const wildCell: fc.Arbitrary<unknown> = fc.oneof(
  { weight: 4, arbitrary: num.extreme },
  { weight: 2, arbitrary: num.any },
  { weight: 1, arbitrary: num.nonFinite },
  { weight: 4, arbitrary: text.hostile },
  { weight: 2, arbitrary: text.any },
  { weight: 1, arbitrary: text.unicode },
  { weight: 2, arbitrary: text.chemish },
  { weight: 1, arbitrary: text.numeric },
  { weight: 2, arbitrary: fc.boolean() },
  { weight: 2, arbitrary: fc.constant(null) },
  { weight: 1, arbitrary: fc.constant(undefined) },
  { weight: 2, arbitrary: fc.constantFrom(...INPUT_ERRORS) },
  { weight: 1, arbitrary: fc.constantFrom(...OBJECTS) },
);

/**
 * Values that are valid for a parameter of this name, edges of the domain included (so that valid
 * combinations are frequent and the arithmetic itself meets extreme inputs).
 */
export function plausibleCell(param: string): fc.Arbitrary<unknown> {
  const p = param.toLowerCase();
  const signed = fc.oneof(num.small, num.extreme, num.int, num.any);
  if (/^couple|cathode|anode/.test(p)) return fc.oneof({ weight: 8, arbitrary: text.couple }, { weight: 1, arbitrary: num.small });
  if (/electrode|scale/.test(p)) return text.electrode;
  if (/species|formula/.test(p)) return fc.oneof({ weight: 4, arbitrary: text.species }, { weight: 1, arbitrary: num.positive });
  if (p === 'activities' || p === 'molalities') return fc.oneof(num.everyday, num.positive);
  if (/model/.test(p)) return text.model;
  if (/reaction/.test(p)) return text.halfReaction;
  if (/temperature/.test(p)) return num.temperature;
  if (p === 'ph') return num.pH;
  if (/efficiency|alpha/.test(p)) return num.fraction;
  if (p === 'n' || p === 'electrons') return num.electrons;
  if (/charge|^z_/.test(p)) return num.charge;
  if (/potential_v|^e0|_v$|overpotential|beta|delta|logk|^i$/.test(p)) return signed;
  return fc.oneof({ weight: 3, arbitrary: num.everyday }, { weight: 2, arbitrary: num.positive });
}

/** How wild one case is: most cells valid (deep paths), or half of them anything at all. */
export type Mode = 'valid' | 'wild';

/** One cell for a parameter. */
function cellFor(param: string, mode: Mode): fc.Arbitrary<unknown> {
  return mode === 'valid'
    ? fc.oneof({ weight: 19, arbitrary: plausibleCell(param) }, { weight: 1, arbitrary: wildCell })
    : fc.oneof({ weight: 1, arbitrary: plausibleCell(param) }, { weight: 1, arbitrary: wildCell });
}

function grid(cell: fc.Arbitrary<unknown>, rows: number, cols: number): fc.Arbitrary<unknown[][]> {
  return fc.array(fc.array(cell, { minLength: cols, maxLength: cols }), { minLength: rows, maxLength: rows });
}

/** Ranges Excel never sends, which must still come back as an error value and not a crash. */
function malformedRange(cell: fc.Arbitrary<unknown>): fc.Arbitrary<unknown> {
  return fc.oneof(
    fc.constant([]),
    fc.constant([[]]),
    fc.constant([[], []]),
    fc.array(cell, { minLength: 1, maxLength: 4 }), // 1-D
    fc.tuple(fc.array(cell, { minLength: 2, maxLength: 3 }), fc.array(cell, { minLength: 1, maxLength: 1 })).map(([a, b]) => [a, b]), // ragged
    cell.map((v) => [[[v]]]), // one level too deep
    fc.tuple(fc.array(cell, { minLength: 1, maxLength: 2 }), cell).map(([a, b]) => [a, b]), // a row then a bare value
  );
}

/**
 * An argument: a single value, or a range shaped from the case's base shape (same shape, one row of
 * it, one column of it, a single cell, or another shape that may not broadcast), or a malformed range.
 */
function argumentFor(param: string, rows: number, cols: number, mode: Mode): fc.Arbitrary<unknown> {
  const cell = cellFor(param, mode);
  if (mode === 'valid') {
    return fc.oneof(
      { weight: 10, arbitrary: cell },
      { weight: 3, arbitrary: grid(cell, rows, cols) },
      { weight: 2, arbitrary: grid(cell, 1, cols) },
      { weight: 2, arbitrary: grid(cell, rows, 1) },
      { weight: 1, arbitrary: grid(cell, 1, 1) },
    );
  }
  return fc.oneof(
    { weight: 10, arbitrary: cell },
    { weight: 4, arbitrary: grid(cell, rows, cols) },
    { weight: 2, arbitrary: grid(cell, 1, cols) },
    { weight: 2, arbitrary: grid(cell, rows, 1) },
    { weight: 1, arbitrary: grid(cell, 1, 1) },
    { weight: 1, arbitrary: fc.integer({ min: 1, max: 4 }).chain((r) => fc.integer({ min: 1, max: 4 }).chain((c) => grid(cell, r, c))) },
    { weight: 1, arbitrary: malformedRange(cell) },
  );
}

/** A complete argument list for one function (one entry per declared parameter). */
export function argumentsFor(meta: FunctionMetadata): fc.Arbitrary<unknown[]> {
  const names = meta.parameters.map((p) => p.name);
  const independent = fc
    .tuple(fc.integer({ min: 1, max: 4 }), fc.integer({ min: 1, max: 4 }), fc.constantFrom<Mode>('valid', 'wild'))
    .chain(([rows, cols, mode]) => fc.tuple(...names.map((name) => argumentFor(name, rows, cols, mode))));
  const pair = LIST_PAIRS.find(([a, b]) => names.includes(a) && names.includes(b));
  if (pair === undefined) return independent;
  // Functions that read two whole ranges of equal size: also give them equal sizes of valid values.
  const [ia, ib] = [names.indexOf(pair[0]), names.indexOf(pair[1])];
  const paired = fc.integer({ min: 1, max: 5 }).chain((len) =>
    fc.tuple(
      ...names.map((name, i) =>
        i === ia || i === ib ? grid(plausibleCell(name), len, 1) : fc.oneof(plausibleCell(name), grid(plausibleCell(name), 1, 1)),
      ),
    ),
  );
  return fc.oneof(independent, paired);
}

/** Pairs of list arguments that must have the same number of values. */
const LIST_PAIRS: ReadonlyArray<readonly [string, string]> = [
  ['species', 'activities'],
  ['molalities', 'charges'],
  ['potentials', 'electrons'],
];

/* ------------------------------------------------------------------------------------------ */
/* What may come back                                                                          */
/* ------------------------------------------------------------------------------------------ */

/** Excel's limit on the length of a text in a cell. */
export const EXCEL_MAX_TEXT = 32767;
/** Longest message accepted: a message names what was wrong, it does not echo a whole input. */
export const MAX_MESSAGE = 300;
const CODES = new Set<string>(Object.values(ErrorCode));
/** Words that betray a leaked exception or an unfinished message. */
const LEAK =
  /\b(undefined|NaN|null|Infinity|TypeError|ReferenceError|RangeError|SyntaxError|InternalError|unexpected problem)\b|\[object |Error:|\n\s*at /;

/** What is wrong with one error value's message, or null. */
export function messageProblem(e: FakeError): string | null {
  const { code, message } = e;
  if (code === ErrorCode.invalidNumber) {
    return message === undefined || message === '' ? null : `#NUM! carries a message (${JSON.stringify(message)}); #NUM! has none`;
  }
  if (code === ErrorCode.notAvailable || code === ErrorCode.invalidValue) {
    if (typeof message !== 'string' || message.trim() === '') return `${code} without a message`;
    if (message.length > MAX_MESSAGE) return `${code} message of ${message.length} characters (at most ${MAX_MESSAGE}): ${JSON.stringify(message.slice(0, 80))}…`;
    if (!/[a-z]{3}/i.test(message)) return `${code} message is not in words: ${JSON.stringify(message)}`;
    // words inside quotes are the user's own text, echoed
    if (LEAK.test(message.replace(/"[^"]*"/g, '""'))) return `${code} message leaks an internal: ${JSON.stringify(message)}`;
    if (/[\r\n]/.test(message)) return `${code} message spans several lines: ${JSON.stringify(message)}`;
    if (message !== message.trim()) return `${code} message has surrounding white space: ${JSON.stringify(message)}`;
    return null;
  }
  return `the function produced ${code}; only #N/A, #VALUE! and #NUM! are its own errors`;
}

/** What is wrong with one cell of a result, or null. `passed` are the error values given as inputs. */
export function cellProblem(v: unknown, passed: ReadonlySet<unknown>): string | null {
  switch (typeof v) {
    case 'number':
      return Number.isFinite(v) ? null : `a non-finite number ${v}`;
    case 'string':
      return v.length <= EXCEL_MAX_TEXT ? null : `a text of ${v.length} characters (Excel holds ${EXCEL_MAX_TEXT})`;
    case 'boolean':
      return null;
    case 'undefined':
      return 'undefined';
    case 'object':
      if (v === null) return 'null';
      if (v instanceof FakeError) {
        if (!CODES.has(v.code)) return `an error value with the unknown code ${JSON.stringify(v.code)}`;
        // Excel accepts #REF! and #NAME? as inputs of a custom function but not as its result.
        if (v.code === ErrorCode.invalidReference || v.code === ErrorCode.invalidName) return `${v.code}, which a function may not return`;
        if (passed.has(v)) return null; // an error from an input cell, passed through unchanged
        return messageProblem(v);
      }
      if (Array.isArray(v)) return 'an array inside a cell';
      return `a plain object ${safeJson(v)}`;
    default:
      return `a ${typeof v}`;
  }
}

/** What is wrong with a whole result, or null: a cell value, or a non-empty rectangular 2-D array of them. */
export function problemWith(result: unknown, passed: ReadonlySet<unknown>): string | null {
  if (!Array.isArray(result)) return cellProblem(result, passed);
  if (result.length === 0) return 'an empty array';
  const first = result[0];
  if (!Array.isArray(first)) return 'a 1-D array';
  const cols = first.length;
  if (cols === 0) return 'an array of empty rows';
  for (let r = 0; r < result.length; r++) {
    const row = result[r];
    if (!Array.isArray(row)) return `row ${r + 1} is not an array`;
    if (row.length !== cols) return `a ragged array (row 1 has ${cols} cells, row ${r + 1} has ${row.length})`;
    for (let c = 0; c < cols; c++) {
      const p = cellProblem(row[c], passed);
      if (p !== null) return `cell (${r + 1}, ${c + 1}): ${p}`;
    }
  }
  return null;
}

function safeJson(v: unknown): string {
  try {
    return JSON.stringify(v)?.slice(0, 120) ?? String(v);
  } catch {
    return '(unprintable)';
  }
}

/** The error values among the inputs (at any depth), which may legitimately come back unchanged. */
export function errorInputs(args: readonly unknown[]): Set<unknown> {
  const out = new Set<unknown>();
  const visit = (v: unknown, depth: number): void => {
    if (v instanceof FakeError) out.add(v);
    else if (Array.isArray(v) && depth < 4) for (const x of v) visit(x, depth + 1);
  };
  for (const a of args) visit(a, 0);
  return out;
}

/** Short description of arguments for a failure report (long texts abbreviated). */
export function describe(args: readonly unknown[]): string {
  return JSON.stringify(args, (_k, v: unknown) => {
    if (typeof v === 'string' && v.length > 60) return `${v.slice(0, 40)}… (${v.length} chars)`;
    if (typeof v === 'number' && !Number.isFinite(v)) return String(v);
    if (v === undefined) return '(undefined)';
    if (v instanceof FakeError) return `${v.code}${v.message ? `(${v.message})` : ''}`;
    return v;
  });
}

const TIMED_OUT: unique symbol = Symbol('timed out');

/**
 * Calls one function like Excel and settles the result: a thrown CustomFunctions.Error is an
 * answer Excel can show; any other throw, or a promise that does not settle, is a failure.
 */
export async function settle(
  call: () => unknown,
): Promise<{ ok: true; value: unknown; ms: number } | { ok: false; problem: string }> {
  const t0 = performance.now();
  let out: unknown;
  try {
    out = call();
  } catch (e) {
    if (e instanceof FakeError) return { ok: true, value: e, ms: performance.now() - t0 };
    return { ok: false, problem: `threw ${e instanceof Error ? `${e.name}: ${e.message}` : safeJson(e)}` };
  }
  if (typeof out === 'object' && out !== null && typeof (out as { then?: unknown }).then === 'function') {
    let timer: ReturnType<typeof setTimeout> | undefined;
    const timeout = new Promise<typeof TIMED_OUT>((res) => {
      timer = setTimeout(() => res(TIMED_OUT), SETTLE_MS);
    });
    try {
      const v = await Promise.race([out as Promise<unknown>, timeout]);
      if (v === TIMED_OUT) return { ok: false, problem: `a promise that did not settle within ${SETTLE_MS} ms` };
      out = v;
    } catch (e) {
      if (e instanceof FakeError) return { ok: true, value: e, ms: performance.now() - t0 };
      return { ok: false, problem: `a promise rejected with ${e instanceof Error ? `${e.name}: ${e.message}` : safeJson(e)}` };
    } finally {
      clearTimeout(timer);
    }
  }
  return { ok: true, value: out, ms: performance.now() - t0 };
}
