/**
 * Worksheet declarations: Nernst equation.
 *
 * Each declaration is JSDoc for custom-functions-metadata-plugin (which writes dist/functions.json
 * and appends the CustomFunctions.associate calls) and a body of one call into the adapter-built
 * function of the same id in functions/families/nernst.ts. Arguments are any[][] so that each
 * accepts a single value or a range; results are 2-D arrays and spill.
 */
/* eslint-disable @typescript-eslint/no-explicit-any */
import * as F from '../families/nernst';


/**
 * Nernst equation: E = E0 − (RT/nF)·ln Q, in V.
 * @customfunction NERNST
 * @helpurl https://localhost:3000/docs/functions.html#nernst
 * @param E0_V Standard potential, in V.
 * @param n Electrons transferred (a whole number ≥ 1).
 * @param Q Reaction quotient (> 0).
 * @param [temperature_C] Temperature in °C (default 25).
 * @returns E in V.
 */
function nernst(E0_V: any[][], n: any[][], Q: any[][], temperature_C?: any[][]): any[][] {
  return F.NERNST(E0_V, n, Q, temperature_C) as any;
}

/**
 * Nernst slope RT·ln10/(nF), in V per decade (0.05916 V at 25 °C for n = 1).
 * @customfunction NERNSTSLOPE
 * @helpurl https://localhost:3000/docs/functions.html#nernstslope
 * @param n Electrons transferred (a whole number ≥ 1).
 * @param [temperature_C] Temperature in °C (default 25).
 * @returns V per decade.
 */
function nernstSlope(n: any[][], temperature_C?: any[][]): any[][] {
  return F.NERNSTSLOPE(n, temperature_C) as any;
}

/**
 * EMF of a concentration cell: (RT/nF)·ln(a_concentrated/a_dilute), in V.
 * @customfunction CONCCELL
 * @helpurl https://localhost:3000/docs/functions.html#conccell
 * @param activity_dilute Activity on the dilute side (> 0).
 * @param activity_concentrated Activity on the concentrated side (> 0).
 * @param n Electrons transferred (a whole number ≥ 1).
 * @param [temperature_C] Temperature in °C (default 25).
 * @returns EMF in V.
 */
function concCell(activity_dilute: any[][], activity_concentrated: any[][], n: any[][], temperature_C?: any[][]): any[][] {
  return F.CONCCELL(activity_dilute, activity_concentrated, n, temperature_C) as any;
}
