/**
 * The one adapter between Excel and the core.
 *
 * A worksheet function is declared once as a spec (its arguments with kind, default and domain,
 * and a per-element compute function over already-converted values). `worksheet(spec)` turns it
 * into the function Excel calls. Everything Excel-specific happens here and only here:
 *
 *  - reading arguments: numbers, numeric text, text, booleans, null (omitted or empty), error
 *    values from other cells, and 2-D ranges;
 *  - defaults: null (or "") in an optional argument means "use the default";
 *  - broadcasting: scalars with ranges, equal shapes element by element, a row against a column
 *    gives the full table; shapes that cannot be broadcast (say 2×3 against 3×2) give one #VALUE!
 *    whose message names each range's shape;
 *  - domain checks declared in the spec (→ #NUM!);
 *  - error mapping: NotFoundError → #N/A + message, InputError → #VALUE! + message,
 *    DomainError or a non-finite result → #NUM! (no message), an error value in an input cell
 *    is passed through in that element only;
 *  - waiting for the workbook's table (functions that read it return a promise while it loads).
 *
 * The result is always a 2-D array (1×1 for scalar arguments), which Excel spills.
 * Nothing here throws: every failure becomes a CustomFunctions.Error value.
 *
 * Rules made precise by the robustness work (issue 6):
 *  - A cell's error is the first error among its arguments in argument order, exactly as if the
 *    function were called with that cell's values alone (a range call and the per-cell calls
 *    always agree; tests/robustness/broadcast.test.ts holds every function to it). Arguments read
 *    whole (lists) that cannot be read give one error for the whole call.
 *  - An input error value is passed through only when Excel accepts it as a function's result
 *    (#N/A, #VALUE!, #NUM!, #DIV/0!, #NULL!). #REF! and #NAME? may arrive from a cell but may not
 *    be returned, so they become #VALUE! with a message naming the argument. An object that only
 *    looks like an error (a `code` that is not an Excel error code) is not one: it is read as a
 *    value that is neither a number nor text (#VALUE!). Look-alikes with a real code are rebuilt
 *    as CustomFunctions.Error.
 *  - Message style: one line of plain words saying what was wrong and what is accepted,
 *    `Q must be a number; got "abc"`, `unknown couple "Xx/Yy"; use a key of the potential table
 *    such as "Cu2+/Cu"`, `n is required; the cell is empty`. Echoed text is quoted Excel-style
 *    (inner quotes doubled) and cut to 40 characters; a message longer than 300 characters keeps
 *    its beginning and end and loses the middle. #N/A and #VALUE! always carry a message; #NUM!
 *    never does (Excel shows none) and is one shared value.
 *  - A result text longer than Excel's 32,767 characters per cell is #VALUE! with a message.
 *
 * Performance (issue 5; figures in BENCHMARKS.md): scalar arguments are converted once per call;
 * the element loop reads numbers without allocating (a number in its domain, checked against the
 * domain's bounds inline, is used as it is; only other values go through the converters), calls
 * `compute` through one closure with the fixed arguments bound, and stores numeric results and
 * error values by separate statements so that a range of numbers stays an unboxed array of
 * doubles. Each distinct text of a range (keys, formulas, model names) is converted once per call,
 * and couple/electrode look-ups are memoized per table (a changed table is a new object, see
 * context.ts). Built-ins (Math, Number, Array, …) are bound once per bundle (functions/intrinsics.ts
 * and the build's ProvidePlugin), because node:vm, where the tests and the benchmark run the
 * bundle, makes every global look-up cost about 150 ns. None of this changes a result.
 */
import { DomainError, InputError, NotFoundError } from '../src/errors';
import { numberTextKind } from '../src/numberText';
import { MAX_NUMBER_CHARS } from '../src/textLimits';
import { suggestKey } from '../src/table/suggestKey';
import type { CoupleRow, ElectrodeRow, PotentialTable } from '../src/table/types';
import { coupleKeyHint, electrodeKeyHint } from '../src/table/suggest';
import { currentTable, tablePending } from './context';

/* ------------------------------------------------------------------------------------------ */
/* Built-ins, bound once                                                                       */
/* ------------------------------------------------------------------------------------------ */

// Looked up once when the bundle is evaluated: in a node:vm context (the tests, the benchmark,
// the demo) every global look-up goes through the context's interceptor and costs ~150 ns.
const isArray = Array.isArray;
const isFiniteNumber = Number.isFinite;
const isInteger = Number.isInteger;
const abs = Math.abs;
const floor = Math.floor;

let ErrorClass: typeof CustomFunctions.Error | null = null;
/** CustomFunctions.Error, looked up on first use (the runtime defines it before any call). */
function errorClass(): typeof CustomFunctions.Error {
  if (ErrorClass === null) ErrorClass = CustomFunctions.Error;
  return ErrorClass;
}

/** What one element of a result may be before it reaches Excel. */
export type Cell = number | string | boolean | CustomFunctions.Error;

/** A domain rule for a number: a predicate and the words that describe what is accepted. */
export interface Domain {
  readonly test: (x: number) => boolean;
  /** What is accepted, in plain words ("> 0", "a whole number ≥ 1"). */
  readonly accepts: string;
}

