import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { nernst } from '../../src/nernst/nernst';

describe('nernst', () => {
  it('Cu2+/Cu at a(Cu2+) = 0.01: E = 0.3419 − (0.05916/2)·2 = 0.2827 V', () => {
    // E° 0.3419 V: CRC Handbook, Electrochemical Series; Q = 1/a(Cu2+) = 100; slope from CODATA 2018
    expect(nernst(0.3419, 2, 100, 25)).toBeCloseTo(0.28274, 5);
  });
  it('one decade of Q at 25 °C moves E by 59.16 mV / n', () => {
    expect(nernst(0, 1, 10, 25)).toBeCloseTo(-0.059159, 6); // CODATA 2018 slope
  });
  it('Q = 1 gives E0 (property)', () => {
    fc.assert(fc.property(fc.double({ min: -5, max: 5, noNaN: true }), fc.integer({ min: 1, max: 10 }), fc.double({ min: -50, max: 300, noNaN: true }), (e0, n, t) => {
      expect(nernst(e0, n, 1, t)).toBe(e0);
    }));
  });
});
