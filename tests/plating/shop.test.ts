import { describe, expect, it } from 'vitest';
import { ecEquiv } from '../../src/faraday/ecEquiv';
import { additiveDose } from '../../src/plating/additiveDose';
import { anodeEfficiency } from '../../src/plating/anodeEfficiency';
import { dragOutLoss } from '../../src/plating/dragOutLoss';
import { efficiencyCurve } from '../../src/plating/efficiencyCurve';
import { hullCell } from '../../src/plating/hullCell';
import { metalPerKAh } from '../../src/plating/metalPerKAh';
import { platingCurrent } from '../../src/plating/platingCurrent';
import { thicknessFromMass } from '../../src/plating/thicknessFromMass';
import { throwingPower } from '../../src/plating/throwingPower';

/** dm² per ft² (NIST SP 811: 1 ft = 0.3048 m exactly). */
const DM2_PER_FT2 = 9.290304;

describe('hullCell: i = I·(C1 − C2·log10 L)', () => {
  // Metal Finishing Guidebook 2013 (metalfinishing.epubxp.com/i/218436-2013/482), Hull cell, Current distribution:
  // 267 mL: I(27.7 − 48.7 log L); 1000 mL: I(18.8 − 28.3 log L); A/ft², I in A, L in inches, 0.25 ≤ L ≤ 3.25 in
  it('267 mL cell at 1 in (2.54 cm): 27.7 A/ft² per A', () => {
    expect(hullCell(1, 2.54, 267) * DM2_PER_FT2).toBeCloseTo(27.7, 10);
    expect(hullCell(2, 2.54, 267)).toBeCloseTo((2 * 27.7) / DM2_PER_FT2, 10);
  });
  it('267 mL cell at the ends of the validity range, 0.25 and 3.25 in', () => {
    expect(hullCell(1, 0.635, 267) * DM2_PER_FT2).toBeCloseTo(27.7 - 48.7 * Math.log10(0.25), 10); // 57.02 A/ft²
    expect(hullCell(1, 8.255, 267) * DM2_PER_FT2).toBeCloseTo(27.7 - 48.7 * Math.log10(3.25), 10); // 2.77 A/ft²
  });
  it('1000 mL cell at 2 in (5.08 cm)', () => {
    expect(hullCell(3, 5.08, 1000) * DM2_PER_FT2).toBeCloseTo(3 * (18.8 - 28.3 * Math.log10(2)), 10);
  });
  it('in metric units it is the familiar i ≈ I·(5.10 − 5.24·log10 L[cm]) A/dm² (common practice)', () => {
    for (const L of [0.635, 1, 3, 8.255]) expect(hullCell(1, L, 267)).toBeCloseTo(5.1 - 5.24 * Math.log10(L), 2);
  });
  it('outside 0.635–8.255 cm, or another cell size, is refused with the range', () => {
    expect(() => hullCell(2, 0.5, 267)).toThrow(/outside 0.635 to 8.255 cm/);
    expect(() => hullCell(2, 9, 267)).toThrow(/0.25 to 3.25 in/);
    expect(() => hullCell(2, 3, 500)).toThrow(/267 or 1000/);
  });
});

describe('efficiencyCurve (a curve the user supplies)', () => {
  const T = [45, 55, 65];
  const E = [0.2, 0.16, 0.12]; // invented curve for the test
  it('at the points and between them, linearly, in any order', () => {
    expect(efficiencyCurve(55, T, E)).toBeCloseTo(0.16, 15);
    expect(efficiencyCurve(50, T, E)).toBeCloseTo(0.18, 15);
    expect(efficiencyCurve(62.5, [65, 45, 55], [0.12, 0.2, 0.16])).toBeCloseTo(0.13, 15);
    expect(efficiencyCurve(45, T, E)).toBe(0.2);
    expect(efficiencyCurve(65, T, E)).toBe(0.12);
  });
  it('no extrapolation; percentages, duplicates and unequal lengths refused', () => {
    expect(() => efficiencyCurve(70, T, E)).toThrow(/outside the curve, which covers 45 to 65 °C/);
    expect(() => efficiencyCurve(50, T, [20, 16, 12])).toThrow(/give 0.2 for 20 %/);
    expect(() => efficiencyCurve(50, [45, 45, 65], E)).toThrow(/two points at 45 °C/);
    expect(() => efficiencyCurve(50, [45, 65], E)).toThrow(/as many temperatures as efficiencies/);
    expect(() => efficiencyCurve(50, [45], [0.2])).toThrow(/at least two points/);
  });
});

