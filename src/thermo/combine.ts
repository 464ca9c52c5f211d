import { InputError } from '../errors';

/**
 * E° of the half-reaction formed by adding half-reactions. Free energies add, potentials do not:
 * E° = Σ nᵢE°ᵢ / Σ nᵢ.
 *
 * Syntax: combine(potentials, electrons)
 * Example: combine([0.771, −0.447], [1, 2]) → −0.041 V (Fe3+/Fe from Fe3+/Fe2+ and Fe2+/Fe)
 * See also: deltaG
 *
 * @param potentials E°ᵢ of each step, V
 * @param electrons nᵢ of each step (a step taken in reverse has a negative n and its own E°)
 */
export function combine(potentials: readonly number[], electrons: readonly number[]): number {
  if (potentials.length !== electrons.length) {
    throw new InputError(`potentials and electrons must have the same number of values; got ${potentials.length} and ${electrons.length}`);
  }
  let sumNE = 0;
  let sumN = 0;
  for (let i = 0; i < potentials.length; i++) {
    sumNE += electrons[i] * potentials[i];
    sumN += electrons[i];
  }
  if (sumN === 0) throw new InputError('the electrons of the steps add up to 0; the combined step must transfer electrons (a sum ≠ 0)');
  return sumNE / sumN;
}
