/**
 * Start-up of the functions bundle (functions/runtime.ts) in the shared runtime, with Office and Excel
 * mocked (office-addin-mock): the functions wait for the workbook's table, use it, fail loudly when it
 * cannot be read, never fall back to the built-in table silently, and follow changes made elsewhere.
 * Also the production bundle dist/functions.js evaluated in node:vm with the same mocks.
 */
import { existsSync } from 'node:fs';
import { resolve } from 'node:path';
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { COMPUTED_WITH_KEY, TABLE_SETTING_KEY } from '../../workbook/store';
import { applyChange, pinnedCopy } from '../../src/store/copy';
import { writeStoredText } from '../../src/store/stored';
import { loadBundle } from '../bundle/harness';
import { COMPUTED_WITH_DATA_KEY } from '../../workbook/pinnedData';
import { builtinPartChecksums, partChecksum } from '../../src/dataset/checksum';
import { builtin } from '../store/fixtures';
import { FakeCfError, WorkbookFile, customFunctionsGlobal, excelFor, officeFor } from './mockExcel';

const B = builtin();
const g = globalThis as Record<string, unknown>;
const cuBuiltin = B.couples.find((c) => c.key === 'Cu2+/Cu')!.e0;
/** What a workbook records as computed with the add-in's built-in reference data (every part besides the table). */
const BUILTIN_DATA = partChecksum({ ...builtinPartChecksums() });

function storedWithCu(e0: number, revision = 1): string {
  const copy = applyChange(null, B, { kind: 'put', rowKind: 'couple', originalKey: 'Cu2+/Cu', record: { ...B.couples.find((c) => c.key === 'Cu2+/Cu')!, e0, source: 'workbook' } });
  return writeStoredText({ ...copy, revision, changedAt: '2026-01-01T00:00:00Z' });
}

type Fn = (...a: unknown[]) => unknown;
interface Started {
  STDPOTENTIAL: Fn;
  context: typeof import('../../functions/context');
}

/** Loads functions/runtime.ts afresh (as a newly started runtime) with the globals set now. */
async function startRuntime(): Promise<Started> {
  vi.resetModules();
  await import('../../functions/runtime');
  const table = await import('../../functions/families/table');
  const context = await import('../../functions/context');
  return { STDPOTENTIAL: table.STDPOTENTIAL as unknown as Fn, context };
}

/** The checksum a stored text carries (what the functions report and record for it). */
function checksumOf(stored: string): string {
  return (JSON.parse(stored) as { checksum: string }).checksum;
}

async function cell(STDPOTENTIAL: Fn, key: string): Promise<unknown> {
  const r = STDPOTENTIAL([[key]], null);
  expect(r).toBeDefined();
  return ((await r) as unknown[][])[0][0];
}

beforeEach(() => {
  g.CustomFunctions = customFunctionsGlobal;
});
afterEach(() => {
  vi.useRealTimers();
  delete g.Office;
  delete g.Excel;
  delete globalThis.cellwrightFunctionsHost;
});

