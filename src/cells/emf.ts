/**
 * Cell EMF from the two electrode potentials: E_cell = E(cathode) − E(anode), in V. Never
 * reorders: a pairing that does not run by itself gives a negative value.
 *
 * Syntax: emf(cathodeV, anodeV)
 * Example: emf(0.3419, -0.7618) → 1.1037 V (the Daniell cell)
 * See also: galvanic, cellPotential, e0AtTemperature
 *
 * @param cathodeV reduction potential of the cathode (where reduction happens), V
 * @param anodeV reduction potential of the anode, V
 */
export function emf(cathodeV: number, anodeV: number): number {
  return cathodeV - anodeV;
}