export const domains = {
  any: { test: (_x: number): boolean => true, accepts: 'any number' },
  positive: { test: (x: number) => x > 0, accepts: '> 0' },
  nonNegative: { test: (x: number) => x >= 0, accepts: '≥ 0' },
  nonZero: { test: (x: number) => x !== 0, accepts: '≠ 0' },
  positiveInteger: { test: (x: number) => x >= 1 && isInteger(x) && x <= 1e6, accepts: 'a whole number ≥ 1' },
  integer: { test: (x: number) => isInteger(x) && abs(x) <= 1e6, accepts: 'a whole number' },
  nonZeroInteger: { test: (x: number) => isInteger(x) && x !== 0 && abs(x) <= 1e6, accepts: 'a whole number ≠ 0' },
  /** Temperatures in °C: above absolute zero (and below 1e6 °C, far beyond any solution chemistry). */
  temperature: { test: (x: number) => x > -273.15 && x < 1e6, accepts: '> −273.15 °C' },
  /** Faradaic or current efficiency as a fraction. */
  efficiency: { test: (x: number) => x > 0 && x <= 1, accepts: 'a fraction in (0, 1]' },
  /** Transfer coefficients. */
  unitInterval: { test: (x: number) => x > 0 && x < 1, accepts: 'a fraction in (0, 1)' },
  pH: { test: (x: number) => x >= -5 && x <= 20, accepts: 'between −5 and 20' },
} satisfies Record<string, Domain>;

/** A domain as bounds, checked inline on the hot path (no call, no boxing). */
interface Bounds {
  readonly lo: number;
  readonly loIncl: boolean;
  readonly hi: number;
  readonly hiIncl: boolean;
  readonly whole: boolean;
}
/**
 * The built-in domains as bounds, for numbers other than 0 (0 and −0 always take the converter's
 * path). A domain not listed here (declared elsewhere) is checked by calling its `test`.
 */
const BOUNDS = new Map<Domain, Bounds>([
  [domains.any, { lo: -Infinity, loIncl: false, hi: Infinity, hiIncl: false, whole: false }],
  [domains.positive, { lo: 0, loIncl: false, hi: Infinity, hiIncl: false, whole: false }],
  [domains.nonNegative, { lo: 0, loIncl: true, hi: Infinity, hiIncl: false, whole: false }],
  [domains.nonZero, { lo: -Infinity, loIncl: false, hi: Infinity, hiIncl: false, whole: false }],
  [domains.positiveInteger, { lo: 1, loIncl: true, hi: 1e6, hiIncl: true, whole: true }],
  [domains.integer, { lo: -1e6, loIncl: true, hi: 1e6, hiIncl: true, whole: true }],
  [domains.nonZeroInteger, { lo: -1e6, loIncl: true, hi: 1e6, hiIncl: true, whole: true }],
  [domains.temperature, { lo: -273.15, loIncl: false, hi: 1e6, hiIncl: false, whole: false }],
  [domains.efficiency, { lo: 0, loIncl: false, hi: 1, hiIncl: true, whole: false }],
  [domains.unitInterval, { lo: 0, loIncl: false, hi: 1, hiIncl: false, whole: false }],
  [domains.pH, { lo: -5, loIncl: true, hi: 20, hiIncl: true, whole: false }],
]);

/** How an argument is read. */
export type ArgKind =
  | 'number' //     a number (numeric text accepted); domain checked
  | 'text' //       text (numbers are turned into text)
  | 'couple' //     a couple key → CoupleRow from the table in use
  | 'coupleOrPotential' // a couple key → CoupleRow, or a number → potential in V
  | 'electrode' //  a reference-electrode key or alias → ElectrodeRow
  | 'species' //    a formula text (kept as text) or a molar mass in g/mol (kept as number > 0)
  | 'boolean' //    TRUE or FALSE (also 1/0 and the texts "TRUE"/"FALSE")
  | 'numberList' // a whole range of numbers, not broadcast (e.g. COMBINE's potentials)
  | 'textList'; //  a whole range of texts, not broadcast

export interface ArgSpec {
  readonly name: string;
  readonly kind: ArgKind;
  /** Optional arguments take this default when omitted (null) or empty. Omit for required ones. */
  readonly default?: number | string | boolean | null;
  readonly optional?: boolean;
  /** Domain of a number (kinds number, coupleOrPotential's number, species' molar mass, numberList). */
  readonly domain?: Domain;
  /** Unit, for the generated reference ("V", "°C", "g/mol"). */
  readonly unit?: string;
}

/** Converted value handed to compute functions. */
export type ArgValue = number | string | boolean | CoupleRow | ElectrodeRow | number[] | string[] | null;

export interface FunctionSpec {
  /** The worksheet id, e.g. "NERNST". */
  readonly id: string;
  readonly args: readonly ArgSpec[];
  /** Per-element computation over converted arguments. May throw the core's errors. */
  // eslint-disable-next-line @typescript-eslint/no-explicit-any
  readonly compute: (...args: any[]) => Cell | Cell[];
  /** Result is a row of several values per element (e.g. GALVANIC's 1×3). */
  readonly rowResult?: number;
  /** True when the function reads the potential table (then it waits for the workbook's copy). */
  readonly usesTable?: boolean;
}

/* ------------------------------------------------------------------------------------------ */
/* Excel errors                                                                                */
/* ------------------------------------------------------------------------------------------ */

/** A message that is one line of words: no white space but single spaces, none at either end. */
const ONE_LINE = /^(?! )(?:[^\s]| (?! |$))*$/;
/** Longest message an error value carries. */
const MAX_MESSAGE = 300;
/** Longest quoted user text inside a message. */
const MAX_QUOTED = 40;
/** Excel's limit on the characters of a text in one cell. */
const EXCEL_MAX_TEXT = 32767;

