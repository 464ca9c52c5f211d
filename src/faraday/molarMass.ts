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
 * Syntax: molarMass(formula)
 * Example: molarMass("CuSO4·5H2O") → 249.68 g/mol
 * See also: atomicWeight, ecEquiv
 */
export function molarMass(formula: string): number {
  // A range of DEPOSITMASS calls names the same few formulas over and over: parse each once.
  const known = MOLAR_MASSES.get(formula);
  if (known !== undefined) return known;
  const m = computeMolarMass(formula);
  if (MOLAR_MASSES.size >= 1000) MOLAR_MASSES.clear();
  MOLAR_MASSES.set(formula, m);
  return m;
}

/** Molar masses already computed, by formula text as given (only successes are kept). */
const MOLAR_MASSES = new Map<string, number>();

function computeMolarMass(formula: string): number {
  let elements: Readonly<Record<string, number>>;
  try {
    const sp = parseSpecies(formula);
    if (sp.isElectron) throw new InputError('the electron has no molar mass here; give a formula such as "Ni" or "CuSO4·5H2O"');
    elements = sp.elements;
  } catch (e) {
    // The parser reports an unknown element symbol as unreadable text; name it as unknown (#N/A).
    if (e instanceof InputError && /is not an element symbol/.test(e.message)) throw new NotFoundError(e.message);
    throw e;
  }
  let sum = 0;
  for (const symbol of Object.keys(elements)) sum += atomicWeight(symbol) * elements[symbol];
  return finite(sum, 'the molar mass');
}
