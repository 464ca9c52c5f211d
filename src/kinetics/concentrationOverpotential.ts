import { thermalVoltage } from '../constants';
import { InputError } from '../errors';

/**
 * Concentration (mass-transfer) overpotential of a cathodic reaction whose reactant reaches the
 * electrode by diffusion and whose product has unit activity (metal deposition) or stays at bulk
 * concentration: η_conc = (RT/nF)·ln(1 − i/i_L), with i and i_L the magnitudes of the current density
 * and of the limiting current density (Bard & Faulkner, Electrochemical Methods, 2nd ed., §1.4.2,
 * surface concentration C(0) = C*(1 − i/i_L)). Sign: the electrode-kinetics convention, a cathodic
 * overpotential is negative, so η_conc ≤ 0; the voltage the cell needs for it is its magnitude.
 * At or above the limiting current no overpotential carries the current: InputError naming it.
 *
 * Syntax: concentrationOverpotential(currentDensity, limitingCurrentDensity, n, temperatureC)
 * Example: concentrationOverpotential(300, 400, 2, 25) → −0.01781 V
 * See also: tafelConcentrationOverpotential, electrodeOverpotential
 *
 * @param currentDensity magnitude of the current density (≥ 0), same unit as the limiting one
 * @param limitingCurrentDensity magnitude of the limiting current density (> 0)
 * @param n electrons transferred
 * @param temperatureC temperature, °C
 */
export function concentrationOverpotential(currentDensity: number, limitingCurrentDensity: number, n: number, temperatureC: number): number {
  if (!(currentDensity < limitingCurrentDensity)) {
    throw new InputError(
      `the current density ${currentDensity} is at or above the limiting current density ${limitingCurrentDensity}; no overpotential carries it (the reactant is used up at the electrode)`,
    );
  }
  const eta = (thermalVoltage(temperatureC) / n) * Math.log1p(-currentDensity / limitingCurrentDensity);
  return eta === 0 ? 0 : eta;
}
