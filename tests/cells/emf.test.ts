import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { emf } from '../../src/cells/emf';

describe('emf', () => {
  it('Daniell cell: E°cell = 0.3419 − (−0.7618) = 1.1037 V', () => {
    // E°(Cu2+/Cu) 0.3419 V and E°(Zn2+/Zn) −0.7618 V: CRC Handbook, Electrochemical Series (from memory);
    // textbooks (Atkins, Physical Chemistry) quote the Daniell cell as 1.10 V
    expect(emf(0.3419, -0.7618)).toBeCloseTo(1.1037, 10);
    expect(emf(0.3419, -0.7618)).toBeCloseTo(1.1, 2);
  });

  it('never reorders: a non-spontaneous pairing is negative', () => {
    expect(emf(-0.7618, 0.3419)).toBeCloseTo(-1.1037, 10);
  });

  it('EMF(a, b) = −EMF(b, a) (property)', () => {
    fc.assert(fc.property(fc.double({ min: -4, max: 4, noNaN: true }), fc.double({ min: -4, max: 4, noNaN: true }), (a, b) => {
      // exact in IEEE arithmetic (=== so that 0 and −0 count as equal when a = b)
      expect(emf(a, b) === -emf(b, a)).toBe(true);
    }));
  });
});
