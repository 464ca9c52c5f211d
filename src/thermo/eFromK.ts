import { eFromLogK } from './eFromLogK';

/**
 * Potential from an equilibrium constant: E = RT ln K / (nF). K must be > 0.
 *
 * Syntax: eFromK(K, n, temperatureC)
 * Example: eFromK(1e10, 1, 25) → 0.5916 V
 * See also: keq, eFromLogK
 */
export function eFromK(k: number, n: number, temperatureC: number): number {
  return eFromLogK(Math.log10(k), n, temperatureC);
}
