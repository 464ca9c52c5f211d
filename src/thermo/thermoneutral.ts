import { FARADAY_C_PER_MOL } from '../constants';

/**
 * Thermoneutral potential: −ΔH/(nF). An electrolysis reaction as written (ΔH > 0) gives a
 * negative value whose magnitude is the thermoneutral voltage (1.481 V for water at 25 °C).
 *
 * Syntax: thermoneutral(deltaHkJ, n)
 * Example: thermoneutral(285.83, 2) → −1.481 V
 * See also: eFromThermo
 */
export function thermoneutral(deltaHkJ: number, n: number): number {
  return (-deltaHkJ * 1000) / (n * FARADAY_C_PER_MOL);
}
