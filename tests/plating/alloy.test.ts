import { describe, expect, it } from 'vitest';
import { equivWeight } from '../../src/corrosion/equivWeight';
import { InputError, NotFoundError } from '../../src/errors';
import { plateThickness } from '../../src/faraday/plateThickness';
import { speciesMolarMass } from '../../src/faraday/speciesMolarMass';
import { alloyDensity } from '../../src/plating/alloyDensity';
import { alloyEquiv } from '../../src/plating/alloyEquiv';
import { alloyFraction } from '../../src/plating/alloyFraction';
import { alloyPlateTime } from '../../src/plating/alloyPlateTime';
import { alloyThickness } from '../../src/plating/alloyThickness';
import { parseAlloy } from '../../src/plating/parseAlloy';
import { partialCurrent } from '../../src/plating/partialCurrent';

describe('parseAlloy', () => {
  it('element symbols each followed by mass percent, as solder and plated alloys are designated', () => {
    const a = parseAlloy('Zn86Ni14');
    expect(a.symbols).toEqual(['Zn', 'Ni']);
    expect(a.fractions[0]).toBeCloseTo(0.86, 15);
    expect(a.atomicWeights).toEqual([65.38, 58.693]); // IUPAC CIAAW 2021 abridged (data/atomic-weights.json)
    expect(parseAlloy('Sn96.5Ag3Cu0.5').fractions).toEqual([0.965, 0.03, 0.005]);
    expect(parseAlloy(' Zn 86 Ni 14 ').symbols).toEqual(['Zn', 'Ni']);
    // rounding: 99.8 is scaled to sum to 1
    const r = parseAlloy('Zn85.9Ni13.9');
    expect(r.fractions[0] + r.fractions[1]).toBeCloseTo(1, 15);
  });
  it('fractions, sums off 100, capitals, unknown and repeated elements are refused with the reason', () => {
    expect(() => parseAlloy('Zn0.86Ni0.14')).toThrow(/write mass percent, not fractions/);
    expect(() => parseAlloy('Zn80Ni14')).toThrow(/sum to 94; they must sum to 100/);
    expect(() => parseAlloy('ZN86NI14')).toThrow(InputError);
    expect(() => parseAlloy('Zn86Ni')).toThrow(/cannot read the alloy/);
    expect(() => parseAlloy('Zn50Zn50')).toThrow(/names Zn twice/);
    expect(() => parseAlloy('Zn86Xx14')).toThrow(NotFoundError);
    expect(() => parseAlloy('')).toThrow(/mass percent/);
  });
});

describe('alloyEquiv: EW = 1/Σ(wᵢ·nᵢ/Mᵢ)', () => {
  it('a pure metal is M/n (Faraday\'s law; IUPAC atomic weight of Ni 58.693)', () => {
    expect(alloyEquiv('Ni100', [2])).toBeCloseTo(58.693 / 2, 12);
  });
  it('agrees with the ASTM G102 eq. 5 alloy equivalent weight (EQUIVWEIGHT) for the same composition', () => {
    expect(alloyEquiv('Zn86Ni14', [2])).toBeCloseTo(equivWeight(['Zn', 'Ni'], [0.86, 0.14], [2, 2]), 12);
    // type 304 at mid-range composition: 25.12 (ASTM G102 Table 2, from memory, as in tests/corrosion)
    expect(alloyEquiv('Fe70.75Cr19Ni9.25Mn1', [2, 3, 2, 2])).toBeCloseTo(25.12, 1);
  });
  it('Zn–Ni 14 % and Sn–Pb 60/40 by hand from the definition; Cu(I)–Zn(II) brass with one valence each', () => {
    // 1/(0.86·2/65.38 + 0.14·2/58.693) = 32.177 g
    expect(alloyEquiv('Zn86Ni14', [2])).toBeCloseTo(1 / ((0.86 * 2) / 65.38 + (0.14 * 2) / 58.693), 12);
    expect(alloyEquiv('Zn86Ni14', [2])).toBeCloseTo(32.177, 3);
    // 1/(0.6·2/118.71 + 0.4·2/207.2) = 71.584 g
    expect(alloyEquiv('Sn60Pb40', [2])).toBeCloseTo(71.584, 3);
    expect(alloyEquiv('Cu70Zn30', [1, 2])).toBeCloseTo(1 / (0.7 / 63.546 + (0.3 * 2) / 65.38), 12);
  });
  it('valences: one for all or one per element, whole numbers 1 to 8', () => {
    expect(() => alloyEquiv('Cu70Zn30', [1, 2, 2])).toThrow(/one valence for all elements or one per element/);
    expect(() => alloyEquiv('Zn86Ni14', [2.5])).toThrow(/whole number from 1 to 8/);
  });
});

