import { describe, expect, it } from 'vitest';
import { bruggemanConductivity } from '../../src/electrolysis/bruggemanConductivity';
import { electrolyteConductivity } from '../../src/electrolysis/electrolyteConductivity';
import { kohConductivity } from '../../src/electrolysis/kohConductivity';
import { ohmicDrop } from '../../src/electrolysis/ohmicDrop';
import { InputError, NotFoundError } from '../../src/errors';

/** The Gilliam et al. (2007) correlation written out independently, S/cm (M mol/L, T K). */
function gilliam(M: number, T: number): number {
  return -2.041 * M - 0.0028 * M ** 2 + 0.005332 * M * T + (207.2 * M) / T + 0.001043 * M ** 3 - 0.0000003 * M ** 2 * T ** 2;
}

describe('kohConductivity (Gilliam, Graydon, Kirk & Thorpe, Int. J. Hydrogen Energy 32 (2007) 359)', () => {
  it('is the published correlation, in S/m', () => {
    for (const [M, t] of [[1, 25], [6.9, 25], [6.9, 80], [12, 100], [3, 0]]) {
      expect(kohConductivity(M, t)).toBeCloseTo(gilliam(M, t + 273.15) * 100, 10);
    }
  });
  it('gives the measured order of magnitude of 30 wt % KOH', () => {
    // 30 wt % KOH (6.9 mol/L) ≈ 0.62 S/cm at 25 °C and ≈ 1.4 S/cm at 80 °C: values widely quoted for alkaline
    // electrolysers, from memory
    expect(kohConductivity(6.9, 25)).toBeCloseTo(62, 0);
    expect(kohConductivity(6.9, 80) / 100).toBeCloseTo(1.39, 1);
  });
  it('has its conductivity maximum between 6 and 8 mol/L at 25 °C (the paper’s figures)', () => {
    const ks = [4, 5, 6, 7, 8, 9, 10].map((m) => kohConductivity(m, 25));
    const best = [4, 5, 6, 7, 8, 9, 10][ks.indexOf(Math.max(...ks))];
    expect(best).toBeGreaterThanOrEqual(6);
    expect(best).toBeLessThanOrEqual(8);
  });
  it('refuses to extrapolate: outside 0–12 mol/L or 0–100 °C is an input error naming the range', () => {
    expect(() => kohConductivity(12.5, 25)).toThrow(InputError);
    expect(() => kohConductivity(12.5, 25)).toThrow(/0–12 mol\/L/);
    expect(() => kohConductivity(6, 101)).toThrow(/0–100 °C/);
    expect(() => kohConductivity(6, -1)).toThrow(InputError);
    // 30 cannot be a molarity: KOH saturates at 14.1 mol/L at 25 °C (Sipos, Hefter & May, J. Chem. Eng. Data 45 (2000) 613, abstract)
    expect(() => kohConductivity(30, 25)).toThrow(/a mass percentage\?/);
    expect(() => kohConductivity(13, 25)).toThrow(/0–12 mol\/L \(Gilliam et al\. 2007\)$/); // a possible molarity: no hint
  });
  it('electrolyteConductivity dispatches by name and names what exists', () => {
    expect(electrolyteConductivity(' koh ', 6.9, 80)).toBe(kohConductivity(6.9, 80));
    expect(() => electrolyteConductivity('NaCl', 1, 25)).toThrow(NotFoundError);
    expect(() => electrolyteConductivity('NaCl', 1, 25)).toThrow(/available: KOH/);
  });
});

describe('ohmic drop and Bruggeman', () => {
  it('U = j·d/κ', () => {
    // 0.3 A/cm² across 3 mm of 30 % KOH at 80 °C (1.386 S/cm): 0.3 × 0.3 / 1.386 = 0.0649 V (Ohm's law)
    expect(ohmicDrop(3000, 3, 138.6)).toBeCloseTo(0.0649, 4);
    expect(ohmicDrop(0, 3, 100)).toBe(0);
  });
  it('κ_eff = κ(1 − ε)^1.5 (Bruggeman 1935)', () => {
    expect(bruggemanConductivity(100, 0)).toBe(100);
    expect(bruggemanConductivity(100, 0.2)).toBeCloseTo(100 * 0.8 ** 1.5, 12); // 71.55
    expect(bruggemanConductivity(100, 0.5)).toBeCloseTo(35.355, 3);
  });
  it('a gas fraction of 1 or more (a percentage typed for a fraction) is an input error', () => {
    expect(() => bruggemanConductivity(100, 1)).toThrow(InputError);
    expect(() => bruggemanConductivity(100, 20)).toThrow(/percentage/);
  });
});
