import { describe, expect, it } from 'vitest';
import { waterSaturationPressure } from '../../src/electrolysis/waterSaturationPressure';
import { InputError } from '../../src/errors';
import { gasVolume } from '../../src/faraday/gasVolume';

/** Molar volume of an ideal gas at 273.15 K and 101.325 kPa, L/mol: CODATA 2018 (exact, 22.413 969 54). */
const VM_STP = 22.41396954;

describe('gasVolume', () => {
  it('one ampere-hour gives 0.418 L of H2 and 0.209 L of O2 at 0 °C and 1 atm', () => {
    // 3600/(2F) mol × 22.413 969 54 L/mol (CODATA 2018) = 0.41815 L; "0.418 L H2 per A·h", common practice
    expect(gasVolume(1, 1, 2, 1, 0, 1.01325, false)).toBeCloseTo((3600 / (2 * 96485.33212)) * VM_STP, 9);
    expect(gasVolume(1, 1, 2, 1, 0, 1.01325, false)).toBeCloseTo(0.418, 3);
    expect(gasVolume(1, 1, 4, 1, 0, 1.01325, false)).toBeCloseTo(0.209, 3);
  });
  it('follows the ideal-gas law in T and p, and the efficiency', () => {
    const v = gasVolume(100, 2, 2, 1, 25, 1, false);
    expect(gasVolume(100, 2, 2, 1, 25, 2, false)).toBeCloseTo(v / 2, 12);
    expect(gasVolume(100, 2, 2, 1, 80, 1, false)).toBeCloseTo((v * 353.15) / 298.15, 12);
    expect(gasVolume(100, 2, 2, 0.9, 25, 1, false)).toBeCloseTo(0.9 * v, 12);
  });
  it('saturated: the wet volume is the dry one × p/(p − p_water)', () => {
    // Dalton's law: the gas's partial pressure is p − p_w(T); p_w from IAPWS-IF97 eq. 30
    const dry = gasVolume(1000, 1, 2, 1, 80, 1.01325, false);
    const pw = waterSaturationPressure(80);
    expect(pw).toBeCloseTo(0.4741, 3); // 47.41 kPa at 80 °C, steam tables (IAPWS), from memory
    expect(gasVolume(1000, 1, 2, 1, 80, 1.01325, true)).toBeCloseTo((dry * 1.01325) / (1.01325 - pw), 10);
    // at 80 °C and 1 atm almost half the wet gas is water vapour: the wet volume is 1.88 × the dry one
    expect(gasVolume(1000, 1, 2, 1, 80, 1.01325, true) / dry).toBeCloseTo(1.01325 / (1.01325 - 0.47414), 3);
  });
  it('saturated at or above the boiling point is an input error that says water boils', () => {
    expect(() => gasVolume(1, 1, 2, 1, 100, 1, true)).toThrow(InputError);
    expect(() => gasVolume(1, 1, 2, 1, 100, 1, true)).toThrow(/boils/);
    expect(gasVolume(1, 1, 2, 1, 100, 2, true)).toBeGreaterThan(0);
  });
});
