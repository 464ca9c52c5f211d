import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { cellElectrons } from '../../src/cells/cellElectrons';
import { builtinTable } from '../../src/table/builtin';

const t = builtinTable();
const row = (k: string) => t.findCouple(k)!.parsed;

describe('cellElectrons', () => {
  it('is the least common multiple of the two n', () => {
    expect(cellElectrons(row('Cu2+/Cu'), row('Zn2+/Zn'))).toBe(2); // Daniell: Cu2+ + Zn -> Cu + Zn2+, n = 2
    expect(cellElectrons(row('MnO4-/Mn2+'), row('Fe3+/Fe2+'))).toBe(5); // permanganate titration of Fe2+, n = 5
    expect(cellElectrons(row('Ag+/Ag'), row('Al3+/Al'))).toBe(3);
    expect(cellElectrons(row('O2/H2O'), row('H+/H2'))).toBe(4); // fuel cell O2 + 2H2 -> 2H2O, n = 4
    expect(cellElectrons(row('Cr2O7^2-/Cr3+'), row('O2/H2O'))).toBe(12);
  });

  it('is symmetric and a multiple of both (property)', () => {
    fc.assert(fc.property(fc.integer({ min: 1, max: 60 }), fc.integer({ min: 1, max: 60 }), (a, b) => {
      const n = cellElectrons({ n: a }, { n: b });
      expect(n).toBe(cellElectrons({ n: b }, { n: a }));
      expect(n % a).toBe(0);
      expect(n % b).toBe(0);
      expect(n).toBeLessThanOrEqual(a * b);
    }));
  });
});
