/**
 * Worksheet declarations: cells (EMF, galvanic pairing, overall reaction, cell potential).
 *
 * Each declaration is JSDoc for custom-functions-metadata-plugin (which writes dist/functions.json
 * and appends the CustomFunctions.associate calls) and a body of one call into the adapter-built
 * function of the same id in functions/families/cells.ts. Arguments are any[][] so that each
 * accepts a single value or a range; results are 2-D arrays and spill.
 */
/* eslint-disable @typescript-eslint/no-explicit-any */
import * as F from '../families/cells';

/**
 * Standard cell EMF E°cell = E°(cathode) − E°(anode), in V. Never reorders: a pairing that does not run by itself gives a negative value. Sign convention: positive when the reaction runs by itself (galvanic); an electrolysis as written is negative, and DECOMPOSITIONVOLTAGE gives its positive decomposition voltage.
 * @customfunction EMF
 * @helpurl https://localhost:3000/docs/functions.html#emf
 * @param cathode Couple key (e.g. "Cu2+/Cu") or a potential in V vs SHE.
 * @param anode Couple key (e.g. "Zn2+/Zn") or a potential in V vs SHE.
 * @param [temperature_C] Temperature in °C, 0 to 100 (default 25); applies to couples, numbers are taken as given.
 * @returns E°cell in V.
 */
function emf(cathode: any[][], anode: any[][], temperature_C?: any[][]): any[][] {
  return F.EMF(cathode, anode, temperature_C) as any;
}

/**
 * Arranges two couples as a galvanic cell: spills 1×3 [E°cell in V (≥ 0), cathode key, anode key]. It compares standard potentials, not the potentials metals take in service: not a design driving voltage for anodes (ANODEDATA, ANODEOUTPUT) nor a galvanic series (GALVANICSERIES; passive stainless steel, for one, is noble in seawater).
 * @customfunction GALVANIC
 * @helpurl https://localhost:3000/docs/functions.html#galvanic
 * @param couple1 A couple key (e.g. "Zn2+/Zn").
 * @param couple2 Another couple key (e.g. "Cu2+/Cu").
 * @param [temperature_C] Temperature in °C, 0 to 100 (default 25).
 * @returns E°cell in V, the cathode's key and the anode's key.
 */
function galvanic(couple1: any[][], couple2: any[][], temperature_C?: any[][]): any[][] {
  return F.GALVANIC(couple1, couple2, temperature_C) as any;
}

/**
 * Electrons n of the balanced overall cell reaction: the least common multiple of the two half-reactions' n (dimensionless).
 * @customfunction CELLELECTRONS
 * @helpurl https://localhost:3000/docs/functions.html#cellelectrons
 * @param cathode Couple key of the cathode (where reduction happens).
 * @param anode Couple key of the anode.
 * @returns n, a whole number.
 */
function cellElectrons(cathode: any[][], anode: any[][]): any[][] {
  return F.CELLELECTRONS(cathode, anode) as any;
}

/**
 * The balanced overall cell reaction as text, species common to both sides cancelled (e.g. "Cu2+ + Zn -> Cu + Zn2+").
 * @customfunction CELLREACTION
 * @helpurl https://localhost:3000/docs/functions.html#cellreaction
 * @param cathode Couple key of the cathode (where reduction happens).
 * @param anode Couple key of the anode.
 * @returns The overall reaction (text).
 */
function cellReaction(cathode: any[][], anode: any[][]): any[][] {
  return F.CELLREACTION(cathode, anode) as any;
}

/**
 * Cell potential at a reaction quotient: E = E°cell − (RT/nF)·ln Q, in V, with n from CELLELECTRONS and Q of the reaction CELLREACTION writes. Sign convention: positive when the reaction runs by itself; an electrolysis as written is negative (its decomposition voltage is −E).
 * @customfunction CELLPOTENTIAL
 * @helpurl https://localhost:3000/docs/functions.html#cellpotential
 * @param cathode Couple key of the cathode (where reduction happens).
 * @param anode Couple key of the anode.
 * @param Q Reaction quotient of the overall reaction (dimensionless, > 0).
 * @param [temperature_C] Temperature in °C, 0 to 100 (default 25).
 * @returns E in V.
 */
function cellPotential(cathode: any[][], anode: any[][], Q: any[][], temperature_C?: any[][]): any[][] {
  return F.CELLPOTENTIAL(cathode, anode, Q, temperature_C) as any;
}
