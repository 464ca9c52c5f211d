/**
 * The production bundle: WATERSPLITVOLTAGE, WATERTHERMONEUTRAL, ELECTROWINVOLTAGE and
 * ELECTROWINTHERMONEUTRAL on scalars, ranges, omitted arguments and error cells.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { type LoadedBundle, isError, loadBundle, one } from './harness';

let b: LoadedBundle;
beforeAll(() => {
  b = loadBundle();
});
const call = async (id: string, ...args: unknown[]) => (await b.call(id, ...args)) as unknown[][];
// F and R: CODATA 2018 exact products (src/constants.ts); species data: NBS 1982 tables (data/species.json)
const F = 96485.33212331001;
const R = 8.31446261815324;

describe('WATERSPLITVOLTAGE', () => {
  it('defaults: 25 °C, 1 bar, pure water → 2·237.129 kJ/mol / 4F = 1.22883 V', async () => {
    // NBS 1982: ΔfG°(H2O, l) = −237.129 kJ/mol
    expect(one(await call('WATERSPLITVOLTAGE'))).toBeCloseTo(237129 / (2 * F), 10);
  });
  it('pressure and water activity add (RT/2F)·ln(p^1.5/a_w)', async () => {
    const u80 = one(await call('WATERSPLITVOLTAGE', 80)) as number;
    const u = one(await call('WATERSPLITVOLTAGE', 80, 30, 0.7)) as number;
    expect(u - u80).toBeCloseTo(((R * 353.15) / (2 * F)) * (1.5 * Math.log(30) - Math.log(0.7)), 10);
  });
  it('a column of temperatures spills; outside 0–100 °C is #VALUE! naming the range', async () => {
    const r = await call('WATERSPLITVOLTAGE', [[25], [80], [120]]);
    expect(r[0][0]).toBeCloseTo(1.2288, 4);
    // reversible voltage of about 1.18 V at 80 °C: common practice for electrolyser sizing
    expect(r[1][0]).toBeCloseTo(1.18, 2);
    expect(isError(r[2][0], '#VALUE!')).toBe(true);
    expect(String((r[2][0] as { message?: string }).message)).toMatch(/between 0 and 100 °C/);
    expect(isError(one(await call('WATERSPLITVOLTAGE', 25, 0)), '#VALUE!')).toBe(true);
  });
});

describe('WATERTHERMONEUTRAL', () => {
  it('1.4812 V at 25 °C and about 9 mV lower at 80 °C', async () => {
    // NBS 1982: ΔfH°(H2O, l) = −285.830 kJ/mol; Cp° H2O(l) 75.291, H2 28.824, O2 29.355 J/(mol·K)
    const u25 = one(await call('WATERTHERMONEUTRAL')) as number;
    expect(u25).toBeCloseTo(285830 / (2 * F), 10);
    const u80 = one(await call('WATERTHERMONEUTRAL', 80)) as number;
    const dCp = 28.824 + 29.355 / 2 - 75.291;
    expect(u80).toBeCloseTo((285830 + dCp * 55) / (2 * F), 10);
    // "at 80 °C the thermoneutral voltage is about 9 mV below −ΔH(25 °C)/2F"
    expect((u25 - u80) * 1000).toBeCloseTo(9.06, 1);
  });
  it('lower-heating-value basis: water vapour, 1.2531 V at 25 °C and rising with temperature', async () => {
    // NBS 1982 (data/NBS_Tables.csv of the NIST digital edition, line 48): H2O(g) ΔfH° = −241.818 kJ/mol, Cp° 33.577 J/(mol·K)
    const l25 = one(await call('WATERTHERMONEUTRAL', 25, 'LHV')) as number;
    expect(l25).toBeCloseTo(241818 / (2 * F), 10);
    const l80 = one(await call('WATERTHERMONEUTRAL', 80, 'lhv')) as number;
    const dCpGas = 28.824 + 29.355 / 2 - 33.577;
    expect(l80).toBeCloseTo((241818 + dCpGas * 55) / (2 * F), 10);
    // the lower heating value of hydrogen, 241.8 kJ/mol, gives about 1.25 V: common practice
    expect(l25).toBeCloseTo(1.253, 3);
    expect(one(await call('WATERTHERMONEUTRAL', 60, 'HHV'))).toBe(one(await call('WATERTHERMONEUTRAL', 60)));
    const bad = one(await call('WATERTHERMONEUTRAL', 25, 'net'));
    expect(isError(bad, '#VALUE!')).toBe(true);
    expect(String((bad as { message?: string }).message)).toMatch(/HHV.*LHV/);
    const col = await call('WATERTHERMONEUTRAL', [[25], [80]], 'LHV');
    expect(col[0][0]).toBeCloseTo(l25, 12);
    expect(col[1][0]).toBeCloseTo(l80, 12);
  });
});

describe('ELECTROWINVOLTAGE and ELECTROWINTHERMONEUTRAL', () => {
  it('zinc at unit activities: (147.06 + 237.129) kJ/mol / 2F = 1.9909 V', async () => {
    // NBS 1982: ΔfG°(Zn2+, ao) = −147.06, ΔfG°(H2O, l) = −237.129 kJ/mol
    expect(one(await call('ELECTROWINVOLTAGE', 'Zn'))).toBeCloseTo((147060 + 237129) / (2 * F), 10);
    // the same as the table's acid oxygen and zinc couples (CRC E°): 1.229 + 0.7618 = 1.9908 V
    expect(Math.abs((one(await call('ELECTROWINVOLTAGE', 'zinc')) as number) - 1.9908)).toBeLessThan(1e-3);
  });
  it('activities: (RT/2F)·ln(p_O2^½·a_H²/(a_M·a_w))', async () => {
    const base = one(await call('ELECTROWINVOLTAGE', 'Zn', 38)) as number;
    const u = one(await call('ELECTROWINVOLTAGE', 'Zn', 38, 0.3, 0.5, 0.21, 0.9)) as number;
    expect(u - base).toBeCloseTo(((R * 311.15) / (2 * F)) * (0.5 * Math.log(0.21) + 2 * Math.log(0.5) - Math.log(0.3) - Math.log(0.9)), 10);
  });
  it('a row of metals spills; water and unknown names are #N/A', async () => {
    const r = await call('ELECTROWINVOLTAGE', [['Zn', 'Cu', 'Ni', 'H2O', 'Fe']]);
    // copper: (237.129 − 65.49)/2F; nickel: (237.129 + 45.6)/2F (NBS 1982 ΔfG°)
    expect(r[0][1]).toBeCloseTo((237129 - 65490) / (2 * F), 10);
    expect(r[0][2]).toBeCloseTo((237129 + 45600) / (2 * F), 10);
    expect(isError(r[0][3], '#N/A')).toBe(true);
    expect(isError(r[0][4], '#N/A')).toBe(true);
  });
  it('thermoneutral: zinc with ΔrCp, copper with ΔrCp = 0', async () => {
    // Zn2+ + H2O → Zn + 2H+ + ½O2: ΔrH = 153.89 + 285.83 kJ/mol (NBS 1982)
    expect(one(await call('ELECTROWINTHERMONEUTRAL', 'Zn'))).toBeCloseTo((153890 + 285830) / (2 * F), 10);
    // Cu2+ has no Cp° in the NBS tables, so the whole reaction takes ΔrCp = 0: ΔrH = −64.77 + 285.83 kJ/mol at any T
    expect(one(await call('ELECTROWINTHERMONEUTRAL', 'Cu', 60))).toBeCloseTo((-64770 + 285830) / (2 * F), 10);
    expect(isError(one(await call('ELECTROWINTHERMONEUTRAL', 'water')), '#N/A')).toBe(true);
  });
});

describe('E0BASIS', () => {
  it('names the basis of each couple; an unknown couple is #N/A', async () => {
    const r = await call('E0BASIS', [['O2/H2O'], ['Cu2+/Cu'], ['Au3+/Au'], ['Sn2+/Sn'], ['bogus']]);
    // O2/H2O: every species has Cp° in the NBS 1982 tables; Cu2+ has none; Au3+ is not tabulated there but
    // its row carries dE°/dT (data/couples.json); Sn2+ is not tabulated at the standard state and its row has no dE°/dT
    expect(r[0][0]).toBe('species (with ΔrCp)');
    expect(r[1][0]).toBe('species (ΔrCp = 0)');
    expect(r[2][0]).toBe('dE/dT');
    expect(r[3][0]).toBe('25 °C only');
    expect(isError(r[4][0], '#N/A')).toBe(true);
  });
});
