import { describe, expect, it } from 'vitest';
import { DomainError, NotFoundError } from '../../src/errors';
import { refPotential } from '../../src/scales/refPotential';
import { builtinTable } from '../../src/table/builtin';
import type { ElectrodeRow } from '../../src/table/types';

const row = (k: string): ElectrodeRow => builtinTable().findElectrode(k)!;

describe('refPotential', () => {
  it('returns the stored value at 25 °C, also for rows without dE/dT', () => {
    expect(refPotential(row('SCE'), 25)).toBe(0.2412); // Bard & Faulkner 2nd ed., inside back cover
    expect(refPotential(row('Ag/AgCl/KCl(3M)'), 25)).toBe(0.21); // common practice (makers' data, 3 mol/L KCl)
  });
  it('SCE falls by about 6.7 mV from 25 to 35 °C', () => {
    // Sawyer, Sobkowiak & Roberts (1995) §5.2: SCE 0.2444 V at 25 °C and 0.2376 V at 35 °C (with junction),
    // a fall of 6.8 mV (read in a secondary reproduction); the row's −0.661 mV/K gives 6.6 mV.
    expect(refPotential(row('SCE'), 35) - refPotential(row('SCE'), 25)).toBeCloseTo(-0.0068, 3);
  });
  it('Ag/AgCl (sat. KCl) falls by about 10 mV from 15 to 25 °C', () => {
    // Sawyer, Sobkowiak & Roberts (1995) §5.2: 0.209 V at 15 °C, 0.199 V at 25 °C (read in a secondary reproduction)
    expect(refPotential(row('Ag/AgCl/KCl(sat)'), 15) - refPotential(row('Ag/AgCl/KCl(sat)'), 25)).toBeCloseTo(0.01, 4);
  });
  it('CSE rises about 0.9 mV per kelvin', () => {
    // common practice in cathodic protection (about +0.9 mV/°C), from memory
    expect(refPotential(row('CSE'), 35)).toBeCloseTo(0.316 + 0.009, 6);
  });
  it('a row without dE/dT is known only at 25 °C (#N/A naming it)', () => {
    expect(() => refPotential(row('Ag/AgCl/KCl(3M)'), 40)).toThrow(NotFoundError);
    expect(() => refPotential(row('Ag/AgCl/KCl(3M)'), 40)).toThrow(/Ag\/AgCl\/KCl\(3M\)/);
  });
  it('outside 0…100 °C is a domain error', () => {
    expect(() => refPotential(row('SCE'), -1)).toThrow(DomainError);
    expect(() => refPotential(row('SCE'), 100.5)).toThrow(DomainError);
    expect(refPotential(row('SCE'), 0)).toBeCloseTo(0.2412 + 0.661e-3 * 25, 9);
  });
});
