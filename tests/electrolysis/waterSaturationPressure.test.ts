import { describe, expect, it } from 'vitest';
import { waterSaturationPressure } from '../../src/electrolysis/waterSaturationPressure';
import { InputError } from '../../src/errors';

describe('waterSaturationPressure (IAPWS-IF97 region 4)', () => {
  it('reproduces the check values of IF97-Rev Table 35', () => {
    // IAPWS R7-97(2012) Table 35: T = 300, 500, 600 K → ps = 0.353658941e-2, 0.263889776e1, 0.123443146e2 MPa
    expect(waterSaturationPressure(300 - 273.15)).toBeCloseTo(0.0353658941, 9);
    expect(waterSaturationPressure(500 - 273.15)).toBeCloseTo(26.3889776, 6);
    expect(waterSaturationPressure(600 - 273.15)).toBeCloseTo(123.443146, 5);
  });
  it('gives the triple-point and normal-boiling-point pressures', () => {
    // 611.2 Pa at 0 °C (IF97 p_min 611.213 Pa at 273.15 K); 101.42 kPa at 100 °C (steam tables, from memory)
    expect(waterSaturationPressure(0)).toBeCloseTo(0.006112, 6);
    expect(waterSaturationPressure(100)).toBeCloseTo(1.0142, 4);
  });
  it('refuses temperatures outside 0 °C … critical point', () => {
    expect(() => waterSaturationPressure(-1)).toThrow(InputError);
    expect(() => waterSaturationPressure(374)).toThrow(/0 to 373.946 °C/);
  });
});
