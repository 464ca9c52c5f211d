import { InputError, NotFoundError } from '../errors';
import { molarMass } from '../faraday/molarMass';
import { referenceMolarVolume } from '../electrolysis/referenceConditions';

/** g per kg. */
const G_PER_KG = 1000;

/**
 * Water consumed by a water electrolyser per unit of hydrogen, in kg of water: the stoichiometry of
 * H2O → H2 + ½O2, one mole of water per mole of hydrogen, M(H2O)/M(H2) = 8.94 kg per kg of H2, or
 * M(H2O)/V_m per normal cubic metre (0.804 kg/Nm³ at 0 °C and 101.325 kPa), times (1 + extra) for
 * a measured extra consumption (water carried out with the wet gases, purge) given as a fraction of
 * the stoichiometric water. Water rejected by the water treatment ahead of the electrolyser is not
 * included.
 *
 * Syntax: waterPerHydrogen(basis, extraFraction, reference)
 * Example: waterPerHydrogen("kg", 0, "0C") → 8.936 kg/kg; waterPerHydrogen("Nm3", 0, "0C") → 0.8037 kg/Nm³
 * See also: normalGasFlow, referenceMolarVolume
 *
 * @param basis "kg" (per kg of H2) or "Nm3" (per normal m³ of H2 at the reference)
 * @param extraFraction extra consumption as a fraction of the stoichiometric water, in [0, 1)
 * @param reference reference of the normal m³, "0C", "15C" or "20C" (used for "Nm3" only)
 */
export function waterPerHydrogen(basis: string, extraFraction: number, reference: string): number {
  if (!(extraFraction >= 0 && extraFraction < 1)) throw new InputError(`extra_fraction must be a fraction in [0, 1); got ${extraFraction}`);
  const mH2O = molarMass('H2O');
  const b = basis.replace(/[\s³·]/g, (c) => (c === '³' ? '3' : '')).toLowerCase();
  let perUnit: number;
  if (b === 'kg') perUnit = mH2O / molarMass('H2');
  else if (b === 'nm3') perUnit = mH2O / G_PER_KG / referenceMolarVolume(reference);
  else throw new NotFoundError(`unknown basis "${basis}"; use "kg" (per kg of H2) or "Nm3" (per normal m³ of H2)`);
  return perUnit * (1 + extraFraction);
}
