import { InputError } from '../errors';

/**
 * The valence of each element of an alloy, in the order of its composition: one number for every
 * element (Zn–Ni, Sn–Pb and Ni–Co all deposit from divalent ions), or one per element ("Cu70Zn30"
 * from a cyanide bath: Cu(I) and Zn(II), so [1, 2]). Each a whole number from 1 to 8.
 *
 * Syntax: alloyValences(symbols, valences)
 * Example: alloyValences(["Cu", "Zn"], [1, 2]) → [1, 2]; alloyValences(["Zn", "Ni"], [2]) → [2, 2]
 * See also: alloyEquiv, parseAlloy
 */
export function alloyValences(symbols: readonly string[], valences: readonly number[]): number[] {
  if (valences.length !== 1 && valences.length !== symbols.length) {
    throw new InputError(`give one valence for all elements or one per element of the alloy (${symbols.join(', ')}): ${symbols.length} values; got ${valences.length}`);
  }
  const out = symbols.map((_, i) => valences[valences.length === 1 ? 0 : i]);
  out.forEach((n, i) => {
    if (!(Number.isInteger(n) && n >= 1 && n <= 8)) throw new InputError(`the valence of ${symbols[i]} must be a whole number from 1 to 8; got ${n}`);
  });
  return out;
}
