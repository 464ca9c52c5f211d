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
 *    gives the full table; shapes that cannot be broadcast give one #VALUE! with a message;
 *  - domain checks declared in the spec (→ #NUM!);
 *  - error mapping: NotFoundError → #N/A + message, InputError → #VALUE! + message,
 *    DomainError or a non-finite result → #NUM! (no message), an error value in an input cell
 *    is passed through in that element only;
 *  - waiting for the workbook's table (functions that read it return a promise while it loads).
 *
 * The result is always a 2-D array (1×1 for scalar arguments), which Excel spills.
 * Nothing here throws: every failure becomes a CustomFunctions.Error value.
 */
import { DomainError, InputError, NotFoundError } from '../src/errors';
import type { CoupleRow, ElectrodeRow, PotentialTable } from '../src/table/types';
import { currentTable, tablePending } from './context';

/** What one element of a result may be before it reaches Excel. */
export type Cell = number | string | boolean | CustomFunctions.Error;

/** A domain rule for a number: a predicate and the words that describe what is accepted. */
export interface Domain {
  readonly test: (x: number) => boolean;
  /** What is accepted, in plain words ("> 0", "a whole number ≥ 1"). */
  readonly accepts: string;
}

export const domains = {
  any: { test: () => true, accepts: 'any number' },
  positive: { test: (x: number) => x > 0, accepts: '> 0' },
  nonNegative: { test: (x: number) => x >= 0, accepts: '≥ 0' },
  nonZero: { test: (x: number) => x !== 0, accepts: '≠ 0' },
  positiveInteger: { test: (x: number) => x >= 1 && Number.isInteger(x) && x <= 1e6, accepts: 'a whole number ≥ 1' },
  integer: { test: (x: number) => Number.isInteger(x) && Math.abs(x) <= 1e6, accepts: 'a whole number' },
  nonZeroInteger: { test: (x: number) => Number.isInteger(x) && x !== 0 && Math.abs(x) <= 1e6, accepts: 'a whole number ≠ 0' },
  /** Temperatures in °C: above absolute zero (and below 1e6 °C, far beyond any solution chemistry). */
  temperature: { test: (x: number) => x > -273.15 && x < 1e6, accepts: '> −273.15 °C' },
  /** Faradaic or current efficiency as a fraction. */
  efficiency: { test: (x: number) => x > 0 && x <= 1, accepts: 'a fraction in (0, 1]' },
  /** Transfer coefficients. */
  unitInterval: { test: (x: number) => x > 0 && x < 1, accepts: 'a fraction in (0, 1)' },
  pH: { test: (x: number) => x >= -5 && x <= 20, accepts: 'between −5 and 20' },
} satisfies Record<string, Domain>;

/** How an argument is read. */
export type ArgKind =
  | 'number' //     a number (numeric text accepted); domain checked
  | 'text' //       text (numbers are turned into text)
  | 'couple' //     a couple key → CoupleRow from the table in use
  | 'coupleOrPotential' // a couple key → CoupleRow, or a number → potential in V
  | 'electrode' //  a reference-electrode key or alias → ElectrodeRow
  | 'species' //    a formula text (kept as text) or a molar mass in g/mol (kept as number > 0)
  | 'numberList' // a whole range of numbers, not broadcast (e.g. COMBINE's potentials)
  | 'textList'; //  a whole range of texts, not broadcast

export interface ArgSpec {
  readonly name: string;
  readonly kind: ArgKind;
  /** Optional arguments take this default when omitted (null) or empty. Omit for required ones. */
  readonly default?: number | string | null;
  readonly optional?: boolean;
  /** Domain of a number (kinds number, coupleOrPotential's number, species' molar mass, numberList). */
  readonly domain?: Domain;
  /** Unit, for the generated reference ("V", "°C", "g/mol"). */
  readonly unit?: string;
}

/** Converted value handed to compute functions. */
export type ArgValue = number | string | CoupleRow | ElectrodeRow | number[] | string[] | null;

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

function cfError(code: CustomFunctions.ErrorCode, message?: string): CustomFunctions.Error {
  return message === undefined ? new CustomFunctions.Error(code) : new CustomFunctions.Error(code, message);
}

/** #N/A with a message. */
export function notAvailable(message: string): CustomFunctions.Error {
  return cfError(CustomFunctions.ErrorCode.notAvailable, message);
}
/** #VALUE! with a message. */
export function invalidValue(message: string): CustomFunctions.Error {
  return cfError(CustomFunctions.ErrorCode.invalidValue, message);
}
/** #NUM! (Excel shows no message for it). */
export function invalidNumber(): CustomFunctions.Error {
  return cfError(CustomFunctions.ErrorCode.invalidNumber);
}

/** Maps anything thrown by the core to an Excel error value. */
export function toExcelError(e: unknown): CustomFunctions.Error {
  if (e instanceof NotFoundError) return notAvailable(e.message);
  if (e instanceof InputError) return invalidValue(e.message);
  if (e instanceof DomainError) return invalidNumber();
  if (isErrorValue(e)) return e;
  if (e instanceof RangeError) return invalidNumber();
  const msg = e instanceof Error ? e.message : String(e);
  return invalidValue(`unexpected problem: ${msg}`);
}

/** True for an Excel error value arriving from a cell (or produced here). */
export function isErrorValue(v: unknown): v is CustomFunctions.Error {
  return typeof v === 'object' && v !== null && !Array.isArray(v) && typeof (v as { code?: unknown }).code === 'string';
}

/* ------------------------------------------------------------------------------------------ */
/* Reading one value                                                                           */
/* ------------------------------------------------------------------------------------------ */

const NUMERIC_TEXT = /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/;

/** Shows a value in a message the way a cell would. */
export function show(v: unknown): string {
  if (typeof v === 'string') {
    const t = v.length > 40 ? `${v.slice(0, 37)}…` : v;
    return `"${t}"`;
  }
  if (typeof v === 'boolean') return v ? 'TRUE' : 'FALSE';
  if (v === null || v === undefined) return 'an empty cell';
  if (typeof v === 'number') return String(v);
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

function numberFrom(raw: unknown, spec: ArgSpec): number | CustomFunctions.Error {
  let x: number;
  if (typeof raw === 'number') x = raw;
  else if (typeof raw === 'string' && NUMERIC_TEXT.test(raw.trim())) x = Number(raw.trim());
  else if (isErrorValue(raw)) return raw;
  else if (isBlank(raw)) return invalidValue(`${spec.name} is required; the cell is empty`);
  else return invalidValue(`${spec.name} must be a number; got ${show(raw)}`);
  if (!Number.isFinite(x)) return invalidNumber();
  if (x === 0) x = 0; // −0 → 0
  const d = spec.domain;
  if (d !== undefined && !d.test(x)) return invalidNumber();
  return x;
}

function textFrom(raw: unknown, spec: ArgSpec): string | CustomFunctions.Error {
  if (typeof raw === 'string') {
    if (raw.trim() === '') return invalidValue(`${spec.name} is required; the cell is empty`);
    if (raw.length > 1000) return invalidValue(`${spec.name} is too long (${raw.length} characters; at most 1000)`);
    return raw;
  }
  if (typeof raw === 'number' && Number.isFinite(raw)) return String(raw);
  if (isErrorValue(raw)) return raw;
  if (isBlank(raw)) return invalidValue(`${spec.name} is required; the cell is empty`);
  return invalidValue(`${spec.name} must be text; got ${show(raw)}`);
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
        if (typeof raw === 'number' || (typeof raw === 'string' && NUMERIC_TEXT.test(raw.trim()))) return numberFrom(raw, spec);
        const t = textFrom(raw, spec);
        return typeof t === 'string' ? lookUpCouple(t) : t;
      });
    case 'electrode':
      return withDefault((raw) => {
        const t = textFrom(raw, spec);
        return typeof t === 'string' ? lookUpElectrode(t) : t;
      });
    case 'species':
      return withDefault((raw) => {
        if (typeof raw === 'number' || (typeof raw === 'string' && NUMERIC_TEXT.test(raw.trim()))) {
          return numberFrom(raw, { ...spec, domain: spec.domain ?? domains.positive });
        }
        return textFrom(raw, spec);
      });
    case 'numberList':
    case 'textList':
      throw new Error('list arguments are read whole, not per element');
  }
}

