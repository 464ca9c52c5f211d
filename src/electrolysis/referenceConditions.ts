import { dataPart } from '../dataset/active';
import { GAS_CONSTANT_J_PER_MOL_K, kelvin } from '../constants';
import { NotFoundError } from '../errors';

/** Pa per kPa. */
const PA_PER_KPA = 1000;

type RefKey = '0C' | '15C' | '20C';
const refs = (): Record<RefKey, { temperature_C: number; pressure_kPa: number; name: string }> => dataPart('electrolysis').referenceConditions;
const KEYS: RefKey[] = ['0C', '15C', '20C'];

/**
 * Molar volume of an ideal gas at a named reference condition, in m³/mol: V_m = R·T/p.
 * "0C" is 0 °C and 101.325 kPa (the usual basis of the normal cubic metre, DIN 1343), "15C" is
 * 15 °C and 101.325 kPa (ISO 13443), "20C" is 20 °C and 101.325 kPa.
 *
 * Syntax: referenceMolarVolume(reference)
 * Example: referenceMolarVolume("0C") → 0.0224139695 m³/mol
 * See also: normalGasFlow
 *
 * @param reference "0C", "15C" or "20C" (also written "0", "15", "20", "0 °C", …)
 */
export function referenceMolarVolume(reference: string): number {
  const key = reference.replace(/\s|°/g, '').toUpperCase().replace(/C$/, '') + 'C';
  if (!KEYS.includes(key as RefKey)) {
    throw new NotFoundError(`unknown reference condition "${reference}"; use "0C" (0 °C, 101.325 kPa), "15C" or "20C" (both at 101.325 kPa)`);
  }
  const r = refs()[key as RefKey];
  return (GAS_CONSTANT_J_PER_MOL_K * kelvin(r.temperature_C)) / (r.pressure_kPa * PA_PER_KPA);
}
