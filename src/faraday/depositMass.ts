import { finite } from '../errors';
import { ecEquiv } from './ecEquiv';

/**
 * Mass deposited (or dissolved) by a current, Faraday's law: m = I·t·ε·M·3600/(nF), in g.
 *
 * Syntax: depositMass(currentA, timeH, species, n, efficiency)
 * Example: depositMass(10, 1, "Cu", 2, 1) → 11.855 g
 * See also: depositTime, currentEfficiency, ecEquiv
 *
 * @param currentA current, A
 * @param timeH time, h
 * @param species formula text or molar mass in g/mol
 * @param n electrons per formula unit
 * @param efficiency current efficiency as a fraction (0, 1]
 */
export function depositMass(currentA: number, timeH: number, species: string | number, n: number, efficiency: number): number {
  return finite(currentA * timeH * efficiency * ecEquiv(species, n), 'the mass');
}
