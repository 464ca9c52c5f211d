import { FARADAY_C_PER_MOL } from '../constants';
import { speciesMolarMass } from './speciesMolarMass';

/** Seconds in an hour. */
const S_PER_H = 3600;

/**
 * Electrochemical equivalent in g/(A·h): M·3600/(nF), the mass one ampere-hour deposits (or
 * dissolves) at 100 % efficiency.
 *
 * Syntax: ecEquiv(species, n)
 * Example: ecEquiv("Ni", 2) → 1.0950 g/(A·h)
 * See also: depositMass, molarMass
 *
 * @param species formula text or molar mass in g/mol
 * @param n electrons per formula unit
 */
export function ecEquiv(species: string | number, n: number): number {
  return (speciesMolarMass(species) * S_PER_H) / (n * FARADAY_C_PER_MOL);
}
