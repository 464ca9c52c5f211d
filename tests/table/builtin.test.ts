import { describe, expect, it } from 'vitest';
import couplesFile from '../../data/couples.json';
import { parseHalfReaction } from '../../src/chem/halfReaction';
import { BUILTIN_TABLE_SOURCE, BUILTIN_TABLE_VERSION, builtinTable, builtinTableProblems } from '../../src/table/builtin';
import { validateCoupleRecord } from '../../src/table/table';

const REQUIRED = [
  'Li+/Li', 'K+/K', 'Na+/Na', 'Mg2+/Mg', 'Al3+/Al', 'Mn2+/Mn', 'Zn2+/Zn', 'Cr3+/Cr', 'Fe2+/Fe', 'Cd2+/Cd', 'Co2+/Co',
  'Ni2+/Ni', 'Sn2+/Sn', 'Pb2+/Pb', 'Fe3+/Fe', 'H+/H2', 'H2O/H2', 'Sn4+/Sn2+', 'Cu2+/Cu+', 'AgCl/Ag', 'Hg2Cl2/Hg',
  'Cu2+/Cu', 'Cu+/Cu', 'O2/OH-', 'I2/I-', 'Fe3+/Fe2+', 'Ag+/Ag', 'Br2/Br-', 'MnO2/Mn2+', 'O2/H2O', 'Cr2O7^2-/Cr3+',
  'Cl2/Cl-', 'Au3+/Au', 'Au+/Au', 'MnO4-/Mn2+', 'PbO2/PbSO4', 'PbSO4/Pb', 'H2O2/H2O', 'Ce4+/Ce3+', 'F2/F-', 'ZnO/Zn',
  'Ni(OH)2/Ni', 'HgO/Hg', 'Hg2SO4/Hg',
];

