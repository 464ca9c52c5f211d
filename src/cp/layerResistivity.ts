import { InputError, finite } from '../errors';

/**
 * Resistivity of the soil layer between the depths of two Wenner readings (Barnes layer method):
 * the layer between a1 and a2 (a2 > a1) conducts as the difference of the two readings' conductances,
 * ρ = 2π·(a2 − a1) / (1/R2 − 1/R1), in Ω·m. A homogeneous soil gives its own resistivity back.
 * R2 must be smaller than R1 (a deeper reading adds a conductor in parallel); otherwise the readings
 * are inconsistent for this method (#VALUE!).
 *
 * Syntax: layerResistivity(a1M, r1Ohm, a2M, r2Ohm)
 * Example: layerResistivity(1.5, 10, 3, 4) → 62.83 Ω·m
 * See also: wennerResistivity
 */
export function layerResistivity(a1M: number, r1Ohm: number, a2M: number, r2Ohm: number): number {
  if (!(a2M > a1M)) throw new InputError(`the second spacing (${a2M} m) must be larger than the first (${a1M} m)`);
  const g = 1 / r2Ohm - 1 / r1Ohm;
  if (!(g > 0)) throw new InputError(`the deeper reading (${r2Ohm} Ω) must be smaller than the shallower (${r1Ohm} Ω) for the layer method`);
  return finite((2 * Math.PI * (a2M - a1M)) / g, 'the layer resistivity');
}
