/**
 * Shapes of range arguments and of results: reading a range's shape, the message for shapes that
 * cannot be broadcast, and making one result element fit for a cell.
 */
import { type Cell, asResultError, invalidNumber, invalidValue, isErrorValue } from './excelErrors';
import type { FunctionSpec } from './spec';

/** Excel's limit on the characters of a text in one cell. */
const EXCEL_MAX_TEXT = 32767;

/** A range argument: its 2-D data (rows·cols > 1). Scalars and 1×1 ranges are read as values. */
export interface Range {
  readonly rows: number;
  readonly cols: number;
  readonly data: readonly (readonly unknown[])[];
}

/** The shape of an argument: a Range, a single value wrapped as { value }, or an error value. */
export function shapeOf(raw: unknown[], name: string): Range | { value: unknown } | CustomFunctions.Error {
  if (raw.length === 0) return invalidValue(`${name} is an empty range`);
  let data = raw as unknown[][];
  if (!Array.isArray(raw[0])) {
    // a 1-D array: read it as one row
    for (let i = 0; i < raw.length; i++) if (Array.isArray(raw[i])) return invalidValue(`${name} is not a rectangular range`);
    data = [raw];
  }
  const rows = data.length;
  const cols = data[0].length;
  if (cols === 0) return invalidValue(`${name} is an empty range`);
  for (let r = 1; r < rows; r++) {
    const row = data[r];
    if (!Array.isArray(row) || row.length !== cols) return invalidValue(`${name} is not a rectangular range`);
  }
  if (rows === 1 && cols === 1) return { value: data[0][0] };
  return { rows, cols, data };
}

/** A result element that is not a finite number: checked and made fit for a cell. */
export function finishOther(v: unknown): Cell {
  if (typeof v === 'number') return Number.isFinite(v) ? (v === 0 ? 0 : v) : invalidNumber();
  if (typeof v === 'string') return v.length <= EXCEL_MAX_TEXT ? v : invalidValue(`the result is a text of ${v.length} characters; a cell holds at most ${EXCEL_MAX_TEXT}`);
  if (typeof v === 'boolean') return v;
  if (isErrorValue(v)) return asResultError(v, 'the result');
  return invalidValue('unexpected problem: a result that is not a number, text or logical value');
}

/** A row of `width` copies of one value. */
export function fillRow(v: Cell, width: number): Cell[] {
  const row = new Array<Cell>(width);
  for (let i = 0; i < width; i++) row[i] = v;
  return row;
}

function dims(raw: unknown): string {
  if (!Array.isArray(raw)) return '1×1';
  const first: unknown = raw[0];
  return Array.isArray(first) ? `${raw.length}×${first.length}` : `1×${raw.length}`;
}

/** #VALUE! naming each range's shape, for ranges that cannot be broadcast together. */
export function shapeMismatch(spec: FunctionSpec, raws: unknown[], isList: readonly boolean[]): CustomFunctions.Error {
  const parts = spec.args
    .map((a, i) => (Array.isArray(raws[i]) && !isList[i] && dims(raws[i]) !== '1×1' ? `${a.name} is ${dims(raws[i])}` : null))
    .filter((s): s is string => s !== null);
  return invalidValue(
    `ranges of different shapes cannot be combined (${parts.join(', ')}); give ranges of the same size, or a single row with a single column`,
  );
}
