/**
 * The workbook's own copy of the potential table, and every change the task pane can make to it.
 *
 * A copy remembers, besides its rows, which rows were set in this workbook ("own": added or edited
 * here) and which built-in rows were deleted here ("removed"). That is what lets a copy be brought up
 * to a newer built-in table without losing anything the workbook's owners changed: rows they set stay
 * as they set them, rows they deleted stay deleted, every other row takes the newer built-in value.
 *
 * All functions here are pure: they take a copy and return a new one, or throw ChangeError with a
 * plain-words reason. Every result is checked with buildTable (parse, balance, ranges, unique keys)
 * before it is returned, so a copy that comes out of here is always a usable table.
 */
import type { CoupleRecord, ElectrodeRecord } from '../table/records';
import { buildTable } from '../table/table';
import type { PotentialTable } from '../table/types';
import type { RevisionLog } from './log';
import {
  type AnyRecord,
  type RowKind,
  type TableRecords,
  type VersionedRecords,
  cleanCouple,
  cleanElectrode,
  cleanRecord,
  matchKey,
  rowsOf,
  sameRecord,
} from './rows';

/** Keys (as written) per kind. */
export interface KeyLists {
  readonly couples: readonly string[];
  readonly electrodes: readonly string[];
}

export interface WorkbookCopy extends TableRecords {
  /** Version of the built-in table this copy was pinned to or last brought up to. */
  readonly basedOn: string;
  /** Write counter: 0 for a copy never written, then 1, 2, … one per write. */
  readonly revision: number;
  /** When the copy was last written (ISO 8601, UTC); "" for a copy never written. */
  readonly changedAt: string;
  /** Keys of rows set in this workbook (added, or edited to differ from the built-in row). */
  readonly own: KeyLists;
  /** Keys of built-in rows deleted in this workbook. */
  readonly removed: KeyLists;
  /**
   * The revision log as read (src/store/log.ts); absent on a copy made in memory. A write appends to
   * the log of the stored value it replaces (workbook/store.ts), not to this one.
   */
  readonly log?: RevisionLog;
}

/** A change the pane can make. Reset (remove the copy) and pin (write pinnedCopy) act on the store itself. */
export type TableChange =
  | { readonly kind: 'put'; readonly rowKind: RowKind; readonly originalKey: string | null; readonly record: AnyRecord }
  | { readonly kind: 'delete'; readonly rowKind: RowKind; readonly key: string }
  | { readonly kind: 'revert'; readonly rowKind: RowKind; readonly key: string }
  | {
      readonly kind: 'import';
      /** merge: imported rows replace rows with the same key, others are kept; replace: the table becomes the imported rows. */
      readonly mode: 'merge' | 'replace';
      readonly couples: readonly CoupleRecord[];
      readonly electrodes: readonly ElectrodeRecord[];
    }
  | { readonly kind: 'update-to-builtin' };

/** A change that cannot be made, with the reason in plain words. */
export class ChangeError extends Error {
  constructor(message: string, readonly details: readonly string[] = []) {
    super(message);
    this.name = 'ChangeError';
  }
}

const KINDS: readonly RowKind[] = ['couple', 'electrode'];
const listName = (kind: RowKind): 'couples' | 'electrodes' => (kind === 'couple' ? 'couples' : 'electrodes');

/**
 * The built-in table as a workbook copy (what Pin writes): same rows, same order, nothing own or
 * removed, so its checksum equals the built-in table's.
 */
export function pinnedCopy(builtin: VersionedRecords): WorkbookCopy {
  return {
    basedOn: builtin.version,
    revision: 0,
    changedAt: '',
    couples: builtin.couples.map(cleanCouple),
    electrodes: builtin.electrodes.map(cleanElectrode),
    own: { couples: [], electrodes: [] },
    removed: { couples: [], electrodes: [] },
  };
}

/** Builds the table a copy describes; throws ChangeError listing every problem when a row is unusable. */
export function tableOfCopy(copy: WorkbookCopy): PotentialTable {
  const built = buildTable(copy.basedOn, copy.couples, copy.electrodes);
  if (built.problems.length > 0) {
    const shortKey = (k: string): string => (k.length > 40 ? `${k.slice(0, 39)}…` : k);
    const details = built.problems.map((p) => `${p.kind} ${p.index + 1}${p.key ? ` (${shortKey(p.key)})` : ''}: ${p.message}`);
    throw new ChangeError(
      built.problems.length === 1 ? `a row is not usable: ${details[0]}` : `${built.problems.length} rows are not usable`,
      details,
    );
  }
  return built.table;
}

