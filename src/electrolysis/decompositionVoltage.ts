/**
 * Decomposition (reversible) voltage of an electrolysis, positive, in V: E(anode couple) −
 * E(cathode couple), with both couples' reduction potentials. It is the EMF of the same pair
 * with the sign reversed: the cell reaction forced by the current does not run by itself, so its
 * EMF (cathode − anode) is negative and its decomposition voltage positive.
 *
 * Syntax: decompositionVoltage(cathodeV, anodeV)
 * Example: decompositionVoltage(-0.7618, 1.229) → 1.9908 V (zinc from acid sulfate, oxygen at the anode)
 * See also: emf
 *
 * @param cathodeV reduction potential of the couple reduced at the cathode (Zn2+/Zn), V
 * @param anodeV reduction potential of the couple oxidised at the anode (O2/H2O), V
 */
export function decompositionVoltage(cathodeV: number, anodeV: number): number {
  return anodeV - cathodeV;
}
