import { finite } from '../errors';

/**
 * IR drop in a cathodic-protection reading: ON minus instant-OFF potential, in V. Negative when the
 * protective current flows onto the structure, as it should; a positive value means current leaves
 * the structure at that point (stray-current interference) or the two readings were swapped, and
 * needs the CP engineer's attention. The instant-OFF reading itself is the estimate of the IR-free
 * (polarised) potential; the IR drop says how much of the ON reading was not polarisation.
 *
 * Syntax: irDrop(onV, instantOffV)
 * Example: irDrop(−1.20, −0.92) → −0.28 V
 * See also: polarisationShift
 */
export function irDrop(onV: number, instantOffV: number): number {
  return finite(onV - instantOffV, 'the IR drop');
}
