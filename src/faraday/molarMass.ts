import Decimal from 'decimal.js-light';
import { cachedOf } from '../dataset/active';
import { parseSpecies } from '../chem/formula';
import { InputError, NotFoundError, finite } from '../errors';
import { atomicWeight } from './atomicWeight';

/**
 * Molar mass of a formula in g/mol from IUPAC standard atomic weights: parentheses, square brackets
 * and hydrate dots (·, * or .) are understood ("CuSO4·5H2O", "K3[Fe(CN)6]", "Ni(NH2SO3)2·4H2O").
 * A charge or phase mark may be written ("SO4^2-", "Cu2+", "NaCl(s)"); the electrons' mass is
 * neglected, as is usual. An unknown element throws NotFoundError naming it; text that is not a
 * formula throws InputError.
 *
 * Spaces: a space inside a formula is read only as a hydrate separator, and only where it stands
 * before a whole or decimal multiplier followed by a formula ("CuSO4 5H2O" = "CuSO4·5H2O",
 * "Na2SO4 10H2O" = "Na2SO4·10H2O"). Any other space inside a formula ("Cu SO4", "CuSO4 H2O",
 * "SO4 2-") throws InputError: it is never dropped silently. Spaces around the formula are ignored.
 *
 * The atomic weights are summed in decimal (decimal.js-light), so the result is the exact decimal sum of the
 * tabulated weights rounded once to a double: molarMass("CuSO4·5H2O") is 249.677, not 249.67700000000002.
 *
 * Syntax: molarMass(formula)
 * Example: molarMass("CuSO4·5H2O") → 249.68 g/mol
 * See also: atomicWeight, ecEquiv
 */
export function molarMass(formula: string): number {
  // A range of DEPOSITMASS calls names the same few formulas over and over: parse each once.
  const MOLAR_MASSES = molarMasses();
  const known = MOLAR_MASSES.get(formula);
  if (known !== undefined) return known;
  const m = computeMolarMass(formula);
  if (MOLAR_MASSES.size >= 1000) MOLAR_MASSES.clear();
  MOLAR_MASSES.set(formula, m);
  return m;
}

/** Molar masses already computed with the atomic weights in use, by formula text as given (only successes are kept). */
const molarMasses = cachedOf('atomicweights', () => new Map<string, number>());

/** Applies the space rule: spaces before a multiplied formula become hydrate dots; other inner spaces are an error. */
function hydrateSpaces(formula: string): string {
  const parts = formula.trim().split(/\s+/);
  if (parts.length === 1) return parts[0];
  for (let i = 1; i < parts.length; i++) {
    if (!/^\d+(\.\d+)?[A-Z([]/.test(parts[i])) {
      throw new InputError(
        `a space inside the formula "${formula.trim()}" is read only as a hydrate separator before a number ("CuSO4 5H2O" = "CuSO4·5H2O"); write the formula without spaces, or with · or * for a hydrate`,
      );
    }
  }
  return parts.join('·');
}

function computeMolarMass(formula: string): number {
  let elements: Readonly<Record<string, number>>;
  try {
    const sp = parseSpecies(hydrateSpaces(String(formula)));
    if (sp.isElectron) throw new InputError('the electron has no molar mass here; give a formula such as "Ni" or "CuSO4·5H2O"');
    elements = sp.elements;
  } catch (e) {
    // The parser reports an unknown element symbol as unreadable text; name it as unknown (#N/A).
    if (e instanceof InputError && /is not an element symbol/.test(e.message)) throw new NotFoundError(e.message);
    throw e;
  }
  let sum = new Decimal(0);
  for (const symbol of Object.keys(elements)) sum = sum.plus(new Decimal(atomicWeight(symbol)).times(elements[symbol]));
  return finite(sum.toNumber(), 'the molar mass');
}
