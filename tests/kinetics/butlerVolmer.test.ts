import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { thermalVoltage } from '../../src/constants';
import { DomainError, InputError } from '../../src/errors';
import { butlerVolmer } from '../../src/kinetics/butlerVolmer';
import { tafelSlope } from '../../src/kinetics/tafelSlope';

describe('butlerVolmer', () => {
  it('is zero at zero overpotential and odd in η for αa = αc', () => {
    expect(butlerVolmer(1e-3, 0, 0.5, null, 25)).toBe(0);
    fc.assert(
      fc.property(fc.double({ min: -1, max: 1, noNaN: true }), (eta) => {
        expect(butlerVolmer(1, -eta, 0.5, 0.5, 25)).toBeCloseTo(-butlerVolmer(1, eta, 0.5, 0.5, 25), 9);
      }),
    );
  });
  it('near equilibrium i = i0·Fη/RT (the charge-transfer resistance RT/(F·i0))', () => {
    // Bard & Faulkner, Electrochemical Methods, 2nd ed., eq. 3.4.11–3.4.12 (from memory)
    // (the next term is (αa − αc)·Fη/2RT relative, −8e-8 here)
    const eta = 1e-8;
    expect(butlerVolmer(2e-3, eta, 0.3, 0.7, 25) / ((2e-3 * eta) / thermalVoltage(25))).toBeCloseTo(1, 6);
  });
  it('at high anodic overpotential it follows the Tafel line: one decade per 118 mV for α = 0.5', () => {
    // Bard & Faulkner 2nd ed. §3.4.3: b = 2.303RT/(αF) = 118 mV per decade for α = 0.5 at 25 °C (from memory)
    const b = tafelSlope(0.5, 25);
    const i1 = butlerVolmer(1e-6, 0.4, 0.5, null, 25);
    const i2 = butlerVolmer(1e-6, 0.4 + b, 0.5, null, 25);
    expect(Math.log10(i2 / i1)).toBeCloseTo(1, 6);
  });
  it('αc defaults to 1 − αa; αa ≥ 1 without αc is a domain error', () => {
    expect(butlerVolmer(1, -0.05, 0.3, null, 25)).toBe(butlerVolmer(1, -0.05, 0.3, 0.7, 25));
    expect(() => butlerVolmer(1, 0.1, 1.5, null, 25)).toThrow(InputError);
    expect(butlerVolmer(1, 0.1, 1.5, 0.5, 25)).toBeGreaterThan(0);
  });
  it('a current beyond double range is a domain error, not Infinity', () => {
    expect(() => butlerVolmer(1, 50, 0.5, null, 25)).toThrow(DomainError);
    expect(() => butlerVolmer(1, -50, 0.5, null, 25)).toThrow(DomainError);
  });
});
