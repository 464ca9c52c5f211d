import { FARADAY_C_PER_MOL } from '../constants';

/**
 * Gibbs energy of a reaction from its potential: ΔG = −nFE.
 *
 * Syntax: deltaG(potentialV, n)
 * Example: deltaG(1.100, 2) → −212.27 kJ/mol (Daniell cell)
 * See also: eFromDeltaG, logK
 *
 * @param potentialV potential of the reaction as written, V
 * @param n electrons transferred
 * @returns ΔG in kJ/mol (negative for a reaction that runs by itself)
 */
export function deltaG(potentialV: number, n: number): number {
  return (-n * FARADAY_C_PER_MOL * potentialV) / 1000;
}
