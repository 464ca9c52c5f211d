import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { deltaG } from '../../src/thermo/deltaG';
import { eFromDeltaG } from '../../src/thermo/eFromDeltaG';

describe('deltaG / eFromDeltaG', () => {
  it('Daniell cell: E° = 1.100 V, n = 2 → ΔG° = −212.3 kJ/mol', () => {
    // Standard textbook worked example (e.g. Atkins, Physical Chemistry, Daniell cell: ΔG° = −212 kJ/mol); F from CODATA 2018
    expect(deltaG(1.1, 2)).toBeCloseTo(-212.268, 3);
  });
  it('water: ΔG° = 237.13 kJ/mol for H2O(l) → H2 + ½O2 gives E = −1.229 V with n = 2', () => {
    // ΔfG°(H2O, l) = −237.13 kJ/mol: NBS/NIST tables (CRC Handbook, "Standard Thermodynamic Properties")
    expect(eFromDeltaG(237.13, 2)).toBeCloseTo(-1.2288, 4);
  });
  it('E → ΔG → E round trip (property)', () => {
    fc.assert(fc.property(fc.double({ min: -10, max: 10, noNaN: true }), fc.integer({ min: 1, max: 20 }), (e, n) => {
      expect(eFromDeltaG(deltaG(e, n), n)).toBeCloseTo(e, 12);
    }));
  });
});
