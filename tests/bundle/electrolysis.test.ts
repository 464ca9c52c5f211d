/**
 * The production bundle (node:vm, only a CustomFunctions global): the electrolysis family and the
 * GASVOLUME argument order, on scalars, ranges, omitted arguments and error cells.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { type LoadedBundle, isError, loadBundle, one } from './harness';

let b: LoadedBundle;
beforeAll(() => {
  b = loadBundle();
});
const call = async (id: string, ...args: unknown[]) => (await b.call(id, ...args)) as unknown[][];
const F = 96485.33212; // CODATA 2018
const VM0 = 0.02241396954; // m³/mol at 0 °C, 101.325 kPa: CODATA 2018

describe('GASVOLUME: efficiency right after the required arguments', () => {
  it('GASVOLUME(10000, 1, 2, 0.98) reads 0.98 as the efficiency (25 °C, 1 bar)', async () => {
    const v = one(await call('GASVOLUME', 10000, 1, 2, 0.98)) as number;
    // 10 kA·h × 0.98 / (2F) mol × R·298.15 K / 1 bar (ideal gas)
    expect(v).toBeCloseTo(((10000 * 3600 * 0.98) / (2 * F)) * 8.314462618 * 298.15 / 1e5 * 1000, 6);
  });
  it('saturated TRUE adds the water vapour; FALSE, empty and omitted are dry', async () => {
    const dry = one(await call('GASVOLUME', 1000, 1, 2, 1, 80, 1.01325, false)) as number;
    expect(one(await call('GASVOLUME', 1000, 1, 2, 1, 80, 1.01325, null))).toBe(dry);
    const wet = one(await call('GASVOLUME', 1000, 1, 2, 1, 80, 1.01325, true)) as number;
    expect(wet / dry).toBeCloseTo(1.01325 / (1.01325 - 0.47414), 3); // p_w(80 °C) 47.41 kPa, steam tables, from memory
    expect(one(await call('GASVOLUME', 1000, 1, 2, 1, 80, 1.01325, 'TRUE'))).toBe(wet);
  });
  it('saturated at the boiling point, or not a logical value, is #VALUE! with a message', async () => {
    const r = one(await call('GASVOLUME', 1, 1, 2, 1, 100, 1, true));
    expect(isError(r, '#VALUE!')).toBe(true);
    expect((r as { message: string }).message).toMatch(/boils/);
    const s = one(await call('GASVOLUME', 1, 1, 2, 1, 25, 1, 'wet'));
    expect(isError(s, '#VALUE!')).toBe(true);
    expect((s as { message: string }).message).toMatch(/TRUE or FALSE/);
  });
});

describe('CONDUCTIVITY, BRUGGEMAN, OHMICDROP', () => {
  it('KOH by Gilliam et al. 2007 over a column of temperatures; outside 0–100 °C is #VALUE! naming the range', async () => {
    const r = await call('CONDUCTIVITY', 'KOH', 6.9, [[25], [80], [120]]);
    expect(r[0][0]).toBeCloseTo(62.1, 1); // ≈ 0.62 S/cm for 30 wt % KOH at 25 °C, from memory
    expect(r[1][0]).toBeCloseTo(138.6, 1);
    expect(isError(r[2][0], '#VALUE!')).toBe(true);
    expect((r[2][0] as { message: string }).message).toMatch(/0–100 °C/);
    expect(isError(one(await call('CONDUCTIVITY', 'NaCl', 1, null)), '#N/A')).toBe(true);
  });
  it('says what to change: a mass percentage typed for mol/L, a negative concentration, an electrolyte without a correlation', async () => {
    const pct = one(await call('CONDUCTIVITY', 'KOH', 30, 80)) as { code: string; message: string };
    expect(pct.code).toBe('#VALUE!');
    expect(pct.message).toBe("KOH concentration 30 mol/L is outside the correlation's range 0–12 mol/L (Gilliam et al. 2007); a mass percentage? the concentration is in mol per litre of solution");
    const neg = one(await call('CONDUCTIVITY', 'KOH', -1, 80)) as { code: string; message: string };
    expect(neg.code).toBe('#VALUE!');
    expect(neg.message).toBe('concentration_mol_L must be ≥ 0; got -1');
    const naoh = one(await call('CONDUCTIVITY', 'NaOH', 2, 80)) as { code: string; message: string };
    expect(naoh.code).toBe('#N/A');
    expect(naoh.message).toMatch(/no conductivity correlation for "NaOH"; available: KOH, H2SO4; .*OHMICDROP or CELLVOLTAGE/);
  });
  it('H2SO4 by Gu, Wang & Liaw 1997 over a row of concentrations at 25 °C; another temperature or a dilute acid is #VALUE! naming the range', async () => {
    const r = await call('CONDUCTIVITY', 'H2SO4', [[1, 1.84, 5.65]], null);
    // κ = c·exp(6.23 − 1.34e-4·c − 1.61e-8·c²)·1e-4 S/m, c in mol/m³ (Gu et al. 1997)
    const gu = (c: number) => c * 1000 * Math.exp(6.23 - 1.34e-4 * c * 1000 - 1.61e-8 * (c * 1000) ** 2) * 1e-4;
    expect(r[0].map((x) => Number((x as number).toFixed(9)))).toEqual([1, 1.84, 5.65].map((c) => Number(gu(c).toFixed(9))));
    const hot = one(await call('CONDUCTIVITY', 'H2SO4', 1.84, 50)) as { code: string; message: string };
    expect(hot.code).toBe('#VALUE!');
    expect(hot.message).toBe('temperature 50 °C: the H2SO4 correlation (Gu, Wang & Liaw 1997) has no temperature term and holds at 25 °C only');
    const dilute = one(await call('CONDUCTIVITY', 'h2so4', 0.5, 25)) as { code: string; message: string };
    expect(dilute.code).toBe('#VALUE!');
    expect(dilute.message).toMatch(/^H2SO4 concentration 0\.5 mol\/L is outside the correlation's range 1–6 mol\/L/);
  });
  it('BRUGGEMAN and OHMICDROP with a gas fraction', async () => {
    expect(one(await call('BRUGGEMAN', 100, 0.2))).toBeCloseTo(71.554, 3); // 100 × 0.8^1.5
    expect(one(await call('OHMICDROP', 3000, 2, 100, null))).toBeCloseTo(0.06, 12); // j·d/κ
    const r = await call('OHMICDROP', 3000, 2, 100, [[0, 0.1, 0.3]]);
    expect(r[0].map((x) => Number((x as number).toFixed(6)))).toEqual([0.06, Number((0.06 / 0.9 ** 1.5).toFixed(6)), Number((0.06 / 0.7 ** 1.5).toFixed(6))]);
    const pct = one(await call('OHMICDROP', 3000, 2, 100, 20));
    expect(isError(pct, '#VALUE!')).toBe(true);
    expect((pct as { message: string }).message).toMatch(/percentage/);
  });
});

describe('CELLVOLTAGE', () => {
  const args = [1.18, 3000, 1e-3, 1.5, 1, 0.5, 2, 100, null, 0.01, 0.02, null, null, 80];
  it('spills seven parts and their sum; header TRUE puts labels on top', async () => {
    const r = await call('CELLVOLTAGE', ...args, null);
    expect(r).toHaveLength(1);
    expect(r[0]).toHaveLength(7);
    expect(r[0][0]).toBe(1.18);
    expect(r[0][3]).toBeCloseTo(0.06, 12);
    expect(r[0][6]).toBeCloseTo((r[0].slice(0, 6) as number[]).reduce((s, x) => s + x, 0), 12);
    const h = await call('CELLVOLTAGE', ...args, true);
    expect(h).toHaveLength(2);
    expect(h[0][0]).toBe('Reversible voltage (V)');
    expect(h[0][6]).toBe('Cell voltage (V)');
    expect(h[1]).toEqual(r[0]);
  });
  it('the anode part is the Tafel line at j ≫ i0: (RT/αF)·ln(j/i0)', async () => {
    const r = await call('CELLVOLTAGE', ...args, null);
    const b80 = (8.314462618 * 353.15) / F;
    expect(r[0][1]).toBeCloseTo((b80 / 1.5) * Math.log(3000 / 1e-3), 9); // Tafel equation, Bard & Faulkner eq. 3.4.12
  });
  it('a column of current densities gives one row each, under one header', async () => {
    const a: unknown[] = args.slice();
    a[1] = [[1000], [2000], [3000]];
    const r = await call('CELLVOLTAGE', ...a, true);
    expect(r).toHaveLength(4);
    expect(r[3]).toEqual((await call('CELLVOLTAGE', ...args, null))[0]);
    expect((r[1][6] as number) < (r[2][6] as number)).toBe(true);
  });
  it('a current at the cathode limiting current is #VALUE! across the row; a header range is #VALUE!', async () => {
    const a: unknown[] = args.slice();
    a[12] = 3000;
    const r = await call('CELLVOLTAGE', ...a, null);
    expect(r[0].every((x) => isError(x, '#VALUE!'))).toBe(true);
    expect(isError(one(await call('CELLVOLTAGE', ...args, [[true, false]])), '#VALUE!')).toBe(true);
  });
});

describe('DECOMPOSITIONVOLTAGE, VOLTAGEEFFICIENCY, CELLHEAT', () => {
  it('zinc electrowinning and water: positive decomposition voltages, the EMF with its sign reversed', async () => {
    // Built-in rows Zn2+/Zn −0.7628 V (MINTEQA2 v4) and O2/H2O 1.2292 V (Thermoddem V1.10), as cited in data/couples.json
    expect(one(await call('DECOMPOSITIONVOLTAGE', 'Zn2+/Zn', 'O2/H2O', null))).toBeCloseTo(1.992, 4);
    const emf = one(await call('EMF', 'H2O/H2', 'O2/OH-', null)) as number; // electrolysis as written: negative
    expect(emf).toBeLessThan(0);
    expect(one(await call('DECOMPOSITIONVOLTAGE', 'H2O/H2', 'O2/OH-', null))).toBeCloseTo(-emf, 12);
    expect(isError(one(await call('DECOMPOSITIONVOLTAGE', 'Xx2+/Xx', 'O2/H2O', null)), '#N/A')).toBe(true);
  });
  it('efficiency on HHV (1.4812 V) and LHV (1.2532 V), or against a number', async () => {
    const r = await call('VOLTAGEEFFICIENCY', [[1.8], [2.0]], [['HHV', 'LHV', 1.6]]);
    expect(r[0][0]).toBeCloseTo(1.48121 / 1.8, 5); // −ΔfH°(H2O,l)/2F, CODATA Key Values
    expect(r[1][1]).toBeCloseTo(1.25317 / 2.0, 5); // −ΔfH°(H2O,g)/2F
    expect(r[1][2]).toBeCloseTo(0.8, 12);
    expect(one(await call('VOLTAGEEFFICIENCY', 1.9, null))).toBeCloseTo(1.48121 / 1.9, 5);
    expect(isError(one(await call('VOLTAGEEFFICIENCY', 1.9, 'GCV')), '#N/A')).toBe(true);
  });
  it('CELLHEAT: N·I·(U − U_tn) in W', async () => {
    expect(one(await call('CELLHEAT', 100, 5000, 1.9, 1.481))).toBeCloseTo(209500, 6);
  });
});

describe('gas in normal m³', () => {
  it('GASFLOW on the three references; the reference is named, unknown ones are #N/A', async () => {
    const r = await call('GASFLOW', 1000, 2, null, null, [['0C', '15C', '20C']]);
    expect(r[0][0]).toBeCloseTo(((1000 * 3600) / (2 * F)) * VM0, 9); // 0.41815 Nm³/h per kA
    expect(r[0][1]).toBeCloseTo((r[0][0] as number) * (288.15 / 273.15), 9); // ideal gas law
    expect(r[0][2]).toBeCloseTo((r[0][0] as number) * (293.15 / 273.15), 9);
    expect(isError(one(await call('GASFLOW', 1000, 2, null, null, 'STP')), '#N/A')).toBe(true);
  });
  it('CURRENTFORGAS and CELLSFORGAS invert GASFLOW', async () => {
    const I = one(await call('CURRENTFORGAS', 100, 2, 0.98, 100, null)) as number;
    expect(one(await call('GASFLOW', I, 2, 0.98, 100, null))).toBeCloseTo(100, 9);
    expect(one(await call('CELLSFORGAS', 100, 2500, 2, null, null))).toBe(96); // 100/(2.5 × 0.41815) = 95.65
  });
  it('GASENERGY: 4.30 kWh/Nm³ of H2 at 1.8 V', async () => {
    expect(one(await call('GASENERGY', 1.8, 2, null, null))).toBeCloseTo((1.8 * 2 * F) / VM0 / 3.6e6, 8);
  });
  it('H2INAIR: fraction and share of the 4 vol % LFL (Zabetakis 1965), a row per input', async () => {
    expect(await call('H2INAIR', 1, 99, null)).toEqual([[0.01, 0.25]]);
    const r = await call('H2INAIR', [[1], [2]], 98, 2);
    expect(r[1][0]).toBeCloseTo(0.02, 12);
    expect(r[1][1]).toBeCloseTo(1, 12);
  });
  it('WATERVAPOR: IF97 check value at 300 K', async () => {
    expect(one(await call('WATERVAPOR', 26.85))).toBeCloseTo(0.0353658941, 9); // IAPWS IF97-Rev Table 35
  });
});

describe('GASEFFICIENCY', () => {
  it('a metered dry flow over the flow at 100 %; an impossible flow is #VALUE!', async () => {
    expect(one(await call('GASEFFICIENCY', 40.98, 1000, 2, 100, null))).toBeCloseTo(40.98 / ((100 * 1000 * 3600) / (2 * F) * VM0), 9);
    const r = await call('GASEFFICIENCY', [[40], [60]], 1000, 2, 100, null);
    expect(r[0][0]).toBeCloseTo(40 / 41.815, 4);
    expect(isError(r[1][0], '#VALUE!')).toBe(true);
  });
});
