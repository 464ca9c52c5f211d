import { describe, expect, it } from 'vitest';
import { bruggemanConductivity } from '../../src/electrolysis/bruggemanConductivity';
import { electrolyteConductivity } from '../../src/electrolysis/electrolyteConductivity';
import { h2so4Conductivity } from '../../src/electrolysis/h2so4Conductivity';
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
    expect(() => electrolyteConductivity('NaCl', 1, 25)).toThrow(/available: KOH, H2SO4;/);
    expect(electrolyteConductivity('h2so4', 2, 25)).toBe(h2so4Conductivity(2, 25));
    expect(electrolyteConductivity('H₂SO₄', 2, 25)).toBe(h2so4Conductivity(2, 25)); // subscript digits read as ASCII
  });
});

/** The Gu, Wang & Liaw (1997) correlation written out independently, S/m (c in mol/L). */
function gu(c: number): number {
  const cm3 = c * 1000; // mol/m³
  return cm3 * Math.exp(6.23 - 1.34e-4 * cm3 - 1.61e-8 * cm3 ** 2) * 1e-4;
}

describe('h2so4Conductivity (Gu, Wang & Liaw, J. Electrochem. Soc. 144 (1997) 2053)', () => {
  it('is the published correlation, in S/m, over 1–6 mol/L at 25 °C', () => {
    for (const c of [1, 1.84, 3, 5.65, 6]) expect(h2so4Conductivity(c, 25)).toBeCloseTo(gu(c), 10);
    expect(h2so4Conductivity(1.8, 25)).toBeCloseTo(68.16, 2); // the JSDoc example, from the formula above
  });
  it('has its maximum near 3.9 mol/L (about 31 wt %), where sulfuric acid conducts best', () => {
    // CRC Handbook, Concentrative Properties of Aqueous Solutions (20 °C): 30 wt % = 3.729 mol/L, 32 wt % = 4.030 mol/L
    // (read in github.com/amosonabike/CRC-Solution-Properties-, src/CRC Solution Properties.txt at commit 5eb7053);
    // the maximum conductivity of sulfuric acid lies near 30 wt %: from memory
    const cs = Array.from({ length: 501 }, (_, i) => 1 + i * 0.01);
    const ks = cs.map((c) => h2so4Conductivity(c, 25));
    const best = cs[ks.indexOf(Math.max(...ks))];
    expect(best).toBeGreaterThan(3.7);
    expect(best).toBeLessThan(4.03);
    expect(Math.max(...ks)).toBeCloseTo(91.92, 1); // the fit's own maximum, 0.919 S/cm
  });
  it('why the range starts at 1 mol/L: below it the fit reads well above the CRC Handbook table', () => {
    // CRC Handbook, Electrical Conductivity of Aqueous Solutions, 20 °C, κ in mS/cm at 0.5, 1, 2, 5 wt % H2SO4: 24.3, 47.8, 92, 211
    // (read in github.com/ugognw/pchemdb, tests/test_crc/Electrical Conductivity of Aqueous Solutions at 20C as a Function of
    // Concentration.csv at commit 38c7fc8f); the molarities of those mass fractions, 0.051, 0.102, 0.206, 0.526 mol/L, from the
    // CRC table of concentrative properties (same reading as above). 1 mS/cm = 0.1 S/m.
    const crc: [number, number][] = [[0.051, 24.3], [0.102, 47.8], [0.206, 92], [0.526, 211]];
    const ratio = crc.map(([c, k]) => gu(c) / (k / 10));
    // 25 °C against 20 °C: dilute sulfuric acid gains about 1.3 %/°C (common practice), so about 1.07 is expected
    expect(ratio[0]).toBeGreaterThan(1.04);
    expect(ratio[1]).toBeLessThan(1.09);
    expect(ratio[2]).toBeGreaterThan(1.1); // 2 wt %: more than the temperature explains
    expect(ratio[3]).toBeGreaterThan(1.15); // 5 wt %: 17 % above
    expect(() => h2so4Conductivity(0.526, 25)).toThrow(InputError);
  });
  it('refuses to extrapolate: outside 1–6 mol/L or at another temperature is an input error naming the range', () => {
    expect(() => h2so4Conductivity(0.5, 25)).toThrow(/1–6 mol\/L \(Gu, Wang & Liaw 1997\)/);
    expect(() => h2so4Conductivity(6.01, 25)).toThrow(InputError);
    expect(() => h2so4Conductivity(180, 25)).toThrow(/mol per litre of solution \(98\.08 g\/L is 1 mol\/L\)/); // 180 g/L typed for mol/L
    expect(() => h2so4Conductivity(2, 50)).toThrow(/has no temperature term and holds at 25 °C only/);
    expect(() => h2so4Conductivity(2, 24.9)).toThrow(InputError);
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
