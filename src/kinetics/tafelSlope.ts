import { LN10, thermalVoltage } from '../constants';

/**
 * Tafel slope b = RT·ln10/(αF), in V per decade of current.
 *
 * Syntax: tafelSlope(alpha, temperatureC)
 * Example: tafelSlope(0.5, 25) → 0.1183 V/decade
 * See also: butlerVolmer, nernstSlope
 *
 * @param alpha apparent transfer coefficient (> 0)
 * @param temperatureC temperature, °C
 */
export function tafelSlope(alpha: number, temperatureC: number): number {
  return (thermalVoltage(temperatureC) * LN10) / alpha;
}
