import { finite } from '../errors';

/**
 * Rectifier output voltage of an impressed-current system: V = I·Rcircuit + back EMF, in V. The
 * circuit resistance is the sum of the groundbed, cable and structure-to-electrolyte resistances;
 * the back EMF (about 2 V between anode and structure in common practice) opposes the current.
 *
 * Syntax: rectifierVoltage(currentA, circuitResistanceOhm, backEmfV)
 * Example: rectifierVoltage(10, 1.5, 2) → 17 V
 * See also: groundbedResistance, cableDrop
 */
export function rectifierVoltage(currentA: number, circuitResistanceOhm: number, backEmfV: number): number {
  return finite(currentA * circuitResistanceOhm + backEmfV, 'the rectifier voltage');
}
