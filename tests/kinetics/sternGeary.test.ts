import { describe, expect, it } from 'vitest';
import { sternGeary } from '../../src/kinetics/sternGeary';

describe('sternGeary', () => {
  it('B = 26 mV for βa = βc = 120 mV/decade, so 1 kΩ·cm² means 26 µA/cm²', () => {
    // Stern & Geary, J. Electrochem. Soc. 104 (1957) 56; B ≈ 26 mV for 120/120 mV Tafel slopes (common practice)
    expect(sternGeary(0.12, 0.12, 1000)).toBeCloseTo(26.06, 2);
  });
  it('uses ln 10 where ASTM G59/G102 print 2.303 (a 0.02 % difference)', () => {
    // ASTM G102 eq. (B = βaβc/(2.303(βa+βc))), from memory
    const withPrinted = ((0.06 * 0.12) / (2.303 * (0.06 + 0.12)) / 250) * 1e6;
    expect(sternGeary(0.06, 0.12, 250) / withPrinted).toBeCloseTo(1, 3);
  });
  it('a diffusion-limited cathode (βc → ∞) gives B = βa/2.303', () => {
    expect(sternGeary(0.06, 1e12, 100)).toBeCloseTo((0.06 / Math.LN10 / 100) * 1e6, 6);
  });
});
