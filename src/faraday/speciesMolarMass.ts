import { asciiFormula } from '../chem/asciiFormula';
import { isElementSymbol } from '../chem/elements';
import { InputError } from '../errors';
import { molarMass } from './molarMass';
import { cachedOf } from '../dataset/active';

/**
 * Molar mass in g/mol of a species argument of the deposition functions: a formula text (see
 * molarMass) or a number read as the molar mass itself (> 0).
 *
 * A deposit is a metal, so a text of two capitals that names two elements but one element symbol
 * when its second letter is lower case ("NI", "CU", "SN", "PB", "CO") is taken as a typing slip and
 * refused with the element it probably means, instead of being read silently as a compound
 * (N + I is 140.9 g/mol, Ni 58.69). MOLARMASS itself keeps the formula reading (CO is carbon monoxide).
 *
 * Syntax: speciesMolarMass(species)
 * Example: speciesMolarMass("Ni") → 58.693; speciesMolarMass(58.69) → 58.69; speciesMolarMass("NI") → InputError "did you mean Ni?"
 * See also: molarMass, miscapitalisedElement
 */
export function speciesMolarMass(species: string | number): number {
  if (typeof species === 'number') {
    if (!(species > 0) || !Number.isFinite(species)) throw new InputError(`a molar mass must be a finite number > 0 g/mol; got ${species}`);
    return species;
  }
  // A range of DEPOSITMASS calls names the same few species over and over: check each text once
  // (per set of atomic weights in use: a workbook's pinned weights start a fresh memo).
  const masses = speciesMasses();
  const known = masses.get(species);
  if (known !== undefined) return known;
  const meant = miscapitalisedElement(species);
  if (meant !== undefined) {
    throw new InputError(
      `"${species.trim()}" reads as two elements (${meant.read}); did you mean ${meant.element}? Element symbols are case-sensitive: write "${meant.element}", or a molar mass in g/mol`,
    );
  }
  let m: number;
  try {
    m = molarMass(species);
  } catch (e) {
    // "Zn0.86Ni0.14": every element with a count and some count a decimal is an alloy composition
    // (the count pattern has one way to match each run of digits, so a long text cannot backtrack)
    if (e instanceof InputError && /^\s*(?:[A-Z][a-z]?\s*(?:\d+(?:\.\d*)?|\.\d+)\s*)+$/.test(species) && /\d\.\d/.test(species)) {
      throw new InputError(`${e.message}; "${species.trim()}" looks like an alloy: give its equivalent weight, ALLOYEQUIV("Zn86Ni14", 2) (mass percent), as the molar mass with n = 1, or use ALLOYPLATETIME`);
    }
    throw e;
  }
  if (masses.size >= 1000) masses.clear();
  masses.set(species, m);
  return m;
}

/** Molar masses of species texts already accepted, by text as given (refused texts are not kept). */
const speciesMasses = cachedOf('atomicweights', () => new Map<string, number>());

/**
 * When a species text is two capital letters (a charge or phase mark may follow) that are two
 * element symbols and whose re-capitalised form is one element symbol, the element meant and the
 * reading it would otherwise get; else undefined.
 *
 * Syntax: miscapitalisedElement(text)
 * Example: miscapitalisedElement("NI") → { element: "Ni", read: "N + I" }; miscapitalisedElement("Ni") → undefined
 * See also: speciesMolarMass
 */
export function miscapitalisedElement(text: string): { element: string; read: string } | undefined {
  const m = /^([A-Z])([A-Z])(?![a-z])(.*)$/.exec(asciiFormula(text).replace(/\s+/g, ''));
  if (m === null) return undefined;
  // only the two letters, with at most a charge or phase mark after them (no counts: "NI3" is a formula)
  if (m[3] !== '' && !/^(\^?\d*[+-]+\d*|\((?:\d*[+-]+|s|l|g|aq|cr|c)\))$/.test(m[3])) return undefined;
  const element = m[1] + m[2].toLowerCase();
  if (!isElementSymbol(m[1]) || !isElementSymbol(m[2]) || !isElementSymbol(element)) return undefined;
  return { element, read: `${m[1]} + ${m[2]}` };
}
