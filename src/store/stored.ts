/**
 * The stored form of the workbook's potential table: one JSON text kept in the workbook (see
 * DEVELOPERS.md, "Where the workbook's table is stored"), and the reader that decides whether a
 * stored text can be used.
 *
 * Schema 3 (written now), fields in this order:
 *   format      "cellwright.potential-table"  (anything else is not ours)
 *   schema      3
 *   basedOn     version of the built-in table the copy was pinned to or last brought up to
 *   revision    write counter, 1 for the first write, +1 per write (shown to people; conflicts are
 *               detected on the whole text, see workbook/store.ts)
 *   changedAt   time of the last write, ISO 8601 UTC
 *   checksum    "sha256:" + SHA-256 of the canonical JSON of { basedOn, couples, electrodes, own, removed }
 *               (own and removed sorted); revision, time and log are not covered, so the same rows
 *               always give the same checksum and a freshly pinned copy has the built-in table's checksum
 *   own         { couples: [keys], electrodes: [keys] }  rows set in this workbook
 *   removed     { couples: [keys], electrodes: [keys] }  built-in rows deleted in this workbook
 *   couples     [{ key, halfReaction, e0, dEdT_mV_K?, source, note? }]
 *   electrodes  [{ key, aliases, potential, dEdT_mV_K?, source, note? }]
 *   log         { entries: [{ revision, at, by, why, action, basedOn, rows, moreRows }], dropped }
 *               the revision log (src/store/log.ts), oldest entry first
 *   logChecksum "sha256:" + SHA-256 of the canonical JSON of log
 *
 * Why the log has a checksum of its own instead of being covered by `checksum`: `checksum` names the
 * rows the results were computed with. TABLEINFO("checksum"), the computed-with record that decides
 * recalculation at start-up, and the "pinned built-in" origin all compare it with the built-in
 * table's checksum and across workbooks; two workbooks with the same rows but different histories
 * must keep giving the same one. The log still needs protecting against damage and edits made
 * outside Cellwright, so `logChecksum` covers it the same way (like `checksum`, it detects damage and
 * hand edits; it is not a signature).
 *
 * Schema 2: as schema 3 without log and logChecksum. Schema 1 (the first layout): format, schema 1,
 * basedOn, changedAt, checksum over { basedOn, couples, electrodes }, couples, electrodes: no write
 * counter and no record of which rows were set here. It is upgraded in memory when read (every row
 * that differs from the add-in's built-in table counts as set here, so an update never overwrites
 * it). Schema 1 and 2 texts read with an empty log; they are written back as schema 3, their log
 * starting with the next change the user makes.
 *
 * Reading checks everything and uses nothing partially: the text is JSON, ours, of a schema this
 * add-in knows, every field of the right type and no unknown fields, the checksum matches, every
 * row passes the table's checks (the half-reaction parses and balances, numbers in range, source
 * present, keys unique), and every log entry is well formed with its checksum matching. Any failure
 * gives a problem with a plain-words message and details.
 */
import type { CoupleRecord, ElectrodeRecord } from '../table/records';
import type { PotentialTable } from '../table/types';
import { canonicalJson } from './canonical';
import { ChangeError, type KeyLists, type WorkbookCopy, pinnedCopy, tableOfCopy } from './copy';
import { type TableRecords, type VersionedRecords, matchKey, sameRecord } from './rows';
import { sha256Hex } from './sha256';
import { isTableVersion } from './tableVersion';
import { isUtcTimestamp } from './utcTimestamp';
import { EMPTY_LOG, checkLog, logChecksum } from './log';
import { MAX_FORMULA_CHARS, MAX_KEY_CHARS, MAX_NOTE_CHARS, MAX_SOURCE_CHARS } from '../textLimits';

export const STORED_FORMAT = 'cellwright.potential-table';
export const STORED_SCHEMA = 3;
/** The writer refuses texts longer than this (see DEVELOPERS.md for the host limits behind it). */
export const MAX_STORED_CHARS = 2_000_000;
/** The reader does not try to read texts longer than this. */
export const MAX_READ_CHARS = 8_000_000;

export type StoredProblemKind = 'empty' | 'too-large' | 'not-json' | 'not-ours' | 'newer-schema' | 'damaged' | 'checksum' | 'rows' | 'log';

export interface StoredProblem {
  readonly kind: StoredProblemKind;
  /** One sentence for people, e.g. "the checksum does not match the rows (the text was changed outside Cellwright)". */
  readonly message: string;
  /** Further lines (one per bad row or field), possibly empty. */
  readonly details: readonly string[];
}