/**
 * One line of plain words, at most MAX_MESSAGE characters. A longer message keeps its beginning
 * (what was wrong) and its end (what is accepted) and loses the middle, which is where long
 * quoted input sits.
 */
function tidyMessage(message: string): string {
  // Most messages are one line already: then nothing is rebuilt.
  let m = ONE_LINE.test(message) ? message : message.replace(/\s+/g, ' ').trim();
  if (m.length > MAX_MESSAGE) {
    const tail = floor(MAX_MESSAGE / 3);
    m = `${m.slice(0, MAX_MESSAGE - tail - 1)}…${m.slice(m.length - tail)}`;
  }
  return m === '' ? 'the value cannot be used here' : m;
}

/** CustomFunctions.ErrorCode, looked up on first use. */
let Codes: typeof CustomFunctions.ErrorCode | null = null;
function codes(): typeof CustomFunctions.ErrorCode {
  if (Codes === null) Codes = CustomFunctions.ErrorCode;
  return Codes;
}

/** #N/A with a message. */
export function notAvailable(message: string): CustomFunctions.Error {
  return new (errorClass())(codes().notAvailable, tidyMessage(message));
}
/** #VALUE! with a message. */
export function invalidValue(message: string): CustomFunctions.Error {
  return new (errorClass())(codes().invalidValue, tidyMessage(message));
}
let numError: CustomFunctions.Error | null = null;
/** #NUM! (Excel shows no message for it). One shared value: it carries nothing but its code. */
export function invalidNumber(): CustomFunctions.Error {
  if (numError === null) numError = new (errorClass())(codes().invalidNumber);
  return numError;
}

/** Maps anything thrown by the core to an Excel error value. */
export function toExcelError(e: unknown): CustomFunctions.Error {
  if (e instanceof NotFoundError) return notAvailable(e.message);
  if (e instanceof InputError) return invalidValue(e.message);
  if (e instanceof DomainError) return invalidNumber();
  if (isErrorValue(e)) return asResultError(e, 'the value');
  if (e instanceof RangeError) return invalidNumber();
  const msg = e instanceof Error ? e.message : String(e);
  return invalidValue(`unexpected problem: ${msg}`);
}

let errorCodes: Set<string> | null = null;
/** The codes of CustomFunctions.ErrorCode (read when first needed: the global exists by then). */
function knownCode(code: string): boolean {
  if (errorCodes === null) errorCodes = new Set<string>(Object.values(codes()) as string[]);
  return errorCodes.has(code);
}

/**
 * True for an Excel error value arriving from a cell (or produced here): a CustomFunctions.Error,
 * or an object whose `code` is one of Excel's error codes.
 */
export function isErrorValue(v: unknown): v is CustomFunctions.Error {
  if (typeof v !== 'object' || v === null) return false;
  if (v instanceof errorClass()) return true;
  if (isArray(v)) return false;
  const code = (v as { code?: unknown }).code;
  return typeof code === 'string' && knownCode(code);
}

/** Error codes Excel accepts as a custom function's input but not as its result. */
function inputOnly(code: string): boolean {
  return code === codes().invalidReference || code === codes().invalidName;
}

/**
 * An error value from an input cell, made fit to be returned: passed through unchanged when it is a
 * CustomFunctions.Error Excel accepts as a result; rebuilt when it only has the shape of one;
 * #REF! and #NAME? (input-only codes) become #VALUE! naming the argument.
 */
function asResultError(e: CustomFunctions.Error, name: string): CustomFunctions.Error {
  const code = e.code as string;
  if (inputOnly(code)) return invalidValue(`${name} comes from a cell showing ${code}`);
  if (e instanceof errorClass()) return e;
  const message = (e as unknown as { message?: unknown }).message;
  const Err = errorClass();
  if (code === codes().invalidValue || code === codes().notAvailable) {
    const text = typeof message === 'string' && message.trim() !== '' ? message : `${name} comes from a cell showing ${code}`;
    return new Err(code as CustomFunctions.ErrorCode, tidyMessage(text));
  }
  return code === codes().invalidNumber ? invalidNumber() : new Err(code as CustomFunctions.ErrorCode);
}

/* ------------------------------------------------------------------------------------------ */
/* Reading one value                                                                           */
/* ------------------------------------------------------------------------------------------ */

/** Shows a value in a message the way a cell would. */
export function show(v: unknown): string {
  if (typeof v === 'string') {
    const t = v.length > MAX_QUOTED ? `${v.slice(0, MAX_QUOTED - 3)}…` : v;
    return `"${t.replace(/\s+/g, ' ').replace(/"/g, '""')}"`;
  }
  if (typeof v === 'boolean') return v ? 'TRUE' : 'FALSE';
  if (v === null || v === undefined) return 'an empty cell';
  if (typeof v === 'number') return isFiniteNumber(v) ? String(v) : 'a number outside the range of double-precision numbers';
  if (isArray(v)) return 'a range inside a cell';
  return 'a value that is not a number or text';
}

function isBlank(v: unknown): boolean {
  return v === null || v === undefined || (typeof v === 'string' && v.trim() === '');
}

/**
 * A converter reads one raw element for one argument. It returns the converted value, or an
 * Excel error value (never throws). `usesTable` converters read currentTable().
 */
type Converter = (raw: unknown) => ArgValue | CustomFunctions.Error;

