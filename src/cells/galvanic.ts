import type { CoupleRow } from '../table/types';
import { e0AtTemperature } from './e0AtTemperature';

/**
 * Arranges two couples as a galvanic cell: the couple with the higher E°(T) is the cathode.
 * Returns [E°cell ≥ 0 in V, cathode key, anode key]; with equal potentials the first couple is
 * named the cathode.
 *
 * Syntax: galvanic(couple1, couple2, temperatureC)
 * Example: galvanic(zinc, copper, 25) → [1.1037, "Cu2+/Cu", "Zn2+/Zn"]
 * See also: emf, cellReaction
 */
export function galvanic(couple1: CoupleRow, couple2: CoupleRow, temperatureC: number): [number, string, string] {
  const e1 = e0AtTemperature(couple1, temperatureC);
  const e2 = e0AtTemperature(couple2, temperatureC);
  return e1 >= e2 ? [e1 - e2, couple1.key, couple2.key] : [e2 - e1, couple2.key, couple1.key];
}
