/**
 * The production bundle (node:vm, only a CustomFunctions global): HALFCELL and HALFCELLBYSPECIES.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { type LoadedBundle, isError, loadBundle, one } from './harness';

let b: LoadedBundle;
beforeAll(() => {
  b = loadBundle();
});
const call = async (id: string, ...args: unknown[]) => (await b.call(id, ...args)) as unknown[][];
const S = 0.0591593; // RT ln10/F at 25 °C, CODATA 2018

describe('HALFCELL', () => {
  it('with every optional argument omitted (null) it is E°', async () => {
    expect(one(await call('HALFCELL', 'MnO4-/Mn2+'))).toBe(1.5111); // data/couples.json (Thermoddem V1.10)
    expect(one(await call('HALFCELL', 'O2/OH-', null, null, null, null))).toBe(0.4008); // data/couples.json (Thermoddem V1.10)
  });
  it('MnO4-/Mn2+ at pH 3 drops by (8/5)·0.05916·3 V', async () => {
    expect(one(await call('HALFCELL', 'MnO4-/Mn2+', null, null, 3))).toBeCloseTo(1.5111 - 1.6 * S * 3, 6);
  });
  it('a row of pH against a column of ox activities gives the full table', async () => {
    const r = await call('HALFCELL', 'Fe3+/Fe2+', [[1], [0.1]], null, [[0, 7]]);
    expect(r.map((x) => x.length)).toEqual([2, 2]);
    // Fe3+ + e- -> Fe2+ has no H+: pH does not move it; a(Fe3+) = 0.1 lowers it by 59.16 mV (E° 0.7697 V, data/couples.json (Thermoddem V1.10))
    expect(r[0][0]).toBe(0.7697);
    expect(r[0][1]).toBe(0.7697);
    expect(r[1][0]).toBeCloseTo(0.7697 - S, 6);
  });
  it('domain errors are #VALUE! in their element only', async () => {
    const r = await call('HALFCELL', 'Cu2+/Cu', [[0.01, 0, -1, 'x']]);
    expect(r[0][0]).toBeCloseTo(0.3372 - S, 6); // data/couples.json (Thermoddem V1.10)
    expect(isError(r[0][1], '#VALUE!')).toBe(true);
    expect(isError(r[0][2], '#VALUE!')).toBe(true);
    expect(isError(r[0][3], '#VALUE!')).toBe(true);
    expect(isError(one(await call('HALFCELL', 'Cu2+/Cu', 1, 1, 30)), '#VALUE!')).toBe(true); // pH outside −5…20
  });
  it('an unknown couple is #N/A with a message', async () => {
    const r = one(await call('HALFCELL', 'Cu3+/Cu')) as { code: string; message: string };
    expect(r.code).toBe('#N/A');
    expect(r.message).toMatch(/Cu3\+\/Cu/);
  });
});

describe('HALFCELLBYSPECIES', () => {
  it('reads the species and activities as whole ranges', async () => {
    // E° 1.5111 V, data/couples.json (Thermoddem V1.10); Q = 0.01/(0.1·(1e-3)^8) = 1e23, n = 5
    const r = one(await call('HALFCELLBYSPECIES', 'MnO4-/Mn2+', [['MnO4-'], ['Mn2+'], ['H+']], [[0.1], [0.01], [1e-3]]));
    expect(r).toBeCloseTo(1.5111 - (S / 5) * 23, 6);
  });
  it('a couple column broadcasts over the same lists', async () => {
    const r = await call('HALFCELLBYSPECIES', [['Fe3+/Fe2+'], ['Fe3+/Fe']], [['Fe3+']], [[0.1]]);
    expect(r[0][0]).toBeCloseTo(0.7697 - S, 6); // E° 0.7697 V, data/couples.json (Thermoddem V1.10)
    expect(r[1][0]).toBeCloseTo(-0.0561 - S / 3, 6); // E° −0.0561 V, data/couples.json (Thermoddem V1.10)
  });
  it('a species not in the half-reaction is #N/A naming it; unequal lists #VALUE!; activity 0 #VALUE!', async () => {
    const na = one(await call('HALFCELLBYSPECIES', 'Cu2+/Cu', [['Zn2+']], [[1]])) as { code: string; message: string };
    expect(na.code).toBe('#N/A');
    expect(na.message).toMatch(/"Zn2\+" is not in the half-reaction/);
    expect(isError(one(await call('HALFCELLBYSPECIES', 'Cu2+/Cu', [['Cu2+', 'Cu']], [[1]])), '#VALUE!')).toBe(true);
    expect(isError(one(await call('HALFCELLBYSPECIES', 'Cu2+/Cu', [['Cu2+']], [[0]])), '#VALUE!')).toBe(true);
  });
});
