/**
 * Compiling a spec into the function Excel calls: arguments read once per call when they are
 * single values, broadcast element by element when they are ranges, results checked and made fit
 * for a cell.
 *
 * A cell's error is the first error among its arguments in argument order, exactly as if the
 * function were called with that cell's values alone (so a range call and the per-cell calls
 * always agree). Arguments read whole (lists) that cannot be read give one error for the call.
 *
 * Speed (figures in BENCHMARKS.md): single values are converted once per call; a number in its
 * domain is used as it is, checked against the domain's bounds inline (only other values go
 * through the converters); each distinct text of a range is converted once per call; `compute`
 * is called through one closure with the fixed arguments bound; numeric results and error values
 * are stored by separate statements so that a range of numbers stays an unboxed array of doubles.
 */
import { tablePending } from './context';
import { type Converter, MEMO_LIMIT, makeConverter } from './convert';
import { type Bounds, domains, within } from './domains';
import { type Cell, errorClass, invalidValue, isErrorValue, toExcelError } from './excelErrors';
import { readLists } from './lists';
import { type Range, fillRow, finishOther, shapeMismatch, shapeOf } from './shapes';
import type { FunctionSpec } from './spec';

export type WorksheetResult = Cell[][] | Promise<Cell[][]>;
// Excel passes each parameter as a value or a 2-D range; the adapter reads them at run time.
// eslint-disable-next-line @typescript-eslint/no-explicit-any
export type WorksheetFunction = (...args: any[]) => WorksheetResult;

/** Every compiled function, by id, in declaration order (for the generator, tests, docs and the demo). */
export const registry = new Map<string, { spec: FunctionSpec; fn: WorksheetFunction }>();

/** Most cells a result may have. */
const MAX_CELLS = 4_000_000;

type Compute = FunctionSpec['compute'];

