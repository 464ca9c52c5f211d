/**
 * The description of the data set in use: one version, one checksum over the per-part checksums, and
 * for each part (the potential table first) whether it is pinned in the workbook or follows the
 * add-in's built-in data, its version, checksum, row count and source. Pure: the callers say what the
 * workbook holds (the functions' status, the pane's model).
 */
import { builtinDataSetChecksum, builtinPartChecksums, builtinTableChecksum, dataSetChecksum } from './checksum';
import { BUILTIN_PARTS, DATASET_VERSION, DATA_PARTS, type DataPartName, type DataParts, PART_INFO } from './parts';
import type { PinnedData } from './pinned';

export type PartName = 'table' | DataPartName;

export interface PartDescription {
  readonly name: PartName;
  readonly title: string;
  /** True when the workbook holds this part; false when it follows the add-in's built-in data. */
  readonly pinned: boolean;
  readonly version: string;
  readonly checksum: string;
  /** Rows in the part (couples + electrodes for the table), or null for a part of constants. */
  readonly rows: number | null;
  readonly source: string;
  /** Where the built-in part comes from in the add-in. */
  readonly file: string;
  /** For a pinned part written by an earlier add-in version: the fields it predates, read from the built-in part. */
  readonly fromBuiltin?: readonly string[];
}

export interface DataSetDescription {
  /** The data version: the pinned data's when the workbook pinned any part besides the table, else the table's. */
  readonly version: string;
  readonly checksum: string;
  readonly parts: readonly PartDescription[];
}

/** What describeDataSet needs to know about the potential table in use. */
export interface TablePart {
  readonly pinned: boolean;
  readonly version: string;
  readonly checksum: string;
  readonly rows: number;
  readonly source: string;
}

function rowsOfPart(name: DataPartName, content: unknown): number | null {
  const list = PART_INFO[name].rows;
  if (list === '') return null;
  const v = (content as Record<string, unknown>)[list];
  return Array.isArray(v) ? v.length : null;
}

function sourceOf(content: unknown): string {
  const s = (content as { source?: unknown }).source;
  if (typeof s === 'string') return s;
  const d = (content as { description?: unknown }).description;
  return typeof d === 'string' ? `see each entry's source (${d.length > 120 ? `${d.slice(0, 119)}…` : d})` : 'see each entry\'s source';
}

/**
 * The data set in use.
 *
 * Syntax: describeDataSet(table, pinned)
 * Example: describeDataSet({ pinned: false, version: "2026.1", checksum, rows: 90, source }, null).version → "2026.1"
 * See also: dataSetChecksum, readPinnedText
 */
export function describeDataSet(table: TablePart, pinned: PinnedData | null): DataSetDescription {
  const builtinSums = builtinPartChecksums();
  const parts: PartDescription[] = [
    { name: 'table', title: 'Potential table (couples and electrodes)', pinned: table.pinned, version: table.version, checksum: table.checksum, rows: table.rows, source: table.source, file: 'data/couples.json, data/electrodes.json' },
  ];
  const sums = { table: table.checksum } as Record<PartName, string>;
  for (const name of DATA_PARTS) {
    const own = pinned?.parts[name];
    const content: unknown = own ?? BUILTIN_PARTS[name];
    const checksum = own !== undefined ? (pinned?.checksums[name] ?? '') : builtinSums[name];
    sums[name] = checksum;
    parts.push({
      name,
      title: PART_INFO[name].title,
      pinned: own !== undefined,
      version: own !== undefined && pinned !== null ? pinned.version : DATASET_VERSION,
      checksum,
      rows: rowsOfPart(name, content),
      source: sourceOf(content),
      file: PART_INFO[name].file,
      ...(own !== undefined && pinned?.fromBuiltin[name] !== undefined ? { fromBuiltin: pinned.fromBuiltin[name] } : {}),
    });
  }
  // The built-in data (or a pinned copy equal to it) has the checksum the build computed.
  const builtin = pinned === null && table.checksum === builtinTableChecksum();
  return { version: pinned !== null ? pinned.version : table.version, checksum: builtin ? builtinDataSetChecksum() : dataSetChecksum(sums), parts };
}

