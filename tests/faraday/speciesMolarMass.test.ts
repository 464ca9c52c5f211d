import { describe, expect, it } from 'vitest';
import { InputError } from '../../src/errors';
import { miscapitalisedElement, speciesMolarMass } from '../../src/faraday/speciesMolarMass';
import { molarMass } from '../../src/faraday/molarMass';
import { plateTime } from '../../src/faraday/plateTime';

describe('miscapitalised element symbols in the deposition functions', () => {
  it.each([
    ['NI', 'Ni'],
    ['CU', 'Cu'],
    ['SN', 'Sn'],
    ['PB', 'Pb'],
    ['CO', 'Co'],
    ['NI2+', 'Ni'],
    [' CU ', 'Cu'],
  ])('%s is refused with "did you mean %s?"', (typed, meant) => {
    expect(() => speciesMolarMass(typed)).toThrow(InputError);
    expect(() => speciesMolarMass(typed)).toThrow(`did you mean ${meant}?`);
  });

  it('leaves correct symbols, formulas with counts and numbers alone', () => {
    expect(speciesMolarMass('Ni')).toBe(58.693); // IUPAC CIAAW 2021 abridged (data/atomic-weights.json)
    expect(speciesMolarMass('NiSO4')).toBe(molarMass('NiSO4'));
    expect(speciesMolarMass(58.69)).toBe(58.69);
    expect(miscapitalisedElement('NI3')).toBeUndefined(); // a formula with a count
    expect(miscapitalisedElement('KI')).toBeUndefined(); // "Ki" is no element
    expect(miscapitalisedElement('Co')).toBeUndefined();
  });

  it('gives the same answers when texts repeat (each accepted text is remembered; refusals never are)', () => {
    for (let i = 0; i < 3; i++) {
      expect(speciesMolarMass('Cu')).toBe(63.546); // IUPAC CIAAW 2021 abridged (data/atomic-weights.json)
      expect(() => speciesMolarMass('CU')).toThrow('did you mean Cu?');
      expect(() => speciesMolarMass('Cu SO4')).toThrow(InputError);
      expect(speciesMolarMass('CuSO4·5H2O')).toBe(molarMass('CuSO4·5H2O'));
    }
  });

  it('MOLARMASS itself keeps CO as carbon monoxide', () => {
    expect(molarMass('CO')).toBeCloseTo(12.011 + 15.999, 9); // IUPAC CIAAW 2021 abridged values
  });

  it('the silent wrong answer of PLATETIME(10, 2, "NI", 2, 8.9) is now an error', () => {
    expect(() => plateTime(10, 2, 'NI', 2, 8.9, 1)).toThrow('did you mean Ni?');
    // With the element: t = d·ρ·n·F / (M·i) = 10e-4 cm · 8.9 g/cm³ · 2 · 96485.33212 / (58.693 · 0.02 A/cm²) s
    // = 1463.0 s = 24.38 min (the figure the hand check gives; Faraday's law, common practice)
    expect(plateTime(10, 2, 'Ni', 2, 8.9, 1)).toBeCloseTo(24.38, 2);
  });
});
