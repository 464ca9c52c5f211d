import { describe, expect, it } from 'vitest';
import { gasVolume } from '../../src/faraday/gasVolume';

/** Molar volume of an ideal gas at 273.15 K and 101.325 kPa, L/mol: CODATA 2018 (exact, 22.413 969 54). */
const VM_STP = 22.41396954;

describe('gasVolume', () => {
  it('one ampere-hour gives 0.418 L of H2 and 0.209 L of O2 at 0 °C and 1 atm', () => {
    // 3600/(2F) mol × 22.413 969 54 L/mol (CODATA 2018) = 0.41815 L; "0.418 L H2 per A·h", common practice
    expect(gasVolume(1, 1, 2, 0, 1.01325, 1)).toBeCloseTo((3600 / (2 * 96485.33212)) * VM_STP, 9);
    expect(gasVolume(1, 1, 2, 0, 1.01325, 1)).toBeCloseTo(0.418, 3);
    expect(gasVolume(1, 1, 4, 0, 1.01325, 1)).toBeCloseTo(0.209, 3);
  });
  it('follows the ideal-gas law in T and p, and the efficiency', () => {
    const v = gasVolume(100, 2, 2, 25, 1, 1);
    expect(gasVolume(100, 2, 2, 25, 2, 1)).toBeCloseTo(v / 2, 12);
    expect(gasVolume(100, 2, 2, 80, 1, 1)).toBeCloseTo((v * 353.15) / 298.15, 12);
    expect(gasVolume(100, 2, 2, 25, 1, 0.9)).toBeCloseTo(0.9 * v, 12);
  });
});
