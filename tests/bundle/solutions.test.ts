/**
 * Solutions (IONICSTRENGTH, ACTIVITYCOEF, MEANACTIVITYCOEF) through the production bundle, called the way
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
