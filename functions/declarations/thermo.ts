/**
 * Worksheet declarations: thermodynamics (ΔG, K, E).
 *
 * Each declaration is JSDoc for custom-functions-metadata-plugin (which writes dist/functions.json
 * and appends the CustomFunctions.associate calls) and a body of one call into the adapter-built
 * function of the same id in functions/families/thermo.ts. Arguments are any[][] so that each
 * accepts a single value or a range; results are 2-D arrays and spill.
 */
/* eslint-disable @typescript-eslint/no-explicit-any */
import * as F from '../families/thermo';


/**
 * Gibbs energy from a potential: ΔG = −nFE, in kJ/mol.
 * @customfunction DELTAG
 * @helpurl https://localhost:3000/docs/functions.html#deltag
 * @param potential_V Potential of the reaction as written, in V.
 * @param n Electrons transferred (a whole number ≥ 1).
 * @returns ΔG in kJ/mol (negative when the reaction runs by itself).
 */
function deltaG(potential_V: any[][], n: any[][]): any[][] {
  return F.DELTAG(potential_V, n) as any;
}

/**
 * Potential from a Gibbs energy: E = −ΔG/(nF), in V.
 * @customfunction EFROMDELTAG
 * @helpurl https://localhost:3000/docs/functions.html#efromdeltag
 * @param deltaG_kJ ΔG in kJ/mol.
 * @param n Electrons transferred (a whole number ≥ 1).
 * @returns E in V.
 */
function eFromDeltaG(deltaG_kJ: any[][], n: any[][]): any[][] {
  return F.EFROMDELTAG(deltaG_kJ, n) as any;
}

/**
 * Decimal logarithm of the equilibrium constant: log10 K = nFE/(RT ln 10).
 * @customfunction LOGK
 * @helpurl https://localhost:3000/docs/functions.html#logk
 * @param potential_V Potential of the reaction as written, in V.
 * @param n Electrons transferred (a whole number ≥ 1).
 * @param [temperature_C] Temperature in °C (default 25).
 * @returns log10 K (dimensionless).
 */
function logK(potential_V: any[][], n: any[][], temperature_C?: any[][]): any[][] {
  return F.LOGK(potential_V, n, temperature_C) as any;
}

/**
 * Equilibrium constant K = exp(nFE/RT); #NUM! when K is outside double range (use LOGK).
 * @customfunction KEQ
 * @helpurl https://localhost:3000/docs/functions.html#keq
 * @param potential_V Potential of the reaction as written, in V.
 * @param n Electrons transferred (a whole number ≥ 1).
 * @param [temperature_C] Temperature in °C (default 25).
 * @returns K (dimensionless).
 */
function keq(potential_V: any[][], n: any[][], temperature_C?: any[][]): any[][] {
  return F.KEQ(potential_V, n, temperature_C) as any;
}

/**
 * Potential from an equilibrium constant: E = RT ln K/(nF), in V.
 * @customfunction EFROMK
 * @helpurl https://localhost:3000/docs/functions.html#efromk
 * @param K Equilibrium constant (> 0).
 * @param n Electrons transferred (a whole number ≥ 1).
 * @param [temperature_C] Temperature in °C (default 25).
 * @returns E in V.
 */
function eFromK(K: any[][], n: any[][], temperature_C?: any[][]): any[][] {
  return F.EFROMK(K, n, temperature_C) as any;
}

/**
 * Potential from log10 K: E = RT ln10 · log10 K/(nF), in V.
 * @customfunction EFROMLOGK
 * @helpurl https://localhost:3000/docs/functions.html#efromlogk
 * @param logK Decimal logarithm of the equilibrium constant.
 * @param n Electrons transferred (a whole number ≥ 1).
 * @param [temperature_C] Temperature in °C (default 25).
 * @returns E in V.
 */
function eFromLogK(logK: any[][], n: any[][], temperature_C?: any[][]): any[][] {
  return F.EFROMLOGK(logK, n, temperature_C) as any;
}

/**
 * E° of a half-reaction made by adding half-reactions: Σ nᵢEᵢ / Σ nᵢ, in V (free energies add, potentials do not).
 * @customfunction COMBINE
 * @helpurl https://localhost:3000/docs/functions.html#combine
 * @param potentials E° of each step, in V (a range).
 * @param electrons Electrons of each step (a range of the same size; whole numbers).
 * @returns E° of the sum, in V.
 */
function combine(potentials: any[][], electrons: any[][]): any[][] {
  return F.COMBINE(potentials, electrons) as any;
}

/**
 * Potential from ΔH and ΔS taken as constant: E = −(ΔH − TΔS)/(nF), in V. Sign convention: positive when the reaction runs by itself; for water electrolysis (ΔH = +285.83 kJ/mol) it is negative, and the reversible voltage the cell needs is −E.
 * @customfunction EFROMTHERMO
 * @helpurl https://localhost:3000/docs/functions.html#efromthermo
 * @param deltaH_kJ ΔH in kJ/mol.
 * @param deltaS_J_K ΔS in J/(mol·K).
 * @param n Electrons transferred (a whole number ≥ 1).
 * @param [temperature_C] Temperature in °C (default 25).
 * @returns E in V.
 */
function eFromThermo(deltaH_kJ: any[][], deltaS_J_K: any[][], n: any[][], temperature_C?: any[][]): any[][] {
  return F.EFROMTHERMO(deltaH_kJ, deltaS_J_K, n, temperature_C) as any;
}

/**
 * Thermoneutral potential −ΔH/(nF), in V. Sign convention: ΔH of the reaction as written, so an electrolysis (ΔH > 0) gives a negative value and the thermoneutral voltage the cell needs is its magnitude (water at 25 °C: 1.481 V on the HHV basis, see VOLTAGEEFFICIENCY); entering ΔH with the other sign flips the result.
 * @customfunction THERMONEUTRAL
 * @helpurl https://localhost:3000/docs/functions.html#thermoneutral
 * @param deltaH_kJ ΔH of the reaction as written, in kJ/mol.
 * @param n Electrons transferred (a whole number ≥ 1).
 * @returns −ΔH/(nF) in V.
 */
function thermoneutral(deltaH_kJ: any[][], n: any[][]): any[][] {
  return F.THERMONEUTRAL(deltaH_kJ, n) as any;
}

