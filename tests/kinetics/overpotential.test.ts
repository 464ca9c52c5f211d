import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { thermalVoltage } from '../../src/constants';
import { butlerVolmer } from '../../src/kinetics/butlerVolmer';
import { overpotential } from '../../src/kinetics/overpotential';

const vt = thermalVoltage;

describe('overpotential inverts butlerVolmer (property)', () => {
  it('to 1e-9 V over the whole range of currents a double can hold, both signs', () => {
    fc.assert(
      fc.property(
        fc.double({ min: -12, max: 2, noNaN: true }), // log10 i0
        fc.double({ min: 0.05, max: 2, noNaN: true }), // αa
        fc.double({ min: 0.05, max: 2, noNaN: true }), // αc
        fc.double({ min: 0, max: 100, noNaN: true }), // °C
        fc.double({ min: -1, max: 1, noNaN: true }), // fraction of the largest η whose current is still a double
        (lgI0, aa, ac, t, u) => {
          const i0 = 10 ** lgI0;
          const etaMax = (690 * vt(t)) / Math.max(aa, ac); // keeps exp(α·Fη/RT) below 1e300
          const eta = u * etaMax;
          const i = butlerVolmer(i0, eta, aa, ac, t);
          expect(Math.abs(overpotential(i, i0, aa, ac, t) - eta)).toBeLessThanOrEqual(1e-9);
        },
      ),
      { numRuns: 5000 },
    );
  });
  it('near equilibrium too (tiny overpotentials, where the two exponentials nearly cancel)', () => {
    fc.assert(
      fc.property(fc.double({ min: -1e-6, max: 1e-6, noNaN: true }), fc.double({ min: 0.1, max: 0.9, noNaN: true }), (eta, aa) => {
        const i = butlerVolmer(1e-3, eta, aa, null, 25);
        expect(Math.abs(overpotential(i, 1e-3, aa, null, 25) - eta)).toBeLessThanOrEqual(1e-15);
      }),
    );
  });
  it('at 15 V, where a plain Newton step from η = 0 overflows, it still returns 15 V', () => {
    const i = butlerVolmer(1, 15, 1, 1, 25); // ≈ 6e253
    const naiveStep = i / ((1 + 1) / vt(25)); // Newton from 0: η1 = i/(i0·(αa+αc)·F/RT)
    expect(Number.isFinite(Math.exp(naiveStep / vt(25)))).toBe(false); // the next evaluation would overflow
    expect(overpotential(i, 1, 1, 1, 25)).toBeCloseTo(15, 9);
    expect(overpotential(-i, 1, 1, 1, 25)).toBeCloseTo(-15, 9);
  });
  it('beyond the range butlerVolmer can evaluate it follows the Tafel line exactly', () => {
    // i/i0 = 1e600: η = (RT/(αa·F))·ln(1e600) (the cathodic term is e^-1400 of the anodic one)
    expect(overpotential(1e300, 1e-300, 0.5, null, 25)).toBeCloseTo((vt(25) / 0.5) * 600 * Math.LN10, 9);
    expect(overpotential(-1e300, 1e-300, 0.5, 0.25, 25)).toBeCloseTo(-(vt(25) / 0.25) * 600 * Math.LN10, 9);
  });
  it('zero current is zero overpotential; the sign follows the current', () => {
    expect(overpotential(0, 1e-3, 0.5, null, 25)).toBe(0);
    expect(overpotential(1e-3, 1e-3, 0.5, null, 25)).toBeGreaterThan(0);
    expect(overpotential(-1e-3, 1e-3, 0.5, null, 25)).toBeLessThan(0);
  });
  it('i = i0 at α = 0.5 and 25 °C needs η = 2·(RT/F)·asinh(1/2) = 24.7 mV', () => {
    // symmetric Butler–Volmer: i = 2·i0·sinh(Fη/2RT) (Bard & Faulkner 2nd ed. §3.4, from memory)
    expect(overpotential(1, 1, 0.5, null, 25)).toBeCloseTo(2 * vt(25) * Math.asinh(0.5), 12);
  });
});
