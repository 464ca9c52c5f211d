import { thermalVoltage } from '../constants';
import { finite } from '../errors';
import { cathodicAlpha } from './cathodicAlpha';

/**
 * Butler–Volmer equation: i = i0·[exp(αa·F·η/RT) − exp(−αc·F·η/RT)], in the units of i0
 * (anodic current positive). αa and αc are apparent transfer coefficients (n included); αc
 * defaults to 1 − αa. Written with expm1 so that small overpotentials keep full precision.
 * A current outside double range throws DomainError.
 *
 * Syntax: butlerVolmer(i0, overpotentialV, alphaA, alphaC, temperatureC)
 * Example: butlerVolmer(1e-3, 0.1, 0.5, null, 25) → 6.858e-3 (with i0 in A/cm², A/cm²)
 * See also: overpotential, tafelSlope
 *
 * @param i0 exchange current density (> 0), any unit
 * @param overpotentialV η, V
 * @param alphaA anodic transfer coefficient (> 0)
 * @param alphaC cathodic transfer coefficient (> 0), or null for 1 − αa
 * @param temperatureC temperature, °C
 */
export function butlerVolmer(i0: number, overpotentialV: number, alphaA: number, alphaC: number | null, temperatureC: number): number {
  const c = cathodicAlpha(alphaA, alphaC);
  const f = 1 / thermalVoltage(temperatureC);
  const x = f * overpotentialV;
  return finite(i0 * (Math.expm1(alphaA * x) - Math.expm1(-c * x)), 'the current');
}
