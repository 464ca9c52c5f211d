/**
 * The revision log kept in the stored table (schema 3): for every write, when (ISO 8601 UTC), who (the
 * name the person gave in the pane), why (the reason they gave on saving) and what (the action, and
 * per row the table, the key and the old → new value of each field, or the row added or removed).
 *
 * Bounds, and why they are what they are. The log keeps the newest MAX_LOG_ENTRIES entries whose
 * stored text together stays within MAX_LOG_CHARS; older entries are dropped and counted in
 * `dropped`, which the pane, the sheet copy and the CSV export show. A save is never refused because
 * of its history: refusing would leave the people who run a plating line or a CP system unable to
 * correct a wrong row until someone trims the log, and a count keeps the loss visible instead.
 * One entry lists at most MAX_LOG_ROWS rows and at most about MAX_ENTRY_CHARS characters of them
 * (an import of 2,000 rows would otherwise fill the log in one step); the rows beyond are counted in
 * `moreRows`. Copy to sheet or CSV export keeps a full record outside the workbook's settings.
 *
 * Everything here is pure. checkLog validates a log read from a stored text (never throws; every
 * problem is a plain-words line) so a damaged log makes the stored table unreadable like a damaged row.
 */
import { canonicalJson } from './canonical';
import { type AnyRecord, type TableRecords, FIELD_LABELS } from './rows';
import { diffTables } from './diff';
import { sha256Hex } from './sha256';
import { isTableVersion } from './tableVersion';
import { isUtcTimestamp } from './utcTimestamp';
import { MAX_FORMULA_CHARS, MAX_KEY_CHARS, MAX_NOTE_CHARS, MAX_PERSON_CHARS, MAX_REASON_CHARS, MAX_SOURCE_CHARS } from '../textLimits';

/** What a write did, in one word of the stored form. */
export type LogAction = 'pin' | 'add' | 'edit' | 'delete' | 'revert' | 'import-merge' | 'import-replace' | 'update';
export const LOG_ACTIONS: readonly LogAction[] = ['pin', 'add', 'edit', 'delete', 'revert', 'import-merge', 'import-replace', 'update'];

/** One field of a row: its value before (`from`) and after (`to`); a side is left out when the row did not have the field. */
export interface LogField {
  readonly field: string;
  readonly from?: number | string | readonly string[];
  readonly to?: number | string | readonly string[];
}

export interface LogRow {
  readonly table: 'couples' | 'electrodes';
  readonly key: string;
  readonly change: 'added' | 'removed' | 'changed';
  /** added: every field of the new row (to); removed: every field of the old row (from); changed: the fields that differ. */
  readonly fields: readonly LogField[];
}

export interface LogEntry {
  /** The revision this write made. */
  readonly revision: number;
  /** When (ISO 8601, UTC). */
  readonly at: string;
  /** Who: the name given in the pane. */
  readonly by: string;
  /** Why: the reason given on saving. */
  readonly why: string;
  readonly action: LogAction;
  /** The built-in version the table is based on after the write. */
  readonly basedOn: string;
  /** The rows changed (at most MAX_LOG_ROWS). */
  readonly rows: readonly LogRow[];
  /** Rows changed beyond those listed. */
  readonly moreRows: number;
}

export interface RevisionLog {
  /** Oldest first. */
  readonly entries: readonly LogEntry[];
  /** Older entries dropped to keep the log within its bounds. */
  readonly dropped: number;
}

/** Who and why, as the pane asks them. */
export interface Signoff {
  readonly by: string;
  readonly why: string;
}

export const EMPTY_LOG: RevisionLog = { entries: [], dropped: 0 };
export const MAX_LOG_ENTRIES = 1000;
export const MAX_LOG_CHARS = 600_000;
export const MAX_LOG_ROWS = 50;
export const MAX_ENTRY_CHARS = 60_000;

const COUPLE_ORDER = ['key', 'halfReaction', 'e0', 'dEdT_mV_K', 'source', 'note'] as const;
const ELECTRODE_ORDER = ['key', 'aliases', 'potential', 'dEdT_mV_K', 'source', 'note'] as const;