/** Reads numeric text: trimmed, plain decimal or exponent notation; undefined when it is not. */
function numericText(raw: string): number | undefined {
  if (raw.length > MAX_NUMBER_CHARS) return undefined; // no number is written with more characters
  const t = raw.trim();
  return numberTextKind(t) === 'number' ? Number(t) : undefined;
}

function numberFrom(raw: unknown, spec: ArgSpec, domain: Domain | undefined = spec.domain): number | CustomFunctions.Error {
  let x: number;
  if (typeof raw === 'number') x = raw;
  else if (typeof raw === 'string') {
    const parsed = numericText(raw);
    if (parsed === undefined) {
      if (raw.trim() === '') return invalidValue(`${spec.name} is required; the cell is empty`);
      return invalidValue(`${spec.name} must be a number; got ${show(raw)}`);
    }
    x = parsed;
  } else if (isErrorValue(raw)) return asResultError(raw, spec.name);
  else if (isBlank(raw)) return invalidValue(`${spec.name} is required; the cell is empty`);
  else return invalidValue(`${spec.name} must be a number; got ${show(raw)}`);
  if (!isFiniteNumber(x)) return invalidNumber();
  if (x === 0) x = 0; // −0 → 0
  if (domain !== undefined && !domain.test(x)) return invalidNumber();
  return x;
}

function textFrom(raw: unknown, spec: ArgSpec): string | CustomFunctions.Error {
  if (typeof raw === 'string') {
    if (raw.length > 1000) return invalidValue(`${spec.name} is too long (${raw.length} characters; at most 1000)`);
    if (raw.trim() === '') return invalidValue(`${spec.name} is required; the cell is empty`);
    return raw;
  }
  if (typeof raw === 'number' && isFiniteNumber(raw)) return String(raw === 0 ? 0 : raw);
  if (isErrorValue(raw)) return asResultError(raw, spec.name);
  if (isBlank(raw)) return invalidValue(`${spec.name} is required; the cell is empty`);
  return invalidValue(`${spec.name} must be text; got ${show(raw)}`);
}

function booleanFrom(raw: unknown, spec: ArgSpec): boolean | CustomFunctions.Error {
  if (typeof raw === 'boolean') return raw;
  if (raw === 0 || raw === 1) return raw === 1;
  if (typeof raw === 'string') {
    const t = raw.trim().toUpperCase();
    if (t === 'TRUE' || t === 'FALSE') return t === 'TRUE';
  }
  if (isErrorValue(raw)) return asResultError(raw, spec.name);
  return invalidValue(`${spec.name} must be TRUE or FALSE; got ${show(raw)}`);
}

function makeConverter(spec: ArgSpec): Converter {
  const withDefault = (inner: Converter): Converter => {
    if (!spec.optional && spec.default === undefined) return inner;
    const def = spec.default === undefined ? null : spec.default;
    return (raw) => (isBlank(raw) ? def : inner(raw));
  };
  switch (spec.kind) {
    case 'number':
      return withDefault((raw) => numberFrom(raw, spec));
    case 'text':
      return withDefault((raw) => textFrom(raw, spec));
    case 'couple':
      return withDefault((raw) => {
        if (typeof raw === 'number') return invalidValue(`${spec.name} must be a couple key such as "Cu2+/Cu"; got ${show(raw)}`);
        const t = textFrom(raw, spec);
        return typeof t === 'string' ? lookUpCouple(t) : t;
      });
    case 'coupleOrPotential':
      return withDefault((raw) => {
        if (typeof raw === 'number' || (typeof raw === 'string' && numericText(raw) !== undefined)) return numberFrom(raw, spec);
        const t = textFrom(raw, spec);
        return typeof t === 'string' ? lookUpCouple(t) : t;
      });
    case 'electrode':
      return withDefault((raw) => {
        const t = textFrom(raw, spec);
        return typeof t === 'string' ? lookUpElectrode(t) : t;
      });
    case 'species': {
      const massDomain = spec.domain ?? domains.positive;
      return withDefault((raw) => {
        if (typeof raw === 'number' || (typeof raw === 'string' && numericText(raw) !== undefined)) return numberFrom(raw, spec, massDomain);
        return textFrom(raw, spec);
      });
    }
    case 'boolean':
      return withDefault((raw) => booleanFrom(raw, spec));
    case 'numberList':
    case 'textList':
      throw new Error('list arguments are read whole, not per element');
  }
}

/* Look-ups, memoized per table: a range of keys repeats the same few keys many times. */
const MEMO_LIMIT = 4096;
let memoTable: PotentialTable | null = null;
const coupleMemo = new Map<string, CoupleRow | CustomFunctions.Error>();
const electrodeMemo = new Map<string, ElectrodeRow | CustomFunctions.Error>();

/**
 * Looks a key up in the table in use through a memo that is emptied whenever the table changes
 * (a changed table is a new object, see context.ts). An unknown key answers `missing(key)`.
 */
function memoLookUp<Row>(
  memo: Map<string, Row | CustomFunctions.Error>,
  key: string,
  find: (table: PotentialTable, key: string) => Row | undefined,
  missing: (key: string, table: PotentialTable) => CustomFunctions.Error,
): Row | CustomFunctions.Error {
  let table: PotentialTable;
  try {
    table = currentTable();
  } catch (e) {
    return toExcelError(e);
  }
  if (table !== memoTable) {
    memoTable = table;
    coupleMemo.clear();
    electrodeMemo.clear();
  }
  let hit = memo.get(key);
  if (hit === undefined) {
    hit = find(table, key) ?? missing(key, table);
    if (memo.size >= MEMO_LIMIT) memo.clear();
    memo.set(key, hit);
  }
  return hit;
}

