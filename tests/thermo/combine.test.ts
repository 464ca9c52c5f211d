import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { combine } from '../../src/thermo/combine';
import { InputError } from '../../src/errors';

describe('combine', () => {
  it('Fe3+/Fe from Fe3+/Fe2+ and Fe2+/Fe by adding free energies: −0.041 V', () => {
    // E°(Fe3+/Fe2+) = 0.771 V, E°(Fe2+/Fe) = −0.447 V: CRC Handbook, Electrochemical Series.
    // (1·0.771 + 2·(−0.447))/3 = −0.041 V: the standard textbook worked example (e.g. Bard & Faulkner, ch. 2, from memory);
    // CRC lists −0.037 V for Fe3+/Fe directly.
    expect(combine([0.771, -0.447], [1, 2])).toBeCloseTo(-0.041, 3);
  });
  it('a single step returns itself (property)', () => {
    fc.assert(fc.property(fc.double({ min: -5, max: 5, noNaN: true }), fc.integer({ min: 1, max: 8 }), (e, n) => {
      expect(combine([e], [n])).toBeCloseTo(e, 14);
    }));
  });
  it('unequal lists and steps whose electrons cancel are errors', () => {
    expect(() => combine([0.1, 0.2], [1])).toThrow(InputError);
    expect(() => combine([0.1, 0.2], [1, -1])).toThrow(InputError);
  });
});
