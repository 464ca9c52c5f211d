/**
 * Copy to sheet: writes the table in use to a new worksheet for review and printing, with the table's
 * description, version, checksum and every row's source. The worksheet functions never read this sheet;
 * it is a copy for people.
 *
 * Every text cell gets the Text number format ("@") before its value is written, so a key, source,
 * note, name or reason that starts with "=" stays text and is never turned into a formula.
 *
 * The workbook's revision log follows the rows, newest entry first: revision, time (UTC), what was
 * done (the action and one line per row), why, and who.
 */
import { type RowDifference, diffTables } from '../src/store/diff';
import { type TableRecords, type VersionedRecords, matchKey } from '../src/store/rows';
import { buildTable } from '../src/table/table';
import { type RevisionLog, describeEntry } from '../src/store/log';
import { plural } from './format';

export interface SheetCopyInput {
  readonly records: TableRecords;
  readonly builtin: VersionedRecords;
  /** Which table this is, in words ("This workbook's own table, based on built-in 2026.1, revision 3"). */
  readonly description: string;
  readonly version: string;
  readonly checksum: string;
  readonly now: Date;
  /** The revision log of the workbook's table (none for the built-in table). */
  readonly log?: RevisionLog;
}

export interface SheetContent {
  readonly values: (string | number)[][];
  readonly formats: string[][];
  /** 0-based indexes of heading rows (written bold). */
  readonly headingRows: readonly number[];
}

export const SHEET_COLUMNS = 8;
export const BASE_SHEET_NAME = 'Potential table';
/** Column widths in points: key, half-reaction, n, E°, dE/dT, source, note, comparison. */
const COLUMN_WIDTHS = [110, 190, 28, 64, 80, 300, 200, 170];
/** Source and note wrap. */
const WRAPPED_COLUMNS = [5, 6];

function status(d: RowDifference | undefined): string {
  if (d === undefined) return 'same as built-in';
  if (d.status === 'added') return 'not in built-in';
  return `differs: ${d.fields.map((f) => ({ e0: 'E°', potential: 'potential', dEdT_mV_K: 'dE/dT', halfReaction: 'half-reaction', aliases: 'other names' })[f] ?? f).join(', ')}`;
}

/** The cells of the copy (pure; tested on its own). */
export function sheetContent(input: SheetCopyInput): SheetContent {
  const values: (string | number)[][] = [];
  const formats: string[][] = [];
  const headingRows: number[] = [];
  const push = (cells: (string | number | undefined)[], heading = false) => {
    const row = Array.from({ length: SHEET_COLUMNS }, (_, i) => cells[i] ?? '');
    if (heading) headingRows.push(values.length);
    values.push(row);
    formats.push(row.map((v) => (typeof v === 'number' ? 'General' : '@')));
  };
  const diffs = diffTables(input.builtin, input.records);
  const byKey = new Map(diffs.filter((d) => d.status !== 'removed').map((d) => [`${d.rowKind}\u0000${matchKey(d.rowKind, d.key)}`, d]));
  const built = buildTable(input.version, input.records.couples, input.records.electrodes).table;
  const nOf = new Map(built.couples.map((c) => [matchKey('couple', c.key), c.n]));

  push(['Cellwright potential table'], true);
  push(['Table', input.description]);
  push(['Version', input.version]);
  push(['Checksum', input.checksum]);
  push(['Copied', input.now.toISOString()]);
  push(['Note', 'A copy for review and printing. The worksheet functions do not read this sheet; change the table in the Cellwright pane.']);
  push([]);
  push(['Couples', `${input.records.couples.length} rows; E° in V vs SHE at 25 °C; dE°/dT in mV/K`], true);
  push(['Key', 'Half-reaction', 'n', 'E° (V)', 'dE°/dT (mV/K)', 'Source', 'Note', 'Compared with built-in'], true);
  for (const c of input.records.couples) {
    push([c.key, c.halfReaction, nOf.get(matchKey('couple', c.key)), c.e0, c.dEdT_mV_K, c.source, c.note, status(byKey.get(`couple\u0000${matchKey('couple', c.key)}`))]);
  }
  push([]);
  push(['Reference electrodes', `${input.records.electrodes.length} rows; potential in V vs SHE at 25 °C; dE/dT in mV/K`], true);
  push(['Name', 'Other names', '', 'Potential (V)', 'dE/dT (mV/K)', 'Source', 'Note', 'Compared with built-in'], true);
  for (const e of input.records.electrodes) {
    push([e.key, e.aliases.join(' | '), '', e.potential, e.dEdT_mV_K, e.source, e.note, status(byKey.get(`electrode\u0000${matchKey('electrode', e.key)}`))]);
  }
  const removed = diffs.filter((d) => d.status === 'removed');
  if (removed.length > 0) {
    push([]);
    push(['Built-in rows not in this table', removed.map((d) => d.key).join(', ')], true);
  }
  if (input.log !== undefined) {
    const n = input.log.entries.length;
    push([]);
    push(['Revision log', `${plural(n, 'entry', 'entries')}, newest first${input.log.dropped > 0 ? `; ${plural(input.log.dropped, 'older entry', 'older entries')} dropped to keep the log within its bounds` : ''}`], true);
    push(['Revision', 'When (UTC)', '', '', '', 'What', 'Why', 'Who'], true);
    for (const e of [...input.log.entries].reverse()) push([e.revision, e.at, '', '', '', describeEntry(e).join('\n'), e.why, e.by]);
  }
  return { values, formats, headingRows };
}

function columnLetter(i: number): string {
  return String.fromCharCode(65 + i);
}

/** A sheet name not yet used in the workbook: "Potential table", "Potential table (2)", … */
export function freeSheetName(existing: readonly string[]): string {
  const taken = new Set(existing.map((n) => n.toLowerCase()));
  if (!taken.has(BASE_SHEET_NAME.toLowerCase())) return BASE_SHEET_NAME;
  for (let i = 2; ; i++) {
    const name = `${BASE_SHEET_NAME} (${i})`;
    if (!taken.has(name.toLowerCase())) return name;
  }
}

/** Writes the copy to a new worksheet and activates it; returns the sheet's name. */
export async function copyToSheet(input: SheetCopyInput): Promise<string> {
  const content = sheetContent(input);
  return Excel.run(async (context) => {
    const sheets = context.workbook.worksheets;
    sheets.load('items/name');
    await context.sync();
    const name = freeSheetName(sheets.items.map((s) => s.name));
    const sheet = sheets.add(name);
    const last = `${columnLetter(SHEET_COLUMNS - 1)}${content.values.length}`;
    const range = sheet.getRange(`A1:${last}`);
    range.numberFormat = content.formats;
    range.values = content.values;
    for (const r of content.headingRows) sheet.getRange(`A${r + 1}:${columnLetter(SHEET_COLUMNS - 1)}${r + 1}`).format.font.bold = true;
    // Fixed widths (in points): long sources and notes wrap instead of making columns wider than a page.
    COLUMN_WIDTHS.forEach((w, i) => {
      const col = sheet.getRange(`${columnLetter(i)}:${columnLetter(i)}`);
      col.format.columnWidth = w;
      if (WRAPPED_COLUMNS.includes(i)) col.format.wrapText = true;
    });
    sheet.activate();
    await context.sync();
    return name;
  });
}
