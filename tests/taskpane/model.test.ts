/**
 * Storage and recalculation through the task pane's model, on a workbook mocked with office-addin-mock:
 * round trip, schema upgrade, damaged data, checksum mismatch, 2,000 rows, concurrent edits from two
 * panes, pin and update, copy to sheet. The worksheet functions are the real ones (functions/families),
 * reached through the real channel (functions/workbookHost.ts), so each test also shows what a cell
 * would show after the change.
 */
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { STDPOTENTIAL } from '../../functions/families/table';
import { installFunctionsHost, useStoredValue } from '../../functions/workbookHost';
import { COMPUTED_WITH_KEY, TABLE_SETTING_KEY } from '../../workbook/store';
import { exportCsv, importCsv } from '../../src/store/csv';
import { type VersionedRecords } from '../../src/store/rows';
import { contentChecksum, forgetLastRead, writeSchema1Text, writeStoredText } from '../../src/store/stored';
import { pinnedCopy } from '../../src/store/copy';
import { type RevisionLog, logChecksum } from '../../src/store/log';
import { TableModel } from '../../taskpane/model';
import { copyToSheet, sheetContent } from '../../taskpane/sheet';

/** Who and why, as the pane asks them before every write. */
const S = { by: 'A. Tester', why: 'test change' };
import { builtin, manyCouples, newerBuiltin } from '../store/fixtures';
import { FakeCfError, WorkbookFile, customFunctionsGlobal, excelFor } from './mockExcel';

const B = builtin();
const g = globalThis as Record<string, unknown>;
let file: WorkbookFile;

function model(b: VersionedRecords = B): TableModel {
  return new TableModel({ builtin: b, host: () => globalThis.cellwrightFunctionsHost, now: () => new Date('2026-03-04T05:06:07Z') });
}

/** What a cell =CELLWRIGHT.STDPOTENTIAL(key) shows now. */
async function cellE0(key: string): Promise<unknown> {
  const r = (await STDPOTENTIAL([[key]], null)) as unknown[][];
  return r[0][0];
}

const cu = () => B.couples.find((c) => c.key === 'Cu2+/Cu')!;
const ag = () => B.couples.find((c) => c.key === 'Ag+/Ag')!;

beforeEach(() => {
  file = new WorkbookFile();
  g.Excel = excelFor(file);
  g.CustomFunctions = customFunctionsGlobal;
  installFunctionsHost();
  useStoredValue(null);
});

afterEach(() => {
  delete g.Excel;
  delete globalThis.cellwrightFunctionsHost;
});