/** Mutable working state of one change: rows by match key (a Map keeps insertion order). */
interface Draft {
  rows: Record<RowKind, Map<string, AnyRecord>>;
  own: Record<RowKind, Set<string>>; // match keys
  removed: Record<RowKind, Map<string, string>>; // match key → key as written in the built-in table
  builtin: Record<RowKind, Map<string, AnyRecord>>;
}

function byKey(kind: RowKind, rows: readonly AnyRecord[]): Map<string, AnyRecord> {
  return new Map(rows.map((r) => [matchKey(kind, r.key), r]));
}

function draftOf(copy: WorkbookCopy, builtin: TableRecords): Draft {
  const d: Draft = {
    rows: { couple: byKey('couple', copy.couples), electrode: byKey('electrode', copy.electrodes) },
    own: { couple: new Set(), electrode: new Set() },
    removed: { couple: new Map(), electrode: new Map() },
    builtin: { couple: byKey('couple', builtin.couples), electrode: byKey('electrode', builtin.electrodes) },
  };
  for (const kind of KINDS) {
    for (const k of copy.own[listName(kind)]) d.own[kind].add(matchKey(kind, k));
    for (const k of copy.removed[listName(kind)]) d.removed[kind].set(matchKey(kind, k), k);
  }
  return d;
}

/** Puts rows in a stable order: built-in rows in built-in order first, then the others as they were. */
function arrange(kind: RowKind, rows: Map<string, AnyRecord>, builtin: TableRecords): AnyRecord[] {
  const out: AnyRecord[] = [];
  for (const b of rowsOf(builtin, kind)) {
    const r = rows.get(matchKey(kind, b.key));
    if (r !== undefined) out.push(r);
  }
  const inBuiltin = new Set(rowsOf(builtin, kind).map((b) => matchKey(kind, b.key)));
  for (const [k, r] of rows) if (!inBuiltin.has(k)) out.push(r);
  return out;
}

function finish(d: Draft, base: WorkbookCopy, builtin: TableRecords, basedOn: string): WorkbookCopy {
  const lists = (kind: RowKind) => {
    const cleaned = new Map([...d.rows[kind]].map(([k, r]) => [k, cleanRecord(kind, r)]));
    const rows = arrange(kind, cleaned, builtin);
    // A row is own only while it exists and differs from the built-in row of its key.
    const own = rows
      .filter((r) => {
        const k = matchKey(kind, r.key);
        if (!d.own[kind].has(k)) return false;
        const b = d.builtin[kind].get(k);
        return b === undefined || !sameRecord(kind, b, r);
      })
      .map((r) => r.key);
    // A key is removed only while the built-in table has it and the copy does not.
    const removed = [...d.removed[kind].entries()].filter(([k]) => !cleaned.has(k) && d.builtin[kind].has(k)).map(([, written]) => written);
    return { rows, own, removed };
  };
  const c = lists('couple');
  const e = lists('electrode');
  const next: WorkbookCopy = {
    basedOn,
    revision: base.revision,
    changedAt: base.changedAt,
    couples: c.rows as CoupleRecord[],
    electrodes: e.rows as ElectrodeRecord[],
    own: { couples: c.own, electrodes: e.own },
    removed: { couples: c.removed, electrodes: e.removed },
  };
  tableOfCopy(next);
  return next;
}

function put(d: Draft, kind: RowKind, originalKey: string | null, record: AnyRecord): void {
  const rows = d.rows[kind];
  const rec = cleanRecord(kind, record);
  const k = matchKey(kind, rec.key);
  const from = originalKey === null ? null : matchKey(kind, originalKey);
  if (from !== null && !rows.has(from)) throw new ChangeError(`there is no ${kind} "${originalKey}" to change`);
  if (rows.has(k) && k !== from) throw new ChangeError(`a ${kind} with the key "${rows.get(k)!.key}" is already in the table`);
  if (from !== null && from !== k) remove(d, kind, rows.get(from)!.key);
  rows.set(k, rec);
  d.own[kind].add(k);
  d.removed[kind].delete(k);
}

