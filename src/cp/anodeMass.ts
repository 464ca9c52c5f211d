import { PLAUSIBLE, plausible } from '../corrosion/plausible';
import { finite } from '../errors';

/** Hours in a year, as DNV-RP-B401 §7.6 counts them. */
export const HOURS_PER_YEAR = 8760;

/**
 * Total net anode mass for the design life (DNV-RP-B401 §7.6.2; ISO 15589-2):
 * Ma = Icm · tf · 8760 / (u · ε), in kg. The utilisation factor u and the capacity ε DIVIDE: a
 * lower efficiency needs more metal.
 *
 * Syntax: anodeMass(meanCurrentA, designLifeYears, capacityAhKg, utilisation)
 * Example: anodeMass(10, 25, 2000, 0.90) → 1216.67 kg
 * See also: anodeLife, currentDemand
 *
 * @param meanCurrentA mean current demand, A
 * @param designLifeYears design life, years
 * @param capacityAhKg electrochemical capacity, A·h/kg
 * @param utilisation utilisation factor, (0, 1]
 */
export function anodeMass(meanCurrentA: number, designLifeYears: number, capacityAhKg: number, utilisation: number): number {
  plausible('design_life_years', designLifeYears, PLAUSIBLE.years);
  plausible('capacity_Ah_per_kg', capacityAhKg, PLAUSIBLE.capacityAhKg);
  return finite((meanCurrentA * designLifeYears * HOURS_PER_YEAR) / (utilisation * capacityAhKg), 'the anode mass');
}