const isText = (max: number) => (v: unknown): boolean => typeof v === 'string' && v.length <= max;
const isFiniteNumber = (v: unknown): boolean => typeof v === 'number' && Number.isFinite(v);
/** What a field's value may be, as in a stored row. */
const VALUE_RULES: Record<string, { test: (v: unknown) => boolean; what: string }> = {
  key: { test: isText(MAX_KEY_CHARS), what: `a text of at most ${MAX_KEY_CHARS} characters` },
  halfReaction: { test: isText(MAX_FORMULA_CHARS), what: `a text of at most ${MAX_FORMULA_CHARS} characters` },
  e0: { test: isFiniteNumber, what: 'a finite number' },
  potential: { test: isFiniteNumber, what: 'a finite number' },
  dEdT_mV_K: { test: isFiniteNumber, what: 'a finite number' },
  source: { test: isText(MAX_SOURCE_CHARS), what: `a text of at most ${MAX_SOURCE_CHARS} characters` },
  note: { test: isText(MAX_NOTE_CHARS), what: `a text of at most ${MAX_NOTE_CHARS} characters` },
  aliases: {
    test: (v) => Array.isArray(v) && v.length <= 100 && v.every(isText(MAX_KEY_CHARS)),
    what: `a list of at most 100 texts of at most ${MAX_KEY_CHARS} characters`,
  },
};

/**
 * The problem with a name or reason, or null when both can be recorded: each must hold something
 * besides blanks and stay within its length limit.
 *
 * Syntax: signoffProblem(signoff)
 * Example: signoffProblem({ by: "A. Tester", why: "" }) → "give a reason for the change"
 */
export function signoffProblem(s: Signoff): string | null {
  const by = s.by.trim();
  const why = s.why.trim();
  if (by === '') return 'give your name (it is recorded with the change)';
  if (by.length > MAX_PERSON_CHARS) return `the name is ${by.length} characters long; at most ${MAX_PERSON_CHARS}`;
  if (why === '') return 'give a reason for the change';
  if (why.length > MAX_REASON_CHARS) return `the reason is ${why.length} characters long; at most ${MAX_REASON_CHARS}`;
  return null;
}

function valueOf(rec: AnyRecord | undefined, field: string): LogField['from'] {
  if (rec === undefined) return undefined;
  const v = (rec as unknown as Record<string, unknown>)[field];
  if (typeof v === 'number' || typeof v === 'string') return v;
  if (Array.isArray(v)) return v.map(String);
  return undefined;
}

function logRowsOf(before: TableRecords, after: TableRecords): LogRow[] {
  return diffTables(before, after).map((d) => {
    const order = d.rowKind === 'couple' ? COUPLE_ORDER : ELECTRODE_ORDER;
    const table = d.rowKind === 'couple' ? 'couples' : 'electrodes';
    const fieldsOf = (names: readonly string[]): LogField[] =>
      names
        .map((f) => {
          const from = d.status === 'added' ? undefined : valueOf(d.before, f);
          const to = d.status === 'removed' ? undefined : valueOf(d.after, f);
          return { field: f, ...(from === undefined ? {} : { from }), ...(to === undefined ? {} : { to }) };
        })
        .filter((x) => 'from' in x || 'to' in x);
    const names = d.status === 'changed' ? order.filter((f) => d.fields.includes(f)) : order.filter((f) => f !== 'key');
    return { table, key: d.key, change: d.status, fields: fieldsOf(names) };
  });
}

/**
 * The log entry of one write: the rows that differ from `before` to `after`, listed up to
 * MAX_LOG_ROWS and MAX_ENTRY_CHARS, the rest counted. Name and reason are stored trimmed.
 *
 * Syntax: logEntry({ revision, at, by, why, action, basedOn, before, after })
 * Example: logEntry({ …, before: builtin, after: edited }).rows[0] → { table: "couples", key: "Cu2+/Cu", change: "changed", fields: [{ field: "e0", from: 0.3419, to: 0.35 }] }
 */
