import { finite } from '../errors';

/** m per mm. */
const M_PER_MM = 1e-3;

/**
 * Ohmic (IR) drop across an electrolyte gap, in V: U = j·d/κ, with j the current density, d the
 * gap and κ the (effective) conductivity of the electrolyte in the gap.
 *
 * Syntax: ohmicDrop(currentDensityA_m2, gapMm, conductivityS_m)
 * Example: ohmicDrop(3000, 3, 100) → 0.09 V
 * See also: bruggemanConductivity, cellVoltageBreakdown
 *
 * @param currentDensityA_m2 current density, A/m²
 * @param gapMm electrode gap, mm
 * @param conductivityS_m conductivity of the electrolyte, S/m
 */
export function ohmicDrop(currentDensityA_m2: number, gapMm: number, conductivityS_m: number): number {
  return finite((currentDensityA_m2 * gapMm * M_PER_MM) / conductivityS_m, 'the ohmic drop');
}
