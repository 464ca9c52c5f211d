/**
 * The built-in reference-electrode table (data/electrodes.json): every electrode the functions document is
 * there, every row is usable and names its source, and says whether a liquid junction is included.
 */
import { describe, expect, it } from 'vitest';
import electrodes from '../../data/electrodes.json';
import { builtinTable, builtinTableProblems } from '../../src/table/builtin';

const REQUIRED = [
  'SCE',
  'Hg/Hg2Cl2/KCl(sat)',
  'Hg/Hg2Cl2/KCl(1M)',
  'Hg/Hg2Cl2/KCl(0.1M)',
  'Ag/AgCl/KCl(sat)',
  'Ag/AgCl/KCl(3.5M)',
  'Ag/AgCl/KCl(3M)',
  'Ag/AgCl/KCl(1M)',
  'Ag/AgCl/KCl(0.1M)',
  'Ag/AgCl/seawater',
  'CSE',
  'Cu/CuSO4(sat)',
  'Hg/HgO/NaOH(1M)',
  'Hg/HgO/NaOH(0.1M)',
  'Hg/Hg2SO4/K2SO4(sat)',
  'Hg/Hg2SO4/H2SO4(1M)',
  'Zn/seawater',
];

describe('data/electrodes.json', () => {
  it('holds every electrode of the reference scales in use, by key or alias', () => {
    const t = builtinTable();
    for (const k of REQUIRED) expect(t.findElectrode(k), k).toBeDefined();
  });
  it('every row passes the table checks (none left out)', () => {
    expect(builtinTableProblems().filter((p) => p.kind === 'electrode')).toEqual([]);
    expect(builtinTable().electrodes).toHaveLength(electrodes.electrodes.length);
  });
  it('every row names a source and says whether a liquid junction is included', () => {
    for (const r of electrodes.electrodes) {
      expect(r.source.trim().length, r.key).toBeGreaterThan(10);
      expect(r.note ?? '', r.key).toMatch(/junction/i);
    }
  });
  it('look-ups ignore case and white space', () => {
    const t = builtinTable();
    expect(t.findElectrode(' ag / agcl / kcl (SAT) ')?.key).toBe('Ag/AgCl/KCl(sat)');
    expect(t.findElectrode('cu/cuso4(SAT)')?.key).toBe('CSE');
    expect(t.findElectrode('hg/hg2cl2/kcl(sat)')?.key).toBe('SCE');
  });
  it('reads the published values', () => {
    const t = builtinTable();
    expect(t.findElectrode('SCE')?.potential).toBe(0.2412); // Bard & Faulkner 2nd ed., inside back cover
    expect(t.findElectrode('Hg/Hg2Cl2/KCl(1M)')?.potential).toBe(0.2801); // Bard & Faulkner 2nd ed., inside back cover
    expect(t.findElectrode('Hg/Hg2Cl2/KCl(0.1M)')?.potential).toBe(0.3337); // Bard & Faulkner 2nd ed., inside back cover
    expect(t.findElectrode('Ag/AgCl/KCl(sat)')?.potential).toBe(0.197); // Bard & Faulkner 2nd ed., inside back cover
    expect(t.findElectrode('CSE')?.potential).toBe(0.316); // Szabó & Bakos, Int. J. Corros. 2010, Table 2
    expect(t.findElectrode('Ag/AgCl/KCl(3M)')?.potential).toBe(0.21); // consultrsr.net reference-electrode table: Ag/AgCl, KCl (3M) 0.210 V vs NHE
    expect(t.findElectrode('Ag/AgCl/seawater')?.potential).toBe(0.25); // Roberge, Corrosion Engineering (2008), Table 4.7: seawater ~0.250 V vs SHE
    // zinc: −0.80 V vs Ag/AgCl ≡ +0.25 V vs Zn (Cathwell, "Monitoring cathodic protection") with Ag/AgCl/seawater at 0.250 V
    expect(t.findElectrode('Zn/seawater')?.potential).toBeCloseTo(0.25 - 0.8 - 0.25, 9);
    expect(t.findElectrode('Hg/Hg2SO4/H2SO4(1M)')?.potential).toBe(0.6739); // Szabó & Bakos, Int. J. Corros. 2010, Table 2
    expect(t.findElectrode('Hg/HgO/NaOH(1M)')?.potential).toBe(0.1077); // J. Power Sources 161 (2006) 1217, abstract
  });
  it('orders the field and laboratory electrodes as the sources do', () => {
    // Zn < SHE < Ag/AgCl(sat) < SCE < NCE < CSE < Hg/Hg2SO4: common practice (every reference-electrode chart)
    const p = (k: string) => builtinTable().findElectrode(k)!.potential;
    const order = ['Zn/seawater', 'Ag/AgCl/KCl(sat)', 'SCE', 'Hg/Hg2Cl2/KCl(1M)', 'CSE', 'Hg/Hg2SO4/K2SO4(sat)'].map(p);
    for (let i = 1; i < order.length; i++) expect(order[i]).toBeGreaterThan(order[i - 1]);
    expect(order[0]).toBeLessThan(0);
  });
});
