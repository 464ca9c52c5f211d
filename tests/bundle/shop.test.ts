/** Plating-shop functions of the shop family through the production bundle: scalars, ranges, omitted arguments and error cells. */
import { describe, expect, it } from 'vitest';
import { bundleUnderTest, isError, messageOf, one } from './harness';

const { run } = bundleUnderTest();

describe('alloy deposits', () => {
  it('ALLOYEQUIV: one valence for all, or a range of one per element; fractions refused with the reason', async () => {
    // 1/(0.86·2/65.38 + 0.14·2/58.693) = 32.177 g (definition, IUPAC atomic weights)
    expect(one(await run('ALLOYEQUIV', 'Zn86Ni14', 2)) as number).toBeCloseTo(32.177, 3);
    expect(one(await run('ALLOYEQUIV', 'Cu70Zn30', [[1, 2]])) as number).toBeCloseTo(1 / (0.7 / 63.546 + (0.3 * 2) / 65.38), 9);
    const bad = one(await run('ALLOYEQUIV', 'Zn0.86Ni0.14', 2));
    expect(isError(bad, '#VALUE!')).toBe(true);
    expect(messageOf(bad)).toMatch(/mass percent, not fractions/);
  });
  it('ALLOYEQUIV on a column of alloys spills a column', async () => {
    const r = (await run('ALLOYEQUIV', [['Zn86Ni14'], ['Sn60Pb40'], ['Zn80Ni14']], 2)) as unknown[][];
    expect(r.length).toBe(3);
    expect(r[1][0] as number).toBeCloseTo(71.584, 3); // 1/(0.6·2/118.71 + 0.4·2/207.2)
    expect(isError(r[2][0], '#VALUE!')).toBe(true); // sums to 94
  });
  it('ALLOYDENSITY: Sn60Pb40 is 8.50 g/cm³ (Indium Corp., Lasky, alloy density formula page)', async () => {
    expect(one(await run('ALLOYDENSITY', 'Sn60Pb40', [[7.29, 11.34]])) as number).toBeCloseTo(8.5, 2);
    expect(isError(one(await run('ALLOYDENSITY', 'Sn60Pb40', 7.29)), '#VALUE!')).toBe(true);
  });
  it('ALLOYTHICKNESS and ALLOYPLATETIME invert each other; efficiency omitted is 1', async () => {
    const h = one(await run('ALLOYTHICKNESS', 2, 30, 'Zn86Ni14', 2, 7.1, 0.6)) as number;
    expect(h).toBeCloseTo(10.146, 3); // j·t·ε·EW/(Fρ), by hand
    expect(one(await run('ALLOYPLATETIME', h, 2, 'Zn86Ni14', 2, 7.1, 0.6)) as number).toBeCloseTo(30, 9);
    expect(one(await run('ALLOYTHICKNESS', 2, 30, 'Zn86Ni14', 2, 7.1, null)) as number).toBeCloseTo(h / 0.6, 9);
    const times = (await run('ALLOYPLATETIME', [[5], [10]], 2, 'Zn86Ni14', 2, 7.1, 0.6)) as unknown[][];
    expect(times[1][0] as number).toBeCloseTo(2 * (times[0][0] as number), 9);
  });
  it('PARTIALCURRENT on a row of elements, and ALLOYFRACTION back from the partial currents', async () => {
    const row = (await run('PARTIALCURRENT', 10, 'Zn86Ni14', [['Zn', 'Ni']], 2, 0.7)) as number[][];
    expect(row[0][0] + row[0][1]).toBeCloseTo(7, 12);
    const w = (await run('ALLOYFRACTION', [['Zn', 'Ni']], [['Zn', 'Ni']], row, 2)) as number[][];
    expect(w[0][0]).toBeCloseTo(0.86, 12);
    expect(w[0][1]).toBeCloseTo(0.14, 12);
    expect(isError(one(await run('PARTIALCURRENT', 10, 'Zn86Ni14', 'Fe', 2, null)), '#VALUE!')).toBe(true);
  });
  it('an alloy typed into PLATETIME says how to give one', async () => {
    const r = one(await run('PLATETIME', 10, 2, 'Zn0.86Ni0.14', 2, 7.1, null));
    expect(isError(r, '#VALUE!')).toBe(true);
    expect(messageOf(r)).toMatch(/looks like an alloy/);
  });
});