describe('round trip', () => {
  it('an edit is stored, read back by a newly opened pane, used by the functions, and recalculated once', async () => {
    const a = model();
    await a.load();
    expect(a.state.kind).toBe('none');
    expect(await cellE0('Cu2+/Cu')).toBe(cu().e0);

    const r = await a.change({ kind: 'put', rowKind: 'couple', originalKey: 'Cu2+/Cu', record: { ...cu(), e0: 0.35, source: 'our lab 2026' } }, S);
    expect(r.kind).toBe('done');
    expect(file.calculations).toEqual(['Full']);
    expect(await cellE0('Cu(2+)/Cu')).toBe(0.35);

    const stored = file.settings.get(TABLE_SETTING_KEY) as string;
    expect(JSON.parse(stored)).toMatchObject({ schema: 3, revision: 1, basedOn: B.version, changedAt: '2026-03-04T05:06:07.000Z' });
    // The recalculation records the table the results are now computed with (checked at the next start-up).
    expect(file.settings.get(COMPUTED_WITH_KEY)).toBe(a.checksum);
    expect(a.checksum).toMatch(/^sha256:[0-9a-f]{64}$/);

    // "Close and reopen": a new pane on the same workbook file, functions restarted from the built-in table.
    useStoredValue(null);
    const b = model();
    await b.load();
    expect(b.state.kind).toBe('readable');
    expect(b.differences().map((d) => d.key)).toEqual(['Cu2+/Cu']);
    expect(await cellE0('Cu2+/Cu')).toBe(0.35); // load() handed the stored table to the functions
    expect(file.calculations).toEqual(['Full', 'Full']);

    // A second change is revision 2.
    await b.change({ kind: 'delete', rowKind: 'couple', key: 'Ag+/Ag' }, S);
    expect(JSON.parse(file.settings.get(TABLE_SETTING_KEY) as string).revision).toBe(2);
    const na = (await cellE0('Ag+/Ag')) as FakeCfError;
    expect(na).toBeInstanceOf(FakeCfError);
    expect(na.code).toBe('#N/A');
  });

  it('revert and reset bring the built-in values back, and reset removes the stored table', async () => {
    const a = model();
    await a.load();
    await a.change({ kind: 'put', rowKind: 'couple', originalKey: 'Cu2+/Cu', record: { ...cu(), e0: 0.35, source: 'x' } }, S);
    await a.change({ kind: 'put', rowKind: 'couple', originalKey: 'Ag+/Ag', record: { ...ag(), e0: 0.8, source: 'x' } }, S);
    expect((await a.change({ kind: 'revert', rowKind: 'couple', key: 'Cu2+/Cu' }, S)).kind).toBe('done');
    expect(await cellE0('Cu2+/Cu')).toBe(cu().e0);
    expect(a.differences().map((d) => d.key)).toEqual(['Ag+/Ag']);
    const r = await a.reset();
    expect(r.kind).toBe('done');
    expect(file.settings.has(TABLE_SETTING_KEY)).toBe(false);
    expect(a.state.kind).toBe('none');
    expect(await cellE0('Ag+/Ag')).toBe(ag().e0);
    expect(file.calculations.length).toBe(4);
  });

  it('a change the table would not accept is refused with the reason and nothing is written', async () => {
    const a = model();
    await a.load();
    const r = await a.change({ kind: 'put', rowKind: 'couple', originalKey: null, record: { key: 'Cu2+/Cu', halfReaction: 'Cu2+ + 2e- -> Cu', e0: 0.3, source: 'x' } }, S);
    expect(r.kind).toBe('refused');
    expect(r.message).toMatch(/already in the table/);
    expect(file.settings.size).toBe(0);
    expect(file.calculations).toEqual([]);
  });
});

describe('opening the pane while the functions are still reading the workbook', () => {
  it('hands the table over without recalculating (the waiting cells get it), and without the channel says so', async () => {
    file.settings.set(TABLE_SETTING_KEY, writeStoredText({ ...pinnedCopy(B), revision: 3, changedAt: '2026-01-01T00:00:00.000Z' }));
    const given: unknown[] = [];
    const loadingHost = { apiVersion: 1 as const, status: () => ({ state: 'loading' as const }), useStoredValue: (v: unknown) => (given.push(v), { state: 'workbook' as const }) };
    const a = new TableModel({ builtin: B, host: () => loadingHost });
    await a.load();
    expect(given).toEqual([file.settings.get(TABLE_SETTING_KEY)]);
    expect(file.calculations).toEqual([]);

    const b = new TableModel({ builtin: B, host: () => undefined });
    await b.load();
    const r = await b.change({ kind: 'delete', rowKind: 'couple', key: 'Zn2+/Zn' }, S);
    expect(r.kind === 'done' && r.warning).toMatch(/do not run in this pane’s page/);
    expect(file.calculations).toEqual(['Full']); // still recalculated, for functions running elsewhere
  });
});