describe('platingCurrent, metalPerKAh, additiveDose, dragOutLoss', () => {
  it('rack current is area × current density × pieces (definition of current density)', () => {
    expect(platingCurrent(1.5, 3, 40)).toBe(180);
  });
  it('metal per kA·h equals the electrochemical equivalent in g/(A·h) times ε (1 g/(A·h) = 1 kg/(kA·h))', () => {
    expect(metalPerKAh('Ni', 2, 1)).toBeCloseTo(ecEquiv('Ni', 2), 15);
    // Faraday's law: 58.693 · 3600 / (2 · 96485.33212) = 1.094958 kg/(kA·h) (CODATA 2018 F, IUPAC Ni)
    expect(metalPerKAh('Ni', 2, 1)).toBeCloseTo(1.094958, 6);
    // tin: Sn(II) from acid baths, Sn(IV) from stannate baths deposit 2.2139 and 1.1070 kg/(kA·h)
    expect(metalPerKAh('Sn', 2, 1)).toBeCloseTo((118.71 * 3600) / (2 * 96485.33212), 9);
    expect(metalPerKAh('Sn', 4, 1) * 2).toBeCloseTo(metalPerKAh('Sn', 2, 1), 12);
  });
  it('additive dose: 12 500 A·h at 150 mL/kA·h is 1875 mL', () => {
    expect(additiveDose(12500, 150)).toBe(1875);
  });
  it('drag-out: 0.15 L per load of 250 g/L for 24 loads is 900 g', () => {
    expect(dragOutLoss(0.15, 250, 24)).toBeCloseTo(900, 10);
  });
});

describe('anodeEfficiency (not clamped at 1)', () => {
  it('a zinc anode that lost more than Faraday\'s law allows reads above 1', () => {
    // 1000 A·h dissolve 1219.7 g of Zn at 100 % (65.38 · 3600 / (2F)); a loss of 1300 g is 1.066
    expect(anodeEfficiency(1300, 1000, 'Zn', 2)).toBeCloseTo(1300 / ((65.38 * 3600) / (2 * 96485.33212) * 1000), 9);
    expect(anodeEfficiency(1300, 1000, 'Zn', 2)).toBeGreaterThan(1);
    expect(anodeEfficiency(1219.7, 1000, 'Zn', 2)).toBeCloseTo(1, 4);
  });
});

describe('throwingPower, Haring–Blum cell: 100·(L − M)/(L + M − 2)', () => {
  // formula as in Corrosionpedia "Throwing power" (T.P. % = 100 (5 − M)/(5 + M − 2) for L = 5) and
  // Big Chemical Encyclopedia, "Haring-Blum cathode" (TP = (L − M)/(L + M − 2); 0 at M = L, −100 % as M → ∞, +100 % at M = 1)
  it('the fixed points of the scale', () => {
    expect(throwingPower(5, 5)).toBe(0);
    expect(throwingPower(5, 1)).toBe(100);
    expect(throwingPower(5, 1e9)).toBeCloseTo(-100, 5);
    expect(throwingPower(5, 3)).toBeCloseTo(100 / 3, 12);
  });
  it('L ≤ 1, or M where the denominator vanishes, is refused', () => {
    expect(() => throwingPower(1, 2)).toThrow(/must be > 1/);
    expect(() => throwingPower(1.5, 0.5)).toThrow(/at or below 2 − L/);
  });
});

describe('thicknessFromMass: h = m/(ρ·A)', () => {
  it('the mass per unit area gives a thickness through the density (ASTM B767 §4.4): 1 g of nickel on 2 dm² is 5.613 µm', () => {
    // 1 g / (8.908 g/cm³ · 200 cm²) = 5.6129e-4 cm
    expect(thicknessFromMass(1, 2, 8.908)).toBeCloseTo(1e4 / (8.908 * 200), 12);
    expect(thicknessFromMass(1, 2, 8.908)).toBeCloseTo(5.613, 3);
  });
});