/** Calls compute with the arguments spread (no spread operator on the hot path for up to 6). */
function apply(compute: Compute, n: number, a: unknown[]): Cell | Cell[] {
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

/**
 * compute with every argument but one fixed: (x) => compute(a0, …, x, …). One closure per call of
 * a worksheet function; the fixed arguments are read once, not once per element.
 */
function bindAt(compute: Compute, n: number, k: number, vals: unknown[]): (x: unknown) => Cell | Cell[] {
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

/**
 * How one broadcast argument reads an element: a number in the domain is used as it is (bounds
 * checked inline, or the domain's own test when it has no bounds; 0 and −0 always take the
 * converter), anything else goes through the converter, a text once per call through `memo`.
 */
interface ElementReader {
  readonly bounds: Bounds | null;
  readonly test: ((x: number) => boolean) | null;
  readonly convert: Converter;
}

/** The one per-element read: fast path for numbers in the domain, memo for texts. */
function readElement(r: ElementReader, raw: unknown, memo: Map<string, unknown> | null): unknown {
  if (typeof raw === 'number' && raw - raw === 0 && raw !== 0) {
    const b = r.bounds;
    if (b !== null ? within(b, raw) : r.test !== null && r.test(raw)) return raw;
  }
  if (typeof raw !== 'string' || memo === null) return r.convert(raw);
  let v = memo.get(raw);
  if (v === undefined) {
    v = r.convert(raw);
    if (memo.size < MEMO_LIMIT) memo.set(raw, v);
  }
  return v;
}

/**
 * The function Excel calls for a spec. Its element loops are compiled on its first call, not when
 * the bundle starts: a workbook calls a few of the functions, and start-up should not pay for all.
 */
export function worksheet(spec: FunctionSpec): WorksheetFunction {
  let evaluate: ((raws: unknown[]) => Cell[][]) | null = null;
  const safeEvaluate = (raws: unknown[]): Cell[][] => {
    try {
      return (evaluate ??= compile(spec))(raws);
    } catch (e) {
      return [[toExcelError(e)]];
    }
  };

  const fn: WorksheetFunction = (...raws: unknown[]) => {
    // While the workbook's table and pinned data are being read at start-up, every function waits:
    // the pinned data (atomic weights, species, constants) is read by functions that never look at
    // the table. One null check per call otherwise.
    const pending = tablePending();
    if (pending !== null) return pending.then(() => safeEvaluate(raws), () => safeEvaluate(raws));
    return safeEvaluate(raws);
  };
  registry.set(spec.id, { spec, fn });
  return fn;
}

/** Compiles a spec into its evaluation: converted arguments, broadcast, results checked. */
function compile(spec: FunctionSpec): (raws: unknown[]) => Cell[][] {
  const n = spec.args.length;
  const names = spec.args.map((a) => a.name);
  const isList = spec.args.map((a) => a.kind === 'numberList' || a.kind === 'textList');
  const listIdx: number[] = [];
  for (let i = 0; i < n; i++) if (isList[i]) listIdx.push(i);
  const readers: Array<ElementReader | null> = spec.args.map((a, i) => {
    if (isList[i]) return null;
    const convert = makeConverter(a);
    if (a.kind !== 'number') return { bounds: null, test: null, convert };
    const d = a.domain ?? domains.any;
    return { bounds: d.bounds ?? null, test: d.test, convert };
  });
  const width = spec.rowResult ?? 0;
  const compute = spec.compute;

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
      if (Array.isArray(v)) {
        if (v.length !== width) return fillRow(invalidValue('unexpected problem: wrong result width'), width);
        return v.map(finishOther);
      }
      return fillRow(finishOther(v), width);
    } catch (e) {
      return fillRow(toExcelError(e), width);
    }
  };

  const evaluate = (raws: unknown[]): Cell[][] => {
    const vals: unknown[] = new Array<unknown>(n);
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
      if (Array.isArray(raw)) {
        const row0: unknown = raw[0];
        if (raw.length === 1 && Array.isArray(row0) && row0.length === 1) raw = row0[0];
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
      const v = readElement(readers[i]!, raw, null);
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

    const out: Cell[][] = new Array<Cell[]>(rows);
    // 3. the arguments that vary, in argument order. A cell's error is the first error among its
    //    arguments in argument order, exactly as if the function were called with that cell's values.
    const idx: number[] = [];
    for (let i = 0; i < scalarErrorAt; i++) if (ranges[i] !== null) idx.push(i);
    const m = idx.length;
    const rangeAt = idx.map((i) => ranges[i]!);
    if (scalarError !== null) {
      if (m === 0) {
        for (let r = 0; r < rows; r++) out[r] = fillRow(scalarError, width || cols);
        return out;
      }
      return firstErrors(idx, rangeAt, scalarError, rows, cols, out);
    }
    if (m === 1 && !width) return broadcastOne(idx[0], rangeAt[0], vals, rows, cols, out);
    const rData = rangeAt.map((sh) => sh.data);
    const rByRow = rangeAt.map((sh) => sh.rows !== 1);
    const rByCol = rangeAt.map((sh) => sh.cols !== 1);
    const memos = idx.map(() => new Map<string, unknown>());
    const Err = errorClass(); // converters answer errors as CustomFunctions.Error only
    for (let r = 0; r < rows; r++) {
      const line: Cell[] = width ? [] : new Array<Cell>(cols);
      for (let c = 0; c < cols; c++) {
        let bad: CustomFunctions.Error | null = null;
        for (let j = 0; j < m; j++) {
          const v = readElement(readers[idx[j]]!, rData[j][rByRow[j] ? r : 0][rByCol[j] ? c : 0], memos[j]);
          if (bad === null && v instanceof Err) bad = v;
          vals[idx[j]] = v;
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
    rangeAt: readonly Range[],
    scalarError: CustomFunctions.Error,
    rows: number,
    cols: number,
    out: Cell[][],
  ): Cell[][] => {
    const w = width || cols;
    const memos = idx.map(() => new Map<string, unknown>());
    const Err = errorClass(); // converters answer errors as CustomFunctions.Error only
    for (let r = 0; r < rows; r++) {
      const line: Cell[] = new Array<Cell>(w);
      for (let c = 0; c < cols; c++) {
        let bad: CustomFunctions.Error = scalarError;
        for (let j = 0; j < idx.length; j++) {
          const sh = rangeAt[j];
          const v = readElement(readers[idx[j]]!, sh.data[sh.rows !== 1 ? r : 0][sh.cols !== 1 ? c : 0], memos[j]);
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
   * others are converted once and bound. Numeric results and other cells are stored by separate
   * statements so that a numeric row stays an unboxed array of doubles.
   */
  const broadcastOne = (k: number, range: Range, vals: unknown[], rows: number, cols: number, out: Cell[][]): Cell[][] => {
    const data = range.data;
    const byRow = range.rows !== 1;
    const byCol = range.cols !== 1;
    const reader = readers[k]!;
    const f = bindAt(compute, n, k, vals);
    // Within one call the conversion of a text is fixed (the table in use cannot change under it).
    const memo = new Map<string, unknown>();
    const Err = errorClass(); // converters answer errors as CustomFunctions.Error only
    for (let r = 0; r < rows; r++) {
      const src = data[byRow ? r : 0];
      const line: Cell[] = new Array<Cell>(cols);
      for (let c = 0; c < cols; c++) {
        const v = readElement(reader, src[byCol ? c : 0], memo);
        if (v instanceof Err) {
          line[c] = v;
          continue;
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

  return evaluate;
}
