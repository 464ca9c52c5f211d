import { describe, expect, it } from 'vitest';
import { builtinTable } from '../../src/table/builtin';

// Every thermodynamic cycle among rows of the built-in couple table: free energies (n·E°) of half-reactions that
// add up to the same overall reaction must agree. Where a cycle also needs an equilibrium constant (a solubility
// product, a stability constant, the ion product of water, a dimerisation), the constant is the one the rows' own
// source lists, with its file and line beside it. Each cycle must close within 5 mV of the overall reaction's E°.

const T = 298.15;
// RT ln10 / F at 298.15 K with the CODATA 2018 exact R and F
const k = (8.314462618 * T * Math.LN10) / 96485.33212;
const TOL_V = 0.005;

const table = builtinTable();
function E(key: string): number {
  const row = table.findCouple(key);
  if (row === undefined) throw new Error(`no row ${key}`);
  return row.e0;
}

// Thermoddem V1.10, thermoddem-v1.10.dat (stored in reaktoro/reaktoro, embedded/databases/phreeqc/):
const THD = {
  logKw: -14.002, // line 5267: H2O = OH- + H+ (89cox/wag)
  dichromate: 14.751, // line 2319: 2CrO4^2- + 2H+ = Cr2O7^2- + H2O
  hydrogenChromate: 6.52, // line 3709: CrO4^2- + H+ = HCrO4-
  agclKsp: -9.749, // line 8300 Chlorargyrite: AgCl = Ag+ + Cl- (89cox/wag)
  calomelKsp: -17.844, // line 8100 Calomel: Hg2Cl2 = Hg2^2+ + 2Cl- (89cox/wag)
  hg2so4Ksp: -6.192, // line 9495 Hg2SO4 = Hg2^2+ + SO4^2- (89cox/wag)
  anglesiteKsp: -7.848, // line 7393 Anglesite: PbSO4 = Pb2+ + SO4^2- (89cox/wag)
  hgo: 2.445, // line 9526 HgO(cr) + 2H+ = Hg2+ + H2O (89cox/wag)
  ag2o: 12.57, // line 7281 Ag2O + 2H+ = 2Ag+ + H2O
  cuprite: -1.47, // line 8800 Cuprite: Cu2O + 2H+ = 2Cu+ + H2O (95rob/hem)
  niOH2: 11.672, // line 10713 Ni(OH)2 + 2H+ = Ni2+ + 2H2O
  cucl2: 4.813, // line 2512: Cu+ + 2Cl- = CuCl2-
  aucl2: 9.581, // line 1520: Au+ + 2Cl- = AuCl2- (01aki/zot)
};
// MINTEQA2 v4, minteq.v4.dat (same stored copy), constants with their listed source:
const MTQ = {
  logKw: -13.997, // line 530: H2O = OH- + H+ (NIST46.4)
  agiKsp: -16.08, // line 11573 Iodyrite: AgI = Ag+ + I-
  agbrKsp: -12.3, // line 11513 Bromyrite: AgBr = Ag+ + Br-
  agCN2: 20.48, // line 4020: Ag+ + 2CN- = Ag(CN)2- (NIST46.4)
  cuCN2: 21.9145, // line 3996: Cu+ + 2CN- = Cu(CN)2- (NIST46.4)
  cuCN3: 27.2145, // line 4004: Cu+ + 3CN- = Cu(CN)3^2- (NIST46.4)
  zincite: 11.334, // line 10917 Zincite: ZnO + 2H+ = Zn2+ + H2O
  snOH2ToHSnO2: -8.9347, // line 578: Sn(OH)2 = HSnO2- + H+
  snOH2ToSn2: 7.094, // line 538: Sn(OH)2 + 2H+ = Sn2+ + 2H2O
  stannateToSn4: 21.2194, // line 586: Sn(OH)6^2- + 6H+ = Sn4+ + 6H2O
};
// LLNL thermo.com.V8.R6.230, llnl.dat (same stored copy):
const LLNL = {
  logKw: -13.9951, // line 6433: H2O = OH- + H+
  zincate: -41.6052, // line 9447: Zn2+ + 4H2O = Zn(OH)4^2- + 4H+
};

interface Cycle {
  name: string;
  /** the overall reaction's n·E° computed two ways (V·electrons) and the n it is divided by */
  left: () => number;
  right: () => number;
  n: number;
}

