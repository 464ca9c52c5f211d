import { PLAUSIBLE, plausible } from '../corrosion/plausible';
import { InputError, finite } from '../errors';

/**
 * Current output of one galvanic anode by Ohm's law (DNV-RP-B401 §7.7): Ia = (Ea − Ec)/Ra, in A,
 * with the design protective potential Ec of the structure, the closed-circuit potential Ea of the
 * anode (both on one reference electrode) and the anode resistance Ra. The driving voltage must be
 * positive: an anode less negative than the criterion cannot protect (#VALUE!).
 *
 * Syntax: anodeOutput(protectionV, anodeClosedCircuitV, resistanceOhm)
 * Example: anodeOutput(−0.80, −1.05, 0.125) → 2 A
 * See also: anodeResistance, anodeCount
 */
export function anodeOutput(protectionV: number, anodeClosedCircuitV: number, resistanceOhm: number): number {
  plausible('protection_V', protectionV, PLAUSIBLE.volts);
  plausible('anode_potential_V', anodeClosedCircuitV, PLAUSIBLE.volts);
  const drive = protectionV - anodeClosedCircuitV;
  if (!(drive > 0)) {
    throw new InputError(`the anode (${anodeClosedCircuitV} V) is not more negative than the protective potential (${protectionV} V): no driving voltage; give both on the same reference electrode`);
  }
  return finite(drive / resistanceOhm, 'the anode output');
}
