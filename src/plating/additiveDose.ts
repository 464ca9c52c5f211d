import { finite } from '../errors';

/**
 * Additive to add for the charge passed since the last addition: the ampere-hour meter reading in
 * A·h, divided by 1000, times the supplier's dose per kA·h (mL/kA·h, g/kA·h…); the result is in
 * the unit of that dose. Taking the meter in A·h and the dose per kA·h keeps the factor of 1000 in
 * one place.
 *
 * Syntax: additiveDose(ampere_hours, dose_per_kAh)
 * Example: additiveDose(12500, 150) → 1875 (mL, for a dose of 150 mL/kA·h)
 * See also: metalPerKAh
 */
export function additiveDose(ampereHours: number, dosePerKAh: number): number {
  return finite((ampereHours / 1000) * dosePerKAh, 'the dose');
}
