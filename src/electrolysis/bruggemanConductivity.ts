import { InputError } from '../errors';

/**
 * Effective conductivity of an electrolyte that holds a volume fraction ε of non-conducting gas
 * bubbles, by the Bruggeman relation κ_eff = κ·(1 − ε)^1.5 (D. A. G. Bruggeman, Ann. Phys. 416
 * (1935) 636), in the units of κ.
 *
 * Syntax: bruggemanConductivity(conductivity, gasFraction)
 * Example: bruggemanConductivity(100, 0.2) → 71.55
 * See also: ohmicDrop
 *
 * @param conductivity conductivity of the gas-free electrolyte (any unit)
 * @param gasFraction volume fraction of gas, 0 ≤ ε < 1
 */
export function bruggemanConductivity(conductivity: number, gasFraction: number): number {
  if (!(gasFraction >= 0 && gasFraction < 1)) {
    throw new InputError(`gas_fraction must be a volume fraction from 0 up to (not including) 1; got ${gasFraction} (a percentage? divide by 100)`);
  }
  return conductivity * Math.pow(1 - gasFraction, 1.5);
}
