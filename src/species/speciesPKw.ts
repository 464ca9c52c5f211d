import { LN10, GAS_CONSTANT_J_PER_MOL_K, kelvin } from '../constants';
import { type HalfReaction, fixedHalfReaction } from '../chem/halfReaction';
import { halfReactionProperties } from './halfReactionProperties';
import { reactionGibbs } from './reactionGibbs';

/**
 * H2O(l) → H+ + OH- written as a "half-reaction" against hydrogen would need electrons; instead the
 * ion product comes from two half-reactions of the same species data: 2H2O + 2e- → H2 + 2OH- minus
 * 2H+ + 2e- → H2, whose difference is 2 H2O → 2 H+ + 2 OH-.
 */
// Read on first use, not when the bundle is evaluated (it is not needed before a pKw is asked for).
const WATER_TO_OH = (): HalfReaction => fixedHalfReaction('2H2O + 2e- -> H2 + 2OH-');

/**
 * pKw = −log10 Kw of water at a temperature, from the species table: Kw = exp(−ΔrG°(T)/RT) for
 * H2O(l) → H+ + OH-, with the same ΔfH°, S°, Cp° as every species-derived E°(T). This is what makes
 * the acid and alkaline forms of a couple agree at any temperature.
 *
 * Syntax: speciesPKw(temperatureC)
 * Example: speciesPKw(25) → 13.995; speciesPKw(80) → 12.63
 * See also: waterPKw (the Bandura–Lvov formulation, for comparison), speciesE0
 *
 * @param temperatureC temperature, °C
 */
export function speciesPKw(temperatureC: number): number {
  const T = kelvin(temperatureC);
  // ΔrG of 2H2O + H2 → H2 + 2OH- + 2H+ (the hydrogen terms cancel): twice that of H2O → H+ + OH-.
  const g = temperatureC === 25 ? halfReactionProperties(WATER_TO_OH()).dG : reactionGibbs(halfReactionProperties(WATER_TO_OH()), T);
  return g / 2 / (GAS_CONSTANT_J_PER_MOL_K * T * LN10);
}
