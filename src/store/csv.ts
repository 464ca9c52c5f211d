/**
 * CSV import and export of the potential table, in Cellwright's own column layout ("CSV layout 1",
 * documented in DEVELOPERS.md):
 *
 *   row_type,key,half_reaction,other_names,potential_V,dEdT_mV_per_K,source,note
 *
 *   row_type        "couple" or "electrode"
 *   key             couple key Ox/Red ("Cu2+/Cu") or electrode name ("SCE")
 *   half_reaction   couples only: the reduction half-reaction ("Cu2+ + 2e- -> Cu"); empty for electrodes
 *   other_names     electrodes only: other accepted names separated by "|"; empty for couples
 *   potential_V     couples: E° in V vs SHE at 25 °C; electrodes: potential in V vs SHE at 25 °C
 *   dEdT_mV_per_K   optional: dE/dT in mV/K
 *   source          required: the published source of the numbers
 *   note            optional
 *
 * Files are UTF-8 (a byte-order mark is accepted and written), comma-separated with double-quote
 * quoting (RFC 4180; fields may hold commas, quotes and line breaks). A file whose header is separated
 * by semicolons or tabs is read with that separator, and then a decimal comma is accepted too. Lines
 * starting with "#" and blank lines are skipped. The header may list the columns in any order;
 * row_type, key, potential_V and source are required, an unknown column makes the whole file refused.
 *
 * Spreadsheet programs run a cell that starts with = + - or @ as a formula, so the export writes such
 * text with a leading apostrophe and the import removes it again (text that starts with an apostrophe
 * gets one more, so every text reads back exactly).
 */
import type { CoupleRecord, ElectrodeRecord } from '../table/records';
import { numberTextKind } from '../numberText';
import { validateCoupleRecord, validateElectrodeRecord } from '../table/table';
import { MAX_NOTE_CHARS, MAX_NUMBER_CHARS } from '../textLimits';
import { type RowKind, type TableRecords, cleanCouple, cleanElectrode, matchKey } from './rows';

export const CSV_COLUMNS = ['row_type', 'key', 'half_reaction', 'other_names', 'potential_V', 'dEdT_mV_per_K', 'source', 'note'] as const;
type Column = (typeof CSV_COLUMNS)[number];
const REQUIRED: readonly Column[] = ['row_type', 'key', 'potential_V', 'source'];
export const ALIAS_SEPARATOR = '|';
/** The longest field read (the longest text a row holds is a note, src/textLimits.ts). */
const MAX_FIELD_CHARS = MAX_NOTE_CHARS;
/** The largest CSV text read, in bytes of UTF-8, whether it comes from a file or is pasted. */
export const MAX_CSV_BYTES = 8_000_000;

export interface CsvAccepted {
  /** Line (1-based) on which the row starts. */
  readonly line: number;
  readonly rowKind: RowKind;
  readonly record: CoupleRecord | ElectrodeRecord;
}

export interface CsvRejected {
  readonly line: number;
  /** The line as read (shortened to 120 characters), for showing beside the reason. */
  readonly text: string;
  readonly reason: string;
}

export interface CsvImport {
  /** A problem with the whole file (no header, unknown column, unclosed quote); then nothing is accepted. */
  readonly fileProblem?: string;
  readonly accepted: readonly CsvAccepted[];
  readonly rejected: readonly CsvRejected[];
  readonly couples: readonly CoupleRecord[];
  readonly electrodes: readonly ElectrodeRecord[];
}

interface RawRecord {
  line: number;
  text: string;
  fields: string[];
}

