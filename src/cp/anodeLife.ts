import { PLAUSIBLE, plausible } from '../corrosion/plausible';
import { finite } from '../errors';
import { HOURS_PER_YEAR } from './anodeMass';

/**
 * Life of galvanic anodes at a mean current, the inverse of the anode-mass formula of DNV-RP-B401
 * §7.6.2: L = m · u · ε / (I · 8760), in years.
 *
 * Syntax: anodeLife(netMassKg, capacityAhKg, utilisation, meanCurrentA)
 * Example: anodeLife(1216.67, 2000, 0.90, 10) → 25 years
 * See also: anodeMass
 */
export function anodeLife(netMassKg: number, capacityAhKg: number, utilisation: number, meanCurrentA: number): number {
  plausible('capacity_Ah_per_kg', capacityAhKg, PLAUSIBLE.capacityAhKg);
  return finite((netMassKg * utilisation * capacityAhKg) / (meanCurrentA * HOURS_PER_YEAR), 'the anode life');
}
