import { describe, expect, it } from 'vitest';
import data from '../../data/atomic-weights.json';
import { ELEMENT_SYMBOLS } from '../../src/chem/elements';
import { NotFoundError } from '../../src/errors';
import { atomicWeight } from '../../src/faraday/atomicWeight';

describe('data/atomic-weights.json', () => {
  it('holds the 84 elements that have a standard atomic weight, each once, with a source', () => {
    // IUPAC CIAAW 2021 (Prohaska et al., Pure Appl. Chem. 94 (2022) 573): 84 elements have a standard atomic weight
    expect(data.elements).toHaveLength(84);
    expect(new Set(data.elements.map((e) => e.symbol)).size).toBe(84);
    for (const e of data.elements) {
      expect(e.source, e.symbol).toMatch(/CIAAW/);
      expect(ELEMENT_SYMBOLS[e.Z - 1], e.symbol).toBe(e.symbol);
    }
  });
  it('has no row for the elements without a standard atomic weight', () => {
    // IUPAC CIAAW 2021: no standard atomic weight for Tc, Pm, Po, At, Rn, Fr, Ra, Ac and Np onwards
    const without = ['Tc', 'Pm', 'Po', 'At', 'Rn', 'Fr', 'Ra', 'Ac', ...ELEMENT_SYMBOLS.slice(92)];
    const have = new Set(data.elements.map((e) => e.symbol));
    for (const s of without) expect(have.has(s), s).toBe(false);
    expect(84 + without.length).toBe(118);
  });
  it('atomic weights increase with Z except at the known inversions Ar/K, Co/Ni, Te/I, Th/Pa', () => {
    // common practice: the four pairs where the atomic weight falls as Z rises
    const inversions = new Set(['K', 'Ni', 'I', 'Pa']);
    const rows = [...data.elements].sort((a, b) => a.Z - b.Z);
    for (let i = 1; i < rows.length; i++) {
      const up = rows[i].atomicWeight > rows[i - 1].atomicWeight;
      expect(up, `${rows[i - 1].symbol} → ${rows[i].symbol}`).toBe(!inversions.has(rows[i].symbol));
    }
  });
});

describe('atomicWeight', () => {
  it('reads the abridged values', () => {
    expect(atomicWeight('Ni')).toBe(58.693); // IUPAC CIAAW 2021 abridged (Prohaska et al. 2022, Table 1; read in github.com/MilanSkocic/ciaaw data/src/saw_2021.txt)
    expect(atomicWeight('Cu')).toBe(63.546); // IUPAC CIAAW 2021 abridged (Prohaska et al. 2022, Table 1; read in github.com/MilanSkocic/ciaaw data/src/saw_2021.txt)
    expect(atomicWeight('Zn')).toBe(65.38); // IUPAC CIAAW 2021 abridged (Prohaska et al. 2022, Table 1; read in github.com/MilanSkocic/ciaaw data/src/saw_2021.txt)
    expect(atomicWeight('Pb')).toBe(207.2); // IUPAC CIAAW 2021 abridged (interval [206.14, 207.94]; read in github.com/MilanSkocic/ciaaw data/src/saw_2021.txt)
  });
  it('an element without a standard atomic weight, or a non-element, is not found', () => {
    expect(() => atomicWeight('Tc')).toThrow(NotFoundError);
    expect(() => atomicWeight('Tc')).toThrow(/Tc/);
    expect(() => atomicWeight('Xx')).toThrow(NotFoundError);
  });
});
