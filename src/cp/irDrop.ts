import { InputError, finite } from '../errors';

/**
 * IR drop in a cathodic-protection reading: ON minus instant-OFF potential, in V (negative when
 * the protective current flows toward the structure). The instant-OFF reading itself is the
 * estimate of the IR-free (polarised) potential; the IR drop says how much of the ON reading was
 * not polarisation. An OFF reading more negative than the ON reading is refused (#VALUE!): the
 * two readings are swapped, or the current was not interrupted.
 *
 * Syntax: irDrop(onV, instantOffV)
 * Example: irDrop(−1.20, −0.92) → −0.28 V
 * See also: polarisationShift
 */
export function irDrop(onV: number, instantOffV: number): number {
  if (instantOffV < onV - 1e-12) {
    throw new InputError(`the instant-OFF reading ${instantOffV} V is more negative than the ON reading ${onV} V: the readings look swapped (ON first, then OFF)`);
  }
  return finite(onV - instantOffV, 'the IR drop');
}
