import { describe, expect, it } from 'vitest';
import { tafelSlope } from '../../src/kinetics/tafelSlope';

describe('tafelSlope', () => {
  it('118 mV per decade for α = 0.5 at 25 °C', () => {
    // Bard & Faulkner, Electrochemical Methods, 2nd ed., §3.4.3 (from memory): 2.303RT/(αF) = 0.118 V
    expect(tafelSlope(0.5, 25) * 1000).toBeCloseTo(118.3, 1);
  });
  it('59 mV per decade for α = 1 and 39 mV for α = 1.5 (common mechanistic diagnostics)', () => {
    // 120 / 60 / 40 mV per decade as mechanistic diagnostics of HER/OER (common practice)
    expect(tafelSlope(1, 25) * 1000).toBeCloseTo(59.16, 2);
    expect(tafelSlope(1.5, 25) * 1000).toBeCloseTo(39.44, 2);
  });
  it('grows with temperature: 130.9 mV at 57 °C for α = 0.5', () => {
    // 2.303·R·330.15/(0.5·F) with CODATA 2018 constants
    expect(tafelSlope(0.5, 57) * 1000).toBeCloseTo(131.0, 1);
  });
});
