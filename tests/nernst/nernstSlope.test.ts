import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { nernstSlope } from '../../src/nernst/nernstSlope';

describe('nernstSlope', () => {
  it('59.159 mV per decade at 25 °C, n = 1', () => {
    expect(nernstSlope(1, 25) * 1000).toBeCloseTo(59.159, 3); // RT ln10/F at 298.15 K, CODATA 2018 constants
  });
  it('61.540 mV per decade at 37 °C, n = 1', () => {
    expect(nernstSlope(1, 37) * 1000).toBeCloseTo(61.540, 3); // RT ln10/F at 310.15 K, CODATA 2018 constants
  });
  it('54.199 mV per decade at 0 °C, n = 1', () => {
    expect(nernstSlope(1, 0) * 1000).toBeCloseTo(54.199, 3); // RT ln10/F at 273.15 K, CODATA 2018 constants
  });
  it('scales as 1/n', () => {
    fc.assert(fc.property(fc.integer({ min: 1, max: 12 }), fc.double({ min: 0, max: 100, noNaN: true }), (n, t) => {
      expect(nernstSlope(n, t) * n).toBeCloseTo(nernstSlope(1, t), 12);
    }));
  });
});
