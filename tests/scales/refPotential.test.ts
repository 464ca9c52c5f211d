import { describe, expect, it } from 'vitest';
import { InputError, NotFoundError } from '../../src/errors';
import { refPotential } from '../../src/scales/refPotential';
import { builtinTable } from '../../src/table/builtin';
import type { ElectrodeRow } from '../../src/table/types';
import { parseHalfReaction } from '../../src/chem/halfReaction';
import { speciesE0 } from '../../src/species/speciesE0';

const row = (k: string): ElectrodeRow => builtinTable().findElectrode(k)!;

describe('refPotential', () => {
  it('returns the stored value at 25 °C, also for rows without dE/dT', () => {
    expect(refPotential(row('SCE'), 25)).toBe(0.2412); // Bard & Faulkner 2nd ed., inside back cover
    expect(refPotential(row('Ag/AgCl/KCl(3M)'), 25)).toBe(0.21); // common practice (makers' data, 3 mol/L KCl)
  });
  it('SCE falls by about 6.7 mV from 25 to 35 °C', () => {
    // Sawyer, Sobkowiak & Roberts (1995) §5.2: SCE 0.2444 V at 25 °C and 0.2376 V at 35 °C (with junction),
    // a fall of 6.8 mV (read in a secondary reproduction); the row's −0.661 mV/K gives 6.6 mV.
    expect(refPotential(row('SCE'), 35) - refPotential(row('SCE'), 25)).toBeCloseTo(-0.0068, 3);
  });
  it('Ag/AgCl (sat. KCl) falls by about 10 mV from 15 to 25 °C', () => {
    // Sawyer, Sobkowiak & Roberts (1995) §5.2: 0.209 V at 15 °C, 0.199 V at 25 °C (read in a secondary reproduction)
    expect(refPotential(row('Ag/AgCl/KCl(sat)'), 15) - refPotential(row('Ag/AgCl/KCl(sat)'), 25)).toBeCloseTo(0.01, 4);
  });
  it('CSE rises about 0.9 mV per kelvin', () => {
    // common practice in cathodic protection (about +0.9 mV/°C), from memory
    expect(refPotential(row('CSE'), 35)).toBeCloseTo(0.316 + 0.009, 6);
  });
  it('a row with neither dE/dT nor a fixed filling is known only at 25 °C (#N/A naming it)', () => {
    expect(() => refPotential(row('Ag/AgCl/seawater'), 40)).toThrow(NotFoundError);
    expect(() => refPotential(row('Ag/AgCl/seawater'), 40)).toThrow(/Ag\/AgCl\/seawater/);
  });
  it('outside 0…100 °C is a domain error', () => {
    expect(() => refPotential(row('SCE'), -1)).toThrow(InputError);
    expect(() => refPotential(row('SCE'), 100.5)).toThrow(InputError);
    expect(refPotential(row('SCE'), 0)).toBeCloseTo(0.2412 + 0.661e-3 * 25, 9);
  });
});

describe('refPotential: electrodes of the second kind with a fixed filling follow their reaction', () => {
  const tb = builtinTable();
  const el = (k: string) => tb.findElectrode(k)!;
  const slope = (k: string) => ((refPotential(el(k), 26) - refPotential(el(k), 24)) / 2) * 1000;
  it('the model reproduces the published dE/dT of the electrodes that have one within 0.05 mV/K', () => {
    // published coefficients in data/electrodes.json (Sawyer, Sobkowiak & Roberts, 1995): calomel 1 mol/L −0.275,
    // 0.1 mol/L −0.09, Ag/AgCl 3.5 mol/L −0.75 mV/K. The model: species-derived dE°/dT of the electrode reaction
    // (NBS 1982) plus (E − E°)/T at constant filling activity.
    const model = (k: string, reaction: string) => {
      const hr = parseHalfReaction(reaction);
      const row = el(k);
      return ((speciesE0(hr, 25.5) - speciesE0(hr, 24.5)) + (row.potential - speciesE0(hr, 25)) / 298.15) * 1000;
    };
    expect(Math.abs(model('Hg/Hg2Cl2/KCl(1M)', 'Hg2Cl2 + 2e- -> 2Hg(l) + 2Cl-') - -0.275)).toBeLessThan(0.02);
    expect(Math.abs(model('Hg/Hg2Cl2/KCl(0.1M)', 'Hg2Cl2 + 2e- -> 2Hg(l) + 2Cl-') - -0.09)).toBeLessThan(0.02);
    expect(Math.abs(model('Ag/AgCl/KCl(3.5M)', 'AgCl + e- -> Ag + Cl-') - -0.75)).toBeLessThan(0.05);
  });
  it('a stored dE/dT takes precedence; fixed fillings without one answer 0–100 °C; saturated and field electrodes do not', () => {
    expect(slope('Hg/Hg2Cl2/KCl(1M)')).toBeCloseTo(-0.275, 9);
    for (const k of ['Ag/AgCl/KCl(3M)', 'Ag/AgCl/KCl(1M)', 'Ag/AgCl/KCl(0.1M)', 'Hg/HgO/NaOH(1M)', 'Hg/HgO/NaOH(0.1M)', 'Hg/Hg2SO4/H2SO4(1M)']) {
      for (let tc = 0; tc <= 100; tc += 10) expect(Number.isFinite(refPotential(el(k), tc)), k).toBe(true);
      expect(refPotential(el(k), 25)).toBe(el(k).potential);
    }
    // Ag/AgCl 3 mol/L at 60 °C: E°(AgCl/Ag, 60 °C) from NBS 1982 plus (333.15/298.15)·(0.210 − 0.22220) V
    const hr = parseHalfReaction('AgCl + e- -> Ag + Cl-');
    expect(refPotential(el('Ag/AgCl/KCl(3M)'), 60)).toBeCloseTo(speciesE0(hr, 60) + (333.15 / 298.15) * (0.21 - speciesE0(hr, 25)), 12);
    for (const k of ['SSCE', 'Ag/AgCl/seawater', 'Hg/Hg2SO4/K2SO4(sat)', 'Zn/seawater']) expect(() => refPotential(el(k), 60), k).toThrow(NotFoundError);
  });
});
