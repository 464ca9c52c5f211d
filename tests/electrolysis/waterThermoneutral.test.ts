import { describe, expect, it } from 'vitest';
import { FARADAY_C_PER_MOL as F } from '../../src/constants';
import { InputError } from '../../src/errors';
import { waterThermoneutral } from '../../src/electrolysis/waterThermoneutral';

describe('waterThermoneutral', () => {
  it('HHV basis is ΔfH°(H2O, l)/2F at 25 °C', () => {
    // NBS 1982 (NIST digital edition, data/NBS_Tables.csv line 47): ΔfH°(H2O, l) = −285.830 kJ/mol
    expect(waterThermoneutral(25)).toBeCloseTo(285830 / (2 * F), 12);
  });
  it('LHV basis is ΔfH°(H2O, g)/2F at 25 °C and differs from HHV by the vaporisation enthalpy', () => {
    // NBS 1982 line 48: ΔfH°(H2O, g) = −241.818 kJ/mol; vaporisation 44.012 kJ/mol at 25 °C
    expect(waterThermoneutral(25, 'LHV')).toBeCloseTo(241818 / (2 * F), 12);
    expect((waterThermoneutral(25) - waterThermoneutral(25, 'LHV')) * 2 * F).toBeCloseTo(44012, 6);
  });
  it('vaporisation enthalpy at 80 °C from the Cp° of both phases', () => {
    // NBS 1982: Cp° H2O(l) 75.291, H2O(g) 33.577 J/(mol·K): 44012 − 41.714·55 = 41717.7 J/mol;
    // the steam tables give about 41.6 kJ/mol at 80 °C (common practice): within 0.3 %
    const dvap = (waterThermoneutral(80) - waterThermoneutral(80, 'LHV')) * 2 * F;
    expect(dvap).toBeCloseTo(44012 - (75.291 - 33.577) * 55, 6);
  });
  it('refuses another basis', () => {
    expect(() => waterThermoneutral(25, 'gross')).toThrow(InputError);
  });
});
