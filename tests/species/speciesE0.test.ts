import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import speciesFile from '../../data/species.json';
import consistency from '../../data/consistency.json';
import { parseHalfReaction } from '../../src/chem/halfReaction';
import { speciesE0 } from '../../src/species/speciesE0';
import { speciesPKw } from '../../src/species/speciesPKw';
import { waterPKw } from '../../src/nernst/waterPKw';
import { e0AtTemperature } from '../../src/cells/e0AtTemperature';
import { e0Basis } from '../../src/cells/e0Basis';
import { halfCell } from '../../src/nernst/halfCell';
import { consistencyReport } from '../../src/table/consistencyReport';
import { builtinTable } from '../../src/table/builtin';
import { NotFoundError } from '../../src/errors';
import { FARADAY_C_PER_MOL, GAS_CONSTANT_J_PER_MOL_K } from '../../src/constants';

const t = builtinTable();
const F = FARADAY_C_PER_MOL; // CODATA 2018, e·N_A exactly
const R = GAS_CONSTANT_J_PER_MOL_K;

describe('data/species.json', () => {
  it('every row has a source, a state, and finite numbers; formulas and states are unique', () => {
    const seen = new Set<string>();
    for (const r of speciesFile.species as Array<Record<string, unknown>>) {
      expect(typeof r.source).toBe('string');
      expect(String(r.source)).not.toMatch(/memory/i);
      expect(['s', 'l', 'g', 'aq']).toContain(r.state);
      for (const k of ['dfH_kJ_mol', 'dfG_kJ_mol', 'S_J_mol_K', 'Cp_J_mol_K']) {
        if (k in r) expect(Number.isFinite(r[k])).toBe(true);
      }
      const key = `${r.formula}|${r.state}`;
      expect(seen.has(key)).toBe(false);
      seen.add(key);
    }
  });
});

describe('speciesE0 at 25 °C against hand arithmetic on the NBS 1982 values', () => {
  it('Cu2+/Cu: −ΔfG°(Cu2+)/2F = −65.49 kJ/mol / 2F = 0.33937 V', () => {
    // NBS 1982: ΔfG°(Cu2+, ao) = 65.49 kJ/mol
    expect(speciesE0(parseHalfReaction('Cu2+ + 2e- -> Cu'), 25)).toBeCloseTo(65490 / (2 * F), 12);
  });
  it('O2/H2O: 2·237.129 kJ/mol / 4F = 1.22876 V', () => {
    // NBS 1982: ΔfG°(H2O, l) = −237.129 kJ/mol
    expect(speciesE0(parseHalfReaction('O2 + 4H+ + 4e- -> 2H2O'), 25)).toBeCloseTo((2 * 237129) / (4 * F), 12);
  });
  it('AgCl/Ag: (−109.789 + 131.228) kJ/mol / F = 0.22220 V', () => {
    // NBS 1982: ΔfG°(AgCl, cr) = −109.789, ΔfG°(Cl-, ao) = −131.228 kJ/mol; CRC's 0.22233 V is 0.13 mV away
    expect(speciesE0(parseHalfReaction('AgCl + e- -> Ag + Cl-'), 25)).toBeCloseTo((-109789 + 131228) / F, 12);
  });
  it('names the species the table lacks', () => {
    expect(() => speciesE0(parseHalfReaction('Au3+ + 3e- -> Au'), 25)).toThrow(NotFoundError);
    expect(() => speciesE0(parseHalfReaction('Au3+ + 3e- -> Au'), 25)).toThrow(/Au3\+/);
    // ΔfG° only (Bi3+): 25 °C answers, other temperatures say why not
    // NBS 1982: ΔfG°(Bi3+, ao) = 82.8 kJ/mol → E° = 82.8 kJ/mol / 3F = 0.2861 V
    expect(speciesE0(parseHalfReaction('Bi3+ + 3e- -> Bi'), 25)).toBeCloseTo(82800 / (3 * F), 12);
    expect(() => speciesE0(parseHalfReaction('Bi3+ + 3e- -> Bi'), 60)).toThrow(/25 °C only/);
  });
});

