import { FARADAY_C_PER_MOL, GAS_CONSTANT_J_PER_MOL_K, LN10, kelvin } from '../constants';

/**
 * Decimal logarithm of the equilibrium constant: log10 K = nFE/(RT ln 10).
 *
 * Syntax: logK(potentialV, n, temperatureC)
 * Example: logK(1.100, 2, 25) → 37.19
 * See also: keq, eFromLogK
 *
 * @returns log10 K (dimensionless)
 */
export function logK(potentialV: number, n: number, temperatureC: number): number {
  return (n * FARADAY_C_PER_MOL * potentialV) / (GAS_CONSTANT_J_PER_MOL_K * kelvin(temperatureC) * LN10);
}
