/**
 * The workbook's pinned data (settings key cellwright.pinnedData) in the functions runtime, with Office
 * and Excel mocked: read with the table at start-up, used by every function that reads reference data,
 * refused whole when damaged (#N/A with the reason, nothing written over), followed when changed
 * elsewhere or handed over by the pane; and a plating result that stays put in a pinned workbook when
 * the add-in's built-in atomic weights change, while an unpinned workbook follows them.
 */
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import atomicWeights from '../../data/atomic-weights.json';
import { AVOGADRO_PER_MOL, ELEMENTARY_CHARGE_C } from '../../src/constants';
import { builtinPartChecksums, partChecksum } from '../../src/dataset/checksum';
import { BUILTIN_PARTS, DATASET_VERSION } from '../../src/dataset/parts';
import { writePinnedText } from '../../src/dataset/pinned';
import { COMPUTED_WITH_DATA_KEY, PINNED_DATA_KEY } from '../../workbook/pinnedData';
import { COMPUTED_WITH_KEY, TABLE_SETTING_KEY } from '../../workbook/store';
import { FakeCfError, WorkbookFile, customFunctionsGlobal, excelFor, officeFor } from './mockExcel';

const g = globalThis as Record<string, unknown>;
type Fn = (...a: unknown[]) => unknown;

const PINNED = writePinnedText({ version: DATASET_VERSION, pinnedAt: '2026-01-05T10:00:00.000Z' });
const BUILTIN_DATA = partChecksum({ ...builtinPartChecksums() });

/**
 * Plating time of 25 µm of nickel at 4 A/dm² (n = 2, ρ = 8.908 g/cm³, efficiency 1) with molar mass M,
 * in min: Faraday's law t = d·ρ·n·F/(M·j) (common practice), F = N_A·e (CODATA 2018, exact).
 */
const plateMinutes = (M: number): number => (25e-4 * 8.908 * 2 * AVOGADRO_PER_MOL * ELEMENTARY_CHARGE_C) / (M * 0.04) / 60;
/** Ni 58.693 g/mol: IUPAC CIAAW 2021 abridged standard atomic weight (data/atomic-weights.json). */
const NI = 58.693;
/** The built-in weight as an earlier add-in could have had it: 58.6934 g/mol, an earlier IUPAC value (from memory); it stands for any change. */
const NI_CHANGED = 58.6934;

async function startRuntime(): Promise<{ PLATETIME: Fn; STDPOTENTIAL: Fn; MOLARMASS: Fn }> {
  await import('../../functions/runtime');
  const faraday = await import('../../functions/families/faraday');
  const table = await import('../../functions/families/table');
  return { PLATETIME: faraday.PLATETIME as unknown as Fn, MOLARMASS: faraday.MOLARMASS as unknown as Fn, STDPOTENTIAL: table.STDPOTENTIAL as unknown as Fn };
}

async function first(r: unknown): Promise<unknown> {
  return ((await r) as unknown[][])[0][0];
}

const plate = (fns: { PLATETIME: Fn }) => first(fns.PLATETIME([[25]], [[4]], [['Ni']], [[2]], [[8.908]], null));

async function open(file: WorkbookFile) {
  g.Office = officeFor('Excel');
  g.Excel = excelFor(file);
  const fns = await startRuntime();
  await vi.waitFor(() => expect(file.settingsChangedHandlers.length).toBeGreaterThan(0));
  return fns;
}

beforeEach(() => {
  vi.resetModules();
  g.CustomFunctions = customFunctionsGlobal;
});
afterEach(() => {
  vi.doUnmock('../../data/atomic-weights.json');
  delete g.Office;
  delete g.Excel;
  delete globalThis.cellwrightFunctionsHost;
});

