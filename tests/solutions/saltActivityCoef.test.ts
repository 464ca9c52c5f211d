import { describe, expect, it } from 'vitest';
import { InputError, NotFoundError } from '../../src/errors';
import { saltActivityCoef } from '../../src/solutions/saltActivityCoef';

/**
 * Measured mean activity coefficients γ± at 25 °C: CRC Handbook of Chemistry and Physics, "Activity Coefficients of
 * Acids, Bases, and Salts" (the 0.1–1.0 m and 2.0–20 m tables), read in github.com/ugognw/pchemdb,
 * tests/test_crc/Activity Coefficients of Acids, Bases, and Salts at 25C as a Function of Concentration Molality
 * 0_1 m to 1_0 m - 1.csv and - 2.csv, and … 2_0 m to 20 m - 1.csv and - 2.csv, at commit 891483affd3d.
 */
const CRC: Record<string, [number, number][]> = {
  CuSO4: [[0.1, 0.15], [0.5, 0.062], [1, 0.0423]],
  ZnSO4: [[0.1, 0.15], [0.5, 0.063], [1, 0.0435]],
  NiSO4: [[0.1, 0.15], [0.5, 0.0627], [1, 0.0425]],
  MnSO4: [[0.1, 0.15], [0.5, 0.064], [1, 0.0439]],
  CdSO4: [[0.1, 0.15], [0.5, 0.0615], [1, 0.0415]],
  CuCl2: [[0.1, 0.508], [1, 0.417], [2, 0.453]],
  NiCl2: [[0.1, 0.522], [0.5, 0.464], [2, 0.915]], // the table's 1.0 m entry (0.563) breaks the row's trend (0.515 at 0.9 m): not used
  CoCl2: [[0.1, 0.522], [1, 0.531], [2, 0.864]],
  ZnCl2: [[0.1, 0.515], [1, 0.339], [2, 0.283]],
  Na2SO4: [[0.1, 0.445], [1, 0.201], [2, 0.155]],
  HCl: [[0.1, 0.796], [1, 0.809], [2, 1.009], [5, 2.38], [10, 10.4]],
  NaCl: [[0.1, 0.778], [1, 0.657], [2, 0.668], [5, 0.874]],
  KCl: [[0.1, 0.77], [1, 0.604], [2, 0.573]],
  NaOH: [[0.1, 0.766], [1, 0.678], [2, 0.714], [5, 1.076], [10, 3.258]],
  KOH: [[0.1, 0.798], [1, 0.756], [2, 0.86], [5, 1.697], [10, 6.11]],
};

describe('saltActivityCoef (binary Pitzer, May et al., J. Chem. Eng. Data 56 (2011) 5066)', () => {
  it('reproduces the CRC Handbook’s measured γ± at 25 °C within 3.5 %, from 0.1 mol/kg to the concentrated solutions', () => {
    for (const [salt, points] of Object.entries(CRC)) {
      for (const [m, measured] of points) {
        const g = saltActivityCoef(salt, m, 25);
        expect(Math.abs(g / measured - 1), `${salt} at ${m} mol/kg: ${g} against ${measured}`).toBeLessThan(0.035);
      }
    }
  });
  it('is within 0.5 % for the tankhouse and plating-bath sulfates of zinc and nickel at 1 mol/kg (I = 4)', () => {
    expect(saltActivityCoef('ZnSO4', 1, 25)).toBeCloseTo(0.0435, 3); // CRC Handbook (as above): 0.0435
    expect(Math.abs(saltActivityCoef('NiSO4', 1, 25) / 0.0425 - 1)).toBeLessThan(0.005); // CRC Handbook: 0.0425
  });
  it('tends to the Debye–Hückel limiting law in dilute solution and is 1 at zero molality', () => {
    // for small I, ln γ± → −3·Aφ·|z₊z₋|·√I = −ln 10·A·|z₊z₋|·√I: the limiting law, with A = 0.5108 at 25 °C (this add-in's A)
    expect(saltActivityCoef('NaCl', 1e-5, 25)).toBeCloseTo(Math.pow(10, -0.5108 * Math.sqrt(1e-5)), 4);
    expect(saltActivityCoef('ZnSO4', 0, 25)).toBe(1);
  });
  it('reads the salt’s name whatever its case and subscripts', () => {
    expect(saltActivityCoef(' znso4 ', 0.5, 25)).toBe(saltActivityCoef('ZnSO4', 0.5, 25));
    expect(saltActivityCoef('NiSO₄', 0.5, 25)).toBe(saltActivityCoef('NiSO4', 0.5, 25));
  });
  it('answers outside its range with the range, never an extrapolation', () => {
    expect(() => saltActivityCoef('CuSO4', 1.5, 25)).toThrow(InputError);
    expect(() => saltActivityCoef('CuSO4', 1.5, 25)).toThrow(/CuSO4 molality 1\.5 mol\/kg is outside the parameters' range 0–1\.42 mol\/kg \(May et al\. 2011\)/);
    expect(() => saltActivityCoef('ZnSO4', -0.1, 25)).toThrow(InputError);
    expect(() => saltActivityCoef('ZnSO4', 1, 40)).toThrow(/hold at 25 °C only/);
    expect(() => saltActivityCoef('MgSO4', 1, 25)).toThrow(NotFoundError);
    expect(() => saltActivityCoef('MgSO4', 1, 25)).toThrow(/available: CuSO4, ZnSO4, NiSO4/);
  });
});
