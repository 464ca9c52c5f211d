import { finite } from '../errors';
import { ecEquiv } from './ecEquiv';

/**
 * Time to deposit a mass at a current, Faraday's law solved for t: t = m·nF/(3600·I·ε·M), in h.
 * The inverse of depositMass.
 *
 * Syntax: depositTime(massG, currentA, species, n, efficiency)
 * Example: depositTime(11.855, 10, "Cu", 2, 1) → 1.000 h
 * See also: depositMass
 *
 * @param massG mass, g
 * @param currentA current, A (> 0)
 * @param species formula text or molar mass in g/mol
 * @param n electrons per formula unit
 * @param efficiency current efficiency as a fraction (0, 1]
 */
export function depositTime(massG: number, currentA: number, species: string | number, n: number, efficiency: number): number {
  return finite(massG / (currentA * efficiency * ecEquiv(species, n)), 'the time');
}
