import { thermalVoltage } from '../constants';

/**
 * EMF of a concentration cell: (RT/nF)·ln(a_concentrated/a_dilute); positive when the
 * concentrated side is the cathode.
 *
 * Syntax: concCell(aDilute, aConcentrated, n, temperatureC)
 * Example: concCell(0.01, 1, 2, 25) → 0.05916 V
 * See also: nernst
 */
export function concCell(aDilute: number, aConcentrated: number, n: number, temperatureC: number): number {
  return (thermalVoltage(temperatureC) / n) * Math.log(aConcentrated / aDilute);
}