describe('species-derived dE°/dT against the measured coefficients in the table (Bratsch 1989)', () => {
  it('agree within 0.01 mV/K for every row that has both', () => {
    const rows = t.couples.filter((r) => r.dEdT_mV_K !== undefined && e0Basis(r).startsWith('species'));
    expect(rows.length).toBeGreaterThanOrEqual(15);
    for (const r of rows) {
      const slope = ((speciesE0(r.parsed, 25.5) - speciesE0(r.parsed, 24.5)) / 1) * 1000;
      // Fe3+/Fe2+: 1.170 vs 1.175 mV/K is the largest difference
      expect(Math.abs(slope - r.dEdT_mV_K!), r.key).toBeLessThan(0.01);
    }
  });
});

describe('ion product of water from the species data', () => {
  it('pKw(25 °C) = 13.995 (NBS 1982 ΔfG°: (237.129 − 157.244) kJ/mol / (RT ln 10))', () => {
    expect(speciesPKw(25)).toBeCloseTo(79885 / (R * 298.15 * Math.LN10), 10);
    // Bandura & Lvov 2006 (IAPWS 2007 release): 13.995 at 25 °C
    expect(Math.abs(speciesPKw(25) - 13.995)).toBeLessThan(0.002);
  });
  it('follows the Bandura–Lvov formulation within 0.06 from 0 to 100 °C (constant ΔrCp of water ionisation)', () => {
    // measured differences: 0 °C −0.010, 50 °C +0.011, 80 °C +0.032, 100 °C +0.051 (species − Bandura–Lvov)
    for (let tc = 0; tc <= 100; tc += 5) expect(Math.abs(speciesPKw(tc) - waterPKw(tc)), `${tc} °C`).toBeLessThan(0.06);
    expect(Math.abs(speciesPKw(80) - waterPKw(80))).toBeLessThan(0.035);
  });
});

describe('E°(T) properties', () => {
  it('every couple with a species or dE/dT basis answers from 0 to 100 °C; the others are listed', () => {
    const notCovered: string[] = [];
    for (const r of t.couples) {
      if (e0Basis(r) === '25 °C only') {
        notCovered.push(r.key);
        expect(() => e0AtTemperature(r, 60)).toThrow(NotFoundError);
        continue;
      }
      for (let tc = 0; tc <= 100; tc += 10) expect(Number.isFinite(e0AtTemperature(r, tc))).toBe(true);
    }
    // species not in the NBS 1982 tables at the standard state (data/species.json, notCovered)
    expect(notCovered.sort()).toEqual(
      ['Au+/Au', 'Au3+/Au', 'Bi3+/Bi', 'Cr2+/Cr', 'Cr2O7^2-/Cr3+', 'Cr3+/Cr', 'Cr3+/Cr2+', 'HCrO4-/Cr3+', 'Pt2+/Pt', 'Sn2+/Sn', 'Sn4+/Sn2+'].sort(),
    );
  });

  it('is smooth: no jump at 25 °C and bounded curvature (property)', () => {
    const rows = t.couples.filter((r) => e0Basis(r) !== '25 °C only');
    fc.assert(
      fc.property(fc.integer({ min: 0, max: rows.length - 1 }), fc.double({ min: 0.5, max: 99.5, noNaN: true }), (i, tc) => {
        const r = rows[i];
        const h = 0.5;
        const d2 = e0AtTemperature(r, tc + h) - 2 * e0AtTemperature(r, tc) + e0AtTemperature(r, tc - h);
        // |d²E°/dT²| = |ΔrCp|/(nFT) stays below 8e-5 V/K² for the table's reactions
        expect(Math.abs(d2)).toBeLessThan(2e-5);
        expect(Math.abs(e0AtTemperature(r, 25 + 1e-9) - r.e0)).toBeLessThan(1e-9);
        expect(Math.abs(e0AtTemperature(r, 25 - 1e-9) - r.e0)).toBeLessThan(1e-9);
      }),
    );
  });

  it('acid and alkaline forms agree: O2/OH- vs O2/H2O and H2O/H2 vs H+/H2 at pH 14 within 1 mV from 0 to 100 °C', () => {
    for (let tc = 0; tc <= 100; tc += 10) {
      const acid = halfCell(t.findCouple('O2/H2O')!, 1, null, 14, tc);
      const alkaline = halfCell(t.findCouple('O2/OH-')!, 1, null, 14, tc);
      expect(Math.abs(acid - alkaline), `${tc} °C`).toBeLessThan(1e-3);
      const h1 = halfCell(t.findCouple('H+/H2')!, null, 1, 14, tc);
      const h2 = halfCell(t.findCouple('H2O/H2')!, null, 1, 14, tc);
      expect(Math.abs(h1 - h2), `${tc} °C`).toBeLessThan(1e-3);
    }
  });
});

