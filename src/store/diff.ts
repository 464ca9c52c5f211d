/**
 * Differences between two tables, row by row: which rows one has that the other lacks, and which rows
 * both have with different content (and in which fields). Rows are matched by key with the look-up
 * rules of their kind, so "Cu(2+)/Cu" and "Cu2+/Cu" are the same row.
 *
 * Used for "rows differing from the built-in table", for what updating to a newer built-in table would
 * change, and for telling the user what another pane changed.
 */
import { type AnyRecord, type RowKind, type TableRecords, differingFields, matchKey, rowsOf } from './rows';

export type DifferenceStatus = 'added' | 'removed' | 'changed';

export interface RowDifference {
  readonly rowKind: RowKind;
  /** The key as written in `to` (or in `from` for a removed row). */
  readonly key: string;
  /** added: only in `to`; removed: only in `from`; changed: in both with different content. */
  readonly status: DifferenceStatus;
  /** For changed rows: the record fields that differ. */
  readonly fields: readonly string[];
  readonly before?: AnyRecord;
  readonly after?: AnyRecord;
}

function diffKind(kind: RowKind, from: readonly AnyRecord[], to: readonly AnyRecord[]): RowDifference[] {
  const out: RowDifference[] = [];
  const fromByKey = new Map(from.map((r) => [matchKey(kind, r.key), r]));
  const toKeys = new Set<string>();
  for (const after of to) {
    const k = matchKey(kind, after.key);
    toKeys.add(k);
    const before = fromByKey.get(k);
    if (before === undefined) {
      out.push({ rowKind: kind, key: after.key, status: 'added', fields: [], after });
    } else {
      const fields = differingFields(kind, before, after);
      if (fields.length > 0) out.push({ rowKind: kind, key: after.key, status: 'changed', fields, before, after });
    }
  }
  for (const before of from) {
    if (!toKeys.has(matchKey(kind, before.key))) out.push({ rowKind: kind, key: before.key, status: 'removed', fields: [], before });
  }
  return out;
}

/**
 * Every row difference from one table to another: couples first, then electrodes; within a kind, rows
 * in `to`'s order, then removed rows in `from`'s order.
 *
 * Syntax: diffTables(from, to)
 * Example: diffTables(builtin, workbookCopy).length → number of rows differing from the built-in table
 */
export function diffTables(from: TableRecords, to: TableRecords): RowDifference[] {
  return [...diffKind('couple', rowsOf(from, 'couple'), rowsOf(to, 'couple')), ...diffKind('electrode', rowsOf(from, 'electrode'), rowsOf(to, 'electrode'))];
}

/** A numeric field of a row as text, "undefined" when the row does not have it. */
function fieldText(rec: AnyRecord | undefined, field: string): string {
  const v: unknown = rec === undefined ? undefined : Object.entries(rec).find(([k]) => k === field)?.[1];
  return typeof v === 'number' || v === undefined ? String(v) : JSON.stringify(v);
}

/** A difference as one line of plain text, e.g. 'Cu2+/Cu: E° 0.3419 → 0.34 V' or 'Zn2+/Zn: removed'. */
export function describeDifference(d: RowDifference): string {
  const what = d.rowKind === 'couple' ? 'couple' : 'electrode';
  if (d.status === 'added') return `${what} ${d.key}: added`;
  if (d.status === 'removed') return `${what} ${d.key}: removed`;
  const parts = d.fields.map((f) => {
    const b = fieldText(d.before, f);
    const a = fieldText(d.after, f);
    if (f === 'e0' || f === 'potential') return `${f === 'e0' ? 'E°' : 'potential'} ${b} → ${a} V`;
    if (f === 'dEdT_mV_K') return `dE/dT ${b === 'undefined' ? 'none' : b} → ${a === 'undefined' ? 'none' : a} mV/K`;
    if (f === 'halfReaction') return 'half-reaction';
    if (f === 'aliases') return 'other names';
    return f;
  });
  return `${what} ${d.key}: ${parts.join(', ')}`;
}
