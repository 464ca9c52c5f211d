/**
 * IUPAC standard atomic weights (abridged values) from data/atomic-weights.json.
 */
import { cachedOf } from '../dataset/active';
import { isElementSymbol } from '../chem/elements';
import { NotFoundError } from '../errors';

/** The weights of the atomic-weights part in use (built-in or pinned), indexed once per part. */
const weights = cachedOf('atomicweights', (part): ReadonlyMap<string, number> => new Map(part.elements.map((e) => [e.symbol, e.atomicWeight])));

/**
 * Standard atomic weight of an element (IUPAC CIAAW 2021, abridged), g/mol. Throws NotFoundError
 * for an element without a standard atomic weight (Tc, Pm, Po, At, Rn, Fr, Ra, Ac, Np onwards) and
 * for a symbol that is not an element.
 *
 * Syntax: atomicWeight(symbol)
 * Example: atomicWeight("Ni") → 58.693
 * See also: molarMass
 */
export function atomicWeight(symbol: string): number {
  const w = weights().get(symbol);
  if (w !== undefined) return w;
  if (isElementSymbol(symbol)) {
    throw new NotFoundError(`${symbol} has no IUPAC standard atomic weight (no stable isotopic composition); give the molar mass in g/mol instead`);
  }
  throw new NotFoundError(`"${symbol}" is not an element symbol (symbols are case-sensitive: Co is cobalt, CO is carbon monoxide)`);
}
