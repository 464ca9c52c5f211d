/** Corrosion rates: coupon mass loss (ASTM G1/G31), pitting factor, Stern–Geary with B, conversions, alloy EW, galvanic series. */
import { describe, expect, it } from 'vitest';
import { equivWeight } from '../../src/corrosion/equivWeight';
import { galvanicSeries } from '../../src/corrosion/galvanicSeries';
import { icorrFromB } from '../../src/corrosion/icorrFromB';
import { massLossRate } from '../../src/corrosion/massLossRate';
import { pittingFactor } from '../../src/corrosion/pittingFactor';
import { PLAUSIBLE, plausible } from '../../src/corrosion/plausible';
import { rateConvert } from '../../src/corrosion/rateConvert';
import { NotFoundError } from '../../src/errors';

describe('massLossRate (ASTM G1 §8.1.2, K = 8.76e4 mm/y, 3.45e6 mpy)', () => {
  it('a carbon-steel coupon: 0.650 g, 28.5 cm², 168 h, 7.85 g/cm³ → 1.515 mm/y', () => {
    // worked example read at costcalculator.calculator.city (K = 87,600): 56,940 / 37,585.8 = 1.515
    expect(massLossRate(0.65, 28.5, 168, 7.85, 'mm/y')).toBeCloseTo(56940 / 37585.8, 6);
    // the two K constants agree through 1 mil = 0.0254 mm (8.76e4/0.0254 = 3.449e6)
    expect(massLossRate(0.65, 28.5, 168, 7.85, 'mpy') / massLossRate(0.65, 28.5, 168, 7.85, 'mm/y')).toBeCloseTo(3.45e6 / 8.76e4, 9);
  });
  it('a density in kg/m³ is refused with the likely mistake named', () => {
    expect(() => massLossRate(0.65, 28.5, 168, 7870, 'mm/y')).toThrow(/looks like kg\/m³/);
  });
});

describe('pittingFactor (ASTM G46), icorrFromB (ASTM G59/G102)', () => {
  it('values and swapped arguments', () => {
    expect(pittingFactor(500, 50)).toBe(10);
    expect(() => pittingFactor(50, 500)).toThrow(/swapped/);
    expect(icorrFromB(0.026, 1000)).toBeCloseTo(26, 9);
    expect(() => icorrFromB(26, 1000)).toThrow(/millivolts/);
  });
});

describe('rateConvert (ASTM G102 K1 = 3.27e-3)', () => {
  it('iron: 1 µA/cm² → 0.0116 mm/y (ASTM G102 X1: Fe, EW 27.92, 7.87 g/cm³)', () => {
    expect(rateConvert(1, 'µA/cm²', 'mm/y', 27.92, 7.87)).toBeCloseTo(3.2707e-3 * 27.92 / 7.87, 6);
    expect(rateConvert(1, 'uA/cm2', 'mA/m2', null, null)).toBeCloseTo(10, 12);
    expect(rateConvert(1, 'mm/y', 'mpy', null, null)).toBeCloseTo(39.3701, 4);
    const r = rateConvert(0.1, 'mm/y', 'uA/cm2', 27.92, 7.87);
    expect(rateConvert(r, 'uA/cm2', 'mm/y', 27.92, 7.87)).toBeCloseTo(0.1, 12);
    expect(() => rateConvert(1, 'uA/cm2', 'mm/y', null, null)).toThrow(/equivalent_weight_g/);
  });
});

describe('equivWeight (ASTM G102 eq. 5: EW = 1/Σ(fᵢnᵢ/Wᵢ))', () => {
  it('iron 27.92 (ASTM G102 Table 2) and type 304 at mid-range composition 25.12 (Table 2, from memory)', () => {
    expect(equivWeight(['Fe'], [1], [2])).toBeCloseTo(27.92, 2);
    // G102 Note 2: mid-range compositions; 304: Cr 19 %, Ni 9.25 %, Mn 1 %, Fe balance; valences Fe 2, Cr 3, Ni 2, Mn 2
    expect(equivWeight(['Fe', 'Cr', 'Ni', 'Mn'], [0.7075, 0.19, 0.0925, 0.01], [2, 3, 2, 2])).toBeCloseTo(25.12, 1);
  });
  it('refuses percentages and unequal lengths', () => {
    expect(() => equivWeight(['Fe', 'Cr'], [70, 18], [2, 3])).toThrow(/0.18 for 18 %/);
    expect(() => equivWeight(['Fe', 'Cr'], [0.7], [2, 3])).toThrow(/same length/);
  });
});

describe('galvanicSeries (ACA, flowing seawater, V vs SCE)', () => {
  it('zinc, mild steel, passive 316 noble to mild steel', () => {
    expect(galvanicSeries('zinc')).toMatchObject({ min_V: -1.03, max_V: -0.98 });
    expect(galvanicSeries('Mild steel, cast iron')).toMatchObject({ min_V: -0.72, max_V: -0.6 });
    expect(galvanicSeries('Stainless steel type 316, 317 (passive)').min_V).toBeGreaterThan(galvanicSeries('mild steel').max_V);
    expect(() => galvanicSeries('stainless')).toThrow(/matches/);
    expect(() => galvanicSeries('unobtainium')).toThrow(NotFoundError);
  });
});

describe('plausible', () => {
  it('millivolts in volts, mV/decade in V/decade', () => {
    expect(() => plausible('potential_V', -850, PLAUSIBLE.volts)).toThrow(/millivolts/);
    expect(() => plausible('beta_a_V', 120, PLAUSIBLE.tafelV)).toThrow(/mV\/decade/);
    expect(plausible('beta_c_V', -0.12, PLAUSIBLE.tafelV)).toBe(-0.12);
  });
});
