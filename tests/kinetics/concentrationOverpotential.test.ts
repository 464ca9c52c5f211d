import { describe, expect, it } from 'vitest';
import { concentrationOverpotential } from '../../src/kinetics/concentrationOverpotential';
import { tafelConcentrationOverpotential } from '../../src/kinetics/tafelConcentrationOverpotential';
import { InputError } from '../../src/errors';

// CODATA 2018 exact: R = N_A·k, F = e·N_A
const R = 8.314462618;
const F = 96485.33212;

describe('concentration overpotential (RT/nF)·ln(1 − i/iL)', () => {
  // form: Bard & Faulkner, Electrochemical Methods, 2nd ed., §1.4.2 (product of unit activity), from memory
  it('is (RT/nF)·ln(1 − i/iL), negative for a cathodic reaction (hand calculation)', () => {
    expect(concentrationOverpotential(300, 400, 2, 25)).toBeCloseTo(((R * 298.15) / (2 * F)) * Math.log(0.25), 12);
    expect(concentrationOverpotential(300, 400, 2, 25)).toBeCloseTo(-0.017809, 6);
    expect(concentrationOverpotential(0, 400, 2, 25)).toBe(0);
  });
  it('at half the limiting current it is −(RT/nF)·ln 2: −8.9 mV for n = 2 at 25 °C', () => {
    expect(concentrationOverpotential(200, 400, 2, 25)).toBeCloseTo(-((R * 298.15) / (2 * F)) * Math.LN2, 12);
  });
  it('at or above the limiting current density: InputError naming it', () => {
    expect(() => concentrationOverpotential(400, 400, 2, 25)).toThrow(InputError);
    expect(() => concentrationOverpotential(500, 400, 2, 25)).toThrow(/limiting current density 400/);
  });
});

describe('Tafel plus concentration overpotential', () => {
  it('adds −b·log10(i/i0) and (RT/nF)·ln(1 − i/iL) (hand calculation)', () => {
    const conc = ((R * 313.15) / (2 * F)) * Math.log(0.25);
    expect(tafelConcentrationOverpotential(300, 0.3, 0.12, 400, 2, 40)).toBeCloseTo(-0.12 * 3 + conc, 12);
    expect(tafelConcentrationOverpotential(300, 0.3, -0.12, 400, 2, 40)).toBeCloseTo(-0.12 * 3 + conc, 12);
  });
  it('without mass-transfer limitation (iL ≫ i) it is the Tafel line', () => {
    expect(tafelConcentrationOverpotential(100, 1, 0.118, 1e12, 2, 25)).toBeCloseTo(-0.236, 9);
  });
  it('needs i ≥ 10·i0 and i < iL', () => {
    expect(() => tafelConcentrationOverpotential(5, 1, 0.12, 400, 2, 25)).toThrow(/OVERPOTENTIAL/);
    expect(() => tafelConcentrationOverpotential(400, 1, 0.12, 400, 2, 25)).toThrow(InputError);
  });
});
