import { InputError } from '../errors';

/** Hull's constants for the current density in A/ft² with I in A and L in inches: [C1, C2] by cell volume in mL. */
const CONSTANTS: ReadonlyMap<number, readonly [number, number]> = new Map([
  [267, [27.7, 48.7]],
  [1000, [18.8, 28.3]],
]);
/** Range of L along the panel in which the relation holds: 0.25 to 3.25 in. */
const L_MIN_CM = 0.25 * 2.54;
const L_MAX_CM = 3.25 * 2.54;
/** dm² in one square foot: (3.048 dm)², exact by the definition of the foot (0.3048 m). */
const DM2_PER_FT2 = 3.048 * 3.048;

/**
 * Primary current density along the cathode panel of a Hull cell, in A/dm²: Hull's relation
 * i = I·(C1 − C2·log10 L) with the averaged constants for the 267 mL cell (C1 = 27.7, C2 = 48.7) or
 * the 1000 mL cell (18.8, 28.3), i in A/ft², I the cell current in A and L the distance from the
 * high-current-density end in inches, converted here to L in cm and i in A/dm² (for the 267 mL cell
 * i ≈ I·(5.10 − 5.24·log10 L[cm])). Valid for L from 0.25 to 3.25 in (0.635 to 8.255 cm); outside
 * that an error. Cyanide and other strongly polarised baths deviate from it.
 * Source: Metal Finishing Guidebook (2013), "Hull cell" chapter, Current distribution.
 *
 * Syntax: hullCell(current_A, distance_cm, cell_mL)
 * Example: hullCell(2, 2.54, 267) → 5.96 A/dm²
 * See also: platingCurrent
 */
export function hullCell(currentA: number, distanceCm: number, cellML: number): number {
  const c = CONSTANTS.get(cellML);
  if (c === undefined) throw new InputError(`cell_mL must be 267 or 1000 (the standard Hull cells); got ${cellML}`);
  if (!(distanceCm >= L_MIN_CM && distanceCm <= L_MAX_CM)) {
    throw new InputError(`the distance ${distanceCm} cm is outside ${L_MIN_CM} to ${L_MAX_CM} cm (0.25 to 3.25 in from the high-current-density end), where the Hull cell relation holds`);
  }
  const asf = currentA * (c[0] - c[1] * Math.log10(distanceCm / 2.54));
  return asf / DM2_PER_FT2;
}