const cycles: Cycle[] = [
  { name: 'Fe3+/Fe = Fe3+/Fe2+ + Fe2+/Fe', left: () => 3 * E('Fe3+/Fe'), right: () => E('Fe3+/Fe2+') + 2 * E('Fe2+/Fe'), n: 3 },
  { name: 'Cu2+/Cu = Cu2+/Cu+ + Cu+/Cu', left: () => 2 * E('Cu2+/Cu'), right: () => E('Cu2+/Cu+') + E('Cu+/Cu'), n: 2 },
  { name: 'O2/H2O = O2/H2O2 + H2O2/H2O', left: () => 4 * E('O2/H2O'), right: () => 2 * E('O2/H2O2') + 2 * E('H2O2/H2O'), n: 4 },
  { name: 'Cr3+/Cr = Cr3+/Cr2+ + Cr2+/Cr', left: () => 3 * E('Cr3+/Cr'), right: () => E('Cr3+/Cr2+') + 2 * E('Cr2+/Cr'), n: 3 },
  {
    name: 'PbO2/Pb2+ + Pb2+/Pb = PbO2/PbSO4 + PbSO4/Pb (both PbO2 + 4H+ + 4e- -> Pb + 2H2O)',
    left: () => 2 * E('PbO2/Pb2+') + 2 * E('Pb2+/Pb'),
    right: () => 2 * E('PbO2/PbSO4') + 2 * E('PbSO4/Pb'),
    n: 4,
  },
  {
    // Cr2O7^2- + H2O = 2HCrO4-: log K = 2·6.520 − 14.751 (the dimerisation constant, inverted)
    name: 'Cr2O7^2-/Cr3+ = 2·HCrO4-/Cr3+ with the dimerisation 2HCrO4- = Cr2O7^2- + H2O',
    left: () => 6 * E('Cr2O7^2-/Cr3+'),
    right: () => 6 * E('HCrO4-/Cr3+') + k * (2 * THD.hydrogenChromate - THD.dichromate),
    n: 6,
  },
  { name: 'O2/OH- = O2/H2O with Kw', left: () => 4 * E('O2/OH-'), right: () => 4 * E('O2/H2O') + 4 * k * THD.logKw, n: 4 },
  { name: 'H2O/H2 = H+/H2 with Kw', left: () => 2 * E('H2O/H2'), right: () => 2 * E('H+/H2') + 2 * k * THD.logKw, n: 2 },
  { name: 'AgCl/Ag = Ag+/Ag with Ksp(AgCl)', left: () => E('AgCl/Ag'), right: () => E('Ag+/Ag') + k * THD.agclKsp, n: 1 },
  { name: 'AgBr/Ag = Ag+/Ag with Ksp(AgBr)', left: () => E('AgBr/Ag'), right: () => E('Ag+/Ag') + k * MTQ.agbrKsp, n: 1 },
  { name: 'AgI/Ag = Ag+/Ag with Ksp(AgI)', left: () => E('AgI/Ag'), right: () => E('Ag+/Ag') + k * MTQ.agiKsp, n: 1 },
  { name: 'Hg2Cl2/Hg = Hg2^2+/Hg with Ksp(Hg2Cl2)', left: () => 2 * E('Hg2Cl2/Hg'), right: () => 2 * E('Hg2^2+/Hg') + k * THD.calomelKsp, n: 2 },
  { name: 'Hg2SO4/Hg = Hg2^2+/Hg with Ksp(Hg2SO4)', left: () => 2 * E('Hg2SO4/Hg'), right: () => 2 * E('Hg2^2+/Hg') + k * THD.hg2so4Ksp, n: 2 },
  { name: 'PbSO4/Pb = Pb2+/Pb with Ksp(PbSO4)', left: () => 2 * E('PbSO4/Pb'), right: () => 2 * E('Pb2+/Pb') + k * THD.anglesiteKsp, n: 2 },
  { name: 'HgO/Hg = Hg2+/Hg with HgO solubility and Kw', left: () => 2 * E('HgO/Hg'), right: () => 2 * E('Hg2+/Hg') + k * (THD.hgo + 2 * THD.logKw), n: 2 },
  { name: 'Ag2O/Ag = Ag+/Ag with Ag2O solubility and Kw', left: () => 2 * E('Ag2O/Ag'), right: () => 2 * E('Ag+/Ag') + k * (THD.ag2o + 2 * THD.logKw), n: 2 },
  { name: 'Cu2O/Cu = Cu+/Cu with Cu2O solubility and Kw', left: () => 2 * E('Cu2O/Cu'), right: () => 2 * E('Cu+/Cu') + k * (THD.cuprite + 2 * THD.logKw), n: 2 },
  { name: 'Ni(OH)2/Ni = Ni2+/Ni with Ni(OH)2 solubility and Kw', left: () => 2 * E('Ni(OH)2/Ni'), right: () => 2 * E('Ni2+/Ni') + k * (THD.niOH2 + 2 * THD.logKw), n: 2 },
  { name: 'CuCl2-/Cu = Cu+/Cu with β2(CuCl2-)', left: () => E('CuCl2-/Cu'), right: () => E('Cu+/Cu') - k * THD.cucl2, n: 1 },
  { name: 'AuCl2-/Au = Au+/Au with β2(AuCl2-)', left: () => E('AuCl2-/Au'), right: () => E('Au+/Au') - k * THD.aucl2, n: 1 },
  { name: 'Ag(CN)2-/Ag = Ag+/Ag with β2', left: () => E('Ag(CN)2-/Ag'), right: () => E('Ag+/Ag') - k * MTQ.agCN2, n: 1 },
  { name: 'Cu(CN)2-/Cu = Cu+/Cu with β2', left: () => E('Cu(CN)2-/Cu'), right: () => E('Cu+/Cu') - k * MTQ.cuCN2, n: 1 },
  { name: 'Cu(CN)3^2-/Cu = Cu+/Cu with β3', left: () => E('Cu(CN)3^2-/Cu'), right: () => E('Cu+/Cu') - k * MTQ.cuCN3, n: 1 },
  { name: 'ZnO/Zn = Zn2+/Zn with ZnO solubility and Kw', left: () => 2 * E('ZnO/Zn'), right: () => 2 * E('Zn2+/Zn') + k * (MTQ.zincite + 2 * MTQ.logKw), n: 2 },
  {
    // Zn(OH)4^2- + 4H+ = Zn2+ + 4H2O (−log K of the LLNL hydrolysis) and 4H2O = 4H+ + 4OH- (4·log Kw): the zincate row
    // comes from LLNL, Zn2+/Zn from MINTEQA2 v4, so this cycle crosses two databases
    name: 'Zn(OH)4^2-/Zn = Zn2+/Zn with zincate hydrolysis and Kw (LLNL constants)',
    left: () => 2 * E('Zn(OH)4^2-/Zn'),
    right: () => 2 * E('Zn2+/Zn') + k * (-LLNL.zincate + 4 * LLNL.logKw),
    n: 2,
  },
  {
    // HSnO2- + H+ = Sn(OH)2; Sn(OH)2 + 2H+ = Sn2+ + 2H2O; 3H2O = 3H+ + 3OH-
    name: 'HSnO2-/Sn = Sn2+/Sn with tin(II) hydrolysis and Kw',
    left: () => 2 * E('HSnO2-/Sn'),
    right: () => 2 * E('Sn2+/Sn') + k * (-MTQ.snOH2ToHSnO2 + MTQ.snOH2ToSn2 + 3 * MTQ.logKw),
    n: 2,
  },
  {
    // Sn(OH)6^2- + 6H+ = Sn4+ + 6H2O; Sn4+ + 2e- = Sn2+; Sn2+ + 2e- = Sn; 6H2O = 6H+ + 6OH-
    name: 'Sn(OH)6^2-/Sn = Sn4+/Sn2+ + Sn2+/Sn with stannate hydrolysis and Kw',
    left: () => 4 * E('Sn(OH)6^2-/Sn'),
    right: () => 2 * E('Sn4+/Sn2+') + 2 * E('Sn2+/Sn') + k * (MTQ.stannateToSn4 + 6 * MTQ.logKw),
    n: 4,
  },
];

describe('thermodynamic cycles of the built-in couple table', () => {
  it.each(cycles.map((c) => [c.name, c] as const))('%s closes within 5 mV', (_name, c) => {
    const diff = (c.left() - c.right()) / c.n;
    expect(Math.abs(diff)).toBeLessThan(TOL_V);
  });

  it('the alkaline forms agree with the ion product of water of data/water.json at 25 °C within 1 mV', () => {
    // pKw = 13.995 at 25 °C: Bandura & Lvov, J. Phys. Chem. Ref. Data 35 (2006) 15, check value (tests/nernst)
    expect(Math.abs(E('O2/H2O') - E('O2/OH-') - k * 13.995)).toBeLessThan(0.001);
    expect(Math.abs(E('H+/H2') - E('H2O/H2') - k * 13.995)).toBeLessThan(0.001);
  });

  it('a cycle that does not close is caught (the check can fail)', () => {
    const wrong = (3 * E('Fe3+/Fe') - (E('Fe3+/Fe2+') + 2 * (E('Fe2+/Fe') + 0.02))) / 3;
    expect(Math.abs(wrong)).toBeGreaterThan(TOL_V);
  });
});
