/**
 * Solutions (IONICSTRENGTH, ACTIVITYCOEF, MEANACTIVITYCOEF, SALTACTIVITYCOEF) through the production bundle, called the way
 * Excel calls them: every declared parameter, null for omitted ones, ranges as 2-D arrays.
 */
import { describe, expect, it } from 'vitest';
import { bundleUnderTest, isError, one } from './harness';

const { bundle, run } = bundleUnderTest();

describe('metadata', () => {
  it('declares the family with its argument names', () => {
    const byId = new Map(bundle().metadata.functions.map((f) => [f.id, f]));
    for (const id of ['IONICSTRENGTH', 'ACTIVITYCOEF', 'MEANACTIVITYCOEF']) expect(byId.has(id), id).toBe(true);
    const names = (id: string) => byId.get(id)!.parameters.map((p) => (p.optional ? `[${p.name}]` : p.name)).join(', ');
    expect(names('MEANACTIVITYCOEF')).toBe('z_cation, z_anion, ionic_strength, [model], [temperature_C], [ion_size_A]');
  });
});

describe('solutions', () => {
  it('IONICSTRENGTH reads two ranges whole, whatever their shapes', async () => {
    expect(one(await run('IONICSTRENGTH', [[0.1, 0.2]], [[2], [-1]]))).toBeCloseTo(0.3, 15);
    expect(isError(one(await run('IONICSTRENGTH', [[0.1, 0.2]], [[2]])), '#VALUE!')).toBe(true);
  });
  it('ACTIVITYCOEF: DAVIES by default, unknown model #N/A, EDH without size #VALUE!, 150 °C #VALUE!', async () => {
    expect(one(await run('ACTIVITYCOEF', 2, 0.1))).toBeCloseTo(0.372, 3);
    expect(one(await run('ACTIVITYCOEF', 2, 0.1, 'edh', null, 6))).toBeCloseTo(0.4, 3); // Kielland 1937: 0.405 for Ca2+ at I = 0.1
    expect(isError(one(await run('ACTIVITYCOEF', 2, 0.1, 'SIT')), '#N/A')).toBe(true);
    expect(isError(one(await run('ACTIVITYCOEF', 2, 0.1, 'EDH')), '#VALUE!')).toBe(true);
    expect(isError(one(await run('ACTIVITYCOEF', 2, 0.1, 'DAVIES', 150)), '#VALUE!')).toBe(true);
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

describe('SALTACTIVITYCOEF (binary Pitzer, May et al. 2011)', () => {
  it('ZnSO4 over a column of molalities at 25 °C against the CRC Handbook’s measured γ±', async () => {
    // CRC Handbook, Activity Coefficients of Acids, Bases, and Salts, 25 °C: ZnSO4 0.0630 at 0.5 and 0.0435 at 1.0 mol/kg
    // (read in github.com/ugognw/pchemdb, tests/test_crc/…0_1 m to 1_0 m - 2.csv, commit 891483affd3d)
    const r = (await run('SALTACTIVITYCOEF', 'ZnSO4', [[0.5], [1], [4]], null)) as unknown[][];
    expect(Math.abs((r[0][0] as number) / 0.063 - 1)).toBeLessThan(0.01);
    expect(Math.abs((r[1][0] as number) / 0.0435 - 1)).toBeLessThan(0.005);
    expect(isError(r[2][0], '#VALUE!')).toBe(true); // beyond the parameters' 3.5 mol/kg
    expect((r[2][0] as { message: string }).message).toBe("ZnSO4 molality 4 mol/kg is outside the parameters' range 0–3.5 mol/kg (May et al. 2011); the molality is in mol per kg of water");
  });
  it('another temperature is #VALUE!, an unknown salt #N/A naming those available, an omitted molality #VALUE!', async () => {
    const hot = one(await run('SALTACTIVITYCOEF', 'NiSO4', 1, 60)) as { code: string; message: string };
    expect(hot.code).toBe('#VALUE!');
    expect(hot.message).toBe('temperature 60 °C: the Pitzer parameters (May et al. 2011) hold at 25 °C only');
    const mg = one(await run('SALTACTIVITYCOEF', 'MgSO4', 1, null)) as { code: string; message: string };
    expect(mg.code).toBe('#N/A');
    expect(mg.message).toMatch(/^no Pitzer parameters for "MgSO4"; available: CuSO4, ZnSO4, NiSO4, MnSO4, CdSO4, /);
    expect(isError(one(await run('SALTACTIVITYCOEF', 'NiSO4', null, null)), '#VALUE!')).toBe(true);
  });
  it('its description names exactly the salts of the data', () => {
    const f = bundle().metadata.functions.find((x) => x.id === 'SALTACTIVITYCOEF')!;
    expect(f.description).toContain('Salts: CuSO4, ZnSO4, NiSO4, MnSO4, CdSO4, CuCl2, NiCl2, CoCl2, ZnCl2, Na2SO4, HCl, NaCl, KCl, NaOH, KOH, each');
  });
});
