import { describe, expect, it } from 'vitest';
import { acidPerTonne } from '../../src/plant/acidPerTonne';
import { degradationRate } from '../../src/plant/degradationRate';
import { gasCrossover } from '../../src/plant/gasCrossover';
import { powerCost } from '../../src/plant/powerCost';
import { waterPerHydrogen } from '../../src/plant/waterPerHydrogen';
import { InputError, NotFoundError } from '../../src/errors';

const F = 96485.33212; // C/mol, CODATA 2018 (exact: e·N_A)
// IUPAC CIAAW 2021 abridged standard atomic weights (Prohaska et al., Pure Appl. Chem. 94 (2022) 573, Table 1)
const H = 1.008;
const O = 15.999;
const S = 32.06;
const ZN = 65.38;
const CU = 63.546;
const MN = 54.938;
const H2SO4 = 2 * H + S + 4 * O; // 98.072 g/mol
const H2O = 2 * H + O; // 18.015 g/mol
const VM0 = (8.314462618 * 273.15) / 101325; // m³/mol at 0 °C, 101.325 kPa: R of CODATA 2018, DIN 1343 conditions

describe('acid per tonne of metal electrowon', () => {
  it('n/2 mol H2SO4 per mol of metal: zinc 1.500 and copper 1.543 t/t (hand calculation with IUPAC 2021 weights)', () => {
    expect(acidPerTonne('Zn', 2, 1, 0)).toBeCloseTo(H2SO4 / ZN, 10);
    expect(acidPerTonne('Cu', 2, 1, 0)).toBeCloseTo(H2SO4 / CU, 10);
    // "about 1.5 t of sulfuric acid regenerated per tonne of zinc": common practice
    expect(acidPerTonne('Zn', 2, 1, 0)).toBeCloseTo(1.5, 2);
    expect(acidPerTonne(ZN, 2, 1, 0)).toBeCloseTo(H2SO4 / ZN, 10);
  });
  it('the cathode efficiency alone does not change the sulfate balance', () => {
    expect(acidPerTonne('Zn', 2, 0.9, 0)).toBe(acidPerTonne('Zn', 2, 1, 0));
  });
  it('MnO2 at the anode adds 1 mol H2SO4 per mol MnO2: (n/2)(1 + f/ε)', () => {
    // zinc at 90 % cathode efficiency, 1 % of the charge to MnO2: MnO2 = 2·0.01/(2·0.9) mol per mol Zn
    const mno2PerZn = (2 * 0.01) / (2 * 0.9);
    expect(acidPerTonne('Zn', 2, 0.9, 0.01)).toBeCloseTo(((1 + mno2PerZn) * H2SO4) / ZN, 10);
    // MnSO4 + 2H2O → MnO2 + H2SO4 + H2 balance: acid per mass of MnO2 is M(H2SO4)/M(MnO2)
    const extraAcidPerT = acidPerTonne('Zn', 2, 0.9, 0.01) - acidPerTonne('Zn', 2, 0.9, 0);
    const mno2PerT = (mno2PerZn * (MN + 2 * O)) / ZN;
    expect(extraAcidPerT / mno2PerT).toBeCloseTo(H2SO4 / (MN + 2 * O), 10);
  });
  it('refuses a charge split over 100 % and a capitalisation slip', () => {
    expect(() => acidPerTonne('Zn', 2, 0.995, 0.01)).toThrow(InputError);
    expect(() => acidPerTonne('CU', 2, 1, 0)).toThrow(/did you mean Cu/);
    expect(() => acidPerTonne('Zn', 2, 1, 1)).toThrow(InputError);
  });
});

describe('water per unit of hydrogen', () => {
  it('stoichiometric M(H2O)/M(H2) = 8.936 kg/kg and M(H2O)/Vm = 0.8037 kg/Nm³ (hand calculation, IUPAC 2021, CODATA 2018)', () => {
    expect(waterPerHydrogen('kg', 0, '0C')).toBeCloseTo(H2O / (2 * H), 10);
    expect(waterPerHydrogen('kg', 0, '0C')).toBeCloseTo(8.936, 3);
    expect(waterPerHydrogen('Nm3', 0, '0C')).toBeCloseTo(H2O / 1000 / VM0, 10);
    expect(waterPerHydrogen('Nm³', 0, '0C')).toBe(waterPerHydrogen('Nm3', 0, '0C'));
    // "about 9 kg of water per kg of hydrogen" before losses: common practice
    expect(Math.round(waterPerHydrogen('kg', 0, '0C'))).toBe(9);
  });
  it('at 15 °C the normal m³ holds fewer moles: ratio 273.15/288.15', () => {
    expect(waterPerHydrogen('Nm3', 0, '15C') / waterPerHydrogen('Nm3', 0, '0C')).toBeCloseTo(273.15 / 288.15, 12);
  });
  it('an extra consumption fraction multiplies by (1 + f); unknown basis is NotFound', () => {
    expect(waterPerHydrogen('kg', 0.1, '0C')).toBeCloseTo(1.1 * waterPerHydrogen('kg', 0, '0C'), 12);
    expect(() => waterPerHydrogen('L', 0, '0C')).toThrow(NotFoundError);
    expect(() => waterPerHydrogen('kg', 5, '0C')).toThrow(InputError);
  });
});

