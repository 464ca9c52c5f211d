import { alloyValences } from './alloyValences';
import { parseAlloy } from './parseAlloy';

/**
 * Equivalent weight of an alloy deposit, in g per mole of electrons: EW = 1 / Σ(wᵢ·nᵢ/Mᵢ), with the
 * mass fraction wᵢ, the valence nᵢ (electrons per atom deposited) and the IUPAC atomic weight Mᵢ of
 * each element (Faraday's law applied to each metal of the deposit; the same sum as the alloy
 * equivalent weight of ASTM G102 §5.2). Used as a molar mass with n = 1 it makes every Faraday's-law
 * function an alloy function: PLATETIME(25, 2, ALLOYEQUIV("Zn86Ni14", 2), 1, 7.1).
 *
 * Syntax: alloyEquiv(alloy, valences)
 * Example: alloyEquiv("Zn86Ni14", [2]) → 32.33 g
 * See also: parseAlloy, alloyDensity, partialCurrent
 */
export function alloyEquiv(alloy: string, valences: readonly number[]): number {
  const a = parseAlloy(alloy);
  const n = alloyValences(a.symbols, valences);
  let sum = 0;
  for (let i = 0; i < n.length; i++) sum += (a.fractions[i] * n[i]) / a.atomicWeights[i];
  return 1 / sum;
}
