/**
 * One ordering of table installs in the functions runtime: a read is ordered by when it starts, a
 * value the pane hands over by when it is handed over, and the later one wins, whatever order the
 * answers arrive in. The table in use and the status (state, revision, checksum) always describe the
 * same stored value.
 *
 * The start-up read and a settings-changed read are interleaved with a pane handover at every step:
 * the handover is made after k microtask turns, for every k from 0 until the read has settled.
 */
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { TABLE_SETTING_KEY } from '../../workbook/store';
import { applyChange } from '../../src/store/copy';
import { builtinChecksum, forgetLastRead, readStoredText, writeStoredText } from '../../src/store/stored';
import { builtin } from '../store/fixtures';
import { FakeCfError, WorkbookFile, customFunctionsGlobal, excelFor, officeFor } from './mockExcel';

const B = builtin();
const g = globalThis as Record<string, unknown>;

function storedWithCu(e0: number, revision: number): string {
  const copy = applyChange(null, B, { kind: 'put', rowKind: 'couple', originalKey: 'Cu2+/Cu', record: { ...B.couples.find((c) => c.key === 'Cu2+/Cu')!, e0, source: 'workbook' } });
  return writeStoredText({ ...copy, revision, changedAt: '2026-01-01T00:00:00Z' });
}
function checksumOf(text: string): string {
  const r = readStoredText(text, B);
  if (!r.ok) throw new Error('test value does not read');
  return r.checksum;
}

type Fn = (...a: unknown[]) => unknown;
async function startRuntime(): Promise<{ STDPOTENTIAL: Fn; context: typeof import('../../functions/context') }> {
  vi.resetModules();
  forgetLastRead();
  await import('../../functions/runtime');
  const table = await import('../../functions/families/table');
  const context = await import('../../functions/context');
  return { STDPOTENTIAL: table.STDPOTENTIAL as unknown as Fn, context };
}
async function cu(STDPOTENTIAL: Fn): Promise<unknown> {
  return ((await STDPOTENTIAL([['Cu2+/Cu']], null)) as unknown[][])[0][0];
}
async function turns(k: number): Promise<void> {
  for (let i = 0; i < k; i++) await Promise.resolve();
}

/** The table in use and the status describe the same value: `expected` (a stored text, or null for the built-in table). */
async function expectConsistent(STDPOTENTIAL: Fn, expected: string | null, e0: number): Promise<void> {
  const st = globalThis.cellwrightFunctionsHost!.status();
  expect(await cu(STDPOTENTIAL)).toBe(e0);
  if (expected === null) {
    expect(st.state).toBe('builtin');
    expect(st.checksum).toBe(builtinChecksum(B));
  } else {
    expect(st.state).toBe('workbook');
    expect(st.checksum).toBe(checksumOf(expected));
  }
}

beforeEach(() => {
  g.CustomFunctions = customFunctionsGlobal;
});
afterEach(() => {
  delete g.Office;
  delete g.Excel;
  delete globalThis.cellwrightFunctionsHost;
});

const cuBuiltin = B.couples.find((c) => c.key === 'Cu2+/Cu')!.e0;
const MAX_TURNS = 30;

describe('start-up read against a pane handover, interleaved at every step', () => {
  for (const [name, paneValue, paneE0] of [
    ['the pane resets to the built-in table', null, cuBuiltin],
    ['the pane hands over a newer workbook table', storedWithCu(0.36, 2), 0.36],
  ] as const) {
    it(`${name}: the handover, made after the read started, wins at every step; status and table agree`, async () => {
      let settledAt = -1;
      for (let k = 0; k <= MAX_TURNS; k++) {
        const file = new WorkbookFile({ [TABLE_SETTING_KEY]: storedWithCu(0.35, 1) });
        let open!: () => void;
        file.gate = new Promise<void>((r) => (open = r));
        g.Office = officeFor('Excel');
        g.Excel = excelFor(file);
        const { STDPOTENTIAL, context } = await startRuntime();
        const host = globalThis.cellwrightFunctionsHost!;
        open();
        await turns(k);
        const pendingBefore = context.tablePending() !== null;
        host.useStoredValue(paneValue);
        await context.tablePending();
        await turns(MAX_TURNS);
        await expectConsistent(STDPOTENTIAL, paneValue, paneE0);
        if (!pendingBefore && settledAt < 0) settledAt = k;
      }
      // The loop covered the whole read: from before its answer to after its install.
      expect(settledAt).toBeGreaterThan(0);
    });
  }

  it('without a handover the start-up read is installed, with a matching status', async () => {
    const value = storedWithCu(0.35, 1);
    const file = new WorkbookFile({ [TABLE_SETTING_KEY]: value });
    g.Office = officeFor('Excel');
    g.Excel = excelFor(file);
    const { STDPOTENTIAL } = await startRuntime();
    await expectConsistent(STDPOTENTIAL, value, 0.35);
  });
});