export type StoredRead =
  | {
      readonly ok: true;
      readonly copy: WorkbookCopy;
      readonly table: PotentialTable;
      /** "sha256:…" of the content. */
      readonly checksum: string;
      /** The schema the text was written in (1 or 2 when it was upgraded on reading). */
      readonly schema: number;
    }
  | { readonly ok: false; readonly problem: StoredProblem };

function sortedKeys(list: readonly string[]): string[] {
  return [...list].sort((a, b) => (a < b ? -1 : a > b ? 1 : 0));
}

/**
 * The content checksum of a copy ("sha256:" + 64 hex digits).
 *
 * Syntax: contentChecksum(copy)
 * Example: contentChecksum(pinnedCopy(builtin)) === builtinChecksum(builtin) → true
 */
export function contentChecksum(c: TableRecords & { basedOn: string; own: KeyLists; removed: KeyLists }): string {
  const content = {
    basedOn: c.basedOn,
    couples: c.couples,
    electrodes: c.electrodes,
    own: { couples: sortedKeys(c.own.couples), electrodes: sortedKeys(c.own.electrodes) },
    removed: { couples: sortedKeys(c.removed.couples), electrodes: sortedKeys(c.removed.electrodes) },
  };
  return `sha256:${sha256Hex(canonicalJson(content))}`;
}

/** The checksum of the add-in's built-in table (the same as a freshly pinned copy's). */
export function builtinChecksum(builtin: VersionedRecords): string {
  return contentChecksum(pinnedCopy(builtin));
}

function schema1Checksum(basedOn: string, couples: unknown, electrodes: unknown): string {
  return `sha256:${sha256Hex(canonicalJson({ basedOn, couples, electrodes }))}`;
}

/**
 * The stored text of a copy (schema 3). The copy's revision, changedAt and log are written as given:
 * the store sets them (workbook/store.ts); a copy without a log is written with an empty one. Throws ChangeError when the text would exceed
 * MAX_STORED_CHARS or the copy is not a usable table.
 *
 * Syntax: writeStoredText(copy)
 */
export function writeStoredText(copy: WorkbookCopy): string {
  const table = tableOfCopy(copy);
  const doc = {
    format: STORED_FORMAT,
    schema: STORED_SCHEMA,
    basedOn: copy.basedOn,
    revision: copy.revision,
    changedAt: copy.changedAt,
    checksum: contentChecksum(copy),
    own: { couples: sortedKeys(copy.own.couples), electrodes: sortedKeys(copy.own.electrodes) },
    removed: { couples: sortedKeys(copy.removed.couples), electrodes: sortedKeys(copy.removed.electrodes) },
    couples: copy.couples,
    electrodes: copy.electrodes,
    log: copy.log ?? EMPTY_LOG,
    logChecksum: logChecksum(copy.log ?? EMPTY_LOG),
  };
  const text = JSON.stringify(doc);
  if (text.length > MAX_STORED_CHARS) {
    throw new ChangeError(
      `the table would take ${text.length.toLocaleString('en-US')} characters in the workbook, more than the ${MAX_STORED_CHARS.toLocaleString('en-US')} Cellwright allows; remove rows or shorten notes`,
    );
  }
  // What this text reads as is known now: remember it, so reading it back does not check it again.
  const parsed = JSON.parse(text) as { couples: CoupleRecord[]; electrodes: ElectrodeRecord[] };
  lastRead = { text, result: { ok: true, copy: { ...copy, couples: parsed.couples, electrodes: parsed.electrodes, log: doc.log }, table, checksum: doc.checksum, schema: STORED_SCHEMA } };
  return text;
}

/**
 * The last text written or read and what it reads as. Reading is deterministic for the current schema
 * (schema 1 depends on the built-in table, so it is not remembered), and tables of thousands of rows take a
 * noticeable time to check, so the same text is not checked twice in a row.
 */
let lastRead: { text: string; result: StoredRead } | null = null;

/** Forgets the remembered text (tests measure a first read with it; a new runtime starts without it). */
export function forgetLastRead(): void {
  lastRead = null;
}

/** The schema-1 text of a copy (kept for tests of the upgrade path and for reading old workbooks' exports). */
export function writeSchema1Text(c: { basedOn: string; changedAt: string; couples: readonly CoupleRecord[]; electrodes: readonly ElectrodeRecord[] }): string {
  return JSON.stringify({
    format: STORED_FORMAT,
    schema: 1,
    basedOn: c.basedOn,
    changedAt: c.changedAt,
    checksum: schema1Checksum(c.basedOn, c.couples, c.electrodes),
    couples: c.couples,
    electrodes: c.electrodes,
  });
}