/** Splits CSV text into records of fields (quotes honoured). Throws Error on an unclosed quote. */
function splitRecords(text: string, sep: string): RawRecord[] {
  const out: RawRecord[] = [];
  let i = 0;
  let line = 1;
  const n = text.length;
  while (i < n) {
    // A comment line ("#" first, after blanks) is skipped whole, quotes in it included.
    const m = /^[ \t]*#[^\r\n]*(\r\n|\n|\r)?/.exec(text.slice(i, text.indexOf('\n', i) < 0 ? n : text.indexOf('\n', i) + 1));
    if (m !== null) {
      i += m[0].length;
      line++;
      continue;
    }
    const startLine = line;
    const start = i;
    const fields: string[] = [];
    let field = '';
    let quoted = false;
    let fieldStart = true;
    let done = false;
    while (i < n && !done) {
      const c = text[i];
      if (quoted) {
        if (c === '"') {
          if (text[i + 1] === '"') {
            field += '"';
            i += 2;
          } else {
            quoted = false;
            i++;
          }
        } else {
          // the run up to the next quote, taken whole
          let q = text.indexOf('"', i);
          if (q < 0) q = n;
          for (let k = i; k < q; k++) if (text.charCodeAt(k) === 10) line++;
          field += text.slice(i, q);
          i = q;
        }
      } else if (c === '"' && fieldStart) {
        quoted = true;
        fieldStart = false;
        i++;
      } else if (c === sep) {
        fields.push(field);
        field = '';
        fieldStart = true;
        i++;
      } else if (c === '\r' || c === '\n') {
        if (c === '\r' && text[i + 1] === '\n') i++;
        i++;
        line++;
        done = true;
      } else {
        // the run up to the next separator, quote or line break, taken whole
        let k = i + 1;
        while (k < n) {
          const d = text[k];
          if (d === sep || d === '"' || d === '\r' || d === '\n') break;
          k++;
        }
        field += text.slice(i, k);
        fieldStart = false;
        i = k;
      }
    }
    if (quoted) throw new Error(`a quoted field opened on line ${startLine} is never closed`);
    fields.push(field);
    let end = i;
    while (end > start && (text[end - 1] === '\r' || text[end - 1] === '\n')) end--;
    const raw = text.slice(start, end);
    out.push({ line: startLine, text: raw.length > 120 ? `${raw.slice(0, 117)}…` : raw, fields });
  }
  return out;
}

function isSkipped(r: RawRecord): boolean {
  return r.fields.length === 1 && r.fields[0].trim() === '';
}

const FORMULA_START = /^[=+\-@\t\r]/;

/** Removes the apostrophe the export puts before text that would start a formula or starts with an apostrophe. */
function unguard(s: string): string {
  return s.startsWith("'") && (FORMULA_START.test(s.slice(1)) || s[1] === "'") ? s.slice(1) : s;
}

/**
 * Text for a CSV cell that a spreadsheet program will not run as a formula: a leading apostrophe before
 * = + - @ (and before a text that itself starts with an apostrophe, so that unguard gives back exactly
 * what was written).
 */
function guard(s: string): string {
  return FORMULA_START.test(s) || s.startsWith("'") ? `'${s}` : s;
}

/** A text as a message shows it: quoted, cut to 40 characters. */
function quoted(text: string): string {
  return `"${text.length > 40 ? `${text.slice(0, 39)}…` : text}"`;
}

function parseNumber(text: string, column: string, decimalComma: boolean): number | string {
  if (text.length > MAX_NUMBER_CHARS) return `${column} is too long for a number (${text.length} characters; at most ${MAX_NUMBER_CHARS})`;
  let t = text.trim().replace(/\u2212/g, '-');
  const kind = numberTextKind(t);
  if (kind === 'decimal-comma' && decimalComma) t = t.replace(',', '.');
  else if (kind !== 'number') {
    if (kind === 'decimal-comma') return `${column} ${quoted(text.trim())} uses a decimal comma; write a point (0.25) in a comma-separated file`;
    return `${column} ${quoted(text.trim())} is not a number`;
  }
  return Number(t);
}

/** The length of a text in UTF-8 bytes. */
function utf8Bytes(text: string): number {
  let bytes = 0;
  for (let i = 0; i < text.length; i++) {
    const c = text.charCodeAt(i);
    if (c < 0x80) bytes += 1;
    else if (c < 0x800) bytes += 2;
    else if (c >= 0xd800 && c <= 0xdbff && i + 1 < text.length && (text.charCodeAt(i + 1) & 0xfc00) === 0xdc00) {
      bytes += 4;
      i++;
    } else bytes += 3;
  }
  return bytes;
}

/**
 * Reads CSV text in layout 1. Every line is checked on its own (parse, balance, ranges, source) and
 * against the lines before it (a key or electrode name may appear once); each rejected line is
 * reported with its reason. `couples` and `electrodes` hold the accepted rows in file order.
 *
 * Syntax: importCsv(text)
 * Example: importCsv("row_type,key,half_reaction,potential_V,source\ncouple,Cu2+/Cu,Cu2+ + 2e- -> Cu,0.3419,CRC").couples.length → 1
 */