describe('functions runtime start-up', () => {
  it('without Office it does nothing: no channel, no waiting, the built-in table answers', async () => {
    const { STDPOTENTIAL, context } = await startRuntime();
    expect(globalThis.cellwrightFunctionsHost).toBeUndefined();
    expect(context.tablePending()).toBeNull();
    const r = STDPOTENTIAL([['Cu2+/Cu']], null);
    expect(r).not.toBeInstanceOf(Promise);
    expect((r as unknown[][])[0][0]).toBe(cuBuiltin);
  });

  it('in Excel, look-ups wait for the workbook table and answer from it (never from the built-in table first)', async () => {
    // The workbook's results were last computed with this very table (recorded), so nothing is recalculated.
    const file = new WorkbookFile({ [TABLE_SETTING_KEY]: storedWithCu(0.35), [COMPUTED_WITH_KEY]: checksumOf(storedWithCu(0.35)), [COMPUTED_WITH_DATA_KEY]: BUILTIN_DATA });
    let open!: () => void;
    file.gate = new Promise<void>((r) => (open = r));
    g.Office = officeFor('Excel');
    g.Excel = excelFor(file);
    const { STDPOTENTIAL, context } = await startRuntime();
    expect(context.tablePending()).not.toBeNull();
    expect(globalThis.cellwrightFunctionsHost!.status().state).toBe('loading');
    const pending = STDPOTENTIAL([['Cu2+/Cu']], null);
    expect(pending).toBeInstanceOf(Promise); // the cell waits
    open();
    expect(((await pending) as unknown[][])[0][0]).toBe(0.35);
    const st = globalThis.cellwrightFunctionsHost!.status();
    expect(st).toMatchObject({ state: 'workbook', revision: 1, version: B.version });
    expect(st.checksum).toMatch(/^sha256:[0-9a-f]{64}$/);
    await vi.waitFor(() => expect(file.settingsChangedHandlers.length).toBe(1)); // start-up has finished
    expect(file.calculations).toEqual([]); // nothing to recalculate: no cell answered before, results current
  });

  it('a workbook without a table of its own uses the built-in table', async () => {
    const file = new WorkbookFile();
    g.Office = officeFor('Excel');
    g.Excel = excelFor(file);
    const { STDPOTENTIAL } = await startRuntime();
    expect(await cell(STDPOTENTIAL, 'Cu2+/Cu')).toBe(cuBuiltin);
    expect(globalThis.cellwrightFunctionsHost!.status().state).toBe('builtin');
  });

  it('an unreadable table makes look-ups answer #N/A with the reason, and it is left as it was', async () => {
    const damaged = storedWithCu(0.35).replace('"e0":0.35', '"e0":0.36');
    const file = new WorkbookFile({ [TABLE_SETTING_KEY]: damaged });
    g.Office = officeFor('Excel');
    g.Excel = excelFor(file);
    const { STDPOTENTIAL } = await startRuntime();
    const v = (await cell(STDPOTENTIAL, 'Cu2+/Cu')) as FakeCfError;
    expect(v).toBeInstanceOf(FakeCfError);
    expect(v.code).toBe('#N/A');
    expect(v.message).toMatch(/^the workbook's potential table could not be read: the checksum does not match/);
    expect(file.settings.get(TABLE_SETTING_KEY)).toBe(damaged);
    expect(globalThis.cellwrightFunctionsHost!.status().state).toBe('unreadable');
  });

  it('a failing read makes look-ups answer #N/A rather than fall back', async () => {
    g.Office = officeFor('Excel');
    g.Excel = { run: async () => Promise.reject(new Error('GeneralException')), CalculationType: { full: 'Full' } };
    const { STDPOTENTIAL } = await startRuntime();
    const v = (await cell(STDPOTENTIAL, 'Cu2+/Cu')) as FakeCfError;
    expect(v.code).toBe('#N/A');
    expect(v.message).toMatch(/reading it failed: GeneralException/);
  });

  it('an Excel without ExcelApi 1.4 cannot read the table: #N/A, saying so', async () => {
    g.Office = officeFor('Excel', false);
    g.Excel = excelFor(new WorkbookFile());
    const { STDPOTENTIAL } = await startRuntime();
    expect(((await cell(STDPOTENTIAL, 'Cu2+/Cu')) as FakeCfError).message).toMatch(/ExcelApi 1.4/);
  });

  it('outside Excel (office.js in a plain browser page) there is no workbook: the built-in table', async () => {
    g.Office = officeFor(null);
    g.Excel = excelFor(new WorkbookFile());
    const { STDPOTENTIAL } = await startRuntime();
    expect(await cell(STDPOTENTIAL, 'Cu2+/Cu')).toBe(cuBuiltin);
  });

  it('when Excel does not answer in time the functions say so (#N/A), then use the late answer and recalculate', async () => {
    vi.useFakeTimers();
    const file = new WorkbookFile({ [TABLE_SETTING_KEY]: storedWithCu(0.35) });
    let open!: () => void;
    file.gate = new Promise<void>((r) => (open = r));
    g.Office = officeFor('Excel');
    g.Excel = excelFor(file);
    const { STDPOTENTIAL, context } = await startRuntime();
    const { START_TIMEOUT_MS } = await import('../../functions/runtime');
    const waiting = STDPOTENTIAL([['Cu2+/Cu']], null) as Promise<unknown[][]>;
    await vi.advanceTimersByTimeAsync(START_TIMEOUT_MS + 10);
    const v = (await waiting)[0][0] as FakeCfError;
    expect(v.code).toBe('#N/A');
    expect(v.message).toMatch(/did not answer within 60 s/);
    vi.useRealTimers();
    open();
    await vi.waitFor(() => expect(file.calculations).toEqual(['Full']));
    expect(context.tableInUse().kind).toBe('workbook');
    expect(await cell(STDPOTENTIAL, 'Cu2+/Cu')).toBe(0.35);
  });

  it('the pane can hand over a new table while the start-up read is still running: the pane wins', async () => {
    const file = new WorkbookFile({ [TABLE_SETTING_KEY]: storedWithCu(0.35, 1) });
    let open!: () => void;
    file.gate = new Promise<void>((r) => (open = r));
    g.Office = officeFor('Excel');
    g.Excel = excelFor(file);
    const { STDPOTENTIAL, context } = await startRuntime();
    globalThis.cellwrightFunctionsHost!.useStoredValue(storedWithCu(0.36, 2));
    open();
    await context.tablePending();
    expect(await cell(STDPOTENTIAL, 'Cu2+/Cu')).toBe(0.36);
  });

  it('a table changed elsewhere (settings changed event) is read, used and recalculated', async () => {
    const file = new WorkbookFile({ [TABLE_SETTING_KEY]: storedWithCu(0.35, 1), [COMPUTED_WITH_KEY]: checksumOf(storedWithCu(0.35, 1)), [COMPUTED_WITH_DATA_KEY]: BUILTIN_DATA });
    g.Office = officeFor('Excel');
    g.Excel = excelFor(file);
    const { STDPOTENTIAL } = await startRuntime();
    expect(await cell(STDPOTENTIAL, 'Cu2+/Cu')).toBe(0.35);
    await vi.waitFor(() => expect(file.settingsChangedHandlers.length).toBe(1));
    // A co-author's write arrives.
    file.settings.set(TABLE_SETTING_KEY, storedWithCu(0.37, 2));
    await file.settingsChangedHandlers[0]({ type: 'SettingsChanged' });
    expect(await cell(STDPOTENTIAL, 'Cu2+/Cu')).toBe(0.37);
    expect(file.calculations).toEqual(['Full']);
    expect(file.settings.get(COMPUTED_WITH_KEY)).toBe(checksumOf(storedWithCu(0.37, 2)));
    // The same value again (e.g. the event for this runtime's own write): nothing to do.
    await file.settingsChangedHandlers[0]({ type: 'SettingsChanged' });
    expect(file.calculations).toEqual(['Full']);
  });
});

describe('recalculation on open: results computed with another table are recalculated once', () => {
  /** Starts the runtime on `file` and waits until start-up has finished (it then watches for changes). */
  async function open(file: WorkbookFile) {
    g.Office = officeFor('Excel');
    g.Excel = excelFor(file);
    const started = await startRuntime();
    await vi.waitFor(() => expect(file.settingsChangedHandlers.length).toBeGreaterThan(0));
    return started;
  }

  it('nothing recorded (saved before the record existed): one full recalculation, and the table in use recorded', async () => {
    const file = new WorkbookFile();
    await open(file);
    expect(file.calculations).toEqual(['Full']);
    const inUse = globalThis.cellwrightFunctionsHost!.status();
    expect(inUse.state).toBe('builtin');
    expect(file.settings.get(COMPUTED_WITH_KEY)).toBe(inUse.checksum);
    // Opened again with the same add-in: the record matches, nothing is recalculated.
    file.settingsChangedHandlers.length = 0;
    await open(file);
    expect(file.calculations).toEqual(['Full']);
  });

  it('results computed with an older built-in table: recalculated once with the table in use, which is then recorded', async () => {
    // A checksum the add-in's table does not have, standing for the table of an earlier release.
    const older = `sha256:${'0'.repeat(64)}`;
    const file = new WorkbookFile({ [COMPUTED_WITH_KEY]: older });
    const { STDPOTENTIAL } = await open(file);
    expect(file.calculations).toEqual(['Full']);
    expect(file.settings.get(COMPUTED_WITH_KEY)).not.toBe(older);
    expect(file.settings.get(COMPUTED_WITH_KEY)).toBe(globalThis.cellwrightFunctionsHost!.status().checksum);
    expect(await cell(STDPOTENTIAL, 'Cu2+/Cu')).toBe(cuBuiltin);
  });

  it("the workbook's own table edited elsewhere since the last recalculation: recalculated once", async () => {
    const file = new WorkbookFile({ [TABLE_SETTING_KEY]: storedWithCu(0.36, 2), [COMPUTED_WITH_KEY]: checksumOf(storedWithCu(0.35, 1)) });
    const { STDPOTENTIAL } = await open(file);
    expect(file.calculations).toEqual(['Full']);
    expect(file.settings.get(COMPUTED_WITH_KEY)).toBe(checksumOf(storedWithCu(0.36, 2)));
    expect(await cell(STDPOTENTIAL, 'Cu2+/Cu')).toBe(0.36);
  });

  it('a table that has become unreadable: recalculated once so the cells show #N/A, and "unreadable" recorded', async () => {
    const damaged = storedWithCu(0.35).replace('"e0":0.35', '"e0":0.36');
    const file = new WorkbookFile({ [TABLE_SETTING_KEY]: damaged, [COMPUTED_WITH_KEY]: checksumOf(storedWithCu(0.35)) });
    await open(file);
    expect(file.calculations).toEqual(['Full']);
    expect(file.settings.get(COMPUTED_WITH_KEY)).toBe('unreadable');
    expect(file.settings.get(TABLE_SETTING_KEY)).toBe(damaged); // never written over
    file.settingsChangedHandlers.length = 0;
    await open(file);
    expect(file.calculations).toEqual(['Full']);
  });
});

describe('the production bundle dist/functions.js in node:vm', () => {
  it('is built (npm test builds it first)', () => {
    expect(existsSync(resolve(__dirname, '../../dist/functions.js'))).toBe(true);
  });
  it('with Office and Excel present it waits for the workbook table and offers the channel', async () => {
    const file = new WorkbookFile({ [TABLE_SETTING_KEY]: storedWithCu(0.35) });
    const b = loadBundle({ Office: officeFor('Excel'), Excel: excelFor(file), setTimeout, clearTimeout, console });
    const r = b.call('STDPOTENTIAL', [['Cu2+/Cu']]);
    expect(typeof (r as { then?: unknown }).then).toBe('function'); // a promise of the sandbox: the cell waits
    expect(((await r) as unknown[][])[0][0]).toBe(0.35);
    const host = b.sandbox.cellwrightFunctionsHost as { useStoredValue(v: unknown): { state: string }; status(): { state: string } };
    expect(host.status().state).toBe('workbook');
    expect(host.useStoredValue(null).state).toBe('builtin');
    expect((b.call('STDPOTENTIAL', [['Cu2+/Cu']]) as unknown[][])[0][0]).toBe(cuBuiltin);
    expect(host.useStoredValue('not ours').state).toBe('unreadable');
    const na = (b.call('STDPOTENTIAL', [['Cu2+/Cu']]) as unknown[][])[0][0] as { code: string; message: string };
    expect(na.code).toBe('#N/A');
    expect(host.useStoredValue(writeStoredText({ ...pinnedCopy(B), revision: 4, changedAt: '2026-01-01T00:00:00.000Z' })).state).toBe('workbook');
  });
  it('with only CustomFunctions present it registers the functions and answers from the built-in table', () => {
    const b = loadBundle();
    expect(b.sandbox.cellwrightFunctionsHost).toBeUndefined();
    expect((b.call('STDPOTENTIAL', [['Cu2+/Cu']]) as unknown[][])[0][0]).toBe(cuBuiltin);
  });
});