const fail = (kind: StoredProblemKind, message: string, details: readonly string[] = []): StoredRead => ({ ok: false, problem: { kind, message, details } });

function isPlainObject(x: unknown): x is Record<string, unknown> {
  return typeof x === 'object' && x !== null && !Array.isArray(x);
}

const COUPLE_FIELDS = new Set(['key', 'halfReaction', 'e0', 'dEdT_mV_K', 'source', 'note']);
const ELECTRODE_FIELDS = new Set(['key', 'aliases', 'potential', 'dEdT_mV_K', 'source', 'note']);

/** Longest field name echoed in a message. */
const shortName = (k: string): string => JSON.stringify(k.length > 40 ? `${k.slice(0, 39)}…` : k);

const isText = (max: number) => (v: unknown): boolean => typeof v === 'string' && v.length <= max;
const isFiniteNumber = (v: unknown): boolean => typeof v === 'number' && Number.isFinite(v);
/**
 * What each field of a row may hold, checked before anything else reads the row (the checksum
 * included): texts within their length limits, finite numbers, a list of short texts. This keeps
 * values the checksum cannot be computed over (numbers beyond double range read as Infinity, deep
 * nesting) and texts too long for the readers away from everything after it.
 */
const FIELD_TYPES: Record<string, { test: (v: unknown) => boolean; what: string; optional?: boolean }> = {
  key: { test: isText(MAX_KEY_CHARS), what: `a text of at most ${MAX_KEY_CHARS} characters` },
  halfReaction: { test: isText(MAX_FORMULA_CHARS), what: `a text of at most ${MAX_FORMULA_CHARS} characters` },
  e0: { test: isFiniteNumber, what: 'a finite number' },
  potential: { test: isFiniteNumber, what: 'a finite number' },
  dEdT_mV_K: { test: isFiniteNumber, what: 'a finite number', optional: true },
  source: { test: isText(MAX_SOURCE_CHARS), what: `a text of at most ${MAX_SOURCE_CHARS} characters` },
  note: { test: isText(MAX_NOTE_CHARS), what: `a text of at most ${MAX_NOTE_CHARS} characters`, optional: true },
  aliases: {
    test: (v) => Array.isArray(v) && v.length <= 100 && v.every(isText(MAX_KEY_CHARS)),
    what: `a list of at most 100 texts of at most ${MAX_KEY_CHARS} characters`,
  },
};

function checkRows(name: string, x: unknown, allowed: Set<string>, problems: string[]): Record<string, unknown>[] {
  if (!Array.isArray(x)) {
    problems.push(`"${name}" is not a list`);
    return [];
  }
  x.forEach((r, i) => {
    if (!isPlainObject(r)) problems.push(`${name} row ${i + 1} is not a record`);
    else {
      const extra = Object.keys(r).filter((k) => !allowed.has(k));
      if (extra.length > 0) problems.push(`${name} row ${i + 1} has fields Cellwright does not write: ${extra.slice(0, 5).map(shortName).join(', ')}`);
      for (const f of allowed) {
        const rule = FIELD_TYPES[f];
        if (!(f in r)) {
          if (!rule.optional) problems.push(`${name} row ${i + 1} has no "${f}"`);
        } else if (!rule.test(r[f])) problems.push(`${name} row ${i + 1}: "${f}" is not ${rule.what}`);
      }
    }
  });
  return x.filter(isPlainObject);
}

function checkKeyLists(name: string, x: unknown, problems: string[]): KeyLists {
  const ok = isPlainObject(x) && Object.keys(x).every((k) => k === 'couples' || k === 'electrodes');
  const list = (v: unknown): v is string[] => Array.isArray(v) && v.every(isText(MAX_KEY_CHARS));
  if (!ok || !list(x.couples) || !list(x.electrodes)) {
    problems.push(`"${name}" is not { couples: [keys], electrodes: [keys] } with keys of at most ${MAX_KEY_CHARS} characters`);
    return { couples: [], electrodes: [] };
  }
  return { couples: x.couples, electrodes: x.electrodes };
}

/** The highest revision read: the next write (revision + 1) must still be an exact whole number. */
export const MAX_REVISION = Number.MAX_SAFE_INTEGER - 1;

