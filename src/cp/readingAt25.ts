import { refPotential } from '../scales/refPotential';
import type { ElectrodeRow } from '../table/types';

/**
 * A reading taken with a reference electrode at its own temperature, referred to the same electrode
 * at 25 °C (the temperature at which criteria are stated): E25 = E + E_ref(T) − E_ref(25 °C).
 * The electrode's potential at temperature comes from the table's reference-electrode function, so
 * an electrode known only at 25 °C answers #N/A away from 25 °C.
 *
 * Syntax: readingAt25(readingV, row, electrodeTemperatureC)
 * Example: readingAt25(−0.85, CSE row, 35) → −0.841 V with dE/dT = 0.9 mV/K
 * See also: refPotential, convertPotential
 *
 * @param readingV the reading against the electrode, V
 * @param row the reference electrode
 * @param electrodeTemperatureC temperature of the reference electrode itself, °C
 */
export function readingAt25(readingV: number, row: ElectrodeRow, electrodeTemperatureC: number): number {
  if (electrodeTemperatureC === 25) return readingV;
  return readingV + (refPotential(row, electrodeTemperatureC) - refPotential(row, 25));
}
