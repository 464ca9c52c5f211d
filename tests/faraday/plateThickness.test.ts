import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { plateThickness } from '../../src/faraday/plateThickness';
import { plateTime } from '../../src/faraday/plateTime';

describe('plateThickness', () => {
  it('nickel at 1 A/dm² for 1 h at 100 % efficiency: about 12.3 µm', () => {
    // plating handbooks (Watts nickel: 1 A/dm² for 60 min gives 12.3 µm at 100 % efficiency), from memory;
    // density of nickel 8.90 g/cm³ (CRC Handbook, 8.908; from memory)
    expect(plateThickness(1, 60, 'Ni', 2, 8.9, 1)).toBeCloseTo(12.3, 1);
  });
  it('copper from an acid sulfate bath at 2 A/dm² for 30 min: about 13.2 µm', () => {
    // 2 A/dm² × 0.5 h × 1.186 g/(A·h) / (8.96 g/cm³ × 100 cm²/dm²) = 13.2 µm (plating handbooks; ρ(Cu) 8.96, CRC; from memory)
    expect(plateThickness(2, 30, 'Cu', 2, 8.96, 1)).toBeCloseTo(13.2, 1);
  });
  it('is proportional to current density, time and efficiency', () => {
    const base = plateThickness(1, 10, 'Zn', 2, 7.14, 1);
    expect(plateThickness(3, 10, 'Zn', 2, 7.14, 1)).toBeCloseTo(3 * base, 12);
    expect(plateThickness(1, 40, 'Zn', 2, 7.14, 0.5)).toBeCloseTo(2 * base, 12);
  });
});

describe('plateTime inverts plateThickness (property)', () => {
  it('t → thickness → t', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 1e-3, max: 100, noNaN: true }),
        fc.double({ min: 1e-2, max: 1e4, noNaN: true }),
        fc.constantFrom<[string | number, number, number]>(['Ni', 2, 8.9], ['Cu', 2, 8.96], ['Zn', 2, 7.14], ['Ag', 1, 10.49], ['Cr', 6, 7.19], ['Au', 1, 19.3], [118.71, 2, 7.29]),
        fc.double({ min: 0.05, max: 1, noNaN: true }),
        (j, t, [s, n, rho], eff) => {
          const h = plateThickness(j, t, s, n, rho, eff);
          expect(plateTime(h, j, s, n, rho, eff) / t - 1).toBeCloseTo(0, 12);
        },
      ),
      { numRuns: 1000 },
    );
  });
  it('25 µm of nickel at 2 A/dm² and 95 % takes about 64 min', () => {
    // 25 / (12.30 µm per A·h/dm² × 2 × 0.95) h = 1.070 h (from the 12.3 µm handbook figure above)
    expect(plateTime(25, 2, 'Ni', 2, 8.9, 0.95)).toBeCloseTo(64.2, 1);
  });
});
