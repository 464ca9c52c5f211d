import { finite } from '../errors';

/**
 * Apparent soil resistivity by the Wenner four-pin method (ASTM G57): ρ = 2π·a·R, in Ω·m, with pin
 * spacing a in m and the measured resistance R in Ω. It is the average resistivity down to a depth
 * of about a (pins driven no deeper than a/20).
 *
 * Syntax: wennerResistivity(spacingM, resistanceOhm)
 * Example: wennerResistivity(3, 5) → 94.25 Ω·m
 * See also: layerResistivity
 */
export function wennerResistivity(spacingM: number, resistanceOhm: number): number {
  return finite(2 * Math.PI * spacingM * resistanceOhm, 'the resistivity');
}
