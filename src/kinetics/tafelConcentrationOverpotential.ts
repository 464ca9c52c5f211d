import { InputError } from '../errors';
import { concentrationOverpotential } from './concentrationOverpotential';

/** Smallest i/i0 for the Tafel line: there the Butler–Volmer back reaction is below about 1 %. */
export const TAFEL_MIN_RATIO = 10;

/**
 * Overpotential of a cathodic reaction as activation plus concentration terms:
 * η = −b·log10(i/i0) + (RT/nF)·ln(1 − i/i_L), with b the Tafel slope (V per decade, its magnitude),
 * i0 the exchange current density and i_L the limiting current density, all current densities as
 * magnitudes in one unit. Sign: a cathodic overpotential is negative (the electrode-kinetics
 * convention); the voltage the cell needs is its magnitude. The Tafel line holds where the back
 * reaction is negligible, i ≥ 10·i0 here (below it, use OVERPOTENTIAL, the Butler–Volmer
 * inverse); at or above i_L no overpotential carries the current. The sum of the two terms is the
 * usual engineering form; it treats the two losses as independent.
 *
 * Syntax: tafelConcentrationOverpotential(currentDensity, i0, tafelSlopeV, limitingCurrentDensity, n, temperatureC)
 * Example: tafelConcentrationOverpotential(300, 0.3, 0.12, 400, 2, 40) → −0.36 − 0.01870 = −0.3787 V
 * See also: concentrationOverpotential, tafelSlope, overpotential
 *
 * @param currentDensity magnitude of the current density (> 0)
 * @param i0 exchange current density (> 0), same unit
 * @param tafelSlopeV Tafel slope, V per decade (magnitude)
 * @param limitingCurrentDensity limiting current density (> 0), same unit
 * @param n electrons transferred
 * @param temperatureC temperature, °C
 */
export function tafelConcentrationOverpotential(
  currentDensity: number,
  i0: number,
  tafelSlopeV: number,
  limitingCurrentDensity: number,
  n: number,
  temperatureC: number,
): number {
  const conc = concentrationOverpotential(currentDensity, limitingCurrentDensity, n, temperatureC);
  const ratio = currentDensity / i0;
  if (!(ratio >= TAFEL_MIN_RATIO)) {
    throw new InputError(
      `the Tafel line needs a current density at least ${TAFEL_MIN_RATIO} times i0; got ${currentDensity} with i0 ${i0}: use OVERPOTENTIAL (Butler–Volmer) near equilibrium`,
    );
  }
  return -Math.abs(tafelSlopeV) * Math.log10(ratio) + conc;
}
