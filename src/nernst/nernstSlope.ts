import { LN10, thermalVoltage } from '../constants';

/**
 * Nernst slope in V per decade: RT·ln10/(nF). 0.059159 V at 25 °C for n = 1 (CODATA 2018).
 *
 * Syntax: nernstSlope(n, temperatureC)
 * Example: nernstSlope(1, 37) → 0.061540 V
 * See also: nernst
 */
export function nernstSlope(n: number, temperatureC: number): number {
  return (thermalVoltage(temperatureC) * LN10) / n;
}
