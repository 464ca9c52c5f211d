import { describe, expect, it } from 'vitest';
import { InputError } from '../../src/errors';
import { debyeHuckelParameters } from '../../src/solutions/debyeHuckelParameters';

/** Molar-scale value from the molal one: A_c = A_m/√(ρw in kg/dm³). */
const molar = (x: number, rho: number) => x / Math.sqrt(rho / 1000);

describe('debyeHuckelParameters', () => {
  it('uses the dielectric constant of Malmberg & Maryott: 78.30 at 25 °C, 87.74 at 0 °C', () => {
    // Malmberg & Maryott, J. Res. NBS 56 (1956) 1, abstract: εr = 78.30 at 25 °C; eq. (1) at 0 °C: 87.740
    expect(debyeHuckelParameters(25).dielectricConstant).toBeCloseTo(78.3, 2);
    expect(debyeHuckelParameters(0).dielectricConstant).toBeCloseTo(87.74, 3);
  });
  it('uses the density of water of Kell: 999.972 kg/m³ at 4 °C, 997.045 at 25 °C', () => {
    // Kell, J. Chem. Eng. Data 20 (1975) 97 (from memory)
    expect(debyeHuckelParameters(4).density_kg_m3).toBeCloseTo(999.972, 2);
    expect(debyeHuckelParameters(25).density_kg_m3).toBeCloseTo(997.045, 2);
  });
  it('reproduces the tabulated A and B of Robinson & Stokes at 0, 25 and 50 °C', () => {
    // Robinson & Stokes, Electrolyte Solutions, 2nd ed. revised, Appendix 7.1 (mol/dm³ scale, B per Å), from memory:
    //   0 °C  A 0.4918  B 0.3248;  25 °C  A 0.5115  B 0.3291;  50 °C  A 0.5373  B 0.3346
    const table: Array<[number, number, number]> = [
      [0, 0.4918, 0.3248],
      [25, 0.5115, 0.3291],
      [50, 0.5373, 0.3346],
    ];
    for (const [t, A, B] of table) {
      const p = debyeHuckelParameters(t);
      expect(Math.abs(molar(p.A, p.density_kg_m3) - A), `A at ${t} °C`).toBeLessThan(3e-4);
      expect(Math.abs(molar(p.B, p.density_kg_m3) - B), `B at ${t} °C`).toBeLessThan(3e-4);
    }
  });
  it('gives the familiar molal A = 0.509 and B = 0.329 at 25 °C', () => {
    // "A = 0.509 (kg/mol)^½, B = 0.329 Å⁻¹(kg/mol)^½ at 25 °C": common practice (every textbook)
    const p = debyeHuckelParameters(25);
    expect(p.A).toBeCloseTo(0.5108, 4);
    expect(p.B).toBeCloseTo(0.3287, 4);
  });
  it('A and B rise with temperature', () => {
    let last = debyeHuckelParameters(0);
    for (let t = 5; t <= 100; t += 5) {
      const p = debyeHuckelParameters(t);
      expect(p.A).toBeGreaterThan(last.A);
      expect(p.B).toBeGreaterThan(last.B);
      last = p;
    }
  });
  it('is available from 0 to 100 °C only', () => {
    expect(() => debyeHuckelParameters(-0.1)).toThrow(InputError);
    expect(() => debyeHuckelParameters(100.1)).toThrow(InputError);
  });
});