/**
 * Reads a stored text. `builtin` is the add-in's built-in table (used only to upgrade schema 1).
 *
 * Syntax: readStoredText(text, builtin)
 * Example: readStoredText(writeStoredText(copy), builtin).ok → true
 */
export function readStoredText(text: unknown, builtin: VersionedRecords): StoredRead {
  if (lastRead !== null && text === lastRead.text) return lastRead.result;
  let result: StoredRead;
  try {
    result = readUncached(text, builtin);
  } catch (e) {
    // Every check above is meant to refuse what it cannot use with a problem; whatever escapes them
    // still makes the table unreadable, never an exception (the functions would stay on the table
    // they had).
    const detail = e instanceof Error ? `${e.name}: ${e.message}` : String(e);
    result = fail('damaged', 'the stored table holds something Cellwright cannot check', [detail.length > 300 ? `${detail.slice(0, 299)}…` : detail]);
  }
  if (typeof text === 'string' && result.ok && result.schema === STORED_SCHEMA) lastRead = { text, result };
  return result;
}

function readUncached(text: unknown, builtin: VersionedRecords): StoredRead {
  if (typeof text !== 'string') {
    const what = text === null ? 'null' : text === undefined ? 'missing' : `a ${typeof text}`;
    return fail('not-ours', `the stored value is ${what}, not the text Cellwright writes`);
  }
  if (text.length > MAX_READ_CHARS) return fail('too-large', `the stored table is ${text.length.toLocaleString('en-US')} characters long, more than Cellwright reads`);
  if (text.trim() === '') return fail('empty', 'the stored table is empty');
  let doc: unknown;
  try {
    doc = JSON.parse(text);
  } catch (e) {
    const detail = e instanceof Error ? e.message : String(e);
    return fail('not-json', 'the stored table is not valid JSON: it may have been cut short or edited by hand', [`JSON reader: ${detail.length > 300 ? `${detail.slice(0, 299)}…` : detail}`]);
  }
  if (!isPlainObject(doc) || doc.format !== STORED_FORMAT) return fail('not-ours', 'the stored value was not written by Cellwright (its format mark is missing or different)');
  const schema = doc.schema;
  if (typeof schema !== 'number' || !Number.isInteger(schema) || schema < 1) return fail('damaged', 'the stored table has no valid schema number');
  if (schema > STORED_SCHEMA) {
    return fail(
      'newer-schema',
      `the stored table was written by a newer version of Cellwright (schema ${schema}; this add-in reads schemas up to ${STORED_SCHEMA}); update the add-in to use it`,
    );
  }

  const problems: string[] = [];
  const allowedTop = schema === 1
    ? ['format', 'schema', 'basedOn', 'changedAt', 'checksum', 'couples', 'electrodes']
    : schema === 2
      ? ['format', 'schema', 'basedOn', 'revision', 'changedAt', 'checksum', 'own', 'removed', 'couples', 'electrodes']
      : ['format', 'schema', 'basedOn', 'revision', 'changedAt', 'checksum', 'own', 'removed', 'couples', 'electrodes', 'log', 'logChecksum'];
  const extra = Object.keys(doc).filter((k) => !allowedTop.includes(k));
  if (extra.length > 0) problems.push(`fields Cellwright does not write: ${extra.map((k) => JSON.stringify(k)).join(', ')}`);
  const missing = allowedTop.filter((k) => !(k in doc));
  if (missing.length > 0) problems.push(`missing fields: ${missing.join(', ')}`);
  if (!isTableVersion(doc.basedOn)) problems.push('"basedOn" is not a table version such as "2026.1"');
  if (!isUtcTimestamp(doc.changedAt)) problems.push('"changedAt" is not a time written YYYY-MM-DDTHH:MM:SS.sssZ (ISO 8601, UTC)');
  if (typeof doc.checksum !== 'string' || !/^sha256:[0-9a-f]{64}$/.test(doc.checksum)) problems.push('"checksum" is not "sha256:" and 64 hex digits');
  let revision = 0;
  if (schema >= 2) {
    if (typeof doc.revision !== 'number' || !Number.isSafeInteger(doc.revision) || doc.revision < 1 || doc.revision > MAX_REVISION) {
      problems.push(`"revision" is not a whole number from 1 to ${MAX_REVISION}`);
    }
    else revision = doc.revision;
  }
  const couples = checkRows('couples', doc.couples, COUPLE_FIELDS, problems);
  const electrodes = checkRows('electrodes', doc.electrodes, ELECTRODE_FIELDS, problems);
  const own = schema >= 2 ? checkKeyLists('own', doc.own, problems) : { couples: [], electrodes: [] };
  const removed = schema >= 2 ? checkKeyLists('removed', doc.removed, problems) : { couples: [], electrodes: [] };
  if (schema >= 3 && (typeof doc.logChecksum !== 'string' || !/^sha256:[0-9a-f]{64}$/.test(doc.logChecksum))) problems.push('"logChecksum" is not "sha256:" and 64 hex digits');
  if (problems.length > 0) return fail('damaged', `the stored table is damaged: ${problems[0]}`, problems.slice(0, 50));
  const logProblems: string[] = [];
  const log = schema >= 3 ? checkLog(doc.log, revision, logProblems) : EMPTY_LOG;
  if (logProblems.length > 0) return fail('log', `the stored table's revision log is damaged: ${logProblems[0].replace(/^revision log: /, '')}`, logProblems);
  if (schema >= 3 && logChecksum(log) !== doc.logChecksum) {
    return fail('log', 'the revision log does not match its checksum: the stored table was changed outside Cellwright or damaged', [
      `stored log checksum ${String(doc.logChecksum)}`,
      `checksum of the log ${logChecksum(log)}`,
    ]);
  }

  const basedOn = doc.basedOn as string;
  const expected = schema === 1 ? schema1Checksum(basedOn, doc.couples, doc.electrodes) : contentChecksum({ basedOn, couples: couples as never, electrodes: electrodes as never, own, removed });
  if (expected !== doc.checksum) {
    return fail('checksum', 'the checksum does not match the rows: the stored table was changed outside Cellwright or damaged', [
      `stored checksum ${String(doc.checksum)}`,
      `checksum of the rows ${expected}`,
    ]);
  }

  let copy: WorkbookCopy = {
    basedOn,
    revision,
    changedAt: doc.changedAt as string,
    couples: couples as unknown as CoupleRecord[],
    electrodes: electrodes as unknown as ElectrodeRecord[],
    own,
    removed,
    log,
  };
  let table: PotentialTable;
  try {
    table = tableOfCopy(copy);
  } catch (e) {
    const ce = e as ChangeError;
    return fail('rows', `the stored table has rows that cannot be used: ${ce.details[0] ?? ce.message}`, ce.details);
  }
  if (schema === 1) copy = upgradeSchema1(copy, builtin);
  const keyProblems = [...ownOrRemovedProblems(copy)];
  if (keyProblems.length > 0) return fail('damaged', `the stored table is damaged: ${keyProblems[0]}`, keyProblems);
  return { ok: true, copy, table, checksum: contentChecksum(copy), schema };
}

