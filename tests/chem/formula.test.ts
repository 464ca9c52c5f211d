import { describe, expect, it } from 'vitest';
import { canonicalSpecies, parseFormula, parseSpecies } from '../../src/chem/formula';
import { InputError } from '../../src/errors';

describe('parseSpecies', () => {
  it('reads every charge spelling of Cu2+ as the same species', () => {
    for (const t of ['Cu2+', 'Cu^2+', 'Cu(2+)', 'Cu+2', 'Cu ^2+', ' Cu2+ ']) {
      const s = parseSpecies(t);
      expect([t, s.body, s.charge, s.key]).toEqual([t, 'Cu', 2, 'Cu2+']);
    }
  });
  it('tells counts from charges the way chemists write them', () => {
    const cases: Array<[string, string, number]> = [
      ['MnO4-', 'MnO4', -1], // permanganate: the 4 is a count
      ['NH4+', 'NH4', 1],
      ['NO3-', 'NO3', -1],
      ['SO42-', 'SO4', -2], // two digits: the last is the charge
      ['SO4--', 'SO4', -2],
      ['SO4^2-', 'SO4', -2],
      ['Cr2O7^2-', 'Cr2O7', -2],
      ['Cr2O72-', 'Cr2O7', -2],
      ['Hg2^2+', 'Hg2', 2],
      ['Hg22+', 'Hg2', 2],
      ['S2-', 'S', -2], // a lone element: the digit is the charge
      ['Fe3+', 'Fe', 3],
      ['VO2+', 'VO2', 1], // dioxovanadium(V)
      ['VO^2+', 'VO', 2], // vanadyl needs the caret
      ['Fe(CN)6^3-', 'Fe(CN)6', -3],
      ['Fe(CN)6(4-)', 'Fe(CN)6', -4],
      ['H+', 'H', 1],
      ['OH-', 'OH', -1],
    ];
    for (const [t, body, z] of cases) {
      const s = parseSpecies(t);
      expect([t, s.body, s.charge]).toEqual([t, body, z]);
    }
  });
  it('reads phase marks and the electron', () => {
    expect(parseSpecies('O2(g)').phase).toBe('g');
    expect(parseSpecies('Hg2Cl2(s)').phase).toBe('s');
    expect(parseSpecies('H2O(l)').phase).toBe('l');
    expect(parseSpecies('Cu2+(aq)')).toMatchObject({ body: 'Cu', charge: 2, phase: 'aq' });
    expect(parseSpecies('e-')).toMatchObject({ isElectron: true, charge: -1, key: 'e-' });
  });
  it('keeps element symbols case-sensitive: Co is cobalt, CO is carbon monoxide', () => {
    expect(parseSpecies('Co').elements).toEqual({ Co: 1 });
    expect(parseSpecies('CO').elements).toEqual({ C: 1, O: 1 });
    expect(() => parseSpecies('co')).toThrow(InputError);
  });
  it('writes canonical text that reads back the same', () => {
    for (const [body, z] of [['Cu', 2], ['MnO4', -1], ['Cr2O7', -2], ['VO', 2], ['Hg2', 2], ['Hg2', 1], ['NH4', 1]] as Array<[string, number]>) {
      const s = parseSpecies(canonicalSpecies(body, z));
      expect([s.body, s.charge]).toEqual([body, z]);
    }
  });
});

describe('parseFormula', () => {
  it('counts atoms through groups, brackets and hydrate dots', () => {
    expect(parseFormula('CuSO4·5H2O')).toEqual({ Cu: 1, S: 1, O: 9, H: 10 });
    expect(parseFormula('CuSO4*5H2O')).toEqual({ Cu: 1, S: 1, O: 9, H: 10 });
    expect(parseFormula('CuSO4.5H2O')).toEqual({ Cu: 1, S: 1, O: 9, H: 10 });
    expect(parseFormula('K4[Fe(CN)6]·3H2O')).toEqual({ K: 4, Fe: 1, C: 6, N: 6, H: 6, O: 3 });
    expect(parseFormula('[Co(NH3)6]Cl3')).toEqual({ Co: 1, N: 6, H: 18, Cl: 3 });
    expect(parseFormula('Ca3(PO4)2')).toEqual({ Ca: 3, P: 2, O: 8 });
    // a decimal hydrate multiplier: plaster of Paris, CaSO4·½H2O
    expect(parseFormula('CaSO4·0.5H2O')).toEqual({ Ca: 1, S: 1, O: 4.5, H: 1 });
    expect(parseFormula('CaSO4.0.5H2O')).toEqual({ Ca: 1, S: 1, O: 4.5, H: 1 });
  });
  it('rejects text that is not a formula, in plain words', () => {
    expect(() => parseFormula('Xx2')).toThrow(/not an element symbol/);
    expect(() => parseFormula('Cu(SO4')).toThrow(/not closed/);
    expect(() => parseFormula('CuSO4)')).toThrow(/unbalanced/);
    expect(() => parseFormula('CuSO4·')).toThrow(/hydrate dot/);
    expect(() => parseFormula('')).toThrow(InputError);
  });
});

describe('parseSpecies read again', () => {
  it('gives the same species for a text read before, and refuses a refused text every time', () => {
    const first = parseSpecies('Cr2O7^2-');
    for (let i = 0; i < 3; i++) {
      // dichromate: 2 Cr, 7 O, charge 2− (common practice)
      expect(parseSpecies('Cr2O7^2-')).toEqual({ body: 'Cr2O7', charge: -2, phase: undefined, elements: { Cr: 2, O: 7 }, isElectron: false, key: 'Cr2O72-' });
      expect(parseSpecies('Cr2O7^2-')).toEqual(first);
      expect(() => parseSpecies('Hg2^2')).toThrow(InputError);
      expect(() => parseSpecies('Qq2+')).toThrow(/not an element symbol/);
    }
  });
});
