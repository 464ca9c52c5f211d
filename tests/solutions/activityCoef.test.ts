import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { InputError, NotFoundError } from '../../src/errors';
import { activityCoef } from '../../src/solutions/activityCoef';

describe('activityCoef: extended Debye–Hückel against Kielland’s table', () => {
  // J. Kielland, J. Am. Chem. Soc. 59 (1937) 1675, Table (single-ion γ at 25 °C), read in a reproduction.
  // Kielland rounded to 2–3 figures and used slightly older A and B; the model's error is stated per point.
  const cases: Array<[number, number, number, number, number, string]> = [
    // z, a (Å), I, Kielland γ, error of this EDH vs Kielland in %, ion
    [1, 9, 0.01, 0.914, -0.1, 'H+'],
    [1, 9, 0.1, 0.83, -0.6, 'H+'],
    [1, 4, 0.01, 0.902, -0.1, 'Na+, HCO3-'],
    [1, 4, 0.1, 0.775, -0.8, 'Na+, HCO3-'],
    [2, 6, 0.01, 0.675, 0.0, 'Ca2+, Cu2+, Zn2+'],
    [2, 6, 0.1, 0.405, -1.2, 'Ca2+, Cu2+, Zn2+'],
    [3, 9, 0.1, 0.18, -1.4, 'Al3+, Fe3+'],
  ];
  for (const [z, a, I, kielland, err, ions] of cases) {
    it(`z = ${z}, a = ${a} Å (${ions}), I = ${I}: ${kielland}, model error ${err} %`, () => {
      const g = activityCoef(z, I, 'EDH', 25, a);
      expect(Math.abs(100 * (g / kielland - 1) - err)).toBeLessThan(0.15);
    });
  }
});

describe('activityCoef: models and rules', () => {
  it('a neutral species has γ = 1 in every model', () => {
    for (const m of ['DHLL', 'EDH', 'DAVIES']) expect(activityCoef(0, 0.004, m, 25, 4)).toBe(1);
  });
  it('γ = 1 at zero ionic strength', () => {
    for (const m of ['DHLL', 'EDH', 'DAVIES']) expect(activityCoef(2, 0, m, 25, 4)).toBe(1);
  });
  it('the limiting law: log γ = −0.5108·z²·√I at 25 °C', () => {
    // A = 0.5108 (kg/mol)^½ on the molality scale at 25 °C (Robinson & Stokes 0.5115 mol/dm³ scale × √0.99705)
    expect(Math.log10(activityCoef(1, 0.001, 'DHLL', 25, null))).toBeCloseTo(-0.5108 * Math.sqrt(0.001), 5);
    expect(Math.log10(activityCoef(-2, 0.004, 'DHLL', 25, null))).toBeCloseTo(-0.5108 * 4 * Math.sqrt(0.004), 5);
  });
  it('the three models agree as I → 0 (and the sign of the charge does not matter)', () => {
    fc.assert(
      fc.property(fc.integer({ min: -3, max: 3 }).filter((z) => z !== 0), fc.double({ min: 1e-7, max: 1e-5, noNaN: true }), (z, I) => {
        const d = activityCoef(z, I, 'DHLL', 25, null);
        expect(Math.abs(activityCoef(z, I, 'DAVIES', 25, null) / d - 1)).toBeLessThan(1e-3);
        expect(Math.abs(activityCoef(z, I, 'EDH', 25, 4) / d - 1)).toBeLessThan(1e-3);
        expect(activityCoef(-z, I, 'DAVIES', 25, null)).toBe(activityCoef(z, I, 'DAVIES', 25, null));
      }),
    );
  });
  it('… and part with ionic strength, where the limiting law falls below the others', () => {
    expect(activityCoef(2, 0.005, 'DHLL', 25, null)).toBeLessThan(activityCoef(2, 0.005, 'DAVIES', 25, null));
    expect(activityCoef(2, 0.005, 'DHLL', 25, null)).toBeLessThan(activityCoef(2, 0.005, 'EDH', 25, 4));
  });
  it('each model answers only within its ionic-strength range (DHLL 0.005, EDH 0.1, DAVIES 0.5 mol/kg), else an input error naming it', () => {
    // the Davies equation would give γ = 53 for z = 2 at I = 5.13 mol/kg: never a number out there
    expect(() => activityCoef(2, 5.13, 'DAVIES', 25, null)).toThrow(InputError);
    expect(() => activityCoef(2, 5.13, 'DAVIES', 25, null)).toThrow(/from 0 to 0.5 mol\/kg/);
    expect(() => activityCoef(1, 0.0051, 'DHLL', 25, null)).toThrow(/from 0 to 0.005 mol\/kg/);
    expect(() => activityCoef(1, 0.11, 'EDH', 25, 4)).toThrow(/from 0 to 0.1 mol\/kg/);
    expect(activityCoef(1, 0.5, 'DAVIES', 25, null)).toBeGreaterThan(0);
    expect(activityCoef(1, 0.1, 'EDH', 25, 4)).toBeGreaterThan(0);
    expect(activityCoef(1, 0.005, 'DHLL', 25, null)).toBeGreaterThan(0);
  });
  it('A and B follow temperature: at 80 °C an ion is less active than at 25 °C', () => {
    expect(activityCoef(2, 0.05, 'DAVIES', 80, null)).toBeLessThan(activityCoef(2, 0.05, 'DAVIES', 25, null));
    expect(activityCoef(2, 0.05, 'EDH', 80, 6)).toBeLessThan(activityCoef(2, 0.05, 'EDH', 25, 6));
  });
  it('model names ignore case; unknown ones are not found; EDH needs the ion size; T within 0…100 °C', () => {
    expect(activityCoef(1, 0.1, ' davies ', 25, null)).toBe(activityCoef(1, 0.1, 'DAVIES', 25, null));
    expect(() => activityCoef(1, 0.1, 'PITZER', 25, null)).toThrow(NotFoundError);
    expect(() => activityCoef(1, 0.1, 'PITZER', 25, null)).toThrow(/PITZER/);
    expect(() => activityCoef(1, 0.1, 'EDH', 25, null)).toThrow(InputError);
    expect(() => activityCoef(1, 0.1, 'DAVIES', 120, null)).toThrow(InputError);
  });
});
