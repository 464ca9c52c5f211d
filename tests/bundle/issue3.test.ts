/**
 * Issue 3 through the production bundle (node:vm, only a CustomFunctions global), called the way
 * Excel calls them: every declared parameter, null for omitted ones, ranges as 2-D arrays.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { FakeError, type LoadedBundle, isError, loadBundle, one } from './harness';

let b: LoadedBundle;
beforeAll(() => {
  b = loadBundle();
});

const IDS = [
  'REFPOTENTIAL', 'CONVERTPOTENTIAL', 'MOLARMASS', 'ECEQUIV', 'DEPOSITMASS', 'DEPOSITTIME', 'PLATETHICKNESS', 'PLATETIME',
  'CURRENTEFFICIENCY', 'SPECIFICENERGY', 'GASVOLUME', 'IONICSTRENGTH', 'ACTIVITYCOEF', 'MEANACTIVITYCOEF', 'BUTLERVOLMER',
  'OVERPOTENTIAL', 'TAFELSLOPE', 'CORROSIONRATE', 'STERNGEARY',
];

/** Awaits a result that may be a promise (table look-ups wait for the workbook's table). */
async function run(id: string, ...args: unknown[]): Promise<unknown> {
  return await b.call(id, ...args);
}

describe('metadata', () => {
  it('declares all 19 functions of issue 3 with the argument names of the issue', () => {
    const byId = new Map(b.metadata.functions.map((f) => [f.id, f]));
    for (const id of IDS) expect(byId.has(id), id).toBe(true);
    const names = (id: string) => byId.get(id)!.parameters.map((p) => (p.optional ? `[${p.name}]` : p.name)).join(', ');
    expect(names('CONVERTPOTENTIAL')).toBe('potential_V, from_scale, to_scale, [pH], [temperature_C]');
    expect(names('PLATETHICKNESS')).toBe('current_density_A_dm2, time_min, species, n, density_g_cm3, [efficiency]');
    expect(names('GASVOLUME')).toBe('current_A, time_h, n, [efficiency], [temperature_C], [pressure_bar], [saturated]');
    expect(names('MEANACTIVITYCOEF')).toBe('z_cation, z_anion, ionic_strength, [model], [temperature_C], [ion_size_A]');
    expect(names('OVERPOTENTIAL')).toBe('i, i0, alpha_a, [alpha_c], [temperature_C]');
    expect(names('STERNGEARY')).toBe('beta_a_V, beta_c_V, polarization_resistance_ohm_cm2');
  });
});

