import { DomainError, NotFoundError } from '../errors';
import type { ElectrodeRow } from '../table/types';

/** Temperatures at which reference-electrode potentials are extrapolated with dE/dT, °C. */
export const REF_TEMPERATURE_RANGE_C = { min: 0, max: 100 } as const;

/**
 * Potential of a reference electrode in V vs SHE at a temperature: E(T) = E(25 °C) + (dE/dT)·(T − 25).
 * At 25 °C the stored value is returned as it is; at any other temperature the row needs a stored
 * dE/dT (NotFoundError naming the electrode otherwise), and T must lie within 0…100 °C (DomainError).
 *
 * Syntax: refPotential(row, temperatureC)
 * Example: refPotential(SCE row, 35) → 0.2346 V (0.2412 V − 0.661 mV/K × 10 K)
 * See also: convertPotential
 *
 * @param row reference electrode from the table
 * @param temperatureC temperature, °C
 */
export function refPotential(row: ElectrodeRow, temperatureC: number): number {
  if (temperatureC === 25) return row.potential;
  if (!(temperatureC >= REF_TEMPERATURE_RANGE_C.min && temperatureC <= REF_TEMPERATURE_RANGE_C.max)) {
    throw new DomainError(`reference potentials are extrapolated only within ${REF_TEMPERATURE_RANGE_C.min}…${REF_TEMPERATURE_RANGE_C.max} °C`);
  }
  if (row.dEdT_mV_K === undefined) {
    throw new NotFoundError(`the electrode table has no dE/dT for "${row.key}", so its potential is known only at 25 °C`);
  }
  return row.potential + (row.dEdT_mV_K / 1000) * (temperatureC - 25);
}
