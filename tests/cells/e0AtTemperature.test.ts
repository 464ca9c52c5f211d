import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { e0AtTemperature } from '../../src/cells/e0AtTemperature';
import { InputError, NotFoundError } from '../../src/errors';
import { builtinTable } from '../../src/table/builtin';

const t = builtinTable();

describe('e0AtTemperature', () => {
  it('returns the stored E° at 25 °C, with or without dE/dT', () => {
    expect(e0AtTemperature(t.findCouple('Cu2+/Cu')!, 25)).toBe(0.3372); // data/couples.json (Thermoddem V1.10 / MINTEQA2 v4, computed from the cited log K)
    expect(e0AtTemperature(t.findCouple('Bi3+/Bi')!, 25)).toBe(0.3307); // CHNOSZ OBIGT, SSWS97 ΔfG°(Bi3+) (no dE/dT)
  });

  // Species data below: NBS 1982 tables (Wagman et al., J. Phys. Chem. Ref. Data 11 Suppl. 2), NIST digital
  // edition mds2-2124, as in data/species.json: ΔfH° kJ/mol, ΔfG° kJ/mol, S° J/(mol·K), Cp° J/(mol·K).
  const R = 8.314462618;
  const F = 96485.33212;
  const gAt = (dG: number, dS: number, dCp: number, T: number) =>
    dG - (T - 298.15) * dS + dCp * (T - 298.15 - T * Math.log(T / 298.15));

  it('O2/H2O at 80 °C: E°(25 °C) plus the species-derived shift, with ΔrCp', () => {
    // O2 + 2H2 → 2H2O(l): ΔrG = 2·(−237.129) kJ, ΔrS = 2·69.91 − 205.138 − 2·130.684, ΔrCp = 2·75.291 − 29.355 − 2·28.824
    const dS = 2 * 69.91 - 205.138 - 2 * 130.684;
    const dCp = 2 * 75.291 - 29.355 - 2 * 28.824;
    const shift = -(gAt(-474258, dS, dCp, 353.15) - -474258) / (4 * F);
    expect(e0AtTemperature(t.findCouple('O2/H2O')!, 80)).toBeCloseTo(t.findCouple("O2/H2O")!.e0 + shift, 10);
    // The row's linear coefficient −0.845 mV/K (Thermoddem V1.10) agrees within 1 mV at 80 °C; the
    // reversible water-splitting voltage of about 1.18 V at 80 °C is common practice for electrolyser sizing
    expect(Math.abs(e0AtTemperature(t.findCouple('O2/H2O')!, 80) - (1.2292 - 0.845e-3 * 55))).toBeLessThan(1e-3);
    expect(e0AtTemperature(t.findCouple('O2/H2O')!, 80)).toBeCloseTo(1.18, 2);
  });

  it('Ag+/Ag at 0 °C: species data with ΔrCp', () => {
    // Ag+ + ½H2 → Ag + H+: ΔrS = 42.55 − 72.68 − 130.684/2, ΔrCp = 25.351 − 21.8 − 28.824/2 (NBS 1982)
    const dS = 42.55 - 72.68 - 130.684 / 2;
    const dCp = 25.351 - 21.8 - 28.824 / 2;
    const shift = -(gAt(-77107, dS, dCp, 273.15) - -77107) / F;
    expect(e0AtTemperature(t.findCouple('Ag+/Ag')!, 0)).toBeCloseTo(t.findCouple("Ag+/Ag")!.e0 + shift, 10);
    // the row's linear dE°/dT (−0.996 mV/K, Thermoddem V1.10) gives 0.8241 V from 0.7992 V; the two bases agree within 0.5 mV
    expect(Math.abs(e0AtTemperature(t.findCouple('Ag+/Ag')!, 0) - 0.8241)).toBeLessThan(0.5e-3);
    void R;
  });

  it('falls back to the row’s dE°/dT when the species table does not cover the couple', () => {
    // an edited row whose half-reaction has a species without data: the linear rule answers
    const row = { key: 'X', e0: 1.5, dEdT_mV_K: 0.3, parsed: t.findCouple('Bi3+/Bi')!.parsed };
    expect(e0AtTemperature(row, 45)).toBeCloseTo(1.5 + 0.3e-3 * 20, 12);
    expect(e0AtTemperature({ key: 'Y', e0: 0.2, dEdT_mV_K: -1 }, 35)).toBeCloseTo(0.19, 12);
  });

  it('the SHE stays 0 V at every temperature', () => {
    fc.assert(fc.property(fc.double({ min: 0, max: 100, noNaN: true }), (tc) => {
      expect(e0AtTemperature(t.findCouple('H+/H2')!, tc)).toBe(0);
    }));
  });

  it('says so when neither species data nor a dE/dT covers the couple', () => {
    // Bi3+(aq) (ΔfG° only) is not in the NBS 1982 tables at the standard state (data/species.json, notCovered)
    expect(() => e0AtTemperature(t.findCouple('Bi3+/Bi')!, 40)).toThrow(NotFoundError);
    expect(() => e0AtTemperature(t.findCouple('Bi3+/Bi')!, 40)).toThrow(/"Bi3\+\/Bi" has neither species data/);
    expect(e0AtTemperature(t.findCouple('Bi3+/Bi')!, 25)).toBe(t.findCouple('Bi3+/Bi')!.e0);
  });

  it('refuses temperatures outside 0…100 °C', () => {
    for (const tc of [-0.1, 100.1, -300, Number.NaN]) {
      expect(() => e0AtTemperature(t.findCouple('Cu2+/Cu')!, tc)).toThrow(InputError);
    }
    // Cu2+ has no Cp° in the NBS tables, so ΔrCp = 0: linear in T with slope ΔrS/2F,
    // ΔrS = 33.150 − (−99.6) − 130.684 (NBS 1982); Bratsch's +0.011 mV/K is the same slope to 0.1 µV/K
    const slope = (33.15 + 99.6 - 130.684) / (2 * 96485.33212);
    expect(e0AtTemperature(t.findCouple('Cu2+/Cu')!, 100)).toBeCloseTo(0.3372 + slope * 75, 12);
  });
});
