import { InputError } from '../errors';
import { quote } from '../text/quote';
import { alloyValences } from './alloyValences';
import { parseAlloy } from './parseAlloy';

/**
 * The part of a current that deposits one element of an alloy of known composition (the partial
 * current): I_k = ε·I·(w_k·n_k/M_k) / Σ(wᵢ·nᵢ/Mᵢ). Each metal takes the charge Faraday's law needs
 * for its share of the deposit; ε·I is the current that goes into the alloy (the rest evolves
 * hydrogen or is otherwise lost). Works the same on current densities.
 *
 * Syntax: partialCurrent(current, alloy, element, valences, efficiency)
 * Example: partialCurrent(10, "Zn86Ni14", "Ni", [2], 1) → 1.535 A
 * See also: alloyFraction, alloyEquiv
 */
export function partialCurrent(current: number, alloy: string, element: string, valences: readonly number[], efficiency: number): number {
  const a = parseAlloy(alloy);
  const n = alloyValences(a.symbols, valences);
  const k = a.symbols.indexOf(element.trim());
  if (k < 0) throw new InputError(`the alloy ${quote(alloy)} has no ${quote(element.trim())}; give one of ${a.symbols.join(', ')} (element symbols are case-sensitive)`);
  let sum = 0;
  for (let i = 0; i < n.length; i++) sum += (a.fractions[i] * n[i]) / a.atomicWeights[i];
  return (efficiency * current * ((a.fractions[k] * n[k]) / a.atomicWeights[k])) / sum;
}