/** One changed value of a part: its place (a row key and field, or a path) with the value before and after (absent: added or removed). */
export interface ValueChange {
  readonly where: string;
  readonly before?: unknown;
  readonly after?: unknown;
}

export interface PartComparison {
  readonly name: DataPartName;
  readonly title: string;
  /** Row keys only in `to`. */
  readonly added: readonly string[];
  /** Row keys only in `from`. */
  readonly removed: readonly string[];
  /** Values that differ: fields of rows in both, and the part's other values. */
  readonly changed: readonly ValueChange[];
}

function keyOfRow(spec: string, row: unknown): string {
  const r = row as Record<string, unknown>;
  return spec.split('|').map((f) => String(r[f])).join(' ');
}

/** Leaves of a value by path; lists of plain values are one leaf. */
function leaves(v: unknown, path: string, out: Map<string, unknown>): void {
  if (v !== null && typeof v === 'object' && !(Array.isArray(v) && v.every((x) => x === null || typeof x !== 'object'))) {
    if (Array.isArray(v)) v.forEach((x, i) => leaves(x, `${path}[${i}]`, out));
    else for (const [k, x] of Object.entries(v)) leaves(x, path === '' ? k : `${path}.${k}`, out);
  } else out.set(path, v);
}

const same = (a: unknown, b: unknown): boolean => JSON.stringify(a) === JSON.stringify(b);

function compareValues(from: unknown, to: unknown, prefix: string, out: ValueChange[]): void {
  const a = new Map<string, unknown>();
  const b = new Map<string, unknown>();
  leaves(from, '', a);
  leaves(to, '', b);
  const at = (k: string) => (prefix === '' ? k : k === '' ? prefix : `${prefix}: ${k}`);
  for (const [k, x] of a) {
    if (!b.has(k)) out.push({ where: at(k), before: x });
    else if (!same(x, b.get(k))) out.push({ where: at(k), before: x, after: b.get(k) });
  }
  for (const [k, y] of b) if (!a.has(k)) out.push({ where: at(k), after: y });
}

/**
 * What changes in one part from `from` to `to` (e.g. the workbook's pinned atomic weights to the
 * add-in's newer built-in ones): rows added and removed (by the part's row key) and values changed.
 *
 * Syntax: comparePart(name, from, to)
 * Example: comparePart("atomicweights", pinned, builtin).changed → [{ where: "Ni: atomicWeight", before: 58.6934, after: 58.693 }]
 */
export function comparePart<K extends DataPartName>(name: K, from: DataParts[K], to: DataParts[K]): PartComparison {
  const info = PART_INFO[name];
  const added: string[] = [];
  const removed: string[] = [];
  const changed: ValueChange[] = [];
  const f = from as unknown as Record<string, unknown>;
  const t = to as unknown as Record<string, unknown>;
  const restFrom: Record<string, unknown> = { ...f };
  const restTo: Record<string, unknown> = { ...t };
  if (info.rows !== '' && Array.isArray(f[info.rows]) && Array.isArray(t[info.rows])) {
    delete restFrom[info.rows];
    delete restTo[info.rows];
    const before = new Map((f[info.rows] as unknown[]).map((r) => [keyOfRow(info.rowKey, r), r]));
    const after = new Map((t[info.rows] as unknown[]).map((r) => [keyOfRow(info.rowKey, r), r]));
    for (const [k, r] of after) {
      const old = before.get(k);
      if (old === undefined) added.push(k);
      else compareValues(old, r, k, changed);
    }
    for (const k of before.keys()) if (!after.has(k)) removed.push(k);
  }
  compareValues(restFrom, restTo, '', changed);
  return { name, title: info.title, added, removed, changed };
}

/** comparePart for every part; parts without differences are left out. */
export function compareDataParts(from: DataParts, to: DataParts): PartComparison[] {
  return DATA_PARTS.map((n) => comparePart(n, from[n], to[n])).filter((c) => c.added.length + c.removed.length + c.changed.length > 0);
}
