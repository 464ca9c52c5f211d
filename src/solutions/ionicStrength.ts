import { InputError, finite } from '../errors';

/**
 * Ionic strength I = ½·Σ mᵢ·zᵢ², in mol/kg, from the molality and charge of each ion.
 *
 * Syntax: ionicStrength(molalities, charges)
 * Example: ionicStrength([0.1, 0.2], [2, −1]) → 0.3 mol/kg (CaCl2 at 0.1 mol/kg)
 * See also: activityCoef, meanActivityCoef
 *
 * @param molalities mᵢ of each ion, mol/kg
 * @param charges zᵢ of each ion (same number of values)
 */
export function ionicStrength(molalities: readonly number[], charges: readonly number[]): number {
  if (molalities.length !== charges.length) {
    throw new InputError(`molalities and charges must have the same number of values; got ${molalities.length} and ${charges.length}`);
  }
  let sum = 0;
  for (let i = 0; i < molalities.length; i++) sum += molalities[i] * charges[i] * charges[i];
  return finite(sum / 2, 'the ionic strength');
}
