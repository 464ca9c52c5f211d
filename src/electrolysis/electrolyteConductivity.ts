import { NotFoundError } from '../errors';
import { kohConductivity } from './kohConductivity';

/** The electrolytes with a published correlation, by the name the user types. */
const CORRELATIONS: Record<string, (concentration: number, temperatureC: number) => number> = {
  KOH: kohConductivity,
};

/**
 * Specific conductivity of an electrolyte from its published correlation, in S/m. Each
 * correlation has its own concentration unit and validity range; outside the range it throws an
 * InputError naming the range (never an extrapolation).
 *
 * Syntax: electrolyteConductivity(electrolyte, concentration, temperatureC)
 * Example: electrolyteConductivity("KOH", 6.9, 25) → about 62.1 S/m
 * See also: kohConductivity, ohmicDrop, bruggemanConductivity
 *
 * @param electrolyte name of the electrolyte ("KOH"); case and surrounding spaces ignored
 * @param concentration concentration in the correlation's unit (mol/L for KOH)
 * @param temperatureC temperature, °C
 */
export function electrolyteConductivity(electrolyte: string, concentration: number, temperatureC: number): number {
  const key = electrolyte.trim().toUpperCase();
  const f = CORRELATIONS[key];
  if (f === undefined) {
    throw new NotFoundError(
      `no conductivity correlation for "${electrolyte}"; available: ${Object.keys(CORRELATIONS).join(', ')}; for another electrolyte enter a measured conductivity in S/m in OHMICDROP or CELLVOLTAGE`,
    );
  }
  return f(concentration, temperatureC);
}
