/** Plating-shop functions through the production bundle: scalars, ranges, omitted arguments and error cells. */
import { describe, expect, it } from 'vitest';
import { bundleUnderTest, type FakeError, isError, one } from './harness';

const { run } = bundleUnderTest();

describe('plating shop', () => {
  it('METALFRACTION on a range of salts', async () => {
    const r = (await run('METALFRACTION', [['NiSO4·6H2O'], ['KAu(CN)2'], ['CuSO4·5H2O']], [['Ni'], ['Au'], ['Ni']])) as unknown[][];
    expect(r[0][0] as number).toBeCloseTo(0.2233, 4); // nickel sulfate hexahydrate 22.3 % Ni (common practice)
    expect(r[1][0] as number).toBeCloseTo(0.6836, 3); // potassium gold cyanide 68.3 % Au (common practice, from memory)
    expect(isError(r[2][0], '#N/A')).toBe(true);
    expect((r[2][0] as FakeError).message).toMatch(/contains no "Ni"/);
  });
  it('SALTMASS for a Watts bath; a negative concentration is an error', async () => {
    // 75 g/L · 1000 L / 0.2233 = 335.9 kg
    expect(one(await run('SALTMASS', 75, 1000, 'NiSO4·6H2O', 'Ni')) as number).toBeCloseTo(335.9, 1);
    expect(isError(one(await run('SALTMASS', -75, 1000, 'NiSO4·6H2O', 'Ni')))).toBe(true);
  });
  it('RINSERATIO: one stage r + 1; 2.5 stages refused', async () => {
    expect(one(await run('RINSERATIO', 20, 1))).toBe(21); // mass balance of one perfectly mixed rinse
    expect(one(await run('RINSERATIO', 20, 2))).toBe(421); // (20³ − 1)/19
    expect(isError(one(await run('RINSERATIO', 20, 2.5)))).toBe(true);
  });
  it('THICKNESSFROMAH with the efficiency omitted (1) and given', async () => {
    // 10 A·h, 20 dm², Ni, n = 2, 8.9 g/cm³: 6.151 µm at 100 %, 5.844 µm at 95 % (Faraday's law)
    expect(one(await run('THICKNESSFROMAH', 10, 20, 'Ni', 2, 8.9, null)) as number).toBeCloseTo(6.151, 3);
    expect(one(await run('THICKNESSFROMAH', 10, 20, 'Ni', 2, 8.9, 0.95)) as number).toBeCloseTo(5.844, 3);
    expect((one(await run('THICKNESSFROMAH', 10, 20, 'NI', 2, 8.9, null)) as FakeError).message).toMatch(/did you mean Ni\?/);
  });
});
