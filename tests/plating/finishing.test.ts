/** Plating-shop checks and sizing: free cyanide, efficiency from thickness readings, rectifier rating, cathode hydrogen. */
import { describe, expect, it } from 'vitest';
import { InputError, NotFoundError } from '../../src/errors';
import { plateThickness } from '../../src/faraday/plateThickness';
import { freeCyanide } from '../../src/plating/freeCyanide';
import { hydrogenVentilation } from '../../src/plating/hydrogenVentilation';
import { rectifierRating } from '../../src/plating/rectifierRating';
import { thicknessEfficiency } from '../../src/plating/thicknessEfficiency';

/** CODATA 2018 Faraday constant, exact (e·N_A). */
const F = 96485.33212331001;
/** IUPAC 2021 abridged standard atomic weights (data/atomic-weights.json). */
const AW = { Na: 22.99, K: 39.098, C: 12.011, N: 14.007, Ni: 58.693 };

describe('freeCyanide: Liebig titration, 2 CN⁻ + Ag⁺ → Ag(CN)₂⁻', () => {
  // Stoichiometry of the Liebig (Liebig–Denigès, KI indicator) titration as written in the method note
  // "Free cyanide in silver plating solution, precipitation titration" (vdocuments.site copy of a titrator
  // maker's application note, eq. 1); method assessed in R. M. Wick, Bur. Stand. J. Res. 7 (1931) RP384
  // (Liebig's method correct to better than 0.2 %). Expected values by hand from IUPAC atomic weights.
  it('12.4 mL of 0.1 mol/L AgNO3 on a 10 mL sample: 2.48 mmol CN⁻ in 10 mL, 12.154 g/L NaCN', () => {
    const nacn = AW.Na + AW.C + AW.N; // 49.008 g/mol
    expect(freeCyanide(12.4, 0.1, 10, 'NaCN')).toBeCloseTo((2 * 1.24 * nacn) / 10, 10);
    expect(freeCyanide(12.4, 0.1, 10, 'NaCN')).toBeCloseTo(12.154, 3);
  });
  it('1 mL of 0.1 mol/L AgNO3 stands for 9.80 mg NaCN or 13.02 mg KCN (hand calculation from the stoichiometry)', () => {
    expect(freeCyanide(1, 0.1, 1000, 'NaCN') * 1000).toBeCloseTo(9.8016, 4);
    expect(freeCyanide(1, 0.1, 1000, 'KCN') * 1000).toBeCloseTo(2 * 0.1 * (AW.K + AW.C + AW.N), 4); // 13.023 mg
  });
  it('the 2 CN⁻ per Ag⁺ factor against a published titration factor: 1 mL 0.02 N AgNO3 = 1.08 mg HCN', () => {
    // AOAC alkaline titration method for HCN, text read at th4.ilovetranslation.com/57bw4vKfIxu=d: "1 mL 0.02 N
    // AgNO3 = 1.08 mg HCN (Ag equivalent to 2 CN)". The same cyanide expressed as HCN (27.025 g/mol) instead of NaCN.
    const mgNaCN = freeCyanide(1, 0.02, 1000, 'NaCN') * 1000; // mg in the sample: g/L × 1 L
    expect((mgNaCN * (1.008 + AW.C + AW.N)) / (AW.Na + AW.C + AW.N)).toBeCloseTo(1.08, 2);
  });
  it('KCN and NaCN results differ by the ratio of their molar masses', () => {
    expect(freeCyanide(8, 0.05, 5, 'kcn') / freeCyanide(8, 0.05, 5, 'nacn')).toBeCloseTo((AW.K + AW.C + AW.N) / (AW.Na + AW.C + AW.N), 12);
  });
  it('another salt, or a titrant molarity that looks like mmol/L, is refused', () => {
    expect(() => freeCyanide(12.4, 0.1, 10, 'HCN')).toThrow(NotFoundError);
    expect(() => freeCyanide(12.4, 100, 10, 'NaCN')).toThrow(/at most 1 mol\/L/);
  });
});

