import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { logK } from '../../src/thermo/logK';
import { keq } from '../../src/thermo/keq';
import { eFromLogK } from '../../src/thermo/eFromLogK';
import { eFromK } from '../../src/thermo/eFromK';
import { DomainError } from '../../src/errors';

describe('logK / keq / eFromLogK / eFromK', () => {
  it('Daniell cell: log10 K = 37.2 (K ≈ 1.5e37)', () => {
    // 2·1.100/0.059159 = 37.19; textbook value K ≈ 1.5×10^37 for Zn + Cu2+ (from memory: Atkins, Physical Chemistry)
    expect(logK(1.1, 2, 25)).toBeCloseTo(37.188, 2);
    expect(keq(1.1, 2, 25)).toBeGreaterThan(1.5e37);
    expect(keq(1.1, 2, 25)).toBeLessThan(1.6e37);
  });
  it('E = 0.1 V, n = 1 → K = 49.0 at 25 °C', () => {
    expect(keq(0.1, 1, 25)).toBeCloseTo(49.0, 1); // 10^(0.1/0.059159) with CODATA 2018 constants
  });
  it('K beyond double range is a domain error while log K still answers', () => {
    expect(() => keq(20, 2, 25)).toThrow(DomainError);
    expect(logK(20, 2, 25)).toBeCloseTo(676.1, 1);
  });
  it('eFromK(1e10, 1) = 10 × 59.159 mV', () => {
    expect(eFromK(1e10, 1, 25)).toBeCloseTo(0.59159, 5); // CODATA 2018 slope
  });
  it('E → log K → E round trip (property)', () => {
    fc.assert(fc.property(fc.double({ min: -5, max: 5, noNaN: true }), fc.integer({ min: 1, max: 12 }), fc.double({ min: -20, max: 200, noNaN: true }), (e, n, t) => {
      expect(eFromLogK(logK(e, n, t), n, t)).toBeCloseTo(e, 12);
    }));
  });
  it('E → K → E round trip where K is representable (property)', () => {
    fc.assert(fc.property(fc.double({ min: -0.5, max: 0.5, noNaN: true }), fc.integer({ min: 1, max: 4 }), (e, n) => {
      expect(eFromK(keq(e, n, 25), n, 25)).toBeCloseTo(e, 10);
    }));
  });
});