function* ownOrRemovedProblems(copy: WorkbookCopy): Generator<string> {
  for (const [kind, rows, own, removed] of [
    ['couple', copy.couples, copy.own.couples, copy.removed.couples],
    ['electrode', copy.electrodes, copy.own.electrodes, copy.removed.electrodes],
  ] as const) {
    const present = new Set(rows.map((r) => matchKey(kind, r.key)));
    for (const k of own) if (!present.has(matchKey(kind, k))) yield `"own" names the ${kind} "${k}", which is not in the table`;
    for (const k of removed) if (present.has(matchKey(kind, k))) yield `"removed" names the ${kind} "${k}", which is in the table`;
  }
}

/** Schema 1 → 2: rows differing from (or missing in) the built-in table count as set here; absent built-in rows as deleted here. */
function upgradeSchema1(copy: WorkbookCopy, builtin: VersionedRecords): WorkbookCopy {
  const lists = (kind: 'couple' | 'electrode', rows: readonly (CoupleRecord | ElectrodeRecord)[], b: readonly (CoupleRecord | ElectrodeRecord)[]) => {
    const bi = new Map(b.map((r) => [matchKey(kind, r.key), r]));
    const present = new Set(rows.map((r) => matchKey(kind, r.key)));
    return {
      own: rows.filter((r) => {
        const x = bi.get(matchKey(kind, r.key));
        return x === undefined || !sameRecord(kind, x, r);
      }).map((r) => r.key),
      removed: b.filter((r) => !present.has(matchKey(kind, r.key))).map((r) => r.key),
    };
  };
  const c = lists('couple', copy.couples, builtin.couples);
  const e = lists('electrode', copy.electrodes, builtin.electrodes);
  return { ...copy, own: { couples: c.own, electrodes: e.own }, removed: { couples: c.removed, electrodes: e.removed } };
}
