import { DomainError, NotFoundError } from '../errors';
import type { CoupleRow } from '../table/types';

/** Temperatures at which a stored E° may be moved with its dE°/dT, °C (liquid water at 1 bar). */
export const E0_TEMPERATURE_RANGE_C = { min: 0, max: 100 } as const;

/**
 * Standard potential of a couple at a temperature: E°(T) = E°(25 °C) + (dE°/dT)·(T − 25), with
 * dE°/dT in mV/K, in V vs SHE.
 *
 * Syntax: e0AtTemperature(row, temperatureC)
 * Example: e0AtTemperature(table.findCouple("O2/H2O"), 80) → 1.229 − 0.000846·55 = 1.1825 V
 * See also: emf, halfCell
 *
 * @param row a couple row (key, e0 in V, dEdT_mV_K when stored)
 * @param temperatureC temperature, °C
 * @throws DomainError outside 0…100 °C
 * @throws NotFoundError when T ≠ 25 °C and the row has no dE°/dT
 */
export function e0AtTemperature(row: Pick<CoupleRow, 'key' | 'e0' | 'dEdT_mV_K'>, temperatureC: number): number {
  if (!(temperatureC >= E0_TEMPERATURE_RANGE_C.min && temperatureC <= E0_TEMPERATURE_RANGE_C.max)) {
    throw new DomainError(`E° can be moved to ${E0_TEMPERATURE_RANGE_C.min}…${E0_TEMPERATURE_RANGE_C.max} °C only`);
  }
  if (temperatureC === 25) return row.e0;
  if (row.dEdT_mV_K === undefined) {
    throw new NotFoundError(`no dE°/dT is stored for "${row.key}": its E° is known at 25 °C only`);
  }
  return row.e0 + (row.dEdT_mV_K / 1000) * (temperatureC - 25);
}
