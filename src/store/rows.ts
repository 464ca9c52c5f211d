/**
 * Rows of the stored table as plain records, and the few things every store module does with them:
 * turn table rows back into records, tidy a record into its one stored form, compare two records,
 * and match keys the way look-ups do.
 */
import { normalizeCoupleKey, normalizeElectrodeKey } from '../table/keys';
import type { CoupleRecord, ElectrodeRecord } from '../table/records';
import type { CoupleRow, ElectrodeRow, PotentialTable } from '../table/types';
import { canonicalJson } from './canonical';

export type RowKind = 'couple' | 'electrode';

/** The rows of a table as plain records. */
export interface TableRecords {
  readonly couples: readonly CoupleRecord[];
  readonly electrodes: readonly ElectrodeRecord[];
}

/** A table's records with the built-in version they are (the add-in's built-in table). */
export interface VersionedRecords extends TableRecords {
  readonly version: string;
}

/** The record of a couple row (the parsed half-reaction and derived n are not stored). */
export function coupleRecordOf(row: CoupleRow): CoupleRecord {
  return cleanCouple({ key: row.key, halfReaction: row.halfReaction, e0: row.e0, dEdT_mV_K: row.dEdT_mV_K, source: row.source, note: row.note });
}

/** The record of an electrode row. */
export function electrodeRecordOf(row: ElectrodeRow): ElectrodeRecord {
  return cleanElectrode({
    key: row.key,
    aliases: [...row.aliases],
    potential: row.potential,
    dEdT_mV_K: row.dEdT_mV_K,
    source: row.source,
    note: row.note,
  });
}

/** A table's rows as records, with its version. */
export function recordsOf(table: PotentialTable): VersionedRecords {
  return { version: table.version, couples: table.couples.map(coupleRecordOf), electrodes: table.electrodes.map(electrodeRecordOf) };
}

function trimmed(x: string | undefined): string | undefined {
  if (x === undefined || x === null) return undefined;
  const t = String(x).trim();
  return t === '' ? undefined : t;
}

/**
 * The one stored form of a couple record: fields in a fixed order, texts trimmed, an empty note and
 * a missing dE°/dT left out.
 */
export function cleanCouple(r: CoupleRecord): CoupleRecord {
  const out: CoupleRecord = { key: r.key.trim(), halfReaction: r.halfReaction.trim(), e0: r.e0, source: r.source.trim() };
  if (r.dEdT_mV_K !== undefined && r.dEdT_mV_K !== null) out.dEdT_mV_K = r.dEdT_mV_K;
  const note = trimmed(r.note);
  if (note !== undefined) out.note = note;
  return out;
}

/** The one stored form of an electrode record (see cleanCouple); aliases trimmed, empty ones dropped. */
export function cleanElectrode(r: ElectrodeRecord): ElectrodeRecord {
  const out: ElectrodeRecord = {
    key: r.key.trim(),
    aliases: (r.aliases ?? []).map((a) => a.trim()).filter((a) => a !== ''),
    potential: r.potential,
    source: r.source.trim(),
  };
  if (r.dEdT_mV_K !== undefined && r.dEdT_mV_K !== null) out.dEdT_mV_K = r.dEdT_mV_K;
  const note = trimmed(r.note);
  if (note !== undefined) out.note = note;
  return out;
}

export type AnyRecord = CoupleRecord | ElectrodeRecord;

/** Tidies a record of either kind. */
export function cleanRecord(kind: RowKind, r: AnyRecord): AnyRecord {
  return kind === 'couple' ? cleanCouple(r as CoupleRecord) : cleanElectrode(r as ElectrodeRecord);
}

/** True when two records hold the same content once tidied. */
export function sameRecord(kind: RowKind, a: AnyRecord, b: AnyRecord): boolean {
  return canonicalJson(cleanRecord(kind, a)) === canonicalJson(cleanRecord(kind, b));
}

const matchCache = new Map<string, string>();

/**
 * The look-up form of a key ("Cu(2+)/Cu" and "Cu2+/Cu" match; electrode keys ignore case and spaces).
 * Remembered, since tables of thousands of rows are matched many times over.
 */
export function matchKey(kind: RowKind, key: string): string {
  const cacheKey = `${kind === 'couple' ? 'c' : 'e'}\u0000${key}`;
  let k = matchCache.get(cacheKey);
  if (k === undefined) {
    k = kind === 'couple' ? normalizeCoupleKey(key) : normalizeElectrodeKey(key);
    if (matchCache.size > 100_000) matchCache.clear();
    matchCache.set(cacheKey, k);
  }
  return k;
}

/** The records of one kind. */
export function rowsOf(t: TableRecords, kind: RowKind): readonly AnyRecord[] {
  return kind === 'couple' ? t.couples : t.electrodes;
}

/** Finds a record by key (look-up rules of its kind); its index or −1. */
export function indexOfKey(rows: readonly AnyRecord[], kind: RowKind, key: string): number {
  const k = matchKey(kind, key);
  return rows.findIndex((r) => matchKey(kind, r.key) === k);
}

/** Field labels used in messages and in the pane. */
export const FIELD_LABELS: Record<string, string> = {
  key: 'key',
  halfReaction: 'half-reaction',
  e0: 'E°',
  potential: 'potential',
  dEdT_mV_K: 'dE/dT',
  aliases: 'other names',
  source: 'source',
  note: 'note',
};

/** The fields in which two records of a kind differ (after tidying), by record field name. */
export function differingFields(kind: RowKind, a: AnyRecord, b: AnyRecord): string[] {
  const x = cleanRecord(kind, a) as unknown as Record<string, unknown>;
  const y = cleanRecord(kind, b) as unknown as Record<string, unknown>;
  const fields = kind === 'couple'
    ? ['key', 'halfReaction', 'e0', 'dEdT_mV_K', 'source', 'note']
    : ['key', 'aliases', 'potential', 'dEdT_mV_K', 'source', 'note'];
  return fields.filter((f) => canonicalJson(x[f] ?? null) !== canonicalJson(y[f] ?? null));
}
