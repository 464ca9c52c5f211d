/**
 * Reference scales (REFPOTENTIAL, CONVERTPOTENTIAL) through the production bundle, called the way
 * Excel calls them: every declared parameter, null for omitted ones, ranges as 2-D arrays.
 */
import { describe, expect, it } from 'vitest';
import { bundleUnderTest, FakeError, isError, one } from './harness';

const { bundle, run } = bundleUnderTest();

describe('metadata', () => {
  it('declares the family with its argument names', () => {
    const byId = new Map(bundle().metadata.functions.map((f) => [f.id, f]));
    for (const id of ['REFPOTENTIAL', 'CONVERTPOTENTIAL']) expect(byId.has(id), id).toBe(true);
    const names = (id: string) => byId.get(id)!.parameters.map((p) => (p.optional ? `[${p.name}]` : p.name)).join(', ');
    expect(names('CONVERTPOTENTIAL')).toBe('potential_V, from_scale, to_scale, [pH], [temperature_C]');
  });
});

describe('reference scales', () => {
  it('REFPOTENTIAL reads the table, ignoring case and white space', async () => {
    expect(one(await run('REFPOTENTIAL', 'SCE'))).toBe(0.2412); // Bard & Faulkner, inside back cover
    expect(one(await run('REFPOTENTIAL', [[' ag/agcl/kcl (SAT) ']]))).toBe(0.197); // Bard & Faulkner, inside back cover
  });
  it('REFPOTENTIAL errors: unknown electrode #N/A naming it; no dE/dT nor fixed filling away from 25 °C #N/A; 150 °C #VALUE!', async () => {
    const unknown = one(await run('REFPOTENTIAL', 'Pt/PtO'));
    expect(isError(unknown, '#N/A')).toBe(true);
    expect((unknown as FakeError).message).toMatch(/Pt\/PtO/);
    const noSlope = one(await run('REFPOTENTIAL', 'Ag/AgCl/seawater', 40));
    expect(isError(noSlope, '#N/A')).toBe(true);
    expect((noSlope as FakeError).message).toMatch(/dE\/dT/);
    expect(isError(one(await run('REFPOTENTIAL', 'SCE', 150)), '#VALUE!')).toBe(true);
  });
  it('away from 25 °C: a mercurous-sulfate electrode at 40 °C, Hg/HgO at 80 °C; calomel above 80 °C #VALUE! naming the limit', async () => {
    // MSE (sat. K2SO4) 0.637 V at 25 °C (Yosypchuk & Novotný 2003), 0.6233 V at 40 °C by its reaction at the sulfate activity of
    // saturated K2SO4 (tests/scales/saturatedFilling.test.ts); Hg/HgO in 1 mol/kg NaOH 0.1077 V at 25 °C (J. Power Sources 161 (2006)
    // 1217), 0.0376 V at 80 °C with the filling held
    expect(one(await run('CONVERTPOTENTIAL', 1.8, 'SHE', 'MSE', null, 40))).toBeCloseTo(1.8 - 0.6233, 4);
    expect(one(await run('REFPOTENTIAL', 'Hg/HgO/NaOH(1M)', 80))).toBeCloseTo(0.0376, 4);
    const hot = one(await run('REFPOTENTIAL', 'SCE', 85));
    expect(isError(hot, '#VALUE!')).toBe(true);
    expect((hot as FakeError).message).toMatch(/80 °C/);
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
