import { describe, expect, it } from 'vitest';
import { asciiFormula } from '../../src/chem/asciiFormula';
import { parseSpecies } from '../../src/chem/formula';
import { molarMass } from '../../src/faraday/molarMass';

describe('asciiFormula', () => {
  it('reads subscript and superscript digits and signs as ASCII', () => {
    expect(asciiFormula('NiSO₄·6H₂O')).toBe('NiSO4·6H2O');
    expect(asciiFormula('Cu²⁺')).toBe('Cu2+');
    expect(asciiFormula('SO₄²⁻')).toBe('SO42-');
    expect(asciiFormula('Fe³⁺/Fe²⁺')).toBe('Fe3+/Fe2+');
    expect(asciiFormula('OH−')).toBe('OH-'); // U+2212 minus sign
    expect(asciiFormula('Ni')).toBe('Ni');
  });

  it('gives the same species and molar mass as the keyboard spelling', () => {
    expect(parseSpecies('Cu²⁺').key).toBe(parseSpecies('Cu2+').key);
    expect(parseSpecies('SO₄²⁻').charge).toBe(-2);
    expect(parseSpecies('Cr₂O₇²⁻').key).toBe(parseSpecies('Cr2O7^2-').key);
    expect(molarMass('NiSO₄·6H₂O')).toBe(molarMass('NiSO4·6H2O'));
  });
});
