import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { e0AtTemperature } from '../../src/cells/e0AtTemperature';
import { DomainError, NotFoundError } from '../../src/errors';
import { builtinTable } from '../../src/table/builtin';

const t = builtinTable();

describe('e0AtTemperature', () => {
  it('returns the stored E° at 25 °C, with or without dE/dT', () => {
    expect(e0AtTemperature(t.findCouple('Cu2+/Cu')!, 25)).toBe(0.3372); // data/couples.json (Thermoddem V1.10 / MINTEQA2 v4, computed from the cited log K)
    expect(e0AtTemperature(t.findCouple('Bi3+/Bi')!, 25)).toBe(0.3307); // CHNOSZ OBIGT, SSWS97 ΔfG°(Bi3+) (no dE/dT)
  });

  it('O2/H2O at 80 °C: 1.2292 − 0.845 mV/K · 55 K = 1.1827 V', () => {
    // E° 1.2292 V, dE°/dT −0.845 mV/K: data/couples.json (Thermoddem V1.10 / MINTEQA2 v4, computed from the cited log K); the reversible water-splitting
    // voltage of about 1.18 V at 80 °C is common practice for electrolyser sizing
    expect(e0AtTemperature(t.findCouple('O2/H2O')!, 80)).toBeCloseTo(1.2292 - 0.845e-3 * 55, 10);
    expect(e0AtTemperature(t.findCouple('O2/H2O')!, 80)).toBeCloseTo(1.18, 2);
  });

  it('Ag+/Ag at 0 °C: 0.7992 + 0.996 mV/K · 25 K = 0.8241 V', () => {
    // E° 0.7992 V, dE°/dT −0.996 mV/K: data/couples.json (Thermoddem V1.10 / MINTEQA2 v4, computed from the cited log K)
    expect(e0AtTemperature(t.findCouple('Ag+/Ag')!, 0)).toBeCloseTo(0.7992 + 0.996e-3 * 25, 9);
  });

  it('the SHE stays 0 V at every temperature', () => {
    fc.assert(fc.property(fc.double({ min: 0, max: 100, noNaN: true }), (tc) => {
      expect(e0AtTemperature(t.findCouple('H+/H2')!, tc)).toBe(0);
    }));
  });

  it('says so when no dE/dT is stored', () => {
    expect(() => e0AtTemperature(t.findCouple('Bi3+/Bi')!, 40)).toThrow(NotFoundError);
    expect(() => e0AtTemperature(t.findCouple('Bi3+/Bi')!, 40)).toThrow(/no dE°\/dT is stored for "Bi3\+\/Bi"/);
  });

  it('refuses temperatures outside 0…100 °C', () => {
    for (const tc of [-0.1, 100.1, -300, Number.NaN]) {
      expect(() => e0AtTemperature(t.findCouple('Cu2+/Cu')!, tc)).toThrow(DomainError);
    }
    expect(e0AtTemperature(t.findCouple('Cu2+/Cu')!, 100)).toBeCloseTo(0.3372 - 0.002e-3 * 75, 12);
  });
});
