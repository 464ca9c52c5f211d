import { NotFoundError } from '../errors';
import { halfReactionProperties } from '../species/halfReactionProperties';
import type { ReactionProperties } from '../species/types';
import type { ElectrolysisReaction } from './electrolysisCouples';

/**
 * Standard properties at 298.15 K of an overall electrolysis reaction (per formula unit, n electrons),
 * in the electrolysis direction (cathode reduction forward, anode reduction backward): n·(X_cathode/n_cathode − X_anode/n_anode) for X = ΔrG°, ΔrH°, ΔrS°,
 * ΔrCp°, each half taken against the hydrogen electrode (the hydrogen terms cancel). ΔrCp° is present
 * only when every species of both halves has Cp°; otherwise the overall reaction has none (taken as 0),
 * never a partial sum.
 *
 * Syntax: overallProperties(reaction)
 * Example: overallProperties(electrolysisReaction("H2O", 25)).dH → 285830 J/mol
 * See also: decompositionVoltage, thermoneutralVoltage
 *
 * @throws NotFoundError when the species table lacks ΔfH° or S° for a species
 */
export function overallProperties(r: ElectrolysisReaction): ReactionProperties {
  const c = halfReactionProperties(r.cathode);
  const a = halfReactionProperties(r.anode);
  if (c.dH === undefined || a.dH === undefined || c.dS === undefined || a.dS === undefined) {
    throw new NotFoundError('the species table lacks ΔfH° or S° for a species of this reaction');
  }
  const k = (x: number, y: number) => r.n * (x / r.cathode.n - y / r.anode.n);
  const out: { dG: number; dH: number; dS: number; dCp?: number } = { dG: k(c.dG, a.dG), dH: k(c.dH, a.dH), dS: k(c.dS, a.dS) };
  if (c.dCp !== undefined && a.dCp !== undefined) out.dCp = k(c.dCp, a.dCp);
  return out;
}
