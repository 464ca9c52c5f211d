/**
 * The pane's model of the pinned data (taskpane/dataModel.ts) on a workbook mocked with
 * office-addin-mock, with the real functions and channel: pin, read back, a pinned part whose
 * built-in counterpart changed, an unreadable value (refused, never written over, removed only
 * explicitly and only when unchanged), and a conflict with another pane.
 */
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { MOLARMASS } from '../../functions/families/faraday';
import { installFunctionsHost, usePinnedValue, useStoredValue } from '../../functions/workbookHost';
import { BUILTIN_PARTS, DATASET_VERSION } from '../../src/dataset/parts';
import { writePinnedText } from '../../src/dataset/pinned';
import { PinnedDataModel } from '../../taskpane/dataModel';
import { COMPUTED_WITH_DATA_KEY, PINNED_DATA_KEY } from '../../workbook/pinnedData';
import { FakeCfError, WorkbookFile, customFunctionsGlobal, excelFor } from './mockExcel';

const g = globalThis as Record<string, unknown>;
let file: WorkbookFile;

const model = () => new PinnedDataModel({ host: () => globalThis.cellwrightFunctionsHost, now: () => new Date('2026-03-04T05:06:07Z') });

/** What =CELLWRIGHT.MOLARMASS("Ni") shows now. */
async function ni(): Promise<unknown> {
  return ((await MOLARMASS([['Ni']])) as unknown[][])[0][0];
}

/** Pinned data from an older add-in in which nickel weighed 58.6934 g/mol (an earlier IUPAC value, from memory). */
function olderPinned(): string {
  const aw = JSON.parse(JSON.stringify(BUILTIN_PARTS.atomicweights)) as typeof BUILTIN_PARTS.atomicweights;
  aw.elements.find((e) => e.symbol === 'Ni')!.atomicWeight = 58.6934;
  return writePinnedText({ version: '2025.1', pinnedAt: '2025-05-05T00:00:00.000Z', parts: { ...BUILTIN_PARTS, atomicweights: aw } });
}

beforeEach(() => {
  file = new WorkbookFile();
  g.Excel = excelFor(file);
  g.CustomFunctions = customFunctionsGlobal;
  installFunctionsHost();
  useStoredValue(null);
  usePinnedValue(null);
});
afterEach(() => {
  delete g.Excel;
  delete globalThis.cellwrightFunctionsHost;
});

describe('pinned data through the pane', () => {
  it('pins every part, hands it to the functions, recalculates once and records the data; a new pane reads it back', async () => {
    const a = model();
    await a.load();
    expect(a.state.kind).toBe('none');
    const r = await a.pin();
    expect(r.kind).toBe('done');
    expect(file.calculations).toEqual(['Full']);
    const stored = file.settings.get(PINNED_DATA_KEY) as string;
    expect(JSON.parse(stored)).toMatchObject({ format: 'cellwright.pinned-data', schema: 1, version: DATASET_VERSION, pinnedAt: '2026-03-04T05:06:07.000Z' });
    expect(file.settings.get(COMPUTED_WITH_DATA_KEY)).toBe(globalThis.cellwrightFunctionsHost!.status().dataChecksum);
    expect(globalThis.cellwrightFunctionsHost!.status().dataset?.pinned).toHaveLength(9);
    const b = model();
    await b.load();
    expect(b.state.kind).toBe('readable');
    expect(b.pinned?.parts.atomicweights).toEqual(BUILTIN_PARTS.atomicweights);
    expect(b.notice()).toBeNull(); // pinned = built-in: nothing to update
    expect(file.calculations).toEqual(['Full']); // opening the pane recalculates nothing
  });

  it('older pinned data: the functions keep its values; the notice names the changed weight; updating takes the built-in one', async () => {
    file.settings.set(PINNED_DATA_KEY, olderPinned());
    const a = model();
    await a.load();
    expect(await ni()).toBe(58.6934);
    const n = a.notice();
    expect(n).toMatchObject({ pinnedVersion: '2025.1', builtinVersion: DATASET_VERSION, addinIsNewer: true });
    expect(n?.changes.map((c) => c.name)).toEqual(['atomicweights']);
    expect(n?.changes[0].changed).toContainEqual({ where: 'Ni: atomicWeight', before: 58.6934, after: 58.693 });
    expect((await a.pin()).kind).toBe('done');
    expect(await ni()).toBe(58.693); // IUPAC CIAAW 2021 abridged (data/atomic-weights.json)
    expect(a.notice()).toBeNull();
  });

  it('unreadable pinned data: functions answer #N/A, pinning is refused and changes nothing; removal needs the same value', async () => {
    const damaged = olderPinned().replace('"atomicWeight":58.6934', '"atomicWeight":58.69');
    file.settings.set(PINNED_DATA_KEY, damaged);
    const a = model();
    await a.load();
    expect(a.state.kind).toBe('unreadable');
    const v = (await ni()) as FakeCfError;
    expect(v.code).toBe('#N/A');
    expect(v.message).toMatch(/pinned data set could not be read: the checksum of the pinned part "Atomic weights"/);
    expect((await a.pin()).kind).toBe('refused');
    expect(file.settings.get(PINNED_DATA_KEY)).toBe(damaged);
    // Repaired elsewhere in the meantime: the removal names the value it saw, so the repair is kept.
    file.settings.set(PINNED_DATA_KEY, olderPinned());
    expect((await a.remove()).kind).toBe('refused');
    expect(file.settings.get(PINNED_DATA_KEY)).toBe(olderPinned());
    expect(a.state.kind).toBe('readable');
    expect((await a.remove()).kind).toBe('done');
    expect(file.settings.has(PINNED_DATA_KEY)).toBe(false);
    expect(await ni()).toBe(58.693);
  });
});