/** "unknown couple "X"; …" with a key that exists in this table, or a near match of what was typed. */
/** A hint that says what to write (a reversed couple, a missing filling); near matches are left to unknownKeyMessage. */
function specificHint(hint: string): string {
  return hint.startsWith('nearest keys') ? '' : hint;
}

function unknownKeyMessage(what: 'couple' | 'reference electrode', where: string, key: string, table: PotentialTable): string {
  const s = suggestKey(table, what === 'couple' ? 'couple' : 'electrode', key);
  if (s.near !== undefined) return `unknown ${what} ${show(key)}; did you mean "${s.near}"?`;
  if (s.example !== undefined) return `unknown ${what} ${show(key)}; use a key of ${where} such as "${s.example}"`;
  return `unknown ${what} ${show(key)}; ${where} has no ${what}s`;
}

function lookUpCouple(key: string): CoupleRow | CustomFunctions.Error {
  return memoLookUp(
    coupleMemo,
    key,
    (t, k) => t.findCouple(k),
    (k, t) => { const h = specificHint(coupleKeyHint(t, k)); return notAvailable(h ? `unknown couple ${show(k)}; ${h}` : unknownKeyMessage('couple', 'the potential table', k, t)); },
  );
}

function lookUpElectrode(key: string): ElectrodeRow | CustomFunctions.Error {
  return memoLookUp(
    electrodeMemo,
    key,
    (t, k) => t.findElectrode(k),
    (k, t) => { const h = specificHint(electrodeKeyHint(t, k)); return notAvailable(h ? `unknown reference electrode ${show(k)}; ${h}` : unknownKeyMessage('reference electrode', 'the electrode table', k, t)); },
  );
}

/** Flattens a whole range row by row, blanks kept in place (so that paired lists stay paired). */
function flattenList(raw: unknown, spec: ArgSpec): unknown[] | CustomFunctions.Error {
  const flat: unknown[] = [];
  if (isArray(raw)) {
    for (const row of raw) {
      if (isArray(row)) {
        for (const v of row) {
          if (isArray(v)) return invalidValue(`${spec.name} is not a range of single values`);
          flat.push(v);
        }
      } else flat.push(row);
      if (flat.length > 100000) return invalidValue(`${spec.name} has more than 100000 values; at most 100000`);
    }
  } else flat.push(raw);
  return flat;
}

/** Converts the non-blank cells of one list. */
function convertList(cells: readonly unknown[], spec: ArgSpec): number[] | string[] | CustomFunctions.Error {
  if (cells.length === 0) {
    if (spec.optional || spec.default !== undefined) return [];
    return invalidValue(`${spec.name} is required; the range is empty`);
  }
  if (spec.kind === 'numberList') {
    const out: number[] = [];
    for (const v of cells) {
      const x = numberFrom(v, spec);
      if (typeof x !== 'number') return x;
      out.push(x);
    }
    return out;
  }
  const out: string[] = [];
  for (const v of cells) {
    const t = textFrom(v, spec);
    if (typeof t !== 'string') return t;
    out.push(t);
  }
  return out;
}

/**
 * Reads the whole-range arguments of a call (COMBINE's potentials and electrons, IONICSTRENGTH's
 * molalities and charges, HALFCELLBYSPECIES' species and activities). Blank cells are skipped, but
 * lists of the same length are read as pairs by position: a position blank in every list is
 * skipped, a position blank in only some of them is a #VALUE! naming it (skipping it in one list
 * alone would pair the others' values with the wrong partners).
 */
function readLists(raws: readonly unknown[], specs: readonly ArgSpec[]): Array<number[] | string[]> | CustomFunctions.Error {
  const flats: unknown[][] = [];
  for (let k = 0; k < specs.length; k++) {
    const f = flattenList(raws[k], specs[k]);
    if (isErrorValue(f)) return f;
    flats.push(f);
  }
  const paired = flats.length > 1 && flats.every((f) => f.length === flats[0].length);
  const kept: unknown[][] = flats.map(() => []);
  if (paired) {
    for (let j = 0; j < flats[0].length; j++) {
      const blank = flats.map((f) => isBlank(f[j]));
      if (blank.every(Boolean)) continue;
      if (blank.some(Boolean)) {
        const empty = specs.filter((_, k) => blank[k]).map((a) => a.name).join(' and ');
        const full = specs.filter((_, k) => !blank[k]).map((a) => a.name).join(' and ');
        return invalidValue(`value ${j + 1} of ${full} has no partner: that cell of ${empty} is empty`);
      }
      for (let k = 0; k < flats.length; k++) kept[k].push(flats[k][j]);
    }
  } else {
    for (let k = 0; k < flats.length; k++) for (const v of flats[k]) if (!isBlank(v)) kept[k].push(v);
  }
  const out: Array<number[] | string[]> = [];
  for (let k = 0; k < specs.length; k++) {
    const list = convertList(kept[k], specs[k]);
    if (isErrorValue(list)) return list;
    out.push(list);
  }
  return out;
}

/* ------------------------------------------------------------------------------------------ */
/* Shapes and broadcasting                                                                     */
/* ------------------------------------------------------------------------------------------ */

