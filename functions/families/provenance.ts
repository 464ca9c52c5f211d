/** Provenance: facts about the potential table and the data set in use and the add-in, for a template's header. */
import pkg from '../../package.json';
import { NotFoundError } from '../../src/errors';
import { recordsOf } from '../../src/store/rows';
import { builtinChecksum } from '../../src/store/stored';
import { DATA_PARTS } from '../../src/dataset/parts';
import { builtinTable } from '../../src/table/builtin';
import { dataSetInUse } from '../dataHost';
import { worksheet } from '../adapter';
import { tableInUse } from '../context';
import { tableDetails, tablePart } from '../workbookHost';

/** The add-in's version, from package.json at build time. */
export const ADDIN_VERSION: string = pkg.version;

/** The fields TABLEINFO answers, in the order its messages list them. */
export const TABLEINFO_FIELDS = ['origin', 'version', 'checksum', 'revision', 'changed', 'couples', 'electrodes', 'addin', 'dataset', 'datasetchecksum', 'pinned'] as const;

/** The parts of the data set, for "checksum:<part>". */
export const DATASET_PART_NAMES: readonly string[] = ['table', ...DATA_PARTS];

const PART_FIELD = 'checksum:';

/** Days from Excel's day 0 (1899-12-30, the 1900 date system) to 1970-01-01. */
const EXCEL_EPOCH_DAYS = 25569;

/** An ISO 8601 time as an Excel date serial (days, fraction = time of day, UTC). */
export function excelSerial(iso: string): number {
  const ms = Date.parse(iso);
  if (!Number.isFinite(ms)) throw new NotFoundError(`the table's change time "${iso}" cannot be read`);
  return ms / 86_400_000 + EXCEL_EPOCH_DAYS;
}

let builtinSum: string | null = null;

/**
 * One fact about the potential table in use, or the add-in's version.
 *
 * Syntax: tableInfo(field)
 * Example: tableInfo("origin") → "built-in"; tableInfo("couples") → 67
 * See also: STDPOTENTIAL, SOURCE
 */
export function tableInfo(field: string): string | number {
  const f = field.trim().toLowerCase();
  const part = f.startsWith(PART_FIELD) ? f.slice(PART_FIELD.length).trim() : null;
  if (part !== null && !DATASET_PART_NAMES.includes(part)) {
    throw new NotFoundError(`unknown part "${part}" of the data set; the parts are ${DATASET_PART_NAMES.map((x) => `"${x}"`).join(', ')}`);
  }
  if (part === null && !(TABLEINFO_FIELDS as readonly string[]).includes(f)) {
    throw new NotFoundError(`unknown field "${field}"; the fields are ${TABLEINFO_FIELDS.map((x) => `"${x}"`).join(', ')}, or "checksum:<part>" for one part of the data set`);
  }
  if (f === 'addin') return ADDIN_VERSION;
  const t = tableInUse();
  if (t.kind === 'unreadable') {
    if (f === 'origin') return 'unreadable';
    throw new NotFoundError(`the workbook's potential table could not be read: ${t.reason}`);
  }
  if (part !== null || f === 'dataset' || f === 'datasetchecksum' || f === 'pinned') {
    const ds = dataSetInUse(tablePart());
    if (part !== null) return ds.parts.find((p) => p.name === part)?.checksum ?? '';
    if (f === 'dataset') return ds.version;
    if (f === 'datasetchecksum') return ds.checksum;
    const pinned = ds.parts.filter((p) => p.pinned).map((p) => p.name);
    return pinned.length === 0 ? 'none' : pinned.join(', ');
  }
  const d = tableDetails();
  if (builtinSum === null) builtinSum = builtinChecksum(recordsOf(builtinTable()));
  switch (f) {
    case 'origin':
      if (t.kind === 'builtin') return 'built-in';
      return d.checksum === builtinSum ? 'pinned built-in' : 'workbook';
    case 'version':
      return t.table.version;
    case 'checksum':
      if (d.checksum === undefined) throw new NotFoundError('the checksum of the table in use is not known yet');
      return d.checksum;
    case 'revision':
      if (t.kind === 'builtin') throw new NotFoundError('the built-in table has no revision; only a workbook\'s own table has one');
      if (d.revision === undefined) throw new NotFoundError('the revision of the workbook\'s table is not known');
      return d.revision;
    case 'changed':
      if (t.kind === 'builtin') throw new NotFoundError(`the built-in table (version ${t.table.version}) has no change time; only a workbook's own table has one`);
      if (!d.changedAt) throw new NotFoundError('the workbook\'s table carries no change time');
      return excelSerial(d.changedAt);
    case 'couples':
      return t.table.couples.length;
    default:
      return t.table.electrodes.length;
  }
}

export const TABLEINFO = worksheet({
  id: 'TABLEINFO',
  description: 'A fact about the potential table and the data set in use, for a template\'s header: "origin" (built-in, workbook, pinned built-in, unreadable), "version", "checksum" (SHA-256), "revision", "changed" (an Excel date serial), "couples", "electrodes", "addin" (the add-in\'s version), "dataset" (the data version), "datasetchecksum", "pinned" (the parts pinned in the workbook), or "checksum:<part>" (e.g. "checksum:atomicweights"). Recalculates when the table or the pinned data changes.',
  args: [{ name: 'field', kind: 'text', unit: '', help: 'One of "origin", "version", "checksum", "revision", "changed", "couples", "electrodes", "addin", "dataset", "datasetchecksum", "pinned", or "checksum:<part>".' }],
  result: 'The fact (text or number).',
  helpAnchor: 'tableinfo',
  compute: (field: string) => tableInfo(field),
  usesTable: true,
});