describe('schema upgrade', () => {
  it('a schema-1 table is used as stored, and the next change writes schema 3 without losing its rows, starting the log', async () => {
    const rows = B.couples.map((c) => (c.key === 'Ag+/Ag' ? { ...c, e0: 0.8 } : c));
    file.settings.set(TABLE_SETTING_KEY, writeSchema1Text({ basedOn: B.version, changedAt: '2025-01-01T00:00:00Z', couples: rows, electrodes: B.electrodes }));
    const a = model();
    await a.load();
    expect(a.state.kind === 'readable' && a.state.read.schema).toBe(1);
    expect(await cellE0('Ag+/Ag')).toBe(0.8);
    await a.change({ kind: 'put', rowKind: 'couple', originalKey: 'Cu2+/Cu', record: { ...cu(), e0: 0.35, source: 'x' } }, S);
    const doc = JSON.parse(file.settings.get(TABLE_SETTING_KEY) as string);
    expect(doc.schema).toBe(3);
    expect(doc.revision).toBe(1);
    expect(doc.own.couples.sort()).toEqual(['Ag+/Ag', 'Cu2+/Cu']);
    expect(doc.log.dropped).toBe(0);
    expect(doc.log.entries.map((e: { revision: number; by: string; action: string }) => [e.revision, e.by, e.action])).toEqual([[1, 'A. Tester', 'edit']]);
    expect(await cellE0('Ag+/Ag')).toBe(0.8);
  });
});

