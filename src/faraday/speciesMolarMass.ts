import { DomainError } from '../errors';
import { molarMass } from './molarMass';

/**
 * Molar mass in g/mol of a species argument: a formula text (see molarMass) or a number read as
 * the molar mass itself (> 0).
 *
 * Syntax: speciesMolarMass(species)
 * Example: speciesMolarMass("Ni") → 58.693; speciesMolarMass(58.69) → 58.69
 * See also: molarMass
 */
export function speciesMolarMass(species: string | number): number {
  if (typeof species === 'number') {
    if (!(species > 0) || !Number.isFinite(species)) throw new DomainError('a molar mass must be a finite number > 0');
    return species;
  }
  return molarMass(species);
}
