/**
 * The production bundle, loaded as the page loads it: the plant family (acid per
 * tonne, water per H2, degradation rate, gas crossover, power cost) and the concentration
 * overpotentials of the kinetics family, on scalars, ranges, omitted arguments and error cells.
 */
import { describe, expect, it } from 'vitest';
import { bundleUnderTest, FakeError, isError, messageOf, one } from './harness';

const { run } = bundleUnderTest();
const call = async (id: string, ...args: unknown[]) => (await run(id, ...args)) as unknown[][];
const F = 96485.33212; // CODATA 2018
const H2SO4 = 2 * 1.008 + 32.06 + 4 * 15.999; // IUPAC 2021 abridged weights
const R = 8.314462618; // CODATA 2018

describe('ACIDPERTONNE', () => {
  it('zinc, copper and nickel down a column: n/2 mol H2SO4 per mol metal (IUPAC 2021 weights, hand calculation)', async () => {
    const r = await call('ACIDPERTONNE', [['Zn'], ['Cu'], ['Ni']], 2, null, null);
    expect(r.map((row) => row[0])).toEqual([H2SO4 / 65.38, H2SO4 / 63.546, H2SO4 / 58.693].map((x) => expect.closeTo(x, 10) as unknown));
  });
  it('MnO2 fraction adds (n/2)·f/ε; a percentage typed for a fraction is #VALUE! saying so', async () => {
    expect(one(await call('ACIDPERTONNE', 'Zn', 2, 0.9, 0.01))).toBeCloseTo(((1 + 0.01 / 0.9) * H2SO4) / 65.38, 10);
    const pct = one(await call('ACIDPERTONNE', 'Zn', 2, 90, null));
    expect(isError(pct, '#VALUE!')).toBe(true);
    expect(messageOf(pct)).toMatch(/a percentage\? write 90 % as 0.9/);
    expect(isError(one(await call('ACIDPERTONNE', 'NI', 2, null, null)), '#VALUE!')).toBe(true);
  });
});

describe('WATERPERH2', () => {
  it('all omitted: 8.936 kg/kg; per Nm³ at 0 °C and 15 °C across a row', async () => {
    expect(one(await call('WATERPERH2', null, null, null))).toBeCloseTo(18.015 / 2.016, 10);
    const r = await call('WATERPERH2', 'Nm3', 0.05, [['0C', '15C']]);
    const vm = (t: number) => (R * (273.15 + t)) / 101325; // ideal gas at 101.325 kPa
    expect(r[0][0]).toBeCloseTo((1.05 * 0.018015) / vm(0), 10);
    expect(r[0][1]).toBeCloseTo((1.05 * 0.018015) / vm(15), 10);
    expect(isError(one(await call('WATERPERH2', 'litre', null, null)), '#N/A')).toBe(true);
    expect(messageOf(one(await call('WATERPERH2', 'kg', 5, null)))).toMatch(/a percentage\? write 5 % as 0.05/);
  });
});

describe('DEGRADATIONRATE', () => {
  const hours = [[0], [500], [1000], [1500], [2000]];
  const volts = [[1.8], [1.805], [1.81], [1.815], [1.82]];
  it('spills rate, standard error and count; +10 µV/h for 10 mV per 1000 h (hand calculation)', async () => {
    const r = await call('DEGRADATIONRATE', volts, hours, null);
    expect(r).toHaveLength(1);
    expect(r[0][0]).toBeCloseTo(10, 8);
    expect(r[0][1]).toBeCloseTo(0, 8);
    expect(r[0][2]).toBe(5);
  });
  it('a blank voltage or a blank hour leaves the pair out; whole blank rows too', async () => {
    const v = [[1.8], [null], [1.81], [1.815], [1.82], [null]];
    const t = [[0], [500], [1000], [''], [2000], [null]];
    const r = await call('DEGRADATIONRATE', v, t, null);
    expect(r[0][0]).toBeCloseTo(10, 8);
    expect(r[0][2]).toBe(3);
  });
  it('ranges of different sizes, too few points and a text reading are #VALUE! with a message', async () => {
    const mm = await call('DEGRADATIONRATE', volts, hours.slice(0, 4), null);
    expect(mm[0]).toHaveLength(3); // an error for the whole call fills the row
    const m = mm[0][0];
    expect(isError(m, '#VALUE!')).toBe(true);
    expect(messageOf(m)).toMatch(/same size.*got 5 and 4 cells/);
    const few = await call('DEGRADATIONRATE', volts, hours, 10);
    expect(isError(few[0][0], '#VALUE!')).toBe(true);
    expect(messageOf(few[0][0])).toMatch(/at least 10/);
    const txt = (await call('DEGRADATIONRATE', [[1.8], ['n/a'], [1.82]], [[0], [1], [2]], null))[0][2];
    expect(isError(txt, '#VALUE!')).toBe(true);
    // an error reading beside an empty hours cell is passed on, not dropped with its partner
    const na = (await call('DEGRADATIONRATE', [[1.8], [new FakeError('#N/A')], [1.82], [1.83]], [[0], [null], [2], [3]], null))[0][0];
    expect(isError(na, '#N/A')).toBe(true);
    const two = await call('DEGRADATIONRATE', volts, hours, 2);
    expect(isError(two[0][0], '#VALUE!')).toBe(true);
    expect(messageOf(two[0][0])).toMatch(/min_points must be a whole number ≥ 3/);
  });
});