export function logEntry(x: Signoff & { revision: number; at: string; action: LogAction; basedOn: string; before: TableRecords; after: TableRecords }): LogEntry {
  const all = logRowsOf(x.before, x.after);
  const rows: LogRow[] = [];
  let chars = 0;
  for (const r of all) {
    const size = JSON.stringify(r).length;
    if (rows.length >= MAX_LOG_ROWS || (rows.length > 0 && chars + size > MAX_ENTRY_CHARS)) break;
    rows.push(r);
    chars += size;
  }
  return { revision: x.revision, at: x.at, by: x.by.trim(), why: x.why.trim(), action: x.action, basedOn: x.basedOn, rows, moreRows: all.length - rows.length };
}

/**
 * The log with one more entry, older entries dropped (and counted) beyond MAX_LOG_ENTRIES entries or
 * MAX_LOG_CHARS characters of stored text. The new entry is always kept.
 *
 * Syntax: appendEntry(log, entry)
 */
export function appendEntry(log: RevisionLog, entry: LogEntry): RevisionLog {
  const entries = [...log.entries, entry];
  const sizes = entries.map((e) => JSON.stringify(e).length + 1);
  let total = sizes.reduce((a, b) => a + b, 0);
  let drop = 0;
  while (entries.length - drop > 1 && (entries.length - drop > MAX_LOG_ENTRIES || total > MAX_LOG_CHARS)) {
    total -= sizes[drop];
    drop++;
  }
  return { entries: entries.slice(drop), dropped: log.dropped + drop };
}

/** "sha256:" + SHA-256 of the log's canonical JSON (the log's own checksum; the rows' checksum does not cover it). */
export function logChecksum(log: RevisionLog): string {
  return `sha256:${sha256Hex(canonicalJson(log))}`;
}

function isPlainObject(x: unknown): x is Record<string, unknown> {
  return typeof x === 'object' && x !== null && !Array.isArray(x);
}

const isWhole = (v: unknown, min: number, max: number): v is number => typeof v === 'number' && Number.isSafeInteger(v) && v >= min && v <= max;
const isPersonText = (max: number) => (v: unknown): v is string => typeof v === 'string' && v.length <= max && v.trim() !== '' && v === v.trim();

const ENTRY_FIELDS = ['revision', 'at', 'by', 'why', 'action', 'basedOn', 'rows', 'moreRows'];
const ROW_FIELDS = ['table', 'key', 'change', 'fields'];

function checkRow(where: string, r: unknown, problems: string[]): void {
  if (!isPlainObject(r)) {
    problems.push(`${where} is not a record`);
    return;
  }
  const keys = Object.keys(r);
  if (keys.length !== ROW_FIELDS.length || !ROW_FIELDS.every((k) => k in r)) {
    problems.push(`${where} does not have exactly the fields ${ROW_FIELDS.join(', ')}`);
    return;
  }
  if (r.table !== 'couples' && r.table !== 'electrodes') problems.push(`${where}: "table" is not "couples" or "electrodes"`);
  if (!isText(MAX_KEY_CHARS)(r.key) || (r.key as string).trim() === '') problems.push(`${where}: "key" is not a key of at most ${MAX_KEY_CHARS} characters`);
  if (r.change !== 'added' && r.change !== 'removed' && r.change !== 'changed') problems.push(`${where}: "change" is not added, removed or changed`);
  if (!Array.isArray(r.fields) || r.fields.length > COUPLE_ORDER.length) {
    problems.push(`${where}: "fields" is not a list of at most ${COUPLE_ORDER.length} fields`);
    return;
  }
  const allowed: readonly string[] = r.table === 'electrodes' ? ELECTRODE_ORDER : COUPLE_ORDER;
  const seen = new Set<string>();
  r.fields.forEach((f: unknown, i) => {
    const at = `${where} field ${i + 1}`;
    if (!isPlainObject(f) || typeof f.field !== 'string' || !allowed.includes(f.field) || seen.has(f.field)) {
      problems.push(`${at} is not one of the row's fields (${allowed.join(', ')}), each named once`);
      return;
    }
    seen.add(f.field);
    const extra = Object.keys(f).filter((k) => k !== 'field' && k !== 'from' && k !== 'to');
    if (extra.length > 0) problems.push(`${at} has fields Cellwright does not write`);
    const rule = VALUE_RULES[f.field];
    for (const side of ['from', 'to'] as const) {
      if (side in f && !rule.test(f[side])) problems.push(`${at}: "${side}" is not ${rule.what}`);
    }
    const wants = r.change === 'added' ? ['to'] : r.change === 'removed' ? ['from'] : null;
    if (wants !== null && !(wants[0] in f && Object.keys(f).length === 2)) problems.push(`${at}: a row ${String(r.change)} has only "${wants[0]}" values`);
    if (wants === null && !('from' in f) && !('to' in f)) problems.push(`${at}: a changed field has neither "from" nor "to"`);
  });
}