describe('reference scales', () => {
  it('REFPOTENTIAL reads the table, ignoring case and white space', async () => {
    expect(one(await run('REFPOTENTIAL', 'SCE'))).toBe(0.2412); // Bard & Faulkner, inside back cover
    expect(one(await run('REFPOTENTIAL', [[' ag/agcl/kcl (SAT) ']]))).toBe(0.197); // Bard & Faulkner, inside back cover
  });
  it('REFPOTENTIAL errors: unknown electrode #N/A naming it; no dE/dT nor fixed filling away from 25 °C #N/A; 150 °C #NUM!', async () => {
    const unknown = one(await run('REFPOTENTIAL', 'Pt/PtO'));
    expect(isError(unknown, '#N/A')).toBe(true);
    expect((unknown as FakeError).message).toMatch(/Pt\/PtO/);
    const noSlope = one(await run('REFPOTENTIAL', 'Ag/AgCl/seawater', 40));
    expect(isError(noSlope, '#N/A')).toBe(true);
    expect((noSlope as FakeError).message).toMatch(/dE\/dT/);
    expect(isError(one(await run('REFPOTENTIAL', 'SCE', 150)), '#NUM!')).toBe(true);
  });
  it('CONVERTPOTENTIAL: the NACE SP0169 criterion −0.85 V vs CSE on the SHE and SCE scales', async () => {
    // NACE SP0169: −850 mV vs CSE; CSE +0.316 V (Szabó & Bakos 2010), SCE +0.2412 V (Bard & Faulkner)
    const r = (await run('CONVERTPOTENTIAL', -0.85, 'CSE', [['SHE', 'SCE']])) as number[][];
    expect(r[0][0]).toBeCloseTo(-0.534, 6);
    expect(r[0][1]).toBeCloseTo(-0.7752, 4);
  });
  it('CONVERTPOTENTIAL: 0 V vs RHE at pH 7 is −0.414 V vs SHE; a column of pH spills a column', async () => {
    // −(RT ln10/F)·pH at 25 °C (CODATA 2018): −0.414 V at pH 7 (the biochemists' E°′ of H+/H2, from memory)
    expect(one(await run('CONVERTPOTENTIAL', 0, 'RHE', 'SHE', 7))).toBeCloseTo(-0.4141, 4);
    const col = (await run('CONVERTPOTENTIAL', 0, 'RHE', 'SHE', [[0], [7], [14]])) as number[][];
    expect(col.map((row) => row.length)).toEqual([1, 1, 1]);
    expect(col[0][0]).toBe(0);
    expect(col[2][0]).toBeCloseTo(-0.8282, 4);
  });
  it('CONVERTPOTENTIAL errors: RHE without pH #VALUE! with a message; unknown scale #N/A', async () => {
    const noPH = one(await run('CONVERTPOTENTIAL', 0.2, 'RHE', 'SHE'));
    expect(isError(noPH, '#VALUE!')).toBe(true);
    expect((noPH as FakeError).message).toMatch(/pH/);
    const unknown = one(await run('CONVERTPOTENTIAL', 0.2, 'SHE', 'MSE?'));
    expect(isError(unknown, '#N/A')).toBe(true);
    expect((unknown as FakeError).message).toMatch(/MSE\?/);
  });
  it('CONVERTPOTENTIAL there and back is the identity, through the bundle', async () => {
    const scales = ['SHE', 'RHE', 'SCE', 'CSE', 'Ag/AgCl/KCl(sat)', 'Hg/HgO/NaOH(1M)', 'Zn/seawater'];
    for (const from of scales) {
      for (const to of scales) {
        const there = one(await run('CONVERTPOTENTIAL', 0.123, from, to, 9.5)) as number;
        expect(one(await run('CONVERTPOTENTIAL', there, to, from, 9.5)), `${from} → ${to}`).toBeCloseTo(0.123, 12);
      }
    }
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
    expect(isError(one(await run('ECEQUIV', 'Ni', 0)), '#NUM!')).toBe(true);
    expect(isError(one(await run('ECEQUIV', -58.7, 2)), '#NUM!')).toBe(true);
  });
  it('DEPOSITMASS with efficiency omitted (null) is at 100 %; efficiency 1.5 is #NUM!', async () => {
    expect(Math.abs((one(await run('DEPOSITMASS', 10, 1, 'Cu', 2)) as number) - 11.86)).toBeLessThan(0.01); // 10 A·h × 1.186 g/(A·h)
    expect(isError(one(await run('DEPOSITMASS', 10, 1, 'Cu', 2, 1.5)), '#NUM!')).toBe(true);
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

describe('solutions', () => {
  it('IONICSTRENGTH reads two ranges whole, whatever their shapes', async () => {
    expect(one(await run('IONICSTRENGTH', [[0.1, 0.2]], [[2], [-1]]))).toBeCloseTo(0.3, 15);
    expect(isError(one(await run('IONICSTRENGTH', [[0.1, 0.2]], [[2]])), '#VALUE!')).toBe(true);
  });
  it('ACTIVITYCOEF: DAVIES by default, unknown model #N/A, EDH without size #VALUE!, 150 °C #NUM!', async () => {
    expect(one(await run('ACTIVITYCOEF', 2, 0.1))).toBeCloseTo(0.372, 3);
    expect(one(await run('ACTIVITYCOEF', 2, 0.1, 'edh', null, 6))).toBeCloseTo(0.4, 3); // Kielland 1937: 0.405 for Ca2+ at I = 0.1
    expect(isError(one(await run('ACTIVITYCOEF', 2, 0.1, 'SIT')), '#N/A')).toBe(true);
    expect(isError(one(await run('ACTIVITYCOEF', 2, 0.1, 'EDH')), '#VALUE!')).toBe(true);
    expect(isError(one(await run('ACTIVITYCOEF', 2, 0.1, 'DAVIES', 150)), '#NUM!')).toBe(true);
  });
  it('MEANACTIVITYCOEF of NaCl at 0.1 mol/kg: 0.781 by Davies against 0.778 measured (+0.4 %)', async () => {
    // Robinson & Stokes, Appendix 8.10: γ±(NaCl, 0.1 mol/kg) = 0.778 (from memory)
    expect(one(await run('MEANACTIVITYCOEF', 1, -1, 0.1))).toBeCloseTo(0.781, 3);
    const models = (await run('MEANACTIVITYCOEF', 1, -1, 0.1, [['DHLL', 'EDH', 'DAVIES']], 25, 4)) as number[][];
    // the limiting law holds to I = 0.005 mol/kg only: at 0.1 it answers #VALUE! naming its range
    expect(isError(models[0][0], '#VALUE!')).toBe(true);
    expect(String((models[0][0] as { message?: string }).message)).toMatch(/from 0 to 0.005 mol\/kg/);
    expect(models[0][1]).toBeCloseTo(0.769, 3);
    expect(models[0][2]).toBeCloseTo(0.781, 3);
  });
});

describe('kinetics and corrosion', () => {
  it('BUTLERVOLMER and OVERPOTENTIAL are inverses, through the bundle, over a column of overpotentials', async () => {
    const etas = [[-2], [-0.2], [0], [1e-6], [0.3], [4]];
    const i = (await run('BUTLERVOLMER', 1e-3, etas, 0.5)) as number[][];
    const back = (await run('OVERPOTENTIAL', i, 1e-3, 0.5)) as number[][];
    etas.forEach(([eta], k) => expect(Math.abs(back[k][0] - eta)).toBeLessThanOrEqual(1e-9));
  });
  it('BUTLERVOLMER beyond double range is #NUM!; alpha_a ≥ 1 without alpha_c is #NUM!; millivolts are refused', async () => {
    expect(isError(one(await run('BUTLERVOLMER', 1, 2, 10, 0.5)), '#NUM!')).toBe(true);
    expect(isError(one(await run('BUTLERVOLMER', 1, 60, 0.5)), '#VALUE!')).toBe(true);
    expect(isError(one(await run('BUTLERVOLMER', 1, 0.1, 1.2)), '#NUM!')).toBe(true);
    expect(one(await run('BUTLERVOLMER', 1, 0.1, 1.2, 0.8))).toBeGreaterThan(0);
  });
  it('TAFELSLOPE is 118 mV per decade for α = 0.5 at 25 °C', async () => {
    expect(one(await run('TAFELSLOPE', 0.5))).toBeCloseTo(0.1183, 4); // Bard & Faulkner §3.4.3 (from memory)
  });
  it('CORROSIONRATE of iron at 1 µA/cm² is 0.0116 mm/y; STERNGEARY 120/120 mV at 1 kΩ·cm² is 26 µA/cm²', async () => {
    expect(one(await run('CORROSIONRATE', 1, 27.92, 7.87))).toBeCloseTo(0.0116, 4); // ASTM G102 (from memory)
    expect(one(await run('STERNGEARY', 0.12, 0.12, 1000))).toBeCloseTo(26.06, 2); // Stern & Geary 1957, B = 26 mV
  });
  it('an error value in an input cell passes through in that element only', async () => {
    const r = (await run('TAFELSLOPE', [[0.5, new FakeError('#DIV/0!'), 1]])) as unknown[][];
    expect(r[0][0] as number).toBeCloseTo(0.1183, 4);
    expect(isError(r[0][1], '#DIV/0!')).toBe(true);
    expect(r[0][2] as number).toBeCloseTo(0.05916, 5);
  });
  it('text that is not a number is #VALUE! with a message naming the argument', async () => {
    const v = one(await run('CORROSIONRATE', 'lots', 27.92, 7.87));
    expect(isError(v, '#VALUE!')).toBe(true);
    expect((v as FakeError).message).toMatch(/icorr_uA_cm2/);
  });
});