/** A range argument: its 2-D data (rows·cols > 1). Scalars and 1×1 ranges are read as values. */
interface Range {
  readonly rows: number;
  readonly cols: number;
  readonly data: readonly (readonly unknown[])[];
}

/** The shape of an argument: a Range, a single value wrapped as { value }, or an error value. */
function shapeOf(raw: unknown[], name: string): Range | { value: unknown } | CustomFunctions.Error {
  if (raw.length === 0) return invalidValue(`${name} is an empty range`);
  let data = raw as unknown[][];
  if (!isArray(raw[0])) {
    // a 1-D array: read it as one row
    for (let i = 0; i < raw.length; i++) if (isArray(raw[i])) return invalidValue(`${name} is not a rectangular range`);
    data = [raw];
  }
  const rows = data.length;
  const cols = data[0].length;
  if (cols === 0) return invalidValue(`${name} is an empty range`);
  for (let r = 1; r < rows; r++) {
    const row = data[r];
    if (!isArray(row) || row.length !== cols) return invalidValue(`${name} is not a rectangular range`);
  }
  if (rows === 1 && cols === 1) return { value: data[0][0] };
  return { rows, cols, data };
}

/** A result element that is not a finite number: checked and made fit for a cell. */
function finishOther(v: unknown): Cell {
  if (typeof v === 'number') return isFiniteNumber(v) ? (v === 0 ? 0 : v) : invalidNumber();
  if (typeof v === 'string') return v.length <= EXCEL_MAX_TEXT ? v : invalidValue(`the result is a text of ${v.length} characters; a cell holds at most ${EXCEL_MAX_TEXT}`);
  if (typeof v === 'boolean') return v;
  if (isErrorValue(v)) return asResultError(v, 'the result');
  return invalidValue('unexpected problem: a result that is not a number, text or logical value');
}

/** Calls compute with the arguments spread (no spread operator on the hot path for up to 6). */
function apply(compute: FunctionSpec['compute'], n: number, a: unknown[]): Cell | Cell[] {
  switch (n) {
    case 0: return compute();
    case 1: return compute(a[0]);
    case 2: return compute(a[0], a[1]);
    case 3: return compute(a[0], a[1], a[2]);
    case 4: return compute(a[0], a[1], a[2], a[3]);
    case 5: return compute(a[0], a[1], a[2], a[3], a[4]);
    case 6: return compute(a[0], a[1], a[2], a[3], a[4], a[5]);
    default: return compute(...a);
  }
}

/* ------------------------------------------------------------------------------------------ */
/* The worksheet function                                                                      */
/* ------------------------------------------------------------------------------------------ */

export type WorksheetResult = Cell[][] | Promise<Cell[][]>;
// eslint-disable-next-line @typescript-eslint/no-explicit-any
export type WorksheetFunction = (...args: any[]) => WorksheetResult;

/** Every compiled function, by id, in declaration order (for tests, docs and the demo). */
export const registry = new Map<string, { spec: FunctionSpec; fn: WorksheetFunction }>();

/** Most cells a result may have. */
const MAX_CELLS = 4_000_000;

/** How the hot path checks a number argument: bounds inline, or the domain's own test. */
interface NumberCheck {
  readonly bounds: Bounds | null;
  readonly test: (x: number) => boolean;
}

/**
 * True when x (finite, not 0) is in the domain. Kept small so that it is inlined into the loops.
 */
function inDomain(check: NumberCheck, x: number): boolean {
  const b = check.bounds;
  if (b === null) return check.test(x);
  return (x > b.lo || (b.loIncl && x === b.lo)) && (x < b.hi || (b.hiIncl && x === b.hi)) && (!b.whole || floor(x) === x);
}

/**
 * compute with every argument but one fixed: (x) => compute(a0, …, x, …). One closure per call of
 * a worksheet function; the fixed arguments are read once, not once per element.
 */
function bindAt(compute: FunctionSpec['compute'], n: number, k: number, vals: unknown[]): (x: unknown) => Cell | Cell[] {
  const a0 = vals[0];
  const a1 = vals[1];
  const a2 = vals[2];
  const a3 = vals[3];
  const a4 = vals[4];
  switch (n * 8 + k) {
    case 8: return (x) => compute(x);
    case 16: return (x) => compute(x, a1);
    case 17: return (x) => compute(a0, x);
    case 24: return (x) => compute(x, a1, a2);
    case 25: return (x) => compute(a0, x, a2);
    case 26: return (x) => compute(a0, a1, x);
    case 32: return (x) => compute(x, a1, a2, a3);
    case 33: return (x) => compute(a0, x, a2, a3);
    case 34: return (x) => compute(a0, a1, x, a3);
    case 35: return (x) => compute(a0, a1, a2, x);
    case 40: return (x) => compute(x, a1, a2, a3, a4);
    case 41: return (x) => compute(a0, x, a2, a3, a4);
    case 42: return (x) => compute(a0, a1, x, a3, a4);
    case 43: return (x) => compute(a0, a1, a2, x, a4);
    case 44: return (x) => compute(a0, a1, a2, a3, x);
    default: {
      const args = vals.slice();
      return (x) => {
        args[k] = x;
        return apply(compute, n, args);
      };
    }
  }
}