describe('the built-in couple table', () => {
  const table = builtinTable();

  it('has a version and names its basis', () => {
    expect(BUILTIN_TABLE_VERSION).toBe('2026.1');
    expect(table.version).toBe(BUILTIN_TABLE_VERSION);
    expect(BUILTIN_TABLE_SOURCE).toMatch(/Thermoddem V1\.10/);
    expect(BUILTIN_TABLE_SOURCE).toMatch(/CODATA Key Values for Thermodynamics/);
    expect(couplesFile.description).toMatch(/Rule for choosing values/);
  });

  it('has no row with a problem, and every data row made it into the table', () => {
    expect(builtinTableProblems()).toEqual([]);
    expect(table.couples).toHaveLength(couplesFile.couples.length);
  });

  it.each(couplesFile.couples.map((r) => [r.key, r] as const))('%s parses, balances and cites a stored source', (_key, record) => {
    const v = validateCoupleRecord(record);
    expect(v.problems).toEqual([]);
    expect(() => parseHalfReaction(record.halfReaction)).not.toThrow();
    // every row names where its numbers can be found again: a stored copy at a commit, or the IUPAC definition
    if (record.key === 'H+/H2') expect(record.source).toMatch(/goldbook\.S05917/);
    else expect(record.source).toMatch(/commit [0-9a-f]{12}/);
    expect(`${record.source} ${record.note ?? ''}`).not.toMatch(/from memory/i);
  });

  it.each(REQUIRED)('holds %s', (key) => {
    expect(table.findCouple(key)).toBeDefined();
  });

  it('holds the plating, refining and water-treatment couples', () => {
    for (const key of ['Au(CN)2-/Au', 'AuCl4-/Au', 'Ag(CN)2-/Ag', 'Cu(CN)2-/Cu', 'Cu(CN)3^2-/Cu', 'Zn(OH)4^2-/Zn', 'HSnO2-/Sn', 'Sn(OH)6^2-/Sn', 'AuCl2-/Au', 'CuCl2-/Cu', 'O3/O2', 'ClO-/Cl-']) {
      expect(table.findCouple(key), key).toBeDefined();
    }
  });

  it('stores E° computed from the cited constants', () => {
    // k = RT ln10/F at 298.15 K with CODATA 2018 R and F
    const k = (8.314462618 * 298.15 * Math.LN10) / 96485.33212;
    // Thermoddem V1.10: Cu(element) log K 31.601 (Cu + 0.5 O2(aq) + 2H+ = Cu2+ + H2O) and H2(g) log K 43.001
    // (H2 + 0.5 O2(aq) = H2O); against the SHE, Cu2+ + H2 → Cu + 2H+ has log K = 43.001 − 31.601: E° = k·11.400/2
    expect(table.findCouple('Cu2+/Cu')!.e0).toBeCloseTo((k * (43.001 - 31.601)) / 2, 4);
    // MINTEQA2 v4: Znmetal log K 25.7886 (Zn = Zn2+ + 2e-), electron scale = SHE: E° = −k·25.7886/2
    expect(table.findCouple('Zn2+/Zn')!.e0).toBeCloseTo((-k * 25.7886) / 2, 4);
    // Thermoddem V1.10: Fe(element) log K 58.856 (Fe + 0.5 O2(aq) + 2H+ = Fe2+ + H2O)
    expect(table.findCouple('Fe2+/Fe')!.e0).toBeCloseTo((k * (43.001 - 58.856)) / 2, 4);
    // Parker & Khodakovskii, J. Phys. Chem. Ref. Data 24 (1995) 1699 (abstract): ΔfG°(Fe2+) = −90.53 ± 1.0 kJ/mol,
    // so E° = −90530/(2F) = −0.4691 V; the table's basis agrees within its uncertainty
    expect(Math.abs(table.findCouple('Fe2+/Fe')!.e0 - -90530 / (2 * 96485.33212))).toBeLessThan(0.001);
    // CRC Handbook, 92nd ed. (2011), Electrochemical Series, Table 1 (read): Ag+/Ag 0.7996 V, AgCl/Ag 0.22233 V, AgBr/Ag 0.07133 V
    expect(Math.abs(table.findCouple('Ag+/Ag')!.e0 - 0.7996)).toBeLessThan(0.001);
    expect(Math.abs(table.findCouple('AgCl/Ag')!.e0 - 0.22233)).toBeLessThan(0.001);
    expect(Math.abs(table.findCouple('AgBr/Ag')!.e0 - 0.07133)).toBeLessThan(0.001);
    expect(table.findCouple('H+/H2')!.e0).toBe(0); // definition of the SHE (IUPAC)
    // NBS 1982 tables (NIST digital edition, stdprops-ml data/NBS_Tables.csv): ΔfG° Au(CN)2- 285.8, CN- 172.4,
    // AuCl4- −235.14, Cl- −131.228 kJ/mol: E° = −(2·172.4 − 285.8)/F and (4·131.228 − 235.14)/(3F)
    const F = 96485.33212;
    expect(table.findCouple('Au(CN)2-/Au')!.e0).toBeCloseTo((-(2 * 172.4 - 285.8) * 1000) / F, 4);
    expect(table.findCouple('AuCl4-/Au')!.e0).toBeCloseTo(((4 * 131.228 - 235.14) * 1000) / (3 * F), 4);
  });

  it('stores dE°/dT = ΔrS°/(nF) from the cited reaction enthalpies', () => {
    const F = 96485.33212;
    const RTln10 = 8.314462618 * 298.15 * Math.LN10;
    // Thermoddem V1.10: O2(g) → O2(aq) log K −2.893, ΔrH −12.134 kJ/mol; H2(g) + 0.5 O2(aq) → H2O log K 43.001,
    // ΔrH −279.763 kJ/mol. For O2(g) + 2H2(g) → 2H2O: log K = 2·43.001 − 2.893, ΔrH = 2·(−279.763) − 12.134
    const logK = 2 * 43.001 - 2.893;
    const dH = (2 * -279.763 - 12.134) * 1000;
    const dS = (dH + RTln10 * logK) / 298.15;
    expect(table.findCouple('O2/H2O')!.dEdT_mV_K).toBeCloseTo((dS / (4 * F)) * 1000, 3);
    expect(table.findCouple('O2/H2O')!.e0).toBeCloseTo((RTln10 * logK) / (4 * F), 4);
    expect(table.findCouple('H+/H2')!.dEdT_mV_K).toBe(0); // E°(SHE) = 0 at every temperature (IUPAC)
  });

  it('derives n from each half-reaction', () => {
    expect(table.findCouple('MnO4-/Mn2+')!.n).toBe(5);
    expect(table.findCouple('Cr2O7^2-/Cr3+')!.n).toBe(6);
    expect(table.findCouple('O2/OH-')!.n).toBe(4);
    expect(table.findCouple('Fe3+/Fe')!.n).toBe(3);
    expect(table.findCouple('Sn(OH)6^2-/Sn')!.n).toBe(4);
  });

  it('is built once and cached', () => {
    expect(builtinTable()).toBe(table);
  });
});
