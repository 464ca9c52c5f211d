/** The finishing family through the production bundle: scalars, ranges, omitted arguments and error cells. */
import { describe, expect, it } from 'vitest';
import { bundleUnderTest, isError, messageOf, one } from './harness';

const { run } = bundleUnderTest();

describe('FREECYANIDE', () => {
  it('salt omitted is NaCN: 12.4 mL of 0.1 mol/L AgNO3 on 10 mL is 12.154 g/L (2 CN⁻ per Ag⁺, IUPAC atomic weights)', async () => {
    expect(one(await run('FREECYANIDE', 12.4, 0.1, 10, null)) as number).toBeCloseTo(12.154, 3);
    expect(one(await run('FREECYANIDE', 12.4, 0.1, 10, 'KCN')) as number).toBeCloseTo((2 * 1.24 * (39.098 + 12.011 + 14.007)) / 10, 9);
  });
  it('a column of titrations spills a column; an unknown salt is #N/A, a negative volume #VALUE!', async () => {
    const r = (await run('FREECYANIDE', [[10], [20], [-1]], 0.1, 10, 'NaCN')) as unknown[][];
    expect(r[1][0] as number).toBeCloseTo(2 * (r[0][0] as number), 12);
    expect(isError(r[2][0], '#VALUE!')).toBe(true);
    const bad = one(await run('FREECYANIDE', 10, 0.1, 10, 'HCN'));
    expect(isError(bad, '#N/A')).toBe(true);
    expect(messageOf(bad)).toMatch(/NaCN.*KCN/);
  });
});

describe('THICKNESSEFFICIENCY', () => {
  it('blank readings are skipped; the mean over the Faraday thickness (nickel, 1 A/dm², 60 min: 12.292 µm)', async () => {
    const r = one(await run('THICKNESSEFFICIENCY', [[11.6], [null], [11.9], [''], [12.1]], 1, 60, 'Ni', 2, 8.908)) as number;
    expect(r).toBeCloseTo(11.8667 / 12.292, 4);
  });
  it('a row of current densities spills a row; a text reading and a miscapitalised metal are #VALUE!', async () => {
    const r = (await run('THICKNESSEFFICIENCY', [[12]], [[1, 2]], 60, 'Ni', 2, 8.908)) as number[][];
    expect(r[0][0]).toBeCloseTo(2 * r[0][1], 12);
    expect(isError(one(await run('THICKNESSEFFICIENCY', [['twelve']], 1, 60, 'Ni', 2, 8.908)), '#VALUE!')).toBe(true);
    expect(isError(one(await run('THICKNESSEFFICIENCY', [[12]], 1, 60, 'NI', 2, 8.908)), '#VALUE!')).toBe(true); // did you mean Ni?
    const zero = one(await run('THICKNESSEFFICIENCY', [[12], [0]], 1, 60, 'Ni', 2, 8.908));
    expect(isError(zero, '#VALUE!')).toBe(true); // a 0 is not averaged in: an empty cell may arrive as 0
    expect(messageOf(zero)).toMatch(/readings_um must be > 0/);
  });
});

describe('RECTIFIERSIZE', () => {
  it('one row of A, V and kW; header TRUE puts labels on top', async () => {
    const r = (await run('RECTIFIERSIZE', 120, 4, 5.5, 0.5, 0.2, 0.1, null)) as number[][];
    expect(r.length).toBe(1);
    expect(r[0][0]).toBeCloseTo(576, 12);
    expect(r[0][1]).toBeCloseTo(6.6, 12);
    expect(r[0][2]).toBeCloseTo(3.8016, 12);
    const h = (await run('RECTIFIERSIZE', 120, 4, 5.5, 0.5, 0.2, 0.1, true)) as unknown[][];
    expect(h[0]).toEqual(['current_A', 'voltage_V', 'power_kW']);
  });
  it('a column of loads gives a row each; a margin typed as a percentage is #VALUE! saying so', async () => {
    const r = (await run('RECTIFIERSIZE', [[120], [60]], 4, 5.5, 0.5, 0, 0, null)) as number[][];
    expect(r.map((row) => row[0])).toEqual([480, 240]);
    const bad = (await run('RECTIFIERSIZE', 120, 4, 5.5, 0.5, 20, 0.1, null)) as unknown[][];
    expect(isError(bad[0][0], '#VALUE!')).toBe(true);
    expect(messageOf(bad[0][0])).toMatch(/write 20 % as 0.2/);
  });
});

describe('H2VENTILATION', () => {
  it('reference and LFL omitted: 0 °C and 4.0 vol %; 100 A to hydrogen is 0.041815 Nm³/h (Faraday, CODATA 2018)', async () => {
    const r = (await run('H2VENTILATION', 2000, 0.95, 0.25, null, null)) as number[][];
    expect(r[0][0]).toBeCloseTo(0.041815, 6);
    expect(r[0][1] / r[0][0]).toBeCloseTo(99, 9);
  });
  it('a column of efficiencies spills rows; 95 for 95 % is #VALUE!; an unknown reference #N/A', async () => {
    const r = (await run('H2VENTILATION', 2000, [[0.9], [0.95]], 0.25, '15C', null)) as number[][];
    expect(r[0][0]).toBeCloseTo(2 * r[1][0], 9);
    const bad = (await run('H2VENTILATION', 2000, 95, 0.25, null, null)) as unknown[][];
    expect(isError(bad[0][0], '#VALUE!')).toBe(true);
    expect(messageOf(bad[0][0])).toMatch(/95 % as 0.95/);
    expect(isError(((await run('H2VENTILATION', 2000, 0.9, 0.25, '25C', null)) as unknown[][])[0][0], '#N/A')).toBe(true);
  });
});

describe('GALVANICPAIR', () => {
  it('zinc on steel: −0.345 V, zinc anodic (ACA seawater series ranges)', async () => {
    const r = (await run('GALVANICPAIR', 'Zinc', 'Mild steel, cast iron')) as unknown[][];
    expect(r[0][0] as number).toBeCloseTo(-0.345, 12);
    expect(r[0][1]).toBe('Zinc');
  });
  it('a column of coatings spills rows; an unknown alloy is #N/A', async () => {
    const r = (await run('GALVANICPAIR', [['Nickel 200'], ['Tin'], ['Gold leaf']], 'Copper')) as unknown[][];
    expect(r[0]).toEqual([0.185, 'Copper']);
    expect(r[1][1]).toMatch(/overlap/);
    expect(isError(r[2][0], '#N/A')).toBe(true);
  });
});

describe('COATINGLIFE', () => {
  it('a penetration rate with the optional arguments omitted; a current density with them', async () => {
    expect(one(await run('COATINGLIFE', 85, 2.1, 'um/y', null, null, null)) as number).toBeCloseTo(85 / 2.1, 12);
    expect(one(await run('COATINGLIFE', 12, 0.5, 'uA/cm2', 'Zn', 2, 7.14)) as number).toBeCloseTo(1.603, 3);
  });
  it('a row of thicknesses spills a row; a current density without the metal is #VALUE! naming what is missing', async () => {
    const r = (await run('COATINGLIFE', [[10, 20]], 2, 'um/y', null, null, null)) as number[][];
    expect(r[0]).toEqual([5, 10]);
    const bad = one(await run('COATINGLIFE', 12, 0.5, 'uA/cm2', null, null, null));
    expect(isError(bad, '#VALUE!')).toBe(true);
    expect(messageOf(bad)).toMatch(/needs species, n and density_g_cm3/);
  });
});
