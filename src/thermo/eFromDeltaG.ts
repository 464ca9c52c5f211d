import { FARADAY_C_PER_MOL } from '../constants';

/**
 * Potential from a Gibbs energy: E = −ΔG/(nF).
 *
 * Syntax: eFromDeltaG(deltaGkJ, n)
 * Example: eFromDeltaG(−212.27, 2) → 1.100 V
 * See also: deltaG
 *
 * @param deltaGkJ ΔG in kJ/mol
 * @param n electrons transferred
 * @returns E in V
 */
export function eFromDeltaG(deltaGkJ: number, n: number): number {
  return (-deltaGkJ * 1000) / (n * FARADAY_C_PER_MOL);
}
