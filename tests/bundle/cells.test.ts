/**
 * The production bundle (node:vm, only a CustomFunctions global): EMF, GALVANIC, CELLELECTRONS,
 * CELLREACTION and CELLPOTENTIAL on scalars, ranges, omitted arguments and error cells.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { type LoadedBundle, isError, loadBundle, one } from './harness';

let b: LoadedBundle;
beforeAll(() => {
  b = loadBundle();
});
const call = async (id: string, ...args: unknown[]) => (await b.call(id, ...args)) as unknown[][];
// Daniell cell: 0.3372 − (−0.7628) = 1.1000 V (data/couples.json (Thermoddem V1.10 / MINTEQA2 v4))
const DANIELL = 1.1;

describe('EMF', () => {
  it('couples, numbers or a mix; temperature omitted', async () => {
    expect(one(await call('EMF', 'Cu2+/Cu', 'Zn2+/Zn'))).toBeCloseTo(DANIELL, 10);
    expect(one(await call('EMF', 0.3372, -0.7628))).toBeCloseTo(DANIELL, 10);
    expect(one(await call('EMF', 'Cu2+/Cu', '-0.7628'))).toBeCloseTo(DANIELL, 10);
  });
  it('never reorders', async () => {
    expect(one(await call('EMF', 'Zn2+/Zn', 'Cu2+/Cu'))).toBeCloseTo(-DANIELL, 10);
  });
  it('a column of anodes spills a column', async () => {
    const r = await call('EMF', 'O2/H2O', [['H+/H2'], ['Zn2+/Zn'], ['bogus']]);
    expect(r[0][0]).toBe(1.2292); // O2/H2O vs SHE, data/couples.json (Thermoddem V1.10 / MINTEQA2 v4)
    expect(r[1][0]).toBeCloseTo(1.2292 + 0.7628, 10);
    expect(isError(r[2][0], '#N/A')).toBe(true);
  });
  it('couples move with temperature, numbers do not', async () => {
    // water electrolysis reversible voltage at 80 °C: 1.2292 V moved by the species data (NBS 1982, with ΔrCp);
    // the row's linear −0.845 mV/K (Thermoddem V1.10) (1.18273 V) agrees within 1 mV
    expect(Math.abs((one(await call('EMF', 'O2/H2O', 'H+/H2', 80)) as number) - 1.18273)).toBeLessThan(1e-3);
    expect(one(await call('EMF', 1, 0.5, 80))).toBe(0.5);
    // Bi3+(aq) (ΔfG° only) has neither species data nor a stored dE°/dT
    expect(isError(one(await call('EMF', 'Bi3+/Bi', 0, 80)), '#N/A')).toBe(true);
  });
});

describe('GALVANIC', () => {
  it('spills [E°cell, cathode, anode]', async () => {
    const r = await call('GALVANIC', 'Zn2+/Zn', 'Cu2+/Cu');
    expect(r).toHaveLength(1);
    expect(r[0][0]).toBeCloseTo(DANIELL, 10);
    expect(r[0].slice(1)).toEqual(['Cu2+/Cu', 'Zn2+/Zn']);
  });
  it('a column of couples gives one row each; an unknown couple errs across its row', async () => {
    const r = await call('GALVANIC', [['Ag+/Ag'], ['nope'], ['Ni2+/Ni']], 'Cu2+/Cu');
    expect(r.map((x) => x.length)).toEqual([3, 3, 3]);
    expect(r[0][0]).toBeCloseTo(0.7992 - 0.3372, 10); // data/couples.json (Thermoddem V1.10 / MINTEQA2 v4)
    expect(r[0].slice(1)).toEqual(['Ag+/Ag', 'Cu2+/Cu']);
    expect(r[1].every((x) => isError(x, '#N/A'))).toBe(true);
    expect(r[2].slice(1)).toEqual(['Cu2+/Cu', 'Ni2+/Ni']);
  });
});

describe('CELLELECTRONS and CELLREACTION', () => {
  it('the Daniell cell and permanganate/iron(II)', async () => {
    expect(one(await call('CELLELECTRONS', 'Cu2+/Cu', 'Zn2+/Zn'))).toBe(2);
    expect(one(await call('CELLELECTRONS', 'MnO4-/Mn2+', 'Fe3+/Fe2+'))).toBe(5);
    expect(one(await call('CELLREACTION', 'Cu2+/Cu', 'Zn2+/Zn'))).toBe('Cu2+ + Zn -> Cu + Zn2+');
    expect(one(await call('CELLREACTION', 'O2/H2O', 'H+/H2'))).toBe('O2 + 2H2 -> 2H2O');
  });
  it('a row of anodes; the same couple twice is #VALUE!', async () => {
    const r = await call('CELLREACTION', 'Ag+/Ag', [['Cu2+/Cu', 'Ag+/Ag']]);
    expect(r[0][0]).toBe('2Ag+ + Cu -> 2Ag + Cu2+');
    expect(isError(r[0][1], '#VALUE!')).toBe(true);
  });
});

describe('CELLPOTENTIAL', () => {
  it('Q = 1 gives the EMF; a column of Q spills', async () => {
    const r = await call('CELLPOTENTIAL', 'Cu2+/Cu', 'Zn2+/Zn', [[1], [100], [0], ['x']]);
    expect(r[0][0]).toBeCloseTo(DANIELL, 10);
    expect(r[1][0]).toBeCloseTo(DANIELL - 0.0591593, 6); // (RT/2F) ln 100, CODATA 2018
    expect(isError(r[2][0], '#VALUE!')).toBe(true);
    expect(isError(r[3][0], '#VALUE!')).toBe(true);
  });
  it('Q is required', async () => {
    expect(isError(one(await call('CELLPOTENTIAL', 'Cu2+/Cu', 'Zn2+/Zn')), '#VALUE!')).toBe(true);
  });
  it('passes an error cell through', async () => {
    const CFError = (b.sandbox.CustomFunctions as { Error: new (c: string, m?: string) => unknown }).Error;
    expect(isError(one(await call('CELLPOTENTIAL', 'Cu2+/Cu', new CFError('#DIV/0!'), 1)), '#DIV/0!')).toBe(true);
  });
});
