import { NotFoundError } from '../errors';
import { h2so4Conductivity } from './h2so4Conductivity';
import { kohConductivity } from './kohConductivity';

/** The electrolytes with a published correlation, by the name the user types. */
const CORRELATIONS: Record<string, (concentration: number, temperatureC: number) => number> = {
  KOH: kohConductivity,
  H2SO4: h2so4Conductivity,
};

/**
 * Specific conductivity of an electrolyte from its published correlation, in S/m. Each
 * correlation has its own concentration unit and validity range; outside the range it throws an
 * InputError naming the range (never an extrapolation).
 *
 * Syntax: electrolyteConductivity(electrolyte, concentration, temperatureC)
 * Example: electrolyteConductivity("KOH", 6.9, 25) → about 62.1 S/m
 * See also: kohConductivity, h2so4Conductivity, ohmicDrop, bruggemanConductivity
 *
 * @param electrolyte name of the electrolyte ("KOH" or "H2SO4"); case, surrounding spaces and subscript digits ignored
 * @param concentration concentration in the correlation's unit (mol/L for both)
 * @param temperatureC temperature, °C
 */
export function electrolyteConductivity(electrolyte: string, concentration: number, temperatureC: number): number {
  const key = electrolyte.trim().normalize('NFKC').toUpperCase(); // NFKC reads H₂SO₄ as H2SO4
  const f = CORRELATIONS[key];
  if (f === undefined) {
    throw new NotFoundError(
      `no conductivity correlation for "${electrolyte}"; available: ${Object.keys(CORRELATIONS).join(', ')}; for another electrolyte enter a measured conductivity in S/m in OHMICDROP or CELLVOLTAGE`,
    );
  }
  return f(concentration, temperatureC);
}
