/**
 * The production bundle (node:vm, only a CustomFunctions global): STDPOTENTIAL, ELECTRONS, HALFREACTION and
 * SOURCE answer from the built-in table.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { type LoadedBundle, isError, loadBundle, one } from './harness';

let b: LoadedBundle;
beforeAll(() => {
  b = loadBundle();
});
const call = async (id: string, ...args: unknown[]) => (await b.call(id, ...args)) as unknown[][];

describe('STDPOTENTIAL', () => {
  it('a scalar couple with temperature omitted (null) is the 25 °C value', async () => {
    expect(one(await call('STDPOTENTIAL', 'Cu2+/Cu'))).toBe(0.3372); // data/couples.json (Thermoddem V1.10 / MINTEQA2 v4, from the cited log K)
    expect(one(await call('STDPOTENTIAL', [['Zn2+/Zn']], [[null]]))).toBe(-0.7628); // data/couples.json (Thermoddem V1.10 / MINTEQA2 v4, from the cited log K)
    expect(one(await call('STDPOTENTIAL', 'Cu2+/Cu', ''))).toBe(0.3372);
  });
  it('reads every key spelling down a column', async () => {
    const r = await call('STDPOTENTIAL', [['Cu(2+)/Cu'], ['Cu^2+ / Cu'], ['Cu+2/Cu'], ['Fe(3+)/Fe+2']]);
    expect(r.map((x) => x[0])).toEqual([0.3372, 0.3372, 0.3372, 0.7697]); // data/couples.json (Thermoddem V1.10 / MINTEQA2 v4, from the cited log K)
  });
  it('moves E° with temperature: O2/H2O across a row of temperatures', async () => {
    // 1.2292 V at 25 °C (the table's row); away from 25 °C the species data (NBS 1982) give the shift,
    // within 1 mV of the row's linear −0.845 mV/K (Thermoddem V1.10) up to 80 °C
    const r = await call('STDPOTENTIAL', 'O2/H2O', [[25, 60, 80]]);
    expect(r[0][0]).toBe(1.2292);
    expect(Math.abs((r[0][1] as number) - (1.2292 - 0.845e-3 * 35))).toBeLessThan(1e-3);
    expect(Math.abs((r[0][2] as number) - (1.2292 - 0.845e-3 * 55))).toBeLessThan(1e-3);
  });
  it('#N/A with a message when neither species data nor dE°/dT covers the couple; #VALUE! outside 0…100 °C', async () => {
    const na = one(await call('STDPOTENTIAL', 'Bi3+/Bi', 40)) as { code: string; message: string };
    expect(na.code).toBe('#N/A');
    expect(na.message).toMatch(/"Bi3\+\/Bi" has neither species data/);
    expect(typeof one(await call('STDPOTENTIAL', 'MnO4-/Mn2+', 40))).toBe('number');
    expect(isError(one(await call('STDPOTENTIAL', 'Cu2+/Cu', 150)), '#VALUE!')).toBe(true);
    expect(isError(one(await call('STDPOTENTIAL', 'Cu2+/Cu', -300)), '#VALUE!')).toBe(true);
  });
  it('an unknown couple is #N/A with a message naming it; a number is #VALUE!', async () => {
    const r = one(await call('STDPOTENTIAL', 'Unobtainium2+/U')) as { code: string; message: string };
    expect(r.code).toBe('#N/A');
    expect(r.message).toMatch(/unknown couple "Unobtainium2\+\/U"/);
    expect(isError(one(await call('STDPOTENTIAL', 'CO2+/CO')), '#N/A')).toBe(true); // CO is not Co
    expect(isError(one(await call('STDPOTENTIAL', 0.3521)), '#VALUE!')).toBe(true);
    expect(isError(one(await call('STDPOTENTIAL', null)), '#VALUE!')).toBe(true);
  });
  it('a bad element in a range errs in that element only', async () => {
    const r = await call('STDPOTENTIAL', [['Ag+/Ag', 'nope', 'H+/H2']]);
    expect(r[0][0]).toBe(0.7992); // data/couples.json (Thermoddem V1.10 / MINTEQA2 v4, from the cited log K)
    expect(isError(r[0][1], '#N/A')).toBe(true);
    expect(r[0][2]).toBe(0); // SHE by definition
  });
});

describe('ELECTRONS, HALFREACTION, SOURCE', () => {
  it('n of each couple down a column', async () => {
    const r = await call('ELECTRONS', [['MnO4-/Mn2+'], ['Cr2O7^2-/Cr3+'], ['O2/OH-'], ['Ag+/Ag']]);
    expect(r.map((x) => x[0])).toEqual([5, 6, 4, 1]);
  });
  it('the half-reaction and the source as text', async () => {
    expect(one(await call('HALFREACTION', 'MnO4(-)/Mn(2+)'))).toBe('MnO4- + 8H+ + 5e- -> Mn2+ + 4H2O');
    expect(one(await call('SOURCE', 'Cu2+/Cu'))).toMatch(/Thermoddem V1\.10.*line 8717 Cu\(element\): log K 31\.601/);
    expect(isError(one(await call('SOURCE', 'Xx/Yy')), '#N/A')).toBe(true);
  });
});
