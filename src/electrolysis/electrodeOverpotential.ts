import { thermalVoltage } from '../constants';
import { InputError, finite } from '../errors';

/**
 * Overpotential (magnitude, V) an electrode needs to pass a current density j, from the
 * Butler–Volmer equation with equal forward and reverse transfer coefficients and, where a
 * limiting current density iL is given, the mass-transfer factor on the forward reaction
 * (Bard & Faulkner, Electrochemical Methods, 2nd ed., eq. 3.4.10 with one limiting current):
 *
 *   j/i0 = (1 − j/iL)·exp(αFη/RT) − exp(−αFη/RT)
 *
 * solved in closed form: with y = exp(αFη/RT) and a = 1 − j/iL, a·y² − (j/i0)·y − 1 = 0.
 * Without iL this is η = (RT/αF)·asinh(j/(2·i0)); at j ≫ i0 it is the Tafel line
 * η = (RT/αF)·ln(j/i0), and near iL it is eq. 3.4.15, η = (RT/αF)·ln(j·iL/(i0·(iL − j))).
 *
 * Syntax: electrodeOverpotential(currentDensity, i0, alpha, limitingCurrentDensity, temperatureC)
 * Example: electrodeOverpotential(1000, 1e-3, 0.5, null, 25) → 0.7099 V
 * See also: cellVoltageBreakdown, overpotential
 *
 * @param currentDensity current density through the electrode (≥ 0), same unit as i0
 * @param i0 exchange current density (> 0)
 * @param alpha apparent transfer coefficient of the electrode's reaction (> 0)
 * @param limitingCurrentDensity limiting current density (> j), or null for none
 * @param temperatureC temperature, °C
 */
/** j/i0 above which r² + 4a is r² to double precision (and r² may overflow). */
const LARGE_RATIO = 1e150;

export function electrodeOverpotential(
  currentDensity: number,
  i0: number,
  alpha: number,
  limitingCurrentDensity: number | null,
  temperatureC: number,
): number {
  let a = 1;
  if (limitingCurrentDensity !== null) {
    if (!(currentDensity < limitingCurrentDensity)) {
      throw new InputError(
        `the current density ${currentDensity} is at or above the limiting current density ${limitingCurrentDensity}; no overpotential can carry it`,
      );
    }
    a = 1 - currentDensity / limitingCurrentDensity;
  }
  const r = currentDensity / i0;
  // larger root of a·y² − r·y − 1 = 0, written to avoid cancellation; where r² would overflow
  // (j/i0 above about 1e150) the root is r/a to double precision, so its logarithm is taken from r
  const lnY = r > LARGE_RATIO ? Math.log(r) - Math.log(a) : Math.log((r + Math.sqrt(r * r + 4 * a)) / (2 * a));
  return finite((thermalVoltage(temperatureC) / alpha) * lnY, 'the overpotential');
}
