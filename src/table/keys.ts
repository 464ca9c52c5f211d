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
import { asciiFormula } from '../chem/asciiFormula';
import { parseSpecies } from '../chem/formula';

/** The canonical key of one side of a couple key; the bare text when it is not a species. */
function sideKey(text: string): string {
  const bare = asciiFormula(text).replace(/\s+/g, '');
  try {
    return parseSpecies(bare).key;
  } catch {
    return bare;
  }
}

/**
 * Normalizes a couple key for look-up: "Cu(2+) / Cu" → "Cu2+/Cu", "Cr2O7^2-/Cr3+" → "Cr2O72-/Cr3+".
 * Text without exactly one "/" is returned without white space (it will not match a valid key).
 *
 * Syntax: normalizeCoupleKey(key)
 * Example: normalizeCoupleKey("Fe(3+)/Fe+2") → "Fe3+/Fe2+"
 * See also: splitCoupleKey, normalizeElectrodeKey
 */
export function normalizeCoupleKey(key: string): string {
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
