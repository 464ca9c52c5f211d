import { describe, expect, it } from 'vitest';
import { CORROSION_K1_MM_G_PER_UA_CM_YR, corrosionRate } from '../../src/kinetics/corrosionRate';

describe('corrosionRate (ASTM G102)', () => {
  it('Faraday’s law gives the K1 of ASTM G102: 3.27 × 10⁻³ mm·g/(µA·cm·yr)', () => {
    // ASTM G102-89 (reapproved), Calculation of Corrosion Rates ..., eq. 2 and Table 1: K1 = 3.27 × 10⁻³ (from memory)
    expect(CORROSION_K1_MM_G_PER_UA_CM_YR).toBeCloseTo(3.27e-3, 5);
  });
  it('iron at 1 µA/cm² corrodes 0.0116 mm per year', () => {
    // ASTM G102 appendix X1: iron EW 27.92, density 7.87 g/cm³; 1 µA/cm² ≈ 11.6 µm/y (from memory)
    expect(corrosionRate(1, 27.92, 7.87)).toBeCloseTo(0.0116, 4);
  });
  it('scales with icorr and EW and inversely with density', () => {
    const r = corrosionRate(1, 27.92, 7.87);
    expect(corrosionRate(10, 27.92, 7.87)).toBeCloseTo(10 * r, 12);
    expect(corrosionRate(1, 2 * 27.92, 7.87)).toBeCloseTo(2 * r, 12);
    expect(corrosionRate(1, 27.92, 2 * 7.87)).toBeCloseTo(r / 2, 12);
  });
  it('zinc (EW 32.69, 7.13 g/cm³) at 1 µA/cm²: 0.0150 mm/y', () => {
    // ASTM G102 appendix X1 equivalent weight of zinc 32.69 (from memory); density 7.13 g/cm³ (CRC, from memory)
    expect(corrosionRate(1, 32.69, 7.13)).toBeCloseTo(0.015, 4);
  });
});
