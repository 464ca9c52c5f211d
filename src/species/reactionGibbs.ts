import type { ReactionProperties } from './types';

/** Reference temperature of the species table, K. */
const T0 = 298.15;

/**
 * ΔrG°(T) from standard reaction properties at 298.15 K, with ΔrCp° constant:
 * ΔrG(T) = ΔrG(T0) − (T − T0)·ΔrS(T0) + ΔrCp·[(T − T0) − T·ln(T/T0)]
 * (the same as ΔrH − T·ΔrS + ΔrCp·[(T − T0) − T·ln(T/T0)] with ΔrG(T0) = ΔrH − T0·ΔrS).
 * ΔrCp° is taken as 0 when the properties carry none. At T0 it returns ΔrG(T0) exactly.
 *
 * Syntax: reactionGibbs(properties, temperatureK)
 * Example: reactionGibbs({ dG: 237129, dH: 285830, dS: 163.307, dCp: -31.79 }, 353.15) → 228322 J/mol
 * See also: halfReactionProperties, speciesE0
 *
 * @param p reaction properties (J/mol, J/(mol·K)); dS is required away from T0
 * @param temperatureK temperature, K
 * @returns ΔrG° in J/mol; NaN when dS is missing and T ≠ T0
 */
export function reactionGibbs(p: ReactionProperties, temperatureK: number): number {
  if (temperatureK === T0) return p.dG;
  if (p.dS === undefined) return NaN;
  const cp = p.dCp ?? 0;
  return p.dG - (temperatureK - T0) * p.dS + cp * (temperatureK - T0 - temperatureK * Math.log(temperatureK / T0));
}
