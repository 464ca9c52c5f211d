import { FARADAY_C_PER_MOL, kelvin } from '../constants';
import { reactionGibbs } from '../species/reactionGibbs';
import { electrolysisReaction } from './electrolysisCouples';
import { overallProperties } from './overallProperties';

/**
 * Standard reversible decomposition voltage of an electrolysis at a temperature, positive for a
 * reaction that needs energy: U° = ΔrG°(T)/(nF) = E°anode(T) − E°cathode(T), from the species data
 * (data/species.json): ΔrG°(T) = ΔrH° − T·ΔrS° + ΔrCp°·[(T − T0) − T·ln(T/T0)], ΔrCp° constant where
 * every species has Cp°, else 0. Unit activities; waterSplitVoltage and electrowinVoltage add the
 * activity and pressure terms.
 *
 * Syntax: standardDecompositionVoltage(process, temperatureC)
 * Example: standardDecompositionVoltage("H2O", 25) → 1.2288 V; standardDecompositionVoltage("Zn", 25) → 1.9909 V
 * See also: thermoneutralVoltage, waterSplitVoltage, electrowinVoltage
 */
export function standardDecompositionVoltage(process: string, temperatureC: number): number {
  const r = electrolysisReaction(process, temperatureC);
  const p = overallProperties(r);
  const g = temperatureC === 25 ? p.dG : reactionGibbs(p, kelvin(temperatureC));
  return g / (r.n * FARADAY_C_PER_MOL);
}
