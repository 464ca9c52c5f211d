import { describe, expect, it } from 'vitest';
import { specificEnergy } from '../../src/faraday/specificEnergy';

describe('specificEnergy', () => {
  it('chlorine takes 755.9 A·h per kg: 0.756 kWh/kg per volt', () => {
    // 1 t Cl2 needs 755.9 kA·h (chlor-alkali practice, e.g. Ullmann's Encyclopedia, "Chlorine"; from memory)
    expect(Math.abs(specificEnergy(1, 'Cl2', 2, 1) - 0.7559)).toBeLessThan(2e-4); // 756.0 with Cl = 35.45
  });
  it('aluminium at 4.2 V and 95 % current efficiency: about 13.2 kWh/kg', () => {
    // Hall–Héroult cells run at 13–14 kWh/kg Al (common practice); Faraday: 4.2 × 2.980 / 0.95 = 13.17
    expect(specificEnergy(4.2, 'Al', 3, 0.95)).toBeCloseTo(13.17, 2);
  });
  it('copper electrowinning at 2.0 V and 90 %: about 1.9 kWh/kg', () => {
    // copper electrowinning uses 1.8–2.5 kWh/kg (common practice); Faraday: 2.0 × 0.84353 / 0.9 = 1.8745
    expect(specificEnergy(2.0, 'Cu', 2, 0.9)).toBeCloseTo(1.8745, 4);
  });
  it('doubles when the efficiency halves', () => {
    expect(specificEnergy(3, 'Zn', 2, 0.45)).toBeCloseTo(2 * specificEnergy(3, 'Zn', 2, 0.9), 12);
  });
});
