import { FARADAY_C_PER_MOL, GAS_CONSTANT_J_PER_MOL_K, ZERO_CELSIUS_K } from '../constants';

/**
 * Nernst equation: E = E° − (RT/nF)·ln Q.
 *
 * Syntax: nernst(e0V, n, q, temperatureC)
 * Example: nernst(0.3419, 2, 100, 25) → 0.2827 V
 * See also: nernstSlope, halfCell
 *
 * @param e0V standard potential, V
 * @param n electrons transferred
 * @param q reaction quotient (> 0)
 * @param temperatureC temperature, °C
 */
export function nernst(e0V: number, n: number, q: number, temperatureC: number): number {
  return e0V - ((GAS_CONSTANT_J_PER_MOL_K * (temperatureC + ZERO_CELSIUS_K)) / (n * FARADAY_C_PER_MOL)) * Math.log(q);
}