describe('thicknessEfficiency: mean reading over the Faraday thickness', () => {
  it('nickel at 1 A/dm² for 60 min is 12.292 µm at 100 % (Faraday\'s law: 3600 C/dm² · 58.693/(2F) g/C / 8.908 g/cm³)', () => {
    const faraday = ((3600 / (2 * F)) * AW.Ni) / 8.908 / 100 * 1e4; // µm
    expect(faraday).toBeCloseTo(12.292, 3);
    expect(plateThickness(1, 60, 'Ni', 2, 8.908, 1)).toBeCloseTo(faraday, 9);
    expect(thicknessEfficiency([11.6, 11.9, 12.1], 1, 60, 'Ni', 2, 8.908)).toBeCloseTo((11.6 + 11.9 + 12.1) / 3 / faraday, 12); // 0.9654
  });
  it('readings above the Faraday thickness give a value above 1, returned as it is', () => {
    expect(thicknessEfficiency([13, 13.2], 1, 60, 'Ni', 2, 8.908)).toBeGreaterThan(1);
  });
  it('no reading is refused', () => {
    expect(() => thicknessEfficiency([], 1, 60, 'Ni', 2, 8.908)).toThrow(InputError);
  });
});

describe('rectifierRating (definitions: I = A·j, P = U·I; margins are the designer\'s, common practice)', () => {
  it('120 dm² at 4 A/dm² with 20 % on the current; 5.5 V tank + 0.5 V leads with 10 % on the voltage', () => {
    const [i, u, p] = rectifierRating(120, 4, 5.5, 0.5, 0.2, 0.1);
    expect(i).toBeCloseTo(576, 12);
    expect(u).toBeCloseTo(6.6, 12);
    expect(p).toBeCloseTo(3.8016, 12);
  });
  it('no margins: the load itself', () => {
    const [i, u, p] = rectifierRating(50, 2, 3, 0.2, 0, 0);
    expect([i, u]).toEqual([100, 3.2]);
    expect(p).toBeCloseTo(0.32, 12);
  });
});

describe('hydrogenVentilation: I·(1 − ε) as H2, and the air for a share of the LFL', () => {
  // 1 kA makes 0.41815 Nm³/h of H2 at 0 °C, 101.325 kPa (Faraday's law, CODATA 2018 F and R; see
  // normalGasFlow's tests); LFL 4.0 vol % (Zabetakis, US Bureau of Mines Bulletin 627, 1965, in data/electrolysis.json)
  it('2000 A at 95 %: 100 A of hydrogen, 0.0418 Nm³/h; 25 % of the LFL (1 vol %) needs 99 times that in air', () => {
    const [h2, air] = hydrogenVentilation(2000, 0.95, 0.25, '0C', null);
    const expected = (100 * 3600) / (2 * F) * 0.02241396954;
    expect(h2).toBeCloseTo(expected, 9);
    expect(h2).toBeCloseTo(0.041815, 6);
    expect(air).toBeCloseTo(expected * 99, 7);
  });
  it('efficiency 1 evolves no hydrogen; efficiency 0 sends the whole current to hydrogen', () => {
    expect(hydrogenVentilation(2000, 1, 0.25, '0C', null)).toEqual([0, 0]);
    expect(hydrogenVentilation(1000, 0, 1, '0C', 4)[0]).toBeCloseTo(0.41815, 5);
  });
  it('at the LFL itself (share 1), x = 4 %: air = H2·(1/0.04 − 1) = 24·H2; another LFL and reference are taken as given', () => {
    const [h2, air] = hydrogenVentilation(1000, 0, 1, '0C', null);
    expect(air / h2).toBeCloseTo(24, 12);
    const [h2b, airb] = hydrogenVentilation(1000, 0, 0.5, '20C', 4.1);
    expect(h2b / h2).toBeCloseTo(293.15 / 273.15, 12);
    expect(airb / h2b).toBeCloseTo(1 / 0.0205 - 1, 12);
  });
  it('a share × LFL of 100 % or more is refused', () => {
    expect(() => hydrogenVentilation(1000, 0.5, 1, '0C', 100)).toThrow(/below 100 vol %/);
  });
});