function lookUpCouple(key: string): CoupleRow | CustomFunctions.Error {
  let table: PotentialTable;
  try {
    table = currentTable();
  } catch (e) {
    return toExcelError(e);
  }
  const row = table.findCouple(key);
  return row ?? notAvailable(`unknown couple "${key}"; use a key of the potential table such as "Cu2+/Cu"`);
}

function lookUpElectrode(key: string): ElectrodeRow | CustomFunctions.Error {
  let table: PotentialTable;
  try {
    table = currentTable();
  } catch (e) {
    return toExcelError(e);
  }
  const row = table.findElectrode(key);
  return row ?? notAvailable(`unknown reference electrode "${key}"; use a key of the electrode table such as "SCE" or "Ag/AgCl/KCl(sat)"`);
}

/** Reads a whole range as a flat list (row by row). Blank cells are skipped. */
function readList(raw: unknown, spec: ArgSpec): number[] | string[] | CustomFunctions.Error {
  const flat: unknown[] = [];
  if (Array.isArray(raw)) {
    for (const row of raw) {
      if (Array.isArray(row)) for (const v of row) flat.push(v);
      else flat.push(row);
    }
  } else flat.push(raw);
  const cells = flat.filter((v) => !isBlank(v));
  if (cells.length === 0) {
    if (spec.optional || spec.default !== undefined) return [];
    return invalidValue(`${spec.name} is required; the range is empty`);
  }
  if (cells.length > 100000) return invalidValue(`${spec.name} has ${cells.length} values; at most 100000`);
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

/* ------------------------------------------------------------------------------------------ */
/* Shapes and broadcasting                                                                     */
/* ------------------------------------------------------------------------------------------ */

interface Shaped {
  readonly rows: number;
  readonly cols: number;
  /** The 2-D data when rows·cols > 1. */
  readonly data?: unknown[][];
  /** The single value when 1×1 or scalar. */
  readonly value?: unknown;
}

function shapeOf(raw: unknown, name: string): Shaped | CustomFunctions.Error {
  if (!Array.isArray(raw)) return { rows: 1, cols: 1, value: raw };
  if (raw.length === 0) return invalidValue(`${name} is an empty range`);
  let data = raw as unknown[][];
  if (!Array.isArray(raw[0])) {
    // a 1-D array: read it as one row
    if (raw.some((v) => Array.isArray(v))) return invalidValue(`${name} is not a rectangular range`);
    data = [raw as unknown[]];
  }
  const rows = data.length;
  const cols = (data[0] as unknown[]).length;
  if (cols === 0) return invalidValue(`${name} is an empty range`);
  for (let r = 1; r < rows; r++) {
    const row = data[r];
    if (!Array.isArray(row) || row.length !== cols) return invalidValue(`${name} is not a rectangular range`);
  }
  if (rows === 1 && cols === 1) return { rows: 1, cols: 1, value: data[0][0] };
  return { rows, cols, data };
}

function finishCell(v: Cell): Cell {
  if (typeof v === 'number') {
    if (!Number.isFinite(v)) return invalidNumber();
    return v === 0 ? 0 : v;
  }
  if (typeof v === 'string' || typeof v === 'boolean') return v;
  if (isErrorValue(v)) return v;
  return invalidValue('unexpected problem: a result that is not a number, text or logical value');
}

/* ------------------------------------------------------------------------------------------ */
/* The worksheet function                                                                      */
/* ------------------------------------------------------------------------------------------ */

export type WorksheetResult = Cell[][] | Promise<Cell[][]>;
// eslint-disable-next-line @typescript-eslint/no-explicit-any
export type WorksheetFunction = (...args: any[]) => WorksheetResult;

/** Every compiled function, by id, in declaration order (for tests, docs and the demo). */
export const registry = new Map<string, { spec: FunctionSpec; fn: WorksheetFunction }>();

/** Compiles a spec into the function Excel calls. */
export function worksheet(spec: FunctionSpec): WorksheetFunction {
  const n = spec.args.length;
  const converters: Array<Converter | null> = spec.args.map((a) =>
    a.kind === 'numberList' || a.kind === 'textList' ? null : makeConverter(a),
  );
  const width = spec.rowResult ?? 0;

  const evaluate = (raws: unknown[]): Cell[][] => {
    const vals: unknown[] = new Array(n);
    const shapes: Array<Shaped | null> = new Array(n);
    let rows = 1;
    let cols = 1;
    let scalarError: CustomFunctions.Error | null = null;
    // 1. read list arguments whole, shape the others, convert scalars once
    for (let i = 0; i < n; i++) {
      const a = spec.args[i];
      const conv = converters[i];
      if (conv === null) {
        const list = readList(raws[i], a);
        if (isErrorValue(list)) return [[list]];
        vals[i] = list;
        shapes[i] = null;
        continue;
      }
      const sh = shapeOf(raws[i], a.name);
      if (isErrorValue(sh)) return [[sh]];
      if (sh.data === undefined) {
        const v = conv(sh.value);
        if (isErrorValue(v) && scalarError === null) scalarError = v;
        vals[i] = v;
        shapes[i] = null;
      } else {
        shapes[i] = sh;
        if (sh.rows !== 1) {
          if (rows !== 1 && rows !== sh.rows) return [[shapeMismatch(spec, raws)]];
          rows = sh.rows;
        }
        if (sh.cols !== 1) {
          if (cols !== 1 && cols !== sh.cols) return [[shapeMismatch(spec, raws)]];
          cols = sh.cols;
        }
      }
    }
    // 2. all scalar: one computation
    if (rows === 1 && cols === 1) {
      if (scalarError !== null) return width ? [fillRow(scalarError, width)] : [[scalarError]];
      return [width ? computeOne(vals) : [computeCell(vals)]];
    }
    if (width && cols !== 1) {
      return [[invalidValue(`${spec.id} gives ${width} values per result; give its arguments as single columns, not ${rows}×${cols} ranges`)]];
    }
    if (rows * cols > 4_000_000) return [[invalidValue(`the result would have ${rows * cols} cells; at most 4000000`)]];
    // 3. broadcast
    const out: Cell[][] = new Array(rows);
    if (scalarError !== null) {
      for (let r = 0; r < rows; r++) out[r] = width ? fillRow(scalarError, width) : fillRow(scalarError, cols);
      return out;
    }
    const args: unknown[] = vals.slice();
    // rangeIdx: the arguments that vary, with their data and whether they vary by row / by column
    const rangeIdx: number[] = [];
    for (let i = 0; i < n; i++) if (shapes[i] !== null) rangeIdx.push(i);
    const m = rangeIdx.length;
    const rData: unknown[][][] = rangeIdx.map((i) => shapes[i]!.data!);
    const rByRow: boolean[] = rangeIdx.map((i) => shapes[i]!.rows !== 1);
    const rByCol: boolean[] = rangeIdx.map((i) => shapes[i]!.cols !== 1);
    const rConv: Converter[] = rangeIdx.map((i) => converters[i]!);
    for (let r = 0; r < rows; r++) {
      const line: Cell[] = width ? [] : new Array(cols);
      for (let c = 0; c < cols; c++) {
        let bad: CustomFunctions.Error | null = null;
        for (let k = 0; k < m; k++) {
          const raw = rData[k][rByRow[k] ? r : 0][rByCol[k] ? c : 0];
          const v = rConv[k](raw);
          if (bad === null && isErrorValue(v)) bad = v;
          args[rangeIdx[k]] = v;
        }
        if (width) {
          out[r] = bad !== null ? fillRow(bad, width) : computeOne(args);
        } else {
          line[c] = bad !== null ? bad : computeCell(args);
        }
      }
      if (!width) out[r] = line;
    }
    return out;
  };

  const computeOne = (args: unknown[]): Cell[] => {
    try {
      const v = spec.compute(...args);
      if (Array.isArray(v)) {
        const row = v.map(finishCell);
        return width && row.length !== width ? fillRow(invalidValue('unexpected problem: wrong result width'), width) : row;
      }
      return width ? fillRow(finishCell(v), width) : [finishCell(v)];
    } catch (e) {
      const err = toExcelError(e);
      return width ? fillRow(err, width) : [err];
    }
  };

  const compute = spec.compute;
  const computeCell = (args: unknown[]): Cell => {
    try {
      let v: Cell | Cell[];
      switch (n) {
        case 1: v = compute(args[0]); break;
        case 2: v = compute(args[0], args[1]); break;
        case 3: v = compute(args[0], args[1], args[2]); break;
        case 4: v = compute(args[0], args[1], args[2], args[3]); break;
        case 5: v = compute(args[0], args[1], args[2], args[3], args[4]); break;
        default: v = compute(...args);
      }
      if (typeof v === 'number') return Number.isFinite(v) ? (v === 0 ? 0 : v) : invalidNumber();
      return finishCell(v as Cell);
    } catch (e) {
      return toExcelError(e);
    }
  };

  const fn: WorksheetFunction = (...raws: unknown[]) => {
    try {
      if (spec.usesTable) {
        const pending = tablePending();
        if (pending !== null) {
          return pending.then(
            () => safeEvaluate(raws),
            () => safeEvaluate(raws),
          );
        }
      }
      return evaluate(raws);
    } catch (e) {
      return [[toExcelError(e)]];
    }
  };
  const safeEvaluate = (raws: unknown[]): Cell[][] => {
    try {
      return evaluate(raws);
    } catch (e) {
      return [[toExcelError(e)]];
    }
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
  if (!Array.isArray(raw)) return '1×1';
  const rows = raw.length;
  const cols = Array.isArray(raw[0]) ? (raw[0] as unknown[]).length : raw.length;
  return Array.isArray(raw[0]) ? `${rows}×${cols}` : `1×${rows}`;
}

function shapeMismatch(spec: FunctionSpec, raws: unknown[]): CustomFunctions.Error {
  const parts = spec.args
    .map((a, i) => (Array.isArray(raws[i]) && a.kind !== 'numberList' && a.kind !== 'textList' ? `${a.name} is ${dims(raws[i])}` : null))
    .filter((s): s is string => s !== null);
  return invalidValue(
    `ranges of different shapes cannot be combined (${parts.join(', ')}); give ranges of the same size, or a single row with a single column`,
  );
}