function remove(d: Draft, kind: RowKind, key: string): void {
  const k = matchKey(kind, key);
  if (!d.rows[kind].delete(k)) throw new ChangeError(`there is no ${kind} "${key}" to delete`);
  d.own[kind].delete(k);
  const b = d.builtin[kind].get(k);
  if (b !== undefined) d.removed[kind].set(k, b.key);
}

function revert(d: Draft, kind: RowKind, key: string): void {
  const k = matchKey(kind, key);
  const b = d.builtin[kind].get(k);
  if (b === undefined) throw new ChangeError(`"${key}" is not in the built-in table, so it has no built-in value to go back to`);
  d.rows[kind].set(k, cleanRecord(kind, b));
  d.own[kind].delete(k);
  d.removed[kind].delete(k);
}

/**
 * Applies one change to a copy (or, when the workbook has none yet, to pinnedCopy(builtin)) and
 * returns the new copy. Revision and time are left for the writer to set.
 *
 * - put: adds a row (originalKey null) or replaces the row with originalKey (a new key renames it; a
 *   built-in key renamed away counts as deleted). A key already used by another row is refused.
 * - delete: removes the row; a built-in row stays deleted when the copy is updated later.
 * - revert: sets the row to the add-in's built-in value (restoring it if it had been deleted).
 * - import merge: every imported row is put; import replace: the table becomes exactly the imported rows.
 * - update-to-builtin: rows set or deleted in this workbook stay as they are; every other row takes the
 *   add-in's built-in value; rows new in the built-in table are added; basedOn becomes the built-in version.
 *
 * Syntax: applyChange(copy, builtin, change)
 * Example: applyChange(pinnedCopy(b), b, { kind: 'delete', rowKind: 'couple', key: 'Zn2+/Zn' }).removed.couples → ["Zn2+/Zn"]
 */
export function applyChange(copy: WorkbookCopy | null, builtin: VersionedRecords, change: TableChange): WorkbookCopy {
  const base = copy ?? pinnedCopy(builtin);
  const d = draftOf(base, builtin);
  let basedOn = base.basedOn;
  switch (change.kind) {
    case 'put':
      put(d, change.rowKind, change.originalKey, change.record);
      break;
    case 'delete':
      remove(d, change.rowKind, change.key);
      break;
    case 'revert':
      revert(d, change.rowKind, change.key);
      break;
    case 'import':
      if (change.mode === 'replace') {
        for (const kind of KINDS) {
          d.rows[kind].clear();
          d.own[kind].clear();
          d.removed[kind] = new Map([...d.builtin[kind]].map(([k, b]) => [k, b.key]));
        }
      }
      // An imported row replaces the row with the same key (the CSV reader refuses keys repeated within a file).
      for (const [kind, list] of [['couple', change.couples], ['electrode', change.electrodes]] as const) {
        for (const r of list) {
          const k = matchKey(kind, r.key);
          put(d, kind, d.rows[kind].has(k) ? d.rows[kind].get(k)!.key : null, r);
        }
      }
      break;
    case 'update-to-builtin':
      for (const kind of KINDS) {
        const next = new Map<string, AnyRecord>();
        for (const [k, b] of d.builtin[kind]) {
          if (d.removed[kind].has(k)) continue;
          const mine = d.own[kind].has(k) ? d.rows[kind].get(k) : undefined;
          next.set(k, mine ?? b);
        }
        for (const [k, r] of d.rows[kind]) if (!next.has(k) && d.own[kind].has(k)) next.set(k, r);
        d.rows[kind] = next;
      }
      basedOn = builtin.version;
      break;
  }
  return finish(d, base, builtin, basedOn);
}

/** True when the copy holds exactly the built-in rows of the add-in (nothing own or removed, same version). */
export function isPristine(copy: WorkbookCopy, builtin: VersionedRecords): boolean {
  const p = pinnedCopy(builtin);
  if (copy.basedOn !== builtin.version || copy.couples.length !== p.couples.length || copy.electrodes.length !== p.electrodes.length) return false;
  return (
    copy.couples.every((r, i) => sameRecord('couple', r, p.couples[i])) &&
    copy.electrodes.every((r, i) => sameRecord('electrode', r, p.electrodes[i]))
  );
}

/** Which rows of a copy were set here, by match key, for display ("edited here"/"added here"). */
export function ownKeys(copy: WorkbookCopy, kind: RowKind): Set<string> {
  return new Set(copy.own[listName(kind)].map((k) => matchKey(kind, k)));
}
