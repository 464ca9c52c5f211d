/**
 * Faraday's law (MOLARMASS, ECEQUIV, DEPOSITMASS, DEPOSITTIME, PLATETHICKNESS, PLATETIME,
 * CURRENTEFFICIENCY, SPECIFICENERGY, GASVOLUME) through the production bundle, called the way Excel
 * calls them: every declared parameter, null for omitted ones, ranges as 2-D arrays.
 */
import { describe, expect, it } from 'vitest';
import { bundleUnderTest, FakeError, isError, one } from './harness';

const { bundle, run } = bundleUnderTest();

describe('metadata', () => {
  it('declares the family with its argument names', () => {
    const byId = new Map(bundle().metadata.functions.map((f) => [f.id, f]));
    for (const id of ['MOLARMASS', 'ECEQUIV', 'DEPOSITMASS', 'DEPOSITTIME', 'PLATETHICKNESS', 'PLATETIME', 'CURRENTEFFICIENCY', 'SPECIFICENERGY', 'SPECIFICCAPACITY', 'GASVOLUME']) expect(byId.has(id), id).toBe(true);
    const names = (id: string) => byId.get(id)!.parameters.map((p) => (p.optional ? `[${p.name}]` : p.name)).join(', ');
    expect(names('PLATETHICKNESS')).toBe('current_density_A_dm2, time_min, species, n, density_g_cm3, [efficiency]');
    expect(names('GASVOLUME')).toBe('current_A, time_h, n, [efficiency], [temperature_C], [pressure_bar], [saturated]');
  });
});

describe("Faraday's law", () => {
  it('MOLARMASS over a column: a hydrate, an unknown element (#N/A), an element without a standard weight (#N/A), bad text (#VALUE!)', async () => {
    const r = (await run('MOLARMASS', [['CuSO4·5H2O'], ['Xy2'], ['Tc'], ['Cu(SO4']])) as unknown[][];
    expect(r[0][0] as number).toBeCloseTo(249.69, 1); // CRC Handbook, copper(II) sulfate pentahydrate (from memory)
    expect(isError(r[1][0], '#N/A')).toBe(true);
    expect((r[1][0] as FakeError).message).toMatch(/Xy/);
    expect(isError(r[2][0], '#N/A')).toBe(true);
    expect(isError(r[3][0], '#VALUE!')).toBe(true);
  });
  it('ECEQUIV of a row of metals (plating-handbook electrochemical equivalents, from memory)', async () => {
    const r = (await run('ECEQUIV', [['Ni', 'Zn', 'Ag']], [[2, 2, 1]])) as number[][];
    expect(r[0][0]).toBeCloseTo(1.095, 3);
    expect(r[0][1]).toBeCloseTo(1.22, 3);
    expect(r[0][2]).toBeCloseTo(4.025, 3);
    expect(one(await run('ECEQUIV', 58.693, 2))).toBeCloseTo(1.095, 3); // a molar mass works as well
    expect(isError(one(await run('ECEQUIV', 'Ni', 0)), '#VALUE!')).toBe(true);
    expect(isError(one(await run('ECEQUIV', -58.7, 2)), '#VALUE!')).toBe(true);
  });
  it('DEPOSITMASS with efficiency omitted (null) is at 100 %; efficiency 1.5 is #VALUE!', async () => {
    expect(Math.abs((one(await run('DEPOSITMASS', 10, 1, 'Cu', 2)) as number) - 11.86)).toBeLessThan(0.01); // 10 A·h × 1.186 g/(A·h)
    expect(isError(one(await run('DEPOSITMASS', 10, 1, 'Cu', 2, 1.5)), '#VALUE!')).toBe(true);
  });
  it('DEPOSITTIME inverts DEPOSITMASS over a range', async () => {
    const masses = (await run('DEPOSITMASS', [[1], [10], [100]], 2, 'Zn', 2, 0.9)) as number[][];
    const times = (await run('DEPOSITTIME', masses, [[1], [10], [100]], 'Zn', 2, 0.9)) as number[][];
    for (const row of times) expect(row[0]).toBeCloseTo(2, 12);
  });
  it('PLATETHICKNESS: nickel at 1 A/dm² for 60 min ≈ 12.3 µm, and PLATETIME brings it back', async () => {
    // plating handbooks: 12.3 µm per A·h/dm² for nickel at 100 % (from memory); ρ(Ni) 8.90 g/cm³ (CRC)
    const h = one(await run('PLATETHICKNESS', 1, 60, 'Ni', 2, 8.9)) as number;
    expect(h).toBeCloseTo(12.3, 1);
    expect(one(await run('PLATETIME', h, 1, 'Ni', 2, 8.9))).toBeCloseTo(60, 10);
  });
  it('CURRENTEFFICIENCY, SPECIFICENERGY and GASVOLUME', async () => {
    expect(one(await run('CURRENTEFFICIENCY', 11, 10, 1, 'Cu', 2))).toBeCloseTo(0.928, 3); // 11.0/(10 × 1.186)
    expect(one(await run('SPECIFICENERGY', 4.2, 'Al', 3, 0.95))).toBeCloseTo(13.17, 2); // Hall–Héroult 13–14 kWh/kg, common practice
    expect(one(await run('GASVOLUME', 1, 1, 2, 1, 0, 1.01325))).toBeCloseTo(0.418, 3); // 0.418 L H2 per A·h at 0 °C, 1 atm (CODATA molar volume)
    expect(one(await run('GASVOLUME', 1, 1, 2, null, null, null))).toBeCloseTo((0.418148 * 298.15) / 273.15 * 1.01325, 5); // 25 °C, 1 bar defaults
  });
});

describe('SPECIFICCAPACITY', () => {
  it('a scalar, a column of materials, an omitted argument and an error cell', async () => {
    // LiFePO4 170 mA·h/g, graphite 372 mA·h/g per g of C6 (theoretical capacities, common practice)
    expect(one(await run('SPECIFICCAPACITY', 'LiFePO4', 1))).toBeCloseTo(169.9, 1);
    const col = (await run('SPECIFICCAPACITY', [['LiFePO4'], ['C6']], 1)) as number[][];
    expect(col[0][0]).toBeCloseTo(169.9, 1);
    expect(col[1][0]).toBeCloseTo(372, 0);
    expect(isError(one(await run('SPECIFICCAPACITY', 'LiFePO4', null)), '#VALUE!')).toBe(true); // n is required
    expect(isError(one(await run('SPECIFICCAPACITY', 'LiFePO4', 0)), '#VALUE!')).toBe(true);
    expect(isError(one(await run('SPECIFICCAPACITY', 'Xq', 1)), '#N/A')).toBe(true);
  });
});