describe('Hull cell, efficiency curve, shop arithmetic', () => {
  it('HULLCELL: 267 mL default, 27.7 A/ft² per A at 1 in (Metal Finishing Guidebook 2013); a column of distances; outside the range #VALUE!', async () => {
    expect(one(await run('HULLCELL', 2, 2.54, null)) as number).toBeCloseTo((2 * 27.7) / 9.290304, 10);
    const col = (await run('HULLCELL', 2, [[1], [5], [10]], 267)) as unknown[][];
    expect(col[0][0] as number).toBeGreaterThan(col[1][0] as number);
    expect(isError(col[2][0], '#VALUE!')).toBe(true);
    expect(messageOf(col[2][0])).toMatch(/0.635 to 8.255 cm/);
    expect(one(await run('HULLCELL', 1, 5.08, 1000)) as number).toBeCloseTo((18.8 - 28.3 * Math.log10(2)) / 9.290304, 10);
  });
  it('EFFICIENCYCURVE on a row of temperatures; outside the curve #VALUE!', async () => {
    const T = [[45], [55], [65]];
    const E = [[0.2], [0.16], [0.12]]; // invented curve for the test
    const r = (await run('EFFICIENCYCURVE', [[50, 60, 70]], T, E)) as unknown[][];
    expect(r[0][0] as number).toBeCloseTo(0.18, 12);
    expect(r[0][1] as number).toBeCloseTo(0.14, 12);
    expect(isError(r[0][2], '#VALUE!')).toBe(true);
    expect(messageOf(r[0][2])).toMatch(/45 to 65 °C/);
  });
  it('PLATINGCURRENT with pieces omitted and given', async () => {
    expect(one(await run('PLATINGCURRENT', 1.5, 3, null))).toBe(4.5);
    expect(one(await run('PLATINGCURRENT', 1.5, 3, 40))).toBe(180);
  });
  it('METALPERKAH: Ni 1.094958 kg/(kA·h) (Faraday\'s law, CODATA 2018 F); Sn(II) and Sn(IV) in a column of n', async () => {
    expect(one(await run('METALPERKAH', 'Ni', 2, null)) as number).toBeCloseTo(1.094958, 6);
    const sn = (await run('METALPERKAH', 'Sn', [[2], [4]], 0.9)) as number[][];
    expect(sn[0][0]).toBeCloseTo(2 * sn[1][0], 12);
    expect(isError(one(await run('METALPERKAH', 'SN', 2, null)), '#VALUE!')).toBe(true); // "did you mean Sn?"
  });
  it('ADDITIVEDOSE and DRAGOUTLOSS', async () => {
    expect(one(await run('ADDITIVEDOSE', 12500, 150))).toBe(1875);
    expect(one(await run('DRAGOUTLOSS', 0.15, 250, 24)) as number).toBeCloseTo(900, 10);
    expect(one(await run('DRAGOUTLOSS', 0.15, 250, null)) as number).toBeCloseTo(37.5, 10);
  });
  it('ANODEEFFICIENCY above 1 is a result, not an error', async () => {
    const r = one(await run('ANODEEFFICIENCY', 1300, 1000, 'Zn', 2)) as number;
    expect(r).toBeCloseTo(1.0658, 4); // 1300 g / (1000 A·h · 65.38·3600/(2F))
  });
  it('THROWINGPOWER on a column of weight ratios (Haring–Blum cell, L = 5)', async () => {
    const r = (await run('THROWINGPOWER', 5, [[5], [1], [3], [0.1]])) as unknown[][];
    expect(r[0][0]).toBe(0);
    expect(r[1][0]).toBe(100);
    expect(r[2][0] as number).toBeCloseTo(100 / 3, 12);
    expect(r[3][0] as number).toBeGreaterThan(100);
    expect(isError(one(await run('THROWINGPOWER', 1, 2)), '#VALUE!')).toBe(true);
  });
  it('THICKNESSFROMMASS on a column of weight gains (ASTM B767 §4.4: thickness from mass per area and density)', async () => {
    const r = (await run('THICKNESSFROMMASS', [[1], [2]], 2, 8.908)) as number[][];
    expect(r[0][0]).toBeCloseTo(5.613, 3); // 1 g / (8.908 g/cm³ · 200 cm²)
    expect(r[1][0]).toBeCloseTo(2 * r[0][0], 12);
    expect(isError(one(await run('THICKNESSFROMMASS', 1, 0, 8.908)))).toBe(true);
  });
});
