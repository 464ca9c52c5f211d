import { asciiFormula } from '../chem/asciiFormula';
import { parseSpecies } from '../chem/formula';
import { InputError, NotFoundError } from '../errors';
import { atomicWeight } from '../faraday/atomicWeight';
import { molarMass } from '../faraday/molarMass';
import { miscapitalisedElement } from '../faraday/speciesMolarMass';

/**
 * Mass fraction of a metal in a salt, from IUPAC standard atomic weights: k·A(metal)/M(salt), k the
 * number of metal atoms in the formula. Hydrates and complexes are read from the formula
 * ("NiSO4·6H2O", "KAu(CN)2", "K[Ag(CN)2]", "Na2Sn(OH)6").
 *
 * Syntax: metalFraction(salt, metal)
 * Example: metalFraction("NiSO4·6H2O", "Ni") → 0.2233
 * See also: saltMass, molarMass
 */
export function metalFraction(salt: string, metal: string): number {
  const symbol = asciiFormula(metal).replace(/\s+/g, '');
  const slip = miscapitalisedElement(symbol);
  if (slip !== undefined) throw new InputError(`metal "${symbol}" reads as two elements (${slip.read}); did you mean ${slip.element}?`);
  const atoms = parseSpecies(salt).elements[symbol];
  if (atoms === undefined) {
    throw new NotFoundError(`the salt "${salt}" contains no "${symbol}"; give the metal as it is written in the formula (element symbols are case-sensitive)`);
  }
  return (atoms * atomicWeight(symbol)) / molarMass(salt);
}
