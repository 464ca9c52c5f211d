import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { currentEfficiency } from '../../src/faraday/currentEfficiency';
import { depositMass } from '../../src/faraday/depositMass';
import { depositTime } from '../../src/faraday/depositTime';

const species = fc.oneof(fc.constantFrom('Cu', 'Ni', 'Zn', 'Ag', 'Cr', 'Au', 'Sn', 'Cd', 'Pb', 'Cl2', 'H2', 'CuSO4·5H2O'), fc.double({ min: 1, max: 1000, noNaN: true }));

describe('depositMass', () => {
  it('10 A for 1 h deposits 11.86 g of copper', () => {
    // 10 A·h × 1.186 g/(A·h), the electrochemical equivalent of Cu(II) in plating handbooks (from memory)
    expect(Math.abs(depositMass(10, 1, 'Cu', 2, 1) - 11.86)).toBeLessThan(0.01);
  });
  it('scales with the efficiency', () => {
    expect(depositMass(10, 1, 'Cu', 2, 0.95)).toBeCloseTo(0.95 * depositMass(10, 1, 'Cu', 2, 1), 12);
  });
  it('one faraday (26.80 A·h) deposits one equivalent: 31.77 g of copper', () => {
    // F = 96485.33 C = 26.801 A·h (CODATA 2018); M(Cu)/2 = 31.773 g (IUPAC 2021 abridged)
    expect(depositMass(1, 96485.33212 / 3600, 'Cu', 2, 1)).toBeCloseTo(31.773, 3);
  });
});

describe('depositTime inverts depositMass (property)', () => {
  it('t → m → t', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 1e-3, max: 1e4, noNaN: true }),
        fc.double({ min: 1e-3, max: 1e3, noNaN: true }),
        species,
        fc.integer({ min: 1, max: 8 }),
        fc.double({ min: 0.01, max: 1, noNaN: true }),
        (i, t, s, n, eff) => {
          const m = depositMass(i, t, s, n, eff);
          expect(depositTime(m, i, s, n, eff) / t - 1).toBeCloseTo(0, 12);
        },
      ),
      { numRuns: 1000 },
    );
  });
  it('and the efficiency of a Faraday mass is 1', () => {
    fc.assert(
      fc.property(fc.double({ min: 1e-3, max: 1e4, noNaN: true }), fc.double({ min: 1e-3, max: 1e3, noNaN: true }), species, fc.integer({ min: 1, max: 8 }), fc.double({ min: 0.01, max: 1, noNaN: true }), (i, t, s, n, eff) => {
        expect(currentEfficiency(depositMass(i, t, s, n, eff), i, t, s, n)).toBeCloseTo(eff, 12);
      }),
    );
  });
});

describe('currentEfficiency', () => {
  it('11.0 g of copper for 10 A·h is 92.8 %', () => {
    // 11.0 / (10 × 1.186) = 0.9275 (plating-handbook electrochemical equivalent, from memory)
    expect(currentEfficiency(11.0, 10, 1, 'Cu', 2)).toBeCloseTo(0.928, 3);
  });
  it('more than the Faraday mass is returned as it is (a measurement to question)', () => {
    expect(currentEfficiency(13, 10, 1, 'Cu', 2)).toBeGreaterThan(1);
  });
});
