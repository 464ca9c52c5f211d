/**
 * Kinetics and corrosion (BUTLERVOLMER, OVERPOTENTIAL, TAFELSLOPE, CORROSIONRATE,
 * STERNGEARY) through the production bundle, called the way
 * Excel calls them: every declared parameter, null for omitted ones, ranges as 2-D arrays.
 */
import { describe, expect, it } from 'vitest';
import { bundleUnderTest, FakeError, isError, one } from './harness';

const { bundle, run } = bundleUnderTest();

describe('metadata', () => {
  it('declares the family with its argument names', () => {
    const byId = new Map(bundle().metadata.functions.map((f) => [f.id, f]));
    for (const id of ['BUTLERVOLMER', 'OVERPOTENTIAL', 'TAFELSLOPE', 'CORROSIONRATE', 'STERNGEARY']) expect(byId.has(id), id).toBe(true);
    const names = (id: string) => byId.get(id)!.parameters.map((p) => (p.optional ? `[${p.name}]` : p.name)).join(', ');
    expect(names('OVERPOTENTIAL')).toBe('i, i0, alpha_a, [alpha_c], [temperature_C]');
    expect(names('STERNGEARY')).toBe('beta_a_V, beta_c_V, polarization_resistance_ohm_cm2');
  });
});

describe('kinetics and corrosion', () => {
  it('BUTLERVOLMER and OVERPOTENTIAL are inverses, through the bundle, over a column of overpotentials', async () => {
    const etas = [[-2], [-0.2], [0], [1e-6], [0.3], [4]];
    const i = (await run('BUTLERVOLMER', 1e-3, etas, 0.5)) as number[][];
    const back = (await run('OVERPOTENTIAL', i, 1e-3, 0.5)) as number[][];
    etas.forEach(([eta], k) => expect(Math.abs(back[k][0] - eta)).toBeLessThanOrEqual(1e-9));
  });
  it('BUTLERVOLMER beyond double range is #NUM!; alpha_a ≥ 1 without alpha_c is #VALUE!; millivolts are refused', async () => {
    expect(isError(one(await run('BUTLERVOLMER', 1, 2, 10, 0.5)), '#NUM!')).toBe(true);
    expect(isError(one(await run('BUTLERVOLMER', 1, 60, 0.5)), '#VALUE!')).toBe(true);
    expect(isError(one(await run('BUTLERVOLMER', 1, 0.1, 1.2)), '#VALUE!')).toBe(true);
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
