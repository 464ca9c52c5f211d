import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { cellReaction } from '../../src/cells/cellReaction';
import { cellElectrons } from '../../src/cells/cellElectrons';
import { parseFormula, parseSpecies } from '../../src/chem/formula';
import { InputError } from '../../src/errors';
import { builtinTable } from '../../src/table/builtin';

const t = builtinTable();
const row = (k: string) => t.findCouple(k)!.parsed;

describe('cellReaction', () => {
  it('Daniell cell: Cu2+ + Zn -> Cu + Zn2+', () => {
    // the Daniell cell reaction (Atkins, Physical Chemistry; Bard & Faulkner ch. 2)
    expect(cellReaction(row('Cu2+/Cu'), row('Zn2+/Zn'))).toBe('Cu2+ + Zn -> Cu + Zn2+');
  });

  it('scales both half-reactions to the common n', () => {
    // 2Ag+ + Cu -> 2Ag + Cu2+ (textbook silver–copper displacement)
    expect(cellReaction(row('Ag+/Ag'), row('Cu2+/Cu'))).toBe('2Ag+ + Cu -> 2Ag + Cu2+');
    // MnO4- + 8H+ + 5Fe2+ -> Mn2+ + 4H2O + 5Fe3+ (the permanganate titration of iron(II), standard textbook reaction)
    expect(cellReaction(row('MnO4-/Mn2+'), row('Fe3+/Fe2+'))).toBe('MnO4- + 8H+ + 5Fe2+ -> Mn2+ + 4H2O + 5Fe3+');
  });

  it('cancels species on both sides', () => {
    // hydrogen–oxygen fuel cell: O2 + 4H+ + 2H2 -> 2H2O + 4H+ cancels to O2 + 2H2 -> 2H2O (common practice)
    expect(cellReaction(row('O2/H2O'), row('H+/H2'))).toBe('O2 + 2H2 -> 2H2O');
    // alkaline: O2 + 2H2O + 2H2 + 4OH- -> 4OH- + 4H2O cancels to the same
    expect(cellReaction(row('O2/OH-'), row('H2O/H2'))).toBe('O2 + 2H2 -> 2H2O');
    // lead–acid battery discharge: PbO2 + Pb + 2SO4^2- + 4H+ -> 2PbSO4 + 2H2O (common practice)
    expect(cellReaction(row('PbO2/PbSO4'), row('PbSO4/Pb'))).toBe('PbO2 + 2SO4^2- + 4H+ + Pb -> 2PbSO4 + 2H2O');
  });

  it('says so when nothing is left', () => {
    expect(() => cellReaction(row('Cu2+/Cu'), row('Cu2+/Cu'))).toThrow(InputError);
  });

  it('every pair of built-in couples gives a reaction that balances in atoms and charge (property)', () => {
    const rows = t.couples;
    fc.assert(fc.property(fc.integer({ min: 0, max: rows.length - 1 }), fc.integer({ min: 0, max: rows.length - 1 }), (i, j) => {
      if (i === j) return;
      let text: string;
      try {
        text = cellReaction(rows[i].parsed, rows[j].parsed);
      } catch (e) {
        // only a pair whose half-reactions cancel completely may fail
        expect(e).toBeInstanceOf(InputError);
        return;
      }
      const [l, r] = text.split(' -> ');
      const tally = (side: string) => {
        const atoms: Record<string, number> = {};
        let charge = 0;
        for (const term of side.split(' + ')) {
          const m = /^(\d+\/\d+ |\d+)?(.*)$/.exec(term)!;
          const [num, den = '1'] = (m[1] ?? '1').trim().split('/');
          const c = Number(num) / Number(den);
          const s = parseSpecies(m[2]);
          charge += c * s.charge;
          for (const [el, k] of Object.entries(parseFormula(s.body))) atoms[el] = (atoms[el] ?? 0) + c * k;
        }
        return { atoms, charge };
      };
      const a = tally(l);
      const b = tally(r);
      expect(a.charge).toBeCloseTo(b.charge, 9);
      for (const el of new Set([...Object.keys(a.atoms), ...Object.keys(b.atoms)])) expect(a.atoms[el] ?? 0).toBeCloseTo(b.atoms[el] ?? 0, 9);
      expect(cellElectrons(rows[i].parsed, rows[j].parsed)).toBeGreaterThanOrEqual(1);
    }), { numRuns: 300 });
  });
});