describe('a settings-changed read against a pane handover, interleaved at every step', () => {
  it('a handover made after the changed read started wins; one made before it loses to the read', async () => {
    const first = storedWithCu(0.35, 1);
    const file = new WorkbookFile({ [TABLE_SETTING_KEY]: first });
    g.Office = officeFor('Excel');
    g.Excel = excelFor(file);
    const { STDPOTENTIAL } = await startRuntime();
    expect(await cu(STDPOTENTIAL)).toBe(0.35);
    await vi.waitFor(() => expect(file.settingsChangedHandlers.length).toBe(1));
    const host = globalThis.cellwrightFunctionsHost!;
    let revision = 2;
    for (let k = 0; k <= MAX_TURNS; k++) {
      for (const order of ['handover after the read started', 'handover before the read started'] as const) {
        const coAuthor = storedWithCu(0.37, revision++);
        const pane = storedWithCu(0.38, revision++);
        host.useStoredValue(first);
        file.settings.set(TABLE_SETTING_KEY, coAuthor);
        let event: Promise<unknown>;
        if (order === 'handover before the read started') {
          host.useStoredValue(pane);
          await turns(k);
          event = Promise.resolve(file.settingsChangedHandlers[0]({ type: 'SettingsChanged' }));
        } else {
          event = Promise.resolve(file.settingsChangedHandlers[0]({ type: 'SettingsChanged' }));
          await turns(k);
          host.useStoredValue(pane);
        }
        await event;
        await turns(MAX_TURNS);
        if (order === 'handover after the read started') await expectConsistent(STDPOTENTIAL, pane, 0.38);
        else await expectConsistent(STDPOTENTIAL, coAuthor, 0.37);
      }
    }
  });

  it('a changed value that cannot be read makes look-ups answer #N/A (never the previous table), and a failed read does too', async () => {
    const file = new WorkbookFile({ [TABLE_SETTING_KEY]: storedWithCu(0.35, 1) });
    g.Office = officeFor('Excel');
    g.Excel = excelFor(file);
    const { STDPOTENTIAL } = await startRuntime();
    expect(await cu(STDPOTENTIAL)).toBe(0.35);
    await vi.waitFor(() => expect(file.settingsChangedHandlers.length).toBe(1));
    const before = file.calculations.length; // the start-up recalculation of a workbook with nothing recorded
    // A co-author's table holding a number beyond double range.
    file.settings.set(TABLE_SETTING_KEY, storedWithCu(0.37, 2).replace('"e0":0.37', '"e0":1e999'));
    await file.settingsChangedHandlers[0]({ type: 'SettingsChanged' });
    let v = (await cu(STDPOTENTIAL)) as FakeCfError;
    expect(v).toBeInstanceOf(FakeCfError);
    expect(v.code).toBe('#N/A');
    expect(globalThis.cellwrightFunctionsHost!.status().state).toBe('unreadable');
    expect(file.calculations.slice(before)).toEqual(['Full']);

    // Back to a readable table, then a read of the changed setting that fails.
    file.settings.set(TABLE_SETTING_KEY, storedWithCu(0.39, 3));
    await file.settingsChangedHandlers[0]({ type: 'SettingsChanged' });
    expect(await cu(STDPOTENTIAL)).toBe(0.39);
    const run = (g.Excel as { run: unknown }).run;
    (g.Excel as { run: unknown }).run = async () => Promise.reject(new Error('GeneralException'));
    await file.settingsChangedHandlers[0]({ type: 'SettingsChanged' });
    (g.Excel as { run: unknown }).run = run;
    v = (await cu(STDPOTENTIAL)) as FakeCfError;
    expect(v).toBeInstanceOf(FakeCfError);
    expect(v.message).toMatch(/GeneralException/);
  });
});
