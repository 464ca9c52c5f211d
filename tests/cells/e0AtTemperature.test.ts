import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { e0AtTemperature } from '../../src/cells/e0AtTemperature';
import { DomainError, NotFoundError } from '../../src/errors';
import { builtinTable } from '../../src/table/builtin';

const t = builtinTable();

describe('e0AtTemperature', () => {
  it('returns the stored E° at 25 °C, with or without dE/dT', () => {
    expect(e0AtTemperature(t.findCouple('Cu2+/Cu')!, 25)).toBe(0.3419); // CRC Handbook, Electrochemical Series (from memory)
    expect(e0AtTemperature(t.findCouple('MnO4-/Mn2+')!, 25)).toBe(1.507); // CRC Handbook, Electrochemical Series (from memory)
  });

  it('O2/H2O at 80 °C: 1.229 − 0.846 mV/K · 55 K = 1.1825 V', () => {
    // E° 1.229 V (CRC Handbook), dE°/dT −0.846 mV/K (Bratsch 1989, from memory); the reversible water-splitting
    // voltage of about 1.18 V at 80 °C is common practice for electrolyser sizing
    expect(e0AtTemperature(t.findCouple('O2/H2O')!, 80)).toBeCloseTo(1.229 - 0.846e-3 * 55, 10);
    expect(e0AtTemperature(t.findCouple('O2/H2O')!, 80)).toBeCloseTo(1.18, 2);
  });

  it('Ag+/Ag at 0 °C: 0.7996 + 0.989 mV/K · 25 K = 0.82433 V', () => {
    // E° 0.7996 V (CRC Handbook, 92nd ed.), dE°/dT −0.989 mV/K (Bratsch 1989, from memory)
    expect(e0AtTemperature(t.findCouple('Ag+/Ag')!, 0)).toBeCloseTo(0.824325, 9);
  });

  it('the SHE stays 0 V at every temperature', () => {
    fc.assert(fc.property(fc.double({ min: 0, max: 100, noNaN: true }), (tc) => {
      expect(e0AtTemperature(t.findCouple('H+/H2')!, tc)).toBe(0);
    }));
  });

  it('says so when no dE/dT is stored', () => {
    expect(() => e0AtTemperature(t.findCouple('MnO4-/Mn2+')!, 40)).toThrow(NotFoundError);
    expect(() => e0AtTemperature(t.findCouple('MnO4-/Mn2+')!, 40)).toThrow(/no dE°\/dT is stored for "MnO4-\/Mn2\+"/);
  });

  it('refuses temperatures outside 0…100 °C', () => {
    for (const tc of [-0.1, 100.1, -300, Number.NaN]) {
      expect(() => e0AtTemperature(t.findCouple('Cu2+/Cu')!, tc)).toThrow(DomainError);
    }
    expect(e0AtTemperature(t.findCouple('Cu2+/Cu')!, 100)).toBeCloseTo(0.3419 + 0.011e-3 * 75, 12);
  });
});