/**
 * Checks a log read from a stored text: `{ entries, dropped }`, every entry with exactly its fields of
 * the right form, revisions increasing and none above the table's revision. Adds one plain-words line
 * per problem (at most 50) and returns the log (EMPTY_LOG when its shape is wrong).
 *
 * Syntax: checkLog(value, tableRevision, problems)
 */
export function checkLog(x: unknown, tableRevision: number, problems: string[]): RevisionLog {
  const start = problems.length;
  const push = (p: string) => {
    if (problems.length - start < 50) problems.push(`revision log: ${p}`);
  };
  if (!isPlainObject(x) || Object.keys(x).length !== 2 || !('entries' in x) || !('dropped' in x)) {
    push('it is not { entries, dropped }');
    return EMPTY_LOG;
  }
  if (!isWhole(x.dropped, 0, Number.MAX_SAFE_INTEGER)) push('"dropped" is not a whole number of 0 or more');
  if (!Array.isArray(x.entries) || x.entries.length > MAX_LOG_ENTRIES) {
    push(`"entries" is not a list of at most ${MAX_LOG_ENTRIES} entries`);
    return EMPTY_LOG;
  }
  let previous = 0;
  x.entries.forEach((e: unknown, i) => {
    const where = `entry ${i + 1}`;
    if (!isPlainObject(e)) {
      push(`${where} is not a record`);
      return;
    }
    const extra = Object.keys(e).filter((k) => !ENTRY_FIELDS.includes(k));
    if (extra.length > 0) push(`${where} has fields Cellwright does not write: ${extra.slice(0, 5).map((k) => JSON.stringify(k.length > 40 ? `${k.slice(0, 39)}…` : k)).join(', ')}`);
    const missing = ENTRY_FIELDS.filter((k) => !(k in e));
    if (missing.length > 0) {
      push(`${where} has no ${missing.join(', ')}`);
      return;
    }
    if (!isWhole(e.revision, 1, tableRevision)) push(`${where}: "revision" is not a whole number from 1 to the table's revision ${tableRevision}`);
    else if (e.revision <= previous) push(`${where}: revision ${e.revision} does not come after revision ${previous}`);
    else previous = e.revision;
    if (!isUtcTimestamp(e.at)) push(`${where}: "at" is not a time written YYYY-MM-DDTHH:MM:SS.sssZ (ISO 8601, UTC)`);
    if (!isPersonText(MAX_PERSON_CHARS)(e.by)) push(`${where}: "by" is not a name of 1 to ${MAX_PERSON_CHARS} characters`);
    if (!isPersonText(MAX_REASON_CHARS)(e.why)) push(`${where}: "why" is not a reason of 1 to ${MAX_REASON_CHARS} characters`);
    if (!LOG_ACTIONS.includes(e.action as LogAction)) push(`${where}: "action" is not one of ${LOG_ACTIONS.join(', ')}`);
    if (!isTableVersion(e.basedOn)) push(`${where}: "basedOn" is not a table version such as "2026.1"`);
    if (!isWhole(e.moreRows, 0, Number.MAX_SAFE_INTEGER)) push(`${where}: "moreRows" is not a whole number of 0 or more`);
    if (!Array.isArray(e.rows) || e.rows.length > MAX_LOG_ROWS) push(`${where}: "rows" is not a list of at most ${MAX_LOG_ROWS} rows`);
    else {
      const rowProblems: string[] = [];
      e.rows.forEach((r: unknown, j) => checkRow(`${where} row ${j + 1}`, r, rowProblems));
      rowProblems.forEach(push);
    }
  });
  if (problems.length > start) return EMPTY_LOG;
  return { entries: x.entries as LogEntry[], dropped: x.dropped as number };
}

