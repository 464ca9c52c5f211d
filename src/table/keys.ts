/**
 * Look-up keys of the potential table.
 *
 * Couple keys are written Ox/Red. Two spellings are the same key when, side by side, they name the
 * same species: white space is ignored and every charge spelling parseSpecies reads is accepted
 * ("Cu(2+)/Cu", "Cu^2+/Cu", "Cu+2/Cu" and "Cu2+ / Cu" are all "Cu2+/Cu"); phase marks are ignored
 * ("O2(g)/H2O(l)" is "O2/H2O"). Element symbols stay case-sensitive: "Co2+/Co" (cobalt) is not
 * "CO2+/CO".
 *
 * Electrode keys ignore case and white space ("ag/agcl/kcl(sat)" is "Ag/AgCl/KCl(sat)").
 */
import { isElementSymbol } from '../chem/elements';
import { asciiFormula } from '../chem/asciiFormula';
import { parseSpecies } from '../chem/formula';
import { MAX_KEY_CHARS } from '../textLimits';

/**
 * False when some capital letter in the text starts no element symbol ("Qq", "Xx2+"): the species
 * reader would refuse the text, so it is not asked (refusing costs an exception; a range of a million
 * unknown keys should not pay a million of them).
 */
function symbolsReadable(s: string): boolean {
  for (let i = 0; i < s.length; i++) {
    const c = s[i];
    if (c < 'A' || c > 'Z') continue;
    const next = s[i + 1];
    if (next !== undefined && next >= 'a' && next <= 'z' && isElementSymbol(c + next)) i++;
    else if (!isElementSymbol(c)) return false;
  }
  return true;
}

/** Sides read recently (a range of keys repeats the same few sides: "…/Cu"), at most SIDE_MEMO entries. */
const sideMemo = new Map<string, string>();
const SIDE_MEMO = 4096;

/** The canonical key of one side of a couple key; the bare text when it is not a species. */
function sideKey(text: string): string {
  let k = sideMemo.get(text);
  if (k !== undefined) return k;
  const bare = asciiFormula(text).replace(/\s+/g, '');
  if (!symbolsReadable(bare)) k = bare;
  else {
    try {
      k = parseSpecies(bare).key;
    } catch {
      k = bare;
    }
  }
  if (sideMemo.size >= SIDE_MEMO) sideMemo.clear();
  sideMemo.set(text, k);
  return k;
}

/**
 * Normalizes a couple key for look-up: "Cu(2+) / Cu" → "Cu2+/Cu", "Cr2O7^2-/Cr3+" → "Cr2O72-/Cr3+".
 * Text without exactly one "/" is returned without white space (it will not match a valid key); text
 * longer than MAX_KEY_CHARS is returned as it is (no key is that long).
 *
 * Syntax: normalizeCoupleKey(key)
 * Example: normalizeCoupleKey("Fe(3+)/Fe+2") → "Fe3+/Fe2+"
 * See also: splitCoupleKey, normalizeElectrodeKey
 */
export function normalizeCoupleKey(key: string): string {
  // No table key is longer (src/textLimits.ts): such a text matches nothing and is not read further.
  if (key.length > MAX_KEY_CHARS) return key;
  const parts = key.split('/');
  if (parts.length !== 2) return key.replace(/\s+/g, '');
  return `${sideKey(parts[0])}/${sideKey(parts[1])}`;
}

/**
 * Splits a couple key into its Ox and Red texts (white space trimmed); undefined unless the key
 * has exactly one "/" with text on both sides.
 *
 * Syntax: splitCoupleKey(key)
 * Example: splitCoupleKey("MnO4-/Mn2+") → { ox: "MnO4-", red: "Mn2+" }
 */
export function splitCoupleKey(key: string): { ox: string; red: string } | undefined {
  const parts = key.split('/');
  if (parts.length !== 2) return undefined;
  const ox = parts[0].trim();
  const red = parts[1].trim();
  if (ox === '' || red === '') return undefined;
  return { ox, red };
}

/**
 * Normalizes an electrode key or alias for look-up: white space removed, lower case.
 *
 * Syntax: normalizeElectrodeKey(key)
 * Example: normalizeElectrodeKey(" Ag/AgCl/KCl (sat) ") → "ag/agcl/kcl(sat)"
 */
export function normalizeElectrodeKey(key: string): string {
  return asciiFormula(key).replace(/\s+/g, '').toLowerCase();
}
