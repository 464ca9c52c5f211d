import { FARADAY_C_PER_MOL, GAS_CONSTANT_J_PER_MOL_K, LN10, kelvin } from '../constants';

/**
 * Potential from log10 K: E = RT ln10 · log10 K / (nF).
 *
 * Syntax: eFromLogK(logK, n, temperatureC)
 * Example: eFromLogK(37.19, 2, 25) → 1.100 V
 * See also: logK, eFromK
 */
export function eFromLogK(logKValue: number, n: number, temperatureC: number): number {
  return (GAS_CONSTANT_J_PER_MOL_K * kelvin(temperatureC) * LN10 * logKValue) / (n * FARADAY_C_PER_MOL);
}