describe('damaged data and checksum mismatch', () => {
  const damaged: Array<[string, () => unknown, RegExp]> = [
    ['cut-short JSON', () => writeStoredText({ ...pinnedCopy(B), revision: 1, changedAt: '2026-01-01T00:00:00.000Z' }).slice(0, 500), /not valid JSON/],
    ['a changed number (checksum mismatch)', () => writeStoredText({ ...pinnedCopy(B), revision: 1, changedAt: '2026-01-01T00:00:00.000Z' }).replace('"e0":0.3372', '"e0":0.4372'), /checksum does not match/],
    ['a newer schema', () => JSON.stringify({ ...JSON.parse(writeStoredText({ ...pinnedCopy(B), revision: 1, changedAt: '2026-01-01T00:00:00.000Z' })), schema: 9 }), /newer version/],
    ['someone else\'s value', () => 'hello', /not valid JSON|not written by Cellwright/],
    // A number beyond double range (JSON reads it as Infinity) and 20,000-deep nesting, behind a stale checksum.
    ['a number beyond double range', () => writeStoredText({ ...pinnedCopy(B), revision: 1, changedAt: '2026-01-01T00:00:00.000Z' }).replace('"e0":0.3372', '"e0":1e999'), /"e0" is not a finite number/],
    // A log entry whose reason was emptied, its log checksum recomputed so the entry check itself is reached.
    ['a damaged revision log entry', () => {
      const log: RevisionLog = { entries: [{ revision: 1, at: '2026-01-01T00:00:00.000Z', by: 'A', why: 'pin', action: 'pin', basedOn: B.version, rows: [], moreRows: 0 }], dropped: 0 };
      const doc = JSON.parse(writeStoredText({ ...pinnedCopy(B), revision: 1, changedAt: '2026-01-01T00:00:00.000Z', log }));
      doc.log.entries[0].why = '';
      doc.logChecksum = logChecksum(doc.log);
      return JSON.stringify(doc);
    }, /revision log is damaged: entry 1: "why" is not a reason/],
    ['a revision log changed behind its checksum', () => writeStoredText({ ...pinnedCopy(B), revision: 1, changedAt: '2026-01-01T00:00:00.000Z', log: { entries: [], dropped: 0 } }).replace('"dropped":0', '"dropped":7'), /revision log does not match its checksum/],
    ['a field nested 20,000 deep', () => writeStoredText({ ...pinnedCopy(B), revision: 1, changedAt: '2026-01-01T00:00:00.000Z' }).replace('"e0":0.3372', `"e0":${'['.repeat(20_000)}0.3372${']'.repeat(20_000)}`), /"e0" is not a finite number/],
  ];
  for (const [name, value, reason] of damaged) {
    it(`${name}: functions answer #N/A with the reason, the pane refuses changes, nothing is overwritten until an explicit reset`, async () => {
      const raw = value();
      file.settings.set(TABLE_SETTING_KEY, raw);
      const a = model();
      await a.load();
      expect(a.state.kind).toBe('unreadable');
      const cell = (await cellE0('Cu2+/Cu')) as FakeCfError;
      expect(cell).toBeInstanceOf(FakeCfError);
      expect(cell.code).toBe('#N/A');
      expect(cell.message).toMatch(/the workbook's potential table could not be read/);
      expect(cell.message).toMatch(reason);
      expect(cell.message!.length).toBeLessThanOrEqual(300);

      expect((await a.change({ kind: 'delete', rowKind: 'couple', key: 'Zn2+/Zn' }, S)).kind).toBe('refused');
      expect((await a.pin(S)).kind).toBe('refused');
      expect(file.settings.get(TABLE_SETTING_KEY)).toBe(raw);

      const r = await a.reset();
      expect(r.kind).toBe('done');
      expect(file.settings.has(TABLE_SETTING_KEY)).toBe(false);
      expect(await cellE0('Cu2+/Cu')).toBe(cu().e0);
    });
  }

  it('a reset does not remove a table that was replaced since the pane read the damaged one', async () => {
    file.settings.set(TABLE_SETTING_KEY, '{broken');
    const a = model();
    await a.load();
    const good = writeStoredText({ ...pinnedCopy(B), revision: 1, changedAt: '2026-01-01T00:00:00.000Z' });
    file.settings.set(TABLE_SETTING_KEY, good); // repaired elsewhere meanwhile
    const r = await a.reset();
    expect(r.kind).toBe('conflict');
    expect(file.settings.get(TABLE_SETTING_KEY)).toBe(good);
    expect(a.state.kind).toBe('readable');
  });
});

describe('2,000 rows', () => {
  it('imports 2,000 rows from CSV, stores them, and a reopened workbook uses them', async () => {
    const csv = exportCsv({ couples: manyCouples(2000), electrodes: [] }, 'test');
    const imp = importCsv(csv);
    expect(imp.rejected).toEqual([]);
    const a = model();
    await a.load();
    const t0 = performance.now();
    const r = await a.change({ kind: 'import', mode: 'merge', couples: imp.couples, electrodes: imp.electrodes }, S);
    const writeMs = performance.now() - t0;
    expect(r.kind).toBe('done');
    const stored = file.settings.get(TABLE_SETTING_KEY) as string;
    useStoredValue(null);
    forgetLastRead(); // as in a newly opened workbook: nothing remembered
    const t1 = performance.now();
    const b = model();
    await b.load();
    const readMs = performance.now() - t1;
    expect(b.records.couples.length).toBe(B.couples.length + 2000);
    expect(await cellE0('C2000H4000O/C2000H4002O')).toBe(manyCouples(2000)[1999].e0);
    console.log(`2,000 imported rows: stored ${stored.length} characters (${new TextEncoder().encode(stored).length} bytes UTF-8); import+write ${writeMs.toFixed(0)} ms, reopen+read ${readMs.toFixed(0)} ms`);
  });
});

describe('concurrent edits from two panes of the same workbook', () => {
  it('the second writer is stopped, told what the first changed, and can apply its change on top: both rows kept', async () => {
    const a = model();
    const b = model();
    await a.load();
    await b.load();
    expect((await a.change({ kind: 'put', rowKind: 'couple', originalKey: 'Cu2+/Cu', record: { ...cu(), e0: 0.35, source: 'pane A' } }, S)).kind).toBe('done');
    const before = file.settings.get(TABLE_SETTING_KEY);
    const r = await b.change({ kind: 'put', rowKind: 'couple', originalKey: 'Ag+/Ag', record: { ...ag(), e0: 0.8, source: 'pane B' } }, S);
    expect(r.kind).toBe('conflict');
    if (r.kind !== 'conflict') return;
    expect(file.settings.get(TABLE_SETTING_KEY)).toBe(before); // nothing written
    expect(r.message).toMatch(/Not saved/);
    expect(r.theirs.map((d) => `${d.key}:${d.status}`)).toEqual(['Cu2+/Cu:changed']);
    const again = await r.retry!();
    expect(again.kind).toBe('done');
    const doc = JSON.parse(file.settings.get(TABLE_SETTING_KEY) as string);
    expect(doc.revision).toBe(2);
    expect(doc.own.couples.sort()).toEqual(['Ag+/Ag', 'Cu2+/Cu']);
    expect(await cellE0('Cu2+/Cu')).toBe(0.35);
    expect(await cellE0('Ag+/Ag')).toBe(0.8);
  });

  it('two writes at the same moment: the one written over is detected and reported, and can be applied again', async () => {
    const a = model();
    const b = model();
    await a.load();
    await b.load();
    // B checks the workbook, then A writes completely, then B's write lands on top of A's.
    file.beforeNextWrite = async () => {
      const ra = await a.change({ kind: 'put', rowKind: 'couple', originalKey: 'Cu2+/Cu', record: { ...cu(), e0: 0.35, source: 'pane A' } }, S);
      expect(ra.kind).toBe('done');
    };
    const rb = await b.change({ kind: 'put', rowKind: 'couple', originalKey: 'Ag+/Ag', record: { ...ag(), e0: 0.8, source: 'pane B' } }, S);
    expect(rb.kind).toBe('done'); // B's own read-back found its table: B cannot know yet
    // A's next look at the workbook finds its change gone and says so.
    const report = await a.checkForChangesElsewhere();
    expect(report).not.toBeNull();
    expect(report!.lostMine).toBe(true);
    expect(report!.message).toMatch(/no longer in the workbook’s table/);
    expect(await cellE0('Cu2+/Cu')).toBe(cu().e0); // the functions follow what is stored
    const again = await report!.retry!();
    expect(again.kind).toBe('done');
    expect(await cellE0('Cu2+/Cu')).toBe(0.35);
    expect(await cellE0('Ag+/Ag')).toBe(0.8);
    // And B sees A's re-applied change as a change made elsewhere, with its own change still there.
    const seenByB = await b.checkForChangesElsewhere();
    expect(seenByB!.lostMine).toBe(false);
    expect(seenByB!.theirs.map((d) => d.key)).toEqual(['Cu2+/Cu']);
  });

  it('a write whose read-back finds another table reports "written over"', async () => {
    const a = model();
    await a.load();
    const other = writeStoredText({ ...pinnedCopy(B), revision: 5, changedAt: '2026-01-01T00:00:00.000Z' });
    // Another writer lands between this pane's write and its read-back.
    const realRun = (g.Excel as { run: (cb: (c: unknown) => Promise<unknown>) => Promise<unknown> }).run;
    let calls = 0;
    (g.Excel as Record<string, unknown>).run = async (cb: (c: unknown) => Promise<unknown>) => {
      calls++;
      if (calls === 2) file.settings.set(TABLE_SETTING_KEY, other); // before the read-back
      return realRun.call(g.Excel, cb);
    };
    const r = await a.change({ kind: 'delete', rowKind: 'couple', key: 'Zn2+/Zn' }, S);
    expect(r.kind).toBe('conflict');
    expect(r.message).toMatch(/written over/);
    expect(a.state.kind === 'readable' && a.state.read.copy.revision).toBe(5);
  });

  it('nothing changed elsewhere: no report', async () => {
    const a = model();
    await a.load();
    await a.change({ kind: 'delete', rowKind: 'couple', key: 'Zn2+/Zn' }, S);
    expect(await a.checkForChangesElsewhere()).toBeNull();
  });
});

describe('pin and a newer built-in table', () => {
  it('pin stores the built-in table with its checksum; a newer add-in shows what would change and updates keeping own rows', async () => {
    const a = model();
    await a.load();
    expect((await a.pin(S)).kind).toBe('done');
    expect(a.state.kind === 'readable' && a.state.read.checksum).toBe(a.checksum);
    expect(a.differences()).toEqual([]);
    expect(a.builtinNotice()).toBeNull();
    await a.change({ kind: 'put', rowKind: 'couple', originalKey: 'Ag+/Ag', record: { ...ag(), e0: 0.8, source: 'lab' } }, S);

    // The add-in is updated: its built-in table is newer.
    const N = newerBuiltin(B);
    useStoredValue(null);
    const b = model(N);
    await b.load();
    expect(await cellE0('Cu2+/Cu')).toBe(cu().e0); // the pinned value, not the newer built-in one
    const notice = b.builtinNotice()!;
    expect(notice.addinIsNewer).toBe(true);
    expect(notice.changes.map((d) => `${d.key}:${d.status}`).sort()).toEqual(['Au+/Au:removed', 'Cu2+/Cu:changed', 'Tl+/Tl:added']);
    expect((await b.change({ kind: 'update-to-builtin' }, S)).kind).toBe('done');
    expect(await cellE0('Cu2+/Cu')).toBe(0.3521);
    expect(await cellE0('Ag+/Ag')).toBe(0.8);
    expect(b.builtinNotice()).toBeNull();
  });
});

describe('copy to sheet', () => {
  it('writes the table with version, checksum and sources, keeps hostile text as text, and never reuses a sheet name', async () => {
    const a = model();
    await a.load();
    await a.change({ kind: 'put', rowKind: 'couple', originalKey: null, record: { key: 'Tl+/Tl', halfReaction: 'Tl+ + e- -> Tl', e0: -0.336, source: '=HYPERLINK("http://example.invalid","x")', note: '<b>bold?</b>' } }, S);
    const input = { records: a.records, builtin: B, description: 'This workbook’s own table', version: B.version, checksum: a.checksum!, now: new Date('2026-01-01T00:00:00Z') };
    const name1 = await copyToSheet(input);
    const name2 = await copyToSheet(input);
    expect([name1, name2]).toEqual(['Potential table', 'Potential table (2)']);
    const sheet = file.sheets.get(name1)!;
    expect(sheet.activated).toBe(true);
    const main = sheet.writes.find((w) => w.values !== undefined)!;
    const values = main.values as unknown[][];
    const formats = main.numberFormat as unknown[][];
    expect(values[3]).toEqual(['Checksum', a.checksum, '', '', '', '', '', '']);
    const tl = values.findIndex((r) => r[0] === 'Tl+/Tl');
    expect(values[tl].slice(0, 4)).toEqual(['Tl+/Tl', 'Tl+ + e- -> Tl', 1, -0.336]);
    expect(values[tl][5]).toBe('=HYPERLINK("http://example.invalid","x")');
    expect(formats[tl][5]).toBe('@'); // text, never a formula
    expect(formats[tl][3]).toBe('General');
    expect(values[tl][7]).toBe('not in built-in');
    expect(sheet.writes.some((w) => w.bold)).toBe(true);
    expect(sheet.writes.some((w) => w.wrapText && w.address === 'F:F')).toBe(true);
    // Every text cell of the content is text-formatted.
    const c = sheetContent(input);
    c.values.forEach((row, i) => row.forEach((v, j) => expect(c.formats[i][j]).toBe(typeof v === 'number' ? 'General' : '@')));
  });

  it('the checksum shown for a pinned table equals the stored one', async () => {
    const a = model();
    await a.load();
    await a.pin(S);
    const doc = JSON.parse(file.settings.get(TABLE_SETTING_KEY) as string);
    expect(doc.checksum).toBe(a.checksum);
    expect(contentChecksum(a.copy!)).toBe(a.checksum);
  });
});

describe('revision log through the pane model', () => {
  it('each write records who, when, why and the row’s old → new values; the log survives reopening', async () => {
    const a = model();
    await a.load();
    expect((await a.pin({ by: 'Q. Engineer', why: 'freeze the data for the customer audit' })).kind).toBe('done');
    const r = await a.change({ kind: 'put', rowKind: 'couple', originalKey: 'Cu2+/Cu', record: { ...cu(), e0: 0.35, source: 'our lab 2026' } }, { by: 'Q. Engineer', why: 'bath 4 measured value' });
    expect(r.kind).toBe('done');
    const b = model();
    await b.load();
    const log = b.copy!.log!;
    expect(log.dropped).toBe(0);
    expect(log.entries.map((e) => [e.revision, e.action, e.by, e.why, e.at])).toEqual([
      [1, 'pin', 'Q. Engineer', 'freeze the data for the customer audit', '2026-03-04T05:06:07.000Z'],
      [2, 'edit', 'Q. Engineer', 'bath 4 measured value', '2026-03-04T05:06:07.000Z'],
    ]);
    expect(log.entries[1].rows).toEqual([
      { table: 'couples', key: 'Cu2+/Cu', change: 'changed', fields: [{ field: 'e0', from: cu().e0, to: 0.35 }, { field: 'source', from: cu().source, to: 'our lab 2026' }] },
    ]);
    // Copy to sheet writes the log after the rows, newest first, every text cell as text.
    const c = sheetContent({ records: b.records, builtin: B, description: 'x', version: B.version, checksum: b.checksum!, now: new Date(0), log });
    const head = c.values.findIndex((row) => row[0] === 'Revision log');
    expect(c.values[head][1]).toBe('2 entries, newest first');
    expect(c.values[head + 2].slice(0, 2)).toEqual([2, '2026-03-04T05:06:07.000Z']);
    expect(c.values[head + 2][5]).toBe(`edited a row\ncouple Cu2+/Cu: E° ${cu().e0} V → 0.35 V; source “${cu().source}” → “our lab 2026”`);
    expect(c.values[head + 2].slice(6)).toEqual(['bath 4 measured value', 'Q. Engineer']);
    expect(c.values[head + 3][0]).toBe(1);
    expect(c.formats[head + 2][6]).toBe('@');
  });

  it('a write without a reason or a name is refused and nothing is stored', async () => {
    const a = model();
    await a.load();
    const r = await a.change({ kind: 'delete', rowKind: 'couple', key: 'Zn2+/Zn' }, { by: 'Q. Engineer', why: '  ' });
    expect(r.kind).toBe('refused');
    expect(r.kind === 'refused' && r.message).toMatch(/give a reason/);
    expect((await a.pin({ by: '', why: 'audit' })).kind).toBe('refused');
    expect(file.settings.has(TABLE_SETTING_KEY)).toBe(false);
  });

  it('a change applied again after a conflict keeps its name and reason, and logs against the latest table', async () => {
    const a = model();
    const b = model();
    await a.load();
    await b.load();
    expect((await a.change({ kind: 'put', rowKind: 'couple', originalKey: 'Cu2+/Cu', record: { ...cu(), e0: 0.35, source: 'pane A' } }, { by: 'A', why: 'first' })).kind).toBe('done');
    const r = await b.change({ kind: 'put', rowKind: 'couple', originalKey: 'Ag+/Ag', record: { ...ag(), e0: 0.8, source: 'pane B' } }, { by: 'B', why: 'second' });
    expect(r.kind).toBe('conflict');
    if (r.kind !== 'conflict') return;
    expect((await r.retry!()).kind).toBe('done');
    const log = b.copy!.log!;
    expect(log.entries.map((e) => [e.revision, e.by, e.why, e.rows.map((x) => x.key)])).toEqual([
      [1, 'A', 'first', ['Cu2+/Cu']],
      [2, 'B', 'second', ['Ag+/Ag']],
    ]);
  });
});
