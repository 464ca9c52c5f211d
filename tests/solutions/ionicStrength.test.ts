import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { InputError } from '../../src/errors';
import { ionicStrength } from '../../src/solutions/ionicStrength';

describe('ionicStrength', () => {
  it('a 1:1 salt: I = m; CaCl2: I = 3m; CuSO4: I = 4m; LaCl3: I = 6m', () => {
    // definitions, e.g. Robinson & Stokes, Electrolyte Solutions, ch. 2 (I = ½Σmᵢzᵢ²)
    expect(ionicStrength([0.1, 0.1], [1, -1])).toBeCloseTo(0.1, 15);
    expect(ionicStrength([0.1, 0.2], [2, -1])).toBeCloseTo(0.3, 15);
    expect(ionicStrength([0.1, 0.1], [2, -2])).toBeCloseTo(0.4, 15);
    expect(ionicStrength([0.1, 0.3], [3, -1])).toBeCloseTo(0.6, 15);
  });
  it('a Watts nickel bath (NiSO4·6H2O 300 g/L, NiCl2·6H2O 45 g/L, H3BO3 40 g/L) is about 5 mol/kg', () => {
    // Watts bath composition: plating handbooks (common practice). Taking g/L ≈ g/kg of water for a rough figure:
    // NiSO4 1.141 mol, NiCl2 0.189 mol, boric acid neutral → I = 4·1.141 + 3·0.189 = 5.13
    const ni = 300 / 262.85 + 45 / 237.69;
    const so4 = 300 / 262.85;
    const cl = (2 * 45) / 237.69;
    expect(ionicStrength([ni, so4, cl], [2, -2, -1])).toBeCloseTo(5.13, 2);
  });
  it('lists of different lengths are an input error', () => {
    expect(() => ionicStrength([0.1, 0.1], [1])).toThrow(InputError);
  });
  it('the order of the ions does not matter (property)', () => {
    fc.assert(
      fc.property(fc.array(fc.tuple(fc.double({ min: 0, max: 10, noNaN: true }), fc.integer({ min: -4, max: 4 })), { minLength: 1, maxLength: 8 }), (ions) => {
        const a = ionicStrength(ions.map((x) => x[0]), ions.map((x) => x[1]));
        const rev = [...ions].reverse();
        expect(ionicStrength(rev.map((x) => x[0]), rev.map((x) => x[1]))).toBeCloseTo(a, 12);
      }),
    );
  });
});