/** Compiles a spec into the function Excel calls. */
export function worksheet(spec: FunctionSpec): WorksheetFunction {
  const n = spec.args.length;
  const names = spec.args.map((a) => a.name);
  const isList = spec.args.map((a) => a.kind === 'numberList' || a.kind === 'textList');
  const listIdx: number[] = [];
  for (let i = 0; i < n; i++) if (isList[i]) listIdx.push(i);
  const converters: Array<Converter | null> = spec.args.map((a, i) => (isList[i] ? null : makeConverter(a)));
  /** For number arguments, the check of the fast path (a number in the domain is used as it is). */
  const checks: Array<NumberCheck | null> = spec.args.map((a) => {
    if (a.kind !== 'number') return null;
    const d = a.domain ?? domains.any;
    return { bounds: BOUNDS.get(d) ?? null, test: d.test };
  });
  const width = spec.rowResult ?? 0;
  const compute = spec.compute;

  /** Converts one element of argument i. */
  const read = (i: number, raw: unknown): unknown => {
    const check = checks[i];
    if (check !== null && typeof raw === 'number' && raw - raw === 0 && raw !== 0 && inDomain(check, raw)) return raw;
    return converters[i]!(raw);
  };

  /** One result element (width 0) from converted arguments. */
  const computeCell = (args: unknown[]): Cell => {
    try {
      const v = apply(compute, n, args);
      if (typeof v === 'number' && v - v === 0) return v === 0 ? 0 : v;
      return finishOther(v);
    } catch (e) {
      return toExcelError(e);
    }
  };

  /** One result row (width > 0) from converted arguments. */
  const computeRow = (args: unknown[]): Cell[] => {
    try {
      const v = apply(compute, n, args);
      if (isArray(v)) {
        if (v.length !== width) return fillRow(invalidValue('unexpected problem: wrong result width'), width);
        return v.map(finishOther);
      }
      return fillRow(finishOther(v), width);
    } catch (e) {
      return fillRow(toExcelError(e), width);
    }
  };

  const evaluate = (raws: unknown[]): Cell[][] => {
    const vals: unknown[] = new Array(n);
    // 1. single values (and 1×1 ranges): the common per-cell path, no shapes needed
    let ranges: Array<Range | null> | null = null;
    let scalarError: CustomFunctions.Error | null = null;
    let scalarErrorAt = n;
    if (listIdx.length > 0) {
      const lists = readLists(
        listIdx.map((i) => raws[i]),
        listIdx.map((i) => spec.args[i]),
      );
      if (isErrorValue(lists)) return [[lists]];
      for (let k = 0; k < listIdx.length; k++) vals[listIdx[k]] = lists[k];
    }
    for (let i = 0; i < n; i++) {
      let raw = raws[i];
      if (isList[i]) continue;
      if (isArray(raw)) {
        const row0 = raw[0];
        if (raw.length === 1 && isArray(row0) && row0.length === 1) raw = row0[0];
        else {
          const sh = shapeOf(raw, names[i]);
          if (isErrorValue(sh)) return [[sh]];
          if ('value' in sh) raw = sh.value;
          else {
            if (ranges === null) ranges = new Array<Range | null>(n).fill(null);
            ranges[i] = sh;
            continue;
          }
        }
      }
      const v = read(i, raw);
      if (scalarError === null && isErrorValue(v)) {
        scalarError = v;
        scalarErrorAt = i;
      }
      vals[i] = v;
    }
    if (ranges === null) {
      if (scalarError !== null) return [width ? fillRow(scalarError, width) : [scalarError]];
      return [width ? computeRow(vals) : [computeCell(vals)]];
    }

    // 2. the broadcast shape
    let rows = 1;
    let cols = 1;
    for (let i = 0; i < n; i++) {
      const sh = ranges[i];
      if (sh === null) continue;
      if (sh.rows !== 1) {
        if (rows !== 1 && rows !== sh.rows) return [[shapeMismatch(spec, raws, isList)]];
        rows = sh.rows;
      }
      if (sh.cols !== 1) {
        if (cols !== 1 && cols !== sh.cols) return [[shapeMismatch(spec, raws, isList)]];
        cols = sh.cols;
      }
    }
    if (width && cols !== 1) {
      return [[invalidValue(`${spec.id} gives ${width} values per result; give its arguments as single columns, not ${rows}×${cols} ranges`)]];
    }
    if (rows * cols > MAX_CELLS) return [[invalidValue(`the result would have ${rows * cols} cells; at most ${MAX_CELLS}`)]];

    const out: Cell[][] = new Array(rows);
    // 3. the arguments that vary, in argument order. A cell's error is the first error among its
    //    arguments in argument order, exactly as if the function were called with that cell's values.
    const idx: number[] = [];
    for (let i = 0; i < scalarErrorAt; i++) if (ranges[i] !== null) idx.push(i);
    const m = idx.length;
    if (scalarError !== null) {
      if (m === 0) {
        for (let r = 0; r < rows; r++) out[r] = fillRow(scalarError, width || cols);
        return out;
      }
      return firstErrors(idx, ranges, scalarError, rows, cols, out);
    }
    if (m === 1 && !width) return broadcastOne(idx[0], ranges[idx[0]]!, vals, rows, cols, out);
    const rData = idx.map((i) => ranges![i]!.data);
    const rByRow = idx.map((i) => ranges![i]!.rows !== 1);
    const rByCol = idx.map((i) => ranges![i]!.cols !== 1);
    const memos = idx.map(() => new Map<string, unknown>());
    const Err = errorClass(); // converters answer errors as CustomFunctions.Error only
    for (let r = 0; r < rows; r++) {
      const line: Cell[] = width ? [] : new Array(cols);
      for (let c = 0; c < cols; c++) {
        let bad: CustomFunctions.Error | null = null;
        for (let j = 0; j < m; j++) {
          const k = idx[j];
          const raw = rData[j][rByRow[j] ? r : 0][rByCol[j] ? c : 0];
          let v: unknown;
          if (typeof raw === 'string') {
            const memo = memos[j];
            v = memo.get(raw);
            if (v === undefined) {
              v = read(k, raw);
              if (memo.size < MEMO_LIMIT) memo.set(raw, v);
            }
          } else v = read(k, raw);
          if (bad === null && v instanceof Err) bad = v;
          vals[k] = v;
        }
        if (width) out[r] = bad !== null ? fillRow(bad, width) : computeRow(vals);
        else if (bad !== null) line[c] = bad;
        else {
          const v = computeCell(vals);
          if (typeof v === 'number') line[c] = v;
          else line[c] = v;
        }
      }
      if (!width) out[r] = line;
    }
    return out;
  };

  /**
   * Some single value is an error: each cell shows the first error among its arguments, which is
   * that value's error unless a range argument before it has an error in that cell.
   */
  const firstErrors = (
    idx: readonly number[],
    ranges: ReadonlyArray<Range | null>,
    scalarError: CustomFunctions.Error,
    rows: number,
    cols: number,
    out: Cell[][],
  ): Cell[][] => {
    const w = width || cols;
    const Err = errorClass(); // converters answer errors as CustomFunctions.Error only
    for (let r = 0; r < rows; r++) {
      const line: Cell[] = new Array(w);
      for (let c = 0; c < cols; c++) {
        let bad: CustomFunctions.Error = scalarError;
        for (const k of idx) {
          const sh = ranges[k]!;
          const v = read(k, sh.data[sh.rows !== 1 ? r : 0][sh.cols !== 1 ? c : 0]);
          if (v instanceof Err) {
            bad = v;
            break;
          }
        }
        if (width) {
          for (let j = 0; j < width; j++) line[j] = bad;
        } else line[c] = bad;
      }
      out[r] = line;
    }
    return out;
  };

  /**
   * The hot loop: one argument varies over a range (a column of Q, a range of keys, …), the
   * others are converted once and bound. A number in the domain goes straight to compute; numeric
   * results and other cells are stored by separate statements so that a numeric row stays an
   * unboxed array of doubles.
   */
  const broadcastOne = (k: number, range: Range, vals: unknown[], rows: number, cols: number, out: Cell[][]): Cell[][] => {
    const data = range.data;
    const byRow = range.rows !== 1;
    const byCol = range.cols !== 1;
    const check = checks[k];
    const conv = converters[k]!;
    const f = bindAt(compute, n, k, vals);
    // Texts repeat (keys, formulas, model names): each distinct text is converted once per call.
    // Within one call the conversion of a text is fixed (the table in use cannot change under it).
    const memo = new Map<string, unknown>();
    const Err = errorClass(); // converters answer errors as CustomFunctions.Error only
    for (let r = 0; r < rows; r++) {
      const src = data[byRow ? r : 0];
      const line: Cell[] = new Array(cols);
      for (let c = 0; c < cols; c++) {
        const raw = src[byCol ? c : 0];
        let v: unknown;
        if (check !== null && typeof raw === 'number' && raw - raw === 0 && raw !== 0 && inDomain(check, raw)) v = raw;
        else {
          if (typeof raw === 'string') {
            v = memo.get(raw);
            if (v === undefined) {
              v = conv(raw);
              if (memo.size < MEMO_LIMIT) memo.set(raw, v);
            }
          } else v = conv(raw);
          if (v instanceof Err) {
            line[c] = v;
            continue;
          }
        }
        let y: unknown;
        try {
          y = f(v);
        } catch (e) {
          line[c] = toExcelError(e);
          continue;
        }
        if (typeof y === 'number' && y - y === 0 && y !== 0) line[c] = y;
        else line[c] = finishOther(y);
      }
      out[r] = line;
    }
    return out;
  };

  const safeEvaluate = (raws: unknown[]): Cell[][] => {
    try {
      return evaluate(raws);
    } catch (e) {
      return [[toExcelError(e)]];
    }
  };

  const fn: WorksheetFunction = (...raws: unknown[]) => {
    if (spec.usesTable) {
      const pending = tablePending();
      if (pending !== null) return pending.then(() => safeEvaluate(raws), () => safeEvaluate(raws));
    }
    return safeEvaluate(raws);
  };
  registry.set(spec.id, { spec, fn });
  return fn;
}

function fillRow(v: Cell, width: number): Cell[] {
  const row = new Array<Cell>(width);
  for (let i = 0; i < width; i++) row[i] = v;
  return row;
}

function dims(raw: unknown): string {
  if (!isArray(raw)) return '1×1';
  const rows = raw.length;
  const cols = isArray(raw[0]) ? (raw[0] as unknown[]).length : raw.length;
  return isArray(raw[0]) ? `${rows}×${cols}` : `1×${rows}`;
}

function shapeMismatch(spec: FunctionSpec, raws: unknown[], isList: readonly boolean[]): CustomFunctions.Error {
  const parts = spec.args
    .map((a, i) => (isArray(raws[i]) && !isList[i] && dims(raws[i]) !== '1×1' ? `${a.name} is ${dims(raws[i])}` : null))
    .filter((s): s is string => s !== null);
  return invalidValue(
    `ranges of different shapes cannot be combined (${parts.join(', ')}); give ranges of the same size, or a single row with a single column`,
  );
}