export function importCsv(text: string): CsvImport {
  const empty = (fileProblem: string): CsvImport => ({ fileProblem, accepted: [], rejected: [], couples: [], electrodes: [] });
  if (text.length > MAX_CSV_BYTES || utf8Bytes(text) > MAX_CSV_BYTES) return empty(`the text is larger than 8 MB (${MAX_CSV_BYTES.toLocaleString('en-US')} bytes of UTF-8); Cellwright does not read it`);
  const body = text.startsWith('\uFEFF') ? text.slice(1) : text;
  // The separator is the header's: the first line that is neither blank nor a comment.
  let headerLine: string | undefined;
  for (let pos = 0; pos < body.length && headerLine === undefined; ) {
    let end = pos;
    while (end < body.length && body[end] !== '\n' && body[end] !== '\r') end++;
    const l = body.slice(pos, end);
    if (l.trim() !== '' && !l.trimStart().startsWith('#')) headerLine = l;
    pos = end + (body[end] === '\r' && body[end + 1] === '\n' ? 2 : 1);
  }
  if (headerLine === undefined) return empty('the file has no header line (expected: ' + CSV_COLUMNS.join(',') + ')');
  const sep = headerLine.includes(',') ? ',' : headerLine.includes(';') ? ';' : headerLine.includes('\t') ? '\t' : ',';
  let records: RawRecord[];
  try {
    records = splitRecords(body, sep).filter((r) => !isSkipped(r));
  } catch (e) {
    return empty(e instanceof Error ? e.message : String(e));
  }
  const header = records.shift()!;
  const names = header.fields.map((f) => f.trim());
  const unknown = names.filter((c) => !(CSV_COLUMNS as readonly string[]).includes(c));
  if (unknown.length > 0) return empty(`line ${header.line}: ${unknown.map((c) => `"${c}"`).join(', ')} ${unknown.length === 1 ? 'is not a column' : 'are not columns'} of Cellwright's layout (${CSV_COLUMNS.join(',')})`);
  const repeated = names.filter((c, i) => names.indexOf(c) !== i);
  if (repeated.length > 0) return empty(`line ${header.line}: the column "${repeated[0]}" appears twice`);
  const lacking = REQUIRED.filter((c) => !names.includes(c));
  if (lacking.length > 0) return empty(`line ${header.line}: the header lacks ${lacking.join(', ')}`);
  const col = new Map(names.map((c, i) => [c as Column, i]));
  const decimalComma = sep !== ',';

  const accepted: CsvAccepted[] = [];
  const rejected: CsvRejected[] = [];
  const seen = { couple: new Map<string, number>(), electrode: new Map<string, number>() };
  for (const r of records) {
    const reject = (reason: string) => rejected.push({ line: r.line, text: r.text, reason });
    const long = r.fields.findIndex((f) => f.length > MAX_FIELD_CHARS);
    if (long >= 0) {
      reject(`the field in column ${long + 1} has ${r.fields[long].length.toLocaleString('en-US')} characters; no field of the layout holds more than ${MAX_FIELD_CHARS.toLocaleString('en-US')}`);
      continue;
    }
    if (r.fields.length !== names.length) {
      reject(`it has ${r.fields.length} field${r.fields.length === 1 ? '' : 's'}; the header has ${names.length}`);
      continue;
    }
    const get = (c: Column): string => {
      const i = col.get(c);
      return i === undefined ? '' : unguard(r.fields[i].trim());
    };
    const type = get('row_type').toLowerCase();
    if (type !== 'couple' && type !== 'electrode') {
      reject(`row_type "${get('row_type')}" must be "couple" or "electrode"`);
      continue;
    }
    const problems: string[] = [];
    const potential = get('potential_V') === '' ? 'potential_V is empty' : parseNumber(get('potential_V'), 'potential_V', decimalComma);
    if (typeof potential === 'string') problems.push(potential);
    let dEdT: number | undefined;
    if (get('dEdT_mV_per_K') !== '') {
      const d = parseNumber(get('dEdT_mV_per_K'), 'dEdT_mV_per_K', decimalComma);
      if (typeof d === 'string') problems.push(d);
      else dEdT = d;
    }
    const note = get('note') === '' ? undefined : get('note');
    let record: CoupleRecord | ElectrodeRecord | undefined;
    if (type === 'couple') {
      if (get('other_names') !== '') problems.push('other_names is for electrodes; leave it empty for a couple');
      if (get('half_reaction') === '') problems.push('half_reaction is empty');
      if (problems.length === 0) {
        const candidate = { key: get('key'), halfReaction: get('half_reaction'), e0: potential as number, dEdT_mV_K: dEdT, source: get('source'), note };
        const v = validateCoupleRecord(candidate);
        if (v.row === undefined) problems.push(...v.problems);
        else record = cleanCouple(candidate);
      }
    } else {
      if (get('half_reaction') !== '') problems.push('half_reaction is for couples; leave it empty for an electrode');
      if (problems.length === 0) {
        const aliases = get('other_names') === '' ? [] : get('other_names').split(ALIAS_SEPARATOR).map((a) => a.trim()).filter((a) => a !== '');
        const candidate = { key: get('key'), aliases, potential: potential as number, dEdT_mV_K: dEdT, source: get('source'), note };
        const v = validateElectrodeRecord(candidate);
        if (v.row === undefined) problems.push(...v.problems);
        else record = cleanElectrode(candidate);
      }
    }
    if (problems.length > 0 || record === undefined) {
      reject(problems.join('; '));
      continue;
    }
    const kind: RowKind = type;
    const names2 = kind === 'couple' ? [record.key] : [record.key, ...(record as ElectrodeRecord).aliases];
    const clash = names2.map((n) => matchKey(kind, n)).find((n) => seen[kind].has(n));
    if (clash !== undefined) {
      reject(`the ${kind === 'couple' ? 'key' : 'name'} "${names2.find((n) => matchKey(kind, n) === clash)}" was already given on line ${seen[kind].get(clash)}`);
      continue;
    }
    for (const n of names2) seen[kind].set(matchKey(kind, n), r.line);
    accepted.push({ line: r.line, rowKind: kind, record });
  }
  return {
    accepted,
    rejected,
    couples: accepted.filter((a) => a.rowKind === 'couple').map((a) => a.record as CoupleRecord),
    electrodes: accepted.filter((a) => a.rowKind === 'electrode').map((a) => a.record as ElectrodeRecord),
  };
}

