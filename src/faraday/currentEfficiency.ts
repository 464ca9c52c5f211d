import { finite } from '../errors';
import { depositMass } from './depositMass';

/**
 * Current efficiency: the mass obtained over the mass Faraday's law gives for the charge passed,
 * as a fraction. A value above 1 is returned as it is: it is a measurement to question (weighing,
 * drag-in, a wrong n), not an error.
 *
 * Syntax: currentEfficiency(massG, currentA, timeH, species, n)
 * Example: currentEfficiency(11.0, 10, 1, "Cu", 2) → 0.928
 * See also: depositMass
 *
 * @param massG mass obtained, g
 * @param currentA current, A (> 0)
 * @param timeH time, h (> 0)
 * @param species formula text or molar mass in g/mol
 * @param n electrons per formula unit
 */
export function currentEfficiency(massG: number, currentA: number, timeH: number, species: string | number, n: number): number {
  return finite(massG / depositMass(currentA, timeH, species, n, 1), 'the efficiency');
}
