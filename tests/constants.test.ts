import { describe, expect, it } from 'vitest';
import { AVOGADRO_PER_MOL, ELEMENTARY_CHARGE_C, FARADAY_C_PER_MOL, GAS_CONSTANT_J_PER_MOL_K, kelvin, thermalVoltage } from '../src/constants';

describe('constants (CODATA 2018)', () => {
  it('exact defining constants', () => {
    expect(ELEMENTARY_CHARGE_C).toBe(1.602176634e-19); // CODATA 2018, exact
    expect(AVOGADRO_PER_MOL).toBe(6.02214076e23); // CODATA 2018, exact
  });
  it('F = e·N_A = 96485.33212 C/mol', () => {
    expect(FARADAY_C_PER_MOL).toBeCloseTo(96485.33212, 5); // CODATA 2018: 96 485.332 12... C/mol (exact)
  });
  it('R = N_A·k = 8.314462618 J/(mol·K)', () => {
    expect(GAS_CONSTANT_J_PER_MOL_K).toBeCloseTo(8.314462618, 9); // CODATA 2018: 8.314 462 618... (exact)
  });
  it('kelvin and RT/F', () => {
    expect(kelvin(25)).toBe(298.15); // definition of the Celsius scale
    expect(thermalVoltage(25)).toBeCloseTo(0.025693, 6); // RT/F at 298.15 K from CODATA 2018 values
  });
});