describe('alloyDensity: 1/ρ = Σ(wᵢ/ρᵢ)', () => {
  it('Sn60Pb40 with Sn 7.29 and Pb 11.34 g/cm³ is 8.50 g/cm³ (Indium Corp., Lasky, "Interest in Formula for Calculating Alloy Density Still Keen")', () => {
    expect(alloyDensity('Sn60Pb40', [7.29, 11.34])).toBeCloseTo(8.5, 2);
  });
  it('Sn96Ag4 with Sn 7.31 and Ag 10.5 g/cm³ is 7.399927 g/cm³ (the same page, worked example)', () => {
    expect(alloyDensity('Sn96Ag4', [7.31, 10.5])).toBeCloseTo(7.399927, 6);
  });
  it('one density per element, in g/cm³', () => {
    expect(() => alloyDensity('Sn60Pb40', [7.29])).toThrow(/one density per element/);
    expect(() => alloyDensity('Sn60Pb40', [7290, 11340])).toThrow(/g\/cm³/);
  });
});

describe('alloyThickness and alloyPlateTime', () => {
  it('are plateThickness with the alloy equivalent weight as molar mass and n = 1', () => {
    const ew = alloyEquiv('Zn86Ni14', [2]);
    expect(alloyThickness(2, 30, 'Zn86Ni14', [2], 7.1, 0.6)).toBeCloseTo(plateThickness(2, 30, ew, 1, 7.1, 0.6), 12);
    // by hand: 2 A/dm² · 1800 s · 0.6 · 32.177 g / (96485.33212 · 7.1 g/cm³ · 100 cm²) · 10⁴ µm/cm = 10.146 µm
    expect(alloyThickness(2, 30, 'Zn86Ni14', [2], 7.1, 0.6)).toBeCloseTo(10.146, 3);
    expect(alloyPlateTime(10.145571085728246, 2, 'Zn86Ni14', [2], 7.1, 0.6)).toBeCloseTo(30, 9);
  });
});

describe('partialCurrent and alloyFraction (Faraday\'s law for each metal)', () => {
  it('partial currents sum to ε·I and give back the composition', () => {
    const zn = partialCurrent(10, 'Zn86Ni14', 'Zn', [2], 0.7);
    const ni = partialCurrent(10, 'Zn86Ni14', 'Ni', [2], 0.7);
    expect(zn + ni).toBeCloseTo(7, 12);
    // Ni share of charge: (0.14·2/58.693)/(0.86·2/65.38 + 0.14·2/58.693) = 0.15350
    expect(ni / 7).toBeCloseTo(0.1535, 4);
    expect(alloyFraction('Ni', ['Zn', 'Ni'], [zn, ni], [2])).toBeCloseTo(0.14, 12);
    expect(alloyFraction('Zn', ['Zn', 'Ni'], [zn, ni], [2, 2])).toBeCloseTo(0.86, 12);
  });
  it('mass from charge: 1 A of Cu(I) and 1 A of Zn(II) give Cu:Zn = 63.546/1 : 65.38/2 by mass', () => {
    expect(alloyFraction('Cu', ['Cu', 'Zn'], [1, 1], [1, 2])).toBeCloseTo(63.546 / (63.546 + 65.38 / 2), 12);
  });
  it('an element not in the alloy, a missing partner, negative currents are refused', () => {
    expect(() => partialCurrent(10, 'Zn86Ni14', 'Fe', [2], 1)).toThrow(/has no "Fe"/);
    expect(() => alloyFraction('Fe', ['Zn', 'Ni'], [1, 1], [2])).toThrow(/not among/);
    expect(() => alloyFraction('Ni', ['Zn', 'Ni'], [1], [2])).toThrow(/one partial current per element/);
    expect(() => alloyFraction('Ni', ['Zn', 'Ni'], [0, 0], [2])).toThrow(/all zero/);
  });
});

describe('an alloy typed as a species of the Faraday\'s-law functions', () => {
  it('"Zn0.86Ni0.14" says it looks like an alloy and how to give one', () => {
    expect(() => speciesMolarMass('Zn0.86Ni0.14')).toThrow(/looks like an alloy/);
    expect(() => speciesMolarMass('CuSO4.5H2O')).not.toThrow();
  });
});
