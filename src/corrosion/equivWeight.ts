import { atomicWeight } from '../faraday/atomicWeight';
import { InputError } from '../errors';

/**
 * Equivalent weight of an alloy (ASTM G102 §5.2, eq. 5): EW = 1 / Σ(fᵢ·nᵢ/Wᵢ), in g, with the mass
 * fraction fᵢ, the valence nᵢ (electrons given up per atom on corrosion) and the IUPAC atomic weight
 * Wᵢ of each element. ASTM G102 counts only elements above 1 % by mass and uses mid-range
 * compositions; the fractions need not sum to 1 (a fraction above 1 is refused: give fractions, not
 * percentages).
 *
 * Syntax: equivWeight(elements, massFractions, valences)
 * Example: equivWeight(["Fe"], [1], [2]) → 27.92 g
 * See also: corrosionRate, rateConvert
 */
export function equivWeight(elements: readonly string[], massFractions: readonly number[], valences: readonly number[]): number {
  if (elements.length !== massFractions.length || elements.length !== valences.length) {
    throw new InputError(`elements, mass_fractions and valences must have the same length (${elements.length}, ${massFractions.length}, ${valences.length})`);
  }
  if (elements.length === 0) throw new InputError('give at least one element');
  let sum = 0;
  let total = 0;
  for (let i = 0; i < elements.length; i++) {
    const f = massFractions[i];
    const n = valences[i];
    if (!(f >= 0 && f <= 1)) throw new InputError(`mass fraction ${f} of ${elements[i]} must be between 0 and 1 (give 0.18 for 18 %)`);
    if (!(Number.isInteger(n) && n >= 1 && n <= 8)) throw new InputError(`valence ${n} of ${elements[i]} must be a whole number from 1 to 8`);
    total += f;
    sum += (f * n) / atomicWeight(elements[i].trim());
  }
  if (total > 1.0001) throw new InputError(`the mass fractions sum to ${total}, more than 1`);
  if (!(sum > 0)) throw new InputError('the mass fractions are all zero');
  return 1 / sum;
}