describe('consistency report of the built-in table', () => {
  const report = consistencyReport(t, consistency.notes);
  it('every difference is within 5 mV or has an explained note', () => {
    const unexplained = report.filter((l) => !l.ok && !l.note).map((l) => `${l.keys.join(' ')} ${l.differenceMV.toFixed(1)} mV`);
    expect(unexplained).toEqual([]);
  });
  it('finds the cycles of the table (Fe, Cu, Cr, O2/H2O2/H2O)', () => {
    const cycles = report.filter((l) => l.kind === 'cycle').map((l) => l.keys[0]).sort();
    expect(cycles).toEqual(['Cr3+/Cr', 'Cu2+/Cu', 'Fe3+/Fe', 'O2/H2O']);
    const fe = report.find((l) => l.kind === 'cycle' && l.keys[0] === 'Fe3+/Fe')!;
    // (1·0.771 + 2·(−0.447))/3 = −0.0410 V from the rows themselves
    expect(fe.derivedV).toBeCloseTo((0.771 - 2 * 0.447) / 3, 12);
  });
  it('links the dichromate and hydrogen-chromate rows through the species that differ (ΔfG° of Cr2O7^2-, HCrO4-, H2O)', () => {
    const link = report.filter((l) => l.kind === 'link');
    expect(link.map((l) => l.keys.join(' ~ '))).toEqual(['Cr2O7^2-/Cr3+ ~ HCrO4-/Cr3+']);
    // per electron: ΔG°/6 of Cr2O7^2- + 14H+ → 2Cr3+ + 7H2O minus ΔG°/3 of HCrO4- + 7H+ → Cr3+ + 4H2O
    // (Cr3+ and H+ cancel): [−7·237.129 + 1301.1]/6 − [−4·237.129 + 764.7]/3 kJ/mol (NBS 1982)
    const g = ((-7 * 237129 + 1301100) / 6 - (-4 * 237129 + 764700) / 3);
    expect(link[0].derivedV).toBeCloseTo(1.35 - g / F, 12);
    expect(link[0].note).toMatch(/0.1 V lower/);
  });
  it('flags a row changed in a workbook’s copy', () => {
    const edited = { ...t, couples: t.couples.map((r) => (r.key === 'Cu2+/Cu' ? { ...r, e0: 0.4 } : r)) };
    const line = consistencyReport(edited).find((l) => l.kind === 'species' && l.keys[0] === 'Cu2+/Cu')!;
    expect(line.ok).toBe(false);
    expect(line.differenceMV).toBeCloseTo((0.4 - 65490 / (2 * F)) * 1000, 6);
  });
  it('notes on file name only rows of the table', () => {
    const keys = new Set(t.couples.map((r) => r.key));
    for (const k of Object.keys(consistency.notes)) for (const part of k.split(/ = | \+ | ~ /)) expect(keys.has(part), part).toBe(true);
  });
});
