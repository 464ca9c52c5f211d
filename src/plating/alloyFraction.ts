import { InputError } from '../errors';
import { atomicWeight } from '../faraday/atomicWeight';
import { quote } from '../text/quote';

/**
 * Mass fraction of one element in an alloy deposit from the partial currents of its elements
 * (Faraday's law for each metal): w_k = (I_k·M_k/n_k) / Σ(Iᵢ·Mᵢ/nᵢ). The partial currents may be
 * in any one unit (A, A/dm², or charges); hydrogen evolution does not enter.
 *
 * Syntax: alloyFraction(element, elements, partial_currents, valences)
 * Example: alloyFraction("Ni", ["Zn", "Ni"], [8.465, 1.535], [2]) → 0.14
 * See also: partialCurrent, parseAlloy
 */
export function alloyFraction(element: string, elements: readonly string[], partialCurrents: readonly number[], valences: readonly number[]): number {
  const symbols = elements.map((e) => e.trim());
  if (partialCurrents.length !== symbols.length) {
    throw new InputError(`give one partial current per element (${symbols.join(', ')}): ${symbols.length} values; got ${partialCurrents.length}`);
  }
  if (valences.length !== 1 && valences.length !== symbols.length) {
    throw new InputError(`give one valence for all elements or one per element: ${symbols.length} values; got ${valences.length}`);
  }
  const k = symbols.indexOf(element.trim());
  if (k < 0) throw new InputError(`${quote(element.trim())} is not among the elements ${symbols.join(', ')} (element symbols are case-sensitive)`);
  let sum = 0;
  let mine = 0;
  for (let i = 0; i < symbols.length; i++) {
    const n = valences[valences.length === 1 ? 0 : i];
    if (!(Number.isInteger(n) && n >= 1 && n <= 8)) throw new InputError(`the valence of ${symbols[i]} must be a whole number from 1 to 8; got ${n}`);
    const I = partialCurrents[i];
    if (!(I >= 0)) throw new InputError(`the partial current of ${symbols[i]} must be ≥ 0; got ${I}`);
    if (symbols.indexOf(symbols[i]) !== i) throw new InputError(`${symbols[i]} is named twice`);
    const m = (I * atomicWeight(symbols[i])) / n;
    sum += m;
    if (i === k) mine = m;
  }
  if (!(sum > 0)) throw new InputError('the partial currents are all zero');
  return mine / sum;
}