/* ----------------------------------------------------------------------------------------------- */
/* Describing entries for people (pane, sheet copy, CSV comment lines)                              */
/* ----------------------------------------------------------------------------------------------- */

const ACTION_WORDS: Record<LogAction, (basedOn: string) => string> = {
  pin: (v) => `pinned the built-in table ${v} to the workbook`,
  add: () => 'added a row',
  edit: () => 'edited a row',
  delete: () => 'deleted a row',
  revert: () => 'reverted a row to its built-in value',
  'import-merge': () => 'imported CSV rows (add and update)',
  'import-replace': () => 'imported CSV rows (replaced the table)',
  update: (v) => `updated to the built-in table ${v}, keeping the rows set here`,
};

/** The action in a few words: "edited a row", "pinned the built-in table 2026.1 to the workbook". */
export function describeAction(e: LogEntry): string {
  return ACTION_WORDS[e.action](e.basedOn);
}

function valueText(field: string, v: LogField['from'], maxChars: number): string {
  if (v === undefined) return 'none';
  const cut = (s: string) => (s.length > maxChars ? `${s.slice(0, maxChars - 1)}…` : s);
  if (typeof v === 'number') return `${v}${field === 'dEdT_mV_K' ? ' mV/K' : field === 'e0' || field === 'potential' ? ' V' : ''}`;
  if (typeof v === 'string') return `“${cut(v)}”`;
  return v.length === 0 ? 'none' : `“${cut(v.join(' | '))}”`;
}

/**
 * One row of an entry as a line: 'couple Cu2+/Cu: E° 0.3419 V → 0.35 V; source “…” → “…”',
 * 'couple Tl+/Tl added: half-reaction “Tl+ + e- -> Tl”, E° -0.336 V, source “…”',
 * 'couple Zn2+/Zn removed (was: …)'. Texts longer than maxChars are cut with "…".
 */
export function describeLogRow(r: LogRow, maxChars = Infinity): string {
  const what = `${r.table === 'couples' ? 'couple' : 'electrode'} ${r.key}`;
  const label = (f: string) => FIELD_LABELS[f] ?? f;
  if (r.change === 'added') return `${what} added: ${r.fields.map((f) => `${label(f.field)} ${valueText(f.field, f.to, maxChars)}`).join(', ')}`;
  if (r.change === 'removed') return `${what} removed (was: ${r.fields.map((f) => `${label(f.field)} ${valueText(f.field, f.from, maxChars)}`).join(', ')})`;
  return `${what}: ${r.fields.map((f) => `${label(f.field)} ${valueText(f.field, f.from, maxChars)} → ${valueText(f.field, f.to, maxChars)}`).join('; ')}`;
}

/** What an entry did, one line per row after the action ("and 12 more rows" when rows were not listed). */
export function describeEntry(e: LogEntry, maxChars = Infinity): string[] {
  const lines = [describeAction(e), ...e.rows.map((r) => describeLogRow(r, maxChars))];
  if (e.moreRows > 0) lines.push(`and ${e.moreRows.toLocaleString('en-US')} more row${e.moreRows === 1 ? '' : 's'} (not listed in the log)`);
  return lines;
}

/**
 * The log as plain lines, newest entry first, for the CSV export's comment lines: a heading line,
 * then per entry one line (revision, time, who, what, why) and one indented line per row.
 *
 * Syntax: logLines(log)
 * Example: logLines(log)[1] → "Revision 2 at 2026-12-02T08:00:00.000Z by A. Tester: edited a row. Reason: new lab value"
 */
export function logLines(log: RevisionLog): string[] {
  const n = log.entries.length;
  const lines = [
    `Revision log, newest first: ${n.toLocaleString('en-US')} entr${n === 1 ? 'y' : 'ies'}${log.dropped > 0 ? ` (${log.dropped.toLocaleString('en-US')} older entr${log.dropped === 1 ? 'y' : 'ies'} dropped to keep the log within its bounds)` : ''}.`,
  ];
  for (const e of [...log.entries].reverse()) {
    const [action, ...rows] = describeEntry(e);
    lines.push(`Revision ${e.revision} at ${e.at} by ${e.by}: ${action}. Reason: ${e.why}`);
    for (const r of rows) lines.push(`  ${r}`);
  }
  return lines;
}