describe('pinned data in the functions runtime', () => {
  it('the built-in Ni weight is the one the test expects', () => {
    expect(atomicWeights.elements.find((e) => e.symbol === 'Ni')?.atomicWeight).toBe(NI);
  });

  it('a workbook without pinned data (saved before it existed) reads as before: the built-in data, only the record is added', async () => {
    const file = new WorkbookFile();
    const fns = await open(file);
    expect(await plate(fns)).toBeCloseTo(plateMinutes(NI), 9);
    const st = globalThis.cellwrightFunctionsHost!.status();
    expect(st.state).toBe('builtin');
    expect(st.dataset?.pinned).toEqual([]);
    expect(st.dataChecksum).toBe(BUILTIN_DATA);
    expect(file.settings.has(PINNED_DATA_KEY)).toBe(false);
    expect(file.settings.get(COMPUTED_WITH_DATA_KEY)).toBe(BUILTIN_DATA);
  });

  it('PLATETIME in a pinned workbook does not change when the built-in atomic weights change; in an unpinned one it does', async () => {
    const modified = JSON.parse(JSON.stringify(atomicWeights)) as typeof atomicWeights;
    modified.elements.find((e) => e.symbol === 'Ni')!.atomicWeight = NI_CHANGED;
    vi.doMock('../../data/atomic-weights.json', () => ({ default: modified }));

    const unpinned = new WorkbookFile({ [COMPUTED_WITH_DATA_KEY]: BUILTIN_DATA });
    const a = await open(unpinned);
    expect(await plate(a)).toBeCloseTo(plateMinutes(NI_CHANGED), 9);
    // The results were computed with the earlier built-in data: recalculated once, the new data recorded.
    expect(unpinned.calculations).toEqual(['Full']);
    expect(unpinned.settings.get(COMPUTED_WITH_DATA_KEY)).not.toBe(BUILTIN_DATA);

    vi.resetModules();
    delete globalThis.cellwrightFunctionsHost;
    const pinned = new WorkbookFile({ [PINNED_DATA_KEY]: PINNED });
    const b = await open(pinned);
    expect(await plate(b)).toBeCloseTo(plateMinutes(NI), 9);
    expect(await first(b.MOLARMASS([['NiSO4·6H2O']]))).toBeCloseTo(NI + 32.06 + 10 * 15.999 + 12 * 1.008, 9); // IUPAC 2021 abridged S, O, H
    expect(globalThis.cellwrightFunctionsHost!.status().dataset?.pinned).toContain('atomicweights');
    expect(pinned.settings.get(PINNED_DATA_KEY)).toBe(PINNED);
  });

  it('a damaged pinned part makes the workbook unreadable: #N/A with the reason for data and table look-ups, nothing written over', async () => {
    const damaged = PINNED.replace('"atomicWeight":58.693', '"atomicWeight":58.7');
    expect(damaged).not.toBe(PINNED);
    const file = new WorkbookFile({ [PINNED_DATA_KEY]: damaged });
    const fns = await open(file);
    const v = (await plate(fns)) as FakeCfError;
    expect(v).toBeInstanceOf(FakeCfError);
    expect(v.code).toBe('#N/A');
    expect(v.message).toMatch(/pinned data set could not be read: the checksum of the pinned part "Atomic weights" does not match its content/);
    const t = (await first(fns.STDPOTENTIAL([['Cu2+/Cu']], null))) as FakeCfError;
    expect(t.code).toBe('#N/A');
    expect(t.message).toMatch(/pinned data set could not be read/);
    expect(globalThis.cellwrightFunctionsHost!.status().state).toBe('unreadable');
    expect(file.settings.get(PINNED_DATA_KEY)).toBe(damaged);
    expect(file.settings.get(COMPUTED_WITH_DATA_KEY)).toBe('unreadable');
    expect(file.settings.get(COMPUTED_WITH_KEY)).toBe('unreadable');
  });

  it('data pinned by an earlier add-in version that predates a field: the pinned values hold, the new field comes from the built-in data', async () => {
    const el = JSON.parse(JSON.stringify(BUILTIN_PARTS.electrolysis)) as { conductivity: Record<string, unknown> };
    delete el.conductivity.H2SO4;
    const aw = JSON.parse(JSON.stringify(BUILTIN_PARTS.atomicweights)) as typeof atomicWeights;
    aw.elements.find((e) => e.symbol === 'Ni')!.atomicWeight = NI_CHANGED;
    const older = writePinnedText({ version: '2025.1', pinnedAt: '2025-06-01T00:00:00.000Z', parts: { ...BUILTIN_PARTS, atomicweights: aw, electrolysis: el as unknown as typeof BUILTIN_PARTS.electrolysis } });
    const file = new WorkbookFile({ [PINNED_DATA_KEY]: older });
    const fns = await open(file);
    expect(await plate(fns)).toBeCloseTo(plateMinutes(NI_CHANGED), 9);
    const electrolysis = await import('../../functions/families/electrolysis');
    const kappa = await first((electrolysis.CONDUCTIVITY as unknown as Fn)([['H2SO4']], [[2]], [[25]]));
    // Gu, Wang & Liaw (1997): κ = c·exp(6.23 − 1.34e-4·c − 1.61e-8·c²)·1e-4 S/m, c in mol/m³
    expect(kappa).toBeCloseTo(2000 * Math.exp(6.23 - 1.34e-4 * 2000 - 1.61e-8 * 2000 ** 2) * 1e-4, 9);
    expect(globalThis.cellwrightFunctionsHost!.status().state).not.toBe('unreadable');
    expect(file.settings.get(PINNED_DATA_KEY)).toBe(older);
  });

  it('pinned data handed over by the pane, or changed elsewhere, is used at once', async () => {
    const file = new WorkbookFile();
    const fns = await open(file);
    const host = globalThis.cellwrightFunctionsHost!;
    expect(host.usePinnedValue?.(PINNED).dataset?.pinned).toEqual(['atomicweights', 'species', 'debyehuckel', 'water', 'electrolysis', 'units', 'anodes', 'cpcriteria', 'galvanicseries']);
    expect(await plate(fns)).toBeCloseTo(plateMinutes(NI), 9);
    // A co-author pins data with another nickel weight (resealed, as an older add-in would have written it).
    const aw = JSON.parse(JSON.stringify(BUILTIN_PARTS.atomicweights)) as typeof atomicWeights;
    aw.elements.find((e) => e.symbol === 'Ni')!.atomicWeight = 58.6934;
    file.settings.set(PINNED_DATA_KEY, writePinnedText({ version: '2025.1', pinnedAt: '2025-06-01T00:00:00.000Z', parts: { ...BUILTIN_PARTS, atomicweights: aw } }));
    await file.settingsChangedHandlers[0]({ type: 'SettingsChanged' });
    expect(await plate(fns)).toBeCloseTo(plateMinutes(58.6934), 9);
    expect(file.calculations.at(-1)).toBe('Full');
    expect(host.status().dataset?.version).toBe('2025.1');
    // Unpinned again: the built-in data.
    expect(host.usePinnedValue?.(null).dataset?.pinned).toEqual([]);
    expect(await plate(fns)).toBeCloseTo(plateMinutes(NI), 9);
    expect(file.settings.has(TABLE_SETTING_KEY)).toBe(false);
  });
});