/** A text cell: formula-guarded, quoted when it holds a comma, quote, line break or edge blanks. */
function cell(s: string): string {
  const g = guard(s);
  return /[",\r\n]/.test(g) || g !== g.trim() ? `"${g.replace(/"/g, '""')}"` : g;
}

/**
 * A comment line for export: one line, and each piece a spreadsheet program could read as a cell of
 * its own (split at a comma, semicolon or tab; the separator depends on the program and its locale)
 * formula-guarded: an apostrophe goes before its first non-blank character when that is = + - @ or a
 * quote (a quote would open a quoted cell, whose content could then start a formula). The line still
 * starts with "#", so the import skips it whole.
 */
function commentLine(text: string): string {
  const one = text.replace(/[\r\n]+/g, ' ');
  const pieces = one.split(/([,;\t])/);
  for (let i = 0; i < pieces.length; i += 2) {
    const p = pieces[i];
    const lead = p.length - p.trimStart().length;
    if (lead < p.length && '=+-@"\''.includes(p[lead])) pieces[i] = `${p.slice(0, lead)}'${p.slice(lead)}`;
  }
  return pieces.join('');
}

/** A number cell, as JavaScript writes it (a leading minus is a number, not a formula). */
function num(x: number | undefined): string {
  return x === undefined ? '' : String(x);
}

/**
 * The CSV text (layout 1) of a table: a byte-order mark, comment lines naming the table, the header,
 * couples, electrodes, then `notes` as comment lines (the revision log; each line formula-guarded
 * like the first comment line, and skipped by the import); CRLF line ends. Throws Error when an
 * electrode's other name holds "|" (it could not be read back).
 *
 * Syntax: exportCsv(records, description, notes?)
 * Example: exportCsv(table, "workbook copy based on built-in 2026.1; checksum sha256:…", logLines(log))
 */
export function exportCsv(t: TableRecords, description: string, notes: readonly string[] = []): string {
  const lines: string[] = [
    commentLine(`# Cellwright potential table, CSV layout 1. ${description}`),
    '# Potentials in V vs SHE at 25 °C; dE/dT in mV/K. Lines starting with # are comments.',
    CSV_COLUMNS.join(','),
  ];
  for (const c of t.couples) {
    lines.push([cell('couple'), cell(c.key), cell(c.halfReaction), '', num(c.e0), num(c.dEdT_mV_K), cell(c.source), cell(c.note ?? '')].join(','));
  }
  for (const e of t.electrodes) {
    const bad = e.aliases.find((a) => a.includes(ALIAS_SEPARATOR));
    if (bad !== undefined) throw new Error(`the electrode "${e.key}" has the other name "${bad}", which holds "${ALIAS_SEPARATOR}", the separator of the other_names column`);
    lines.push(
      [cell('electrode'), cell(e.key), '', cell(e.aliases.join(ALIAS_SEPARATOR)), num(e.potential), num(e.dEdT_mV_K), cell(e.source), cell(e.note ?? '')].join(','),
    );
  }
  for (const note of notes) lines.push(commentLine(`# ${note}`));
  return `\uFEFF${lines.join('\r\n')}\r\n`;
}
