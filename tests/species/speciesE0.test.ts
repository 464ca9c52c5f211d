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
      const key = `${String(r.formula)}|${String(r.state)}`;
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

describe('species-derived dE°/dT (NBS 1982) against the table’s coefficients (Thermoddem V1.10 / MINTEQA2 v4 / LLNL ΔrH)', () => {
  // Two evaluated databases: the table's dE°/dT = ΔrS°/nF comes from the ΔrH and log K each row cites, the
  // species slope from NBS 1982 S° and ΔfH°. They are compared as ΔrS° = nF·dE°/dT, in J/(mol·K).
  // Tolerance 12 J/(mol·K): the order of the stated uncertainty of one aqueous ion's S° in the CODATA Key
  // Values (S°(Al3+) = −325 ± 10 J/(mol·K), as read into data/species.json). It is 0.124 mV/K for n = 1,
  // 0.062 mV/K for n = 2, i.e. at most 9 mV at 100 °C. Measured |difference|: largest within tolerance In3+/In 9.8,
  // I2/I- 9.2, AgI/Ag 8.0 J/(mol·K); largest of all Ce4+/Ce3+ 117.8 J/(mol·K) (1.22 mV/K).
  // Rows beyond it are listed with the difference measured (table − species) and why; a listed row must
  // still differ by that much, so the list cannot outlive the data. E°(T) uses the species slope where the
  // species data cover a row (e0Basis), so for these rows the spread is the uncertainty of E° away from 25 °C.
  const TOLERANCE_J_MOL_K = 12;
  const EXPLAINED: Record<string, { dS: number; why: string }> = {
    // Thermoddem's S° of Ce4+ is from 97asho/sas (the row's source); NBS 1982 S°(Ce4+) = −301
    'Ce4+/Ce3+': { dS: 117.8, why: 'S° of the highly charged Ce4+(aq) differs between the selections' },
    // the row's note: Pd2+ aquo-ion data are estimates (Sassani & Shock); NBS 1982 S°(Pd2+) = −184
    'Pd2+/Pd': { dS: -95.3, why: 'the Pd2+(aq) data are estimates (the row’s note)' },
    // Thermoddem's S° of Ni(OH)2 is an internal calculation (its cited source); NBS 1982 S° = 88.0
    'Ni(OH)2/Ni': { dS: 44.2, why: 'S° of Ni(OH)2 differs between the selections' },
    // Thermoddem takes Fe2+ from Parker & Khodakovskii 1995 (row's note); NBS 1982 S°(Fe2+) = −137.7.
    // Fe3+/Fe2+ agrees within 1.3 J/(mol·K), so the Fe3+/Fe spread is the Fe2+ spread.
    'Fe2+/Fe': { dS: -36.0, why: 'S° of Fe2+(aq) re-evaluated since NBS 1982' },
    'Fe3+/Fe': { dS: -37.2, why: 'inherited from Fe2+/Fe' },
    // NBS 1982 S°(Ni2+) = −128.9; Thermoddem's Ni2+ selection differs
    'Ni2+/Ni': { dS: 19.4, why: 'S° of Ni2+(aq) differs between the selections' },
    // Thermoddem takes Hg2^2+ from CODATA (89cox/wag, as cited); NBS 1982 S°(Hg2^2+) = 84.5
    'Hg2^2+/Hg': { dS: 18.6, why: 'CODATA and NBS 1982 differ for Hg2^2+(aq)' },
    // ΔfH°(Al3+): CODATA 7.4 kJ/mol below NBS 1982 (data/species.json), less the 2.6 kJ/mol ΔrG° difference
    // (−8.9 mV·3F): 4.8 kJ/mol / 298.15 K = 16 J/(mol·K)
    'Al3+/Al': { dS: 16.5, why: 'ΔfH° of Al3+(aq) differs between CODATA and NBS 1982' },
  };
  const rows = t.couples.filter((r) => r.dEdT_mV_K !== undefined && e0Basis(r).startsWith('species'));
  const dSOf = (r: (typeof rows)[number]) => {
    const slope = (speciesE0(r.parsed, 25.5) - speciesE0(r.parsed, 24.5)) * 1000; // mV/K
    return (r.n * F * (r.dEdT_mV_K! - slope)) / 1000; // J/(mol·K)
  };
  it('agree within 12 J/(mol·K) in ΔrS° (nF·dE°/dT) for every row that has both, except the explained rows', () => {
    expect(rows.length).toBeGreaterThanOrEqual(40);
    for (const r of rows) {
      if (r.key in EXPLAINED) continue;
      expect(Math.abs(dSOf(r)), r.key).toBeLessThanOrEqual(TOLERANCE_J_MOL_K);
    }
  });
  it('the explained rows differ by the amount measured, beyond the tolerance', () => {
    for (const [key, e] of Object.entries(EXPLAINED)) {
      const r = rows.find((x) => x.key === key);
      expect(r, key).toBeDefined();
      expect(dSOf(r!), `${key}: ${e.why}`).toBeCloseTo(e.dS, 0);
      expect(Math.abs(e.dS)).toBeGreaterThan(TOLERANCE_J_MOL_K);
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
    // no S° for a species in the NBS 1982 data (data/species.json: Bi3+ and Zn(OH)4^2- ΔfG° only; no tin ions)
    // and no dE°/dT in the row (data/couples.json); the gold, chromium and platinum rows carry dE°/dT
    expect(notCovered.sort()).toEqual(['Bi3+/Bi', 'HSnO2-/Sn', 'Sn(OH)6^2-/Sn', 'Sn2+/Sn', 'Sn4+/Sn2+', 'Zn(OH)4^2-/Zn'].sort());
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
    // (1·0.7697 + 2·(−0.469))/3 = −0.0561 V from the rows themselves (data/couples.json, Thermoddem V1.10)
    expect(fe.derivedV).toBeCloseTo((0.7697 - 2 * 0.469) / 3, 12);
    // the re-sourced rows close their cycles within 0.1 mV (Fe3+/Fe's note: it closes exactly)
    for (const l of report.filter((x) => x.kind === 'cycle')) expect(Math.abs(l.differenceMV), l.keys.join(' ')).toBeLessThan(0.1);
  });
  it('links the dichromate and hydrogen-chromate rows through the species that differ (ΔfG° of Cr2O7^2-, HCrO4-, H2O)', () => {
    const link = report.filter((l) => l.kind === 'link');
    expect(link.map((l) => l.keys.join(' ~ '))).toEqual(['Cr2O7^2-/Cr3+ ~ HCrO4-/Cr3+']);
    // per electron: ΔG°/6 of Cr2O7^2- + 14H+ → 2Cr3+ + 7H2O minus ΔG°/3 of HCrO4- + 7H+ → Cr3+ + 4H2O
    // (Cr3+ and H+ cancel): [−7·237.129 + 1301.1]/6 − [−4·237.129 + 764.7]/3 kJ/mol (NBS 1982)
    const g = ((-7 * 237129 + 1301100) / 6 - (-4 * 237129 + 764700) / 3);
    // HCrO4-/Cr3+ row: 1.3234 V (data/couples.json)
    expect(link[0].derivedV).toBeCloseTo(1.3234 - g / F, 12);
    // the dichromate row (1.3065 V) now agrees: −1.65 mV measured
    expect(link[0].differenceMV).toBeCloseTo((1.3065 - 1.3234 + g / F) * 1000, 9);
    expect(link[0].ok).toBe(true);
  });
  it('every note on file belongs to a line outside the tolerance (no stale explanations)', () => {
    const noted = report.filter((l) => l.note !== undefined);
    expect(noted.length).toBe(Object.keys(consistency.notes).length);
    for (const l of noted) expect(l.ok, l.keys.join(' ')).toBe(false);
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
