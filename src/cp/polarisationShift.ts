import { finite } from '../errors';

/**
 * Cathodic polarisation from survey readings: native (static, before protection) minus instant-OFF
 * potential, in V, on one reference electrode. Positive when the structure is polarised in the
 * cathodic direction; compare it with the 100 mV polarisation criterion where the standard allows it.
 *
 * Syntax: polarisationShift(instantOffV, nativeV)
 * Example: polarisationShift(−0.78, −0.65) → 0.13 V
 * See also: irDrop, protectionCriterion
 *
 * @param instantOffV instant-OFF potential, V
 * @param nativeV native (free-corrosion) potential on the same electrode, V
 */
export function polarisationShift(instantOffV: number, nativeV: number): number {
  return finite(nativeV - instantOffV, 'the polarisation shift');
}