describe('GASCROSSOVER', () => {
  it('H2 in O2 down a column of current densities, against the 4.0 vol % default; a row is refused', async () => {
    const r = await call('GASCROSSOVER', [[1000], [5000]], 50, null, null, null);
    expect(r).toHaveLength(2);
    expect(r[0][0]).toBeCloseTo(100 / 1100, 14);
    expect(r[0][1]).toBeCloseTo(100 / 1100 / 0.04, 12);
    expect(r[1][0]).toBeCloseTo(100 / 5100, 14);
    const row = one(await call('GASCROSSOVER', [[1000, 5000]], 50, null, null, null));
    expect(isError(row, '#VALUE!')).toBe(true);
    expect(messageOf(row)).toMatch(/single columns/);
  });
  it('O2 in H2 from a flux needs its limit; without it #VALUE! saying so', async () => {
    const r = await call('GASCROSSOVER', 5000, 10 / (4 * F), 'O2', 'mol/m2/s', 5);
    expect(r[0][0]).toBeCloseTo(10 / 10010, 10);
    const e = (await call('GASCROSSOVER', 5000, 10, 'O2', null, null))[0][0];
    expect(isError(e, '#VALUE!')).toBe(true);
    expect(messageOf(e)).toMatch(/give limit_percent/);
  });
});

describe('POWERCOST', () => {
  it('DC, AC and cost per tonne; efficiency omitted is 1', async () => {
    const dc = (3.3 * 2 * F) / 65.38 / 3.6; // kWh/t, CODATA F and IUPAC zinc
    const r = await call('POWERCOST', 3.3, 'Zn', 2, 0.96, 0.08, null);
    expect(r[0][0]).toBeCloseTo(dc, 5);
    expect(r[0][1]).toBeCloseTo(dc / 0.96, 5);
    expect(r[0][2]).toBeCloseTo((dc / 0.96) * 0.08, 6);
    const col = await call('POWERCOST', [[3.2], [3.4]], 'Zn', 2, 0.96, 0.08, 0.9);
    expect(col).toHaveLength(2);
    expect(col[1][0]).toBeCloseTo((3.4 * 2 * F) / (0.9 * 65.38) / 3.6, 5);
    const pct = await call('POWERCOST', 3.3, 'Zn', 2, 96, 0.08, null);
    expect(isError(pct[0][0], '#VALUE!')).toBe(true);
  });
});

describe('CONCOVERPOTENTIAL and TAFELCONCOVERPOTENTIAL', () => {
  it('(RT/nF)·ln(1 − i/iL) down a column; at iL #VALUE! naming it', async () => {
    const r = await call('CONCOVERPOTENTIAL', [[100], [300], [400]], 400, 2, null);
    expect(r[0][0]).toBeCloseTo(((R * 298.15) / (2 * F)) * Math.log(0.75), 12);
    expect(r[1][0]).toBeCloseTo(((R * 298.15) / (2 * F)) * Math.log(0.25), 12);
    expect(isError(r[2][0], '#VALUE!')).toBe(true);
    expect(messageOf(r[2][0])).toMatch(/limiting current density/);
  });
  it('Tafel plus concentration at 40 °C; a slope in mV/decade is refused', async () => {
    const v = one(await call('TAFELCONCOVERPOTENTIAL', 300, 0.3, 0.12, 400, 2, 40));
    expect(v).toBeCloseTo(-0.36 + ((R * 313.15) / (2 * F)) * Math.log(0.25), 12);
    const mv = one(await call('TAFELCONCOVERPOTENTIAL', 300, 0.3, 120, 400, 2, 40));
    expect(isError(mv, '#VALUE!')).toBe(true);
    expect(messageOf(mv)).toMatch(/mV\/decade/);
  });
});