describe('degradation rate from a voltage log', () => {
  // The rate as the least-squares slope of voltage against operating hours, in µV/h: common practice
  // (a published protocol's definition, such as the EU harmonised test protocols for water
  // electrolysis, could not be read while this was written).
  // NIST Statistical Reference Datasets, linear least squares, "Norris" (lower difficulty):
  // https://www.itl.nist.gov/div898/strd/lls/data/Norris.shtml; certified B1 = 1.00211681802045,
  // s(B1) = 0.429796848199937E-03 (data and certified values read in public test files that copy the set)
  const y = [0.1, 338.8, 118.1, 888.0, 9.2, 228.1, 668.5, 998.5, 449.1, 778.9, 559.2, 0.3, 0.1, 778.1, 668.8, 339.3, 448.9, 10.8, 557.7, 228.3, 998.0, 888.8, 119.6, 0.3, 0.6, 557.6, 339.3, 888.0, 998.5, 778.9, 10.2, 117.6, 228.9, 668.4, 449.2, 0.2];
  const x = [0.2, 337.4, 118.2, 884.6, 10.1, 226.5, 666.3, 996.3, 448.6, 777.0, 558.2, 0.4, 0.6, 775.5, 666.9, 338.0, 447.5, 11.6, 556.0, 228.1, 995.8, 887.6, 120.2, 0.3, 0.3, 556.8, 339.1, 887.2, 999.0, 779.0, 11.1, 118.3, 229.2, 669.1, 448.9, 0.5];
  it('reproduces the certified slope and its standard error of the NIST Norris set (as V against h, so ×10⁶ µV/h)', () => {
    const [rate, se, n] = degradationRate(y, x, 3);
    expect(rate / 1e6).toBeCloseTo(1.00211681802045, 12);
    expect(se / 1e6).toBeCloseTo(0.429796848199937e-3, 12);
    expect(n).toBe(36);
  });
  it('a log rising 10 mV per 1000 h is 10 µV/h with no scatter (hand calculation)', () => {
    const [rate, se, n] = degradationRate([1.8, 1.81, 1.82, 1.83], [0, 1000, 2000, 3000], 3);
    expect(rate).toBeCloseTo(10, 9);
    expect(se).toBeCloseTo(0, 9);
    expect(n).toBe(4);
  });
  it('needs the minimum number of points, readings at different hours and paired lists', () => {
    expect(() => degradationRate([1.8, 1.81], [0, 100], 3)).toThrow(/at least 3/);
    expect(() => degradationRate([1.8, 1.81, 1.82, 1.83], [0, 100, 200, 300], 5)).toThrow(/at least 5/);
    expect(() => degradationRate([1.8, 1.81, 1.82], [5, 5, 5], 3)).toThrow(/same operating hour/);
    expect(() => degradationRate([1.8, 1.81, 1.82], [0, 1], 3)).toThrow(/3 voltages and 2 hours/);
  });
});

describe('gas crossover', () => {
  it('H2 in O2 = 2·ix/(2·ix + j) by Faraday\'s law (hand calculation), against the 4.0 vol % limit', () => {
    const [x, share] = gasCrossover(5000, 50, 'H2', 'A/m2', 4);
    expect(x).toBeCloseTo(100 / 5100, 14);
    expect(share).toBeCloseTo(100 / 5100 / 0.04, 12);
    // default limit: hydrogen's 4.0 vol % lower flammability limit (Zabetakis 1965, data/electrolysis.json)
    expect(gasCrossover(5000, 50, 'H2', 'A/m2', null)).toEqual([x, share]);
  });
  it('a flux in mol/(m²·s) is ix = 2F·N for H2, 4F·N for O2', () => {
    const n = 50 / (2 * F);
    const [x] = gasCrossover(5000, n, 'h2', 'mol/(m²·s)', 4);
    expect(x).toBeCloseTo(100 / 5100, 10);
    const [xo] = gasCrossover(5000, 10 / (4 * F), 'O2', 'mol/m2/s', 5);
    expect(xo).toBeCloseTo(10 / (10 + 10000), 12);
  });
  it('O2 in H2 = ix/(ix + 2j) and has no default limit', () => {
    expect(gasCrossover(5000, 10, 'O2', 'A/m2', 5)[0]).toBeCloseTo(10 / 10010, 14);
    expect(() => gasCrossover(5000, 10, 'O2', 'A/m2', null)).toThrow(/give limit_percent/);
    expect(() => gasCrossover(5000, 10, 'N2', 'A/m2', 4)).toThrow(NotFoundError);
    expect(() => gasCrossover(5000, 10, 'H2', 'mA/cm2', 4)).toThrow(NotFoundError);
    expect(() => gasCrossover(5000, 10, 'H2', 'A/m2', 400)).toThrow(InputError);
  });
});

describe('AC energy and power cost per tonne', () => {
  it('DC = U·nF/(ε·M) per tonne, AC = DC/η_rect, cost = AC × price (hand calculation, CODATA 2018 F)', () => {
    const dc = ((3.3 * 2 * F) / (0.9 * ZN)) / 3.6; // kWh/t: C·V per g = J/g = kJ/kg; /3.6 → kWh/t
    const [d, a, c] = powerCost(3.3, 'Zn', 2, 0.96, 0.08, 0.9);
    expect(d).toBeCloseTo(dc, 5);
    expect(a).toBeCloseTo(dc / 0.96, 5);
    expect(c).toBeCloseTo((dc / 0.96) * 0.08, 6);
    // copper electrowinning near 2 V and 90 % efficiency: about 1.9 MWh DC per tonne, common practice
    expect(powerCost(2, 'Cu', 2, 1, 0, 0.9)[0] / 1000).toBeCloseTo(1.875, 3);
  });
  it('refuses a rectifier efficiency outside (0, 1]', () => {
    expect(() => powerCost(3.3, 'Zn', 2, 0, 0.08, 0.9)).toThrow(InputError);
    expect(() => powerCost(3.3, 'Zn', 2, 96, 0.08, 0.9)).toThrow(InputError);
  });
});
