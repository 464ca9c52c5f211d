import type { HalfReaction } from '../chem/halfReaction';
import { FARADAY_C_PER_MOL, kelvin } from '../constants';
import { NotFoundError } from '../errors';
import { halfReactionProperties } from './halfReactionProperties';
import { reactionGibbs } from './reactionGibbs';

/**
 * Standard potential of a half-reaction derived from the species table (data/species.json):
 * E°(T) = −ΔrG°(T)/(nF) of Ox + (n/2) H2 → Red + n H+, i.e. against the hydrogen electrode at the
 * same temperature, with ΔrG°(T) from reactionGibbs (ΔrCp° constant where every species has Cp°,
 * else 0).
 *
 * Syntax: speciesE0(halfReaction, temperatureC)
 * Example: speciesE0(parseHalfReaction("O2 + 4H+ + 4e- -> 2H2O"), 25) → 1.2288 V
 * See also: halfReactionProperties, e0AtTemperature, e0Basis
 *
 * @throws NotFoundError when a species has no data, or (T ≠ 25 °C) when ΔfH° or S° is missing
 */
export function speciesE0(hr: HalfReaction, temperatureC: number): number {
  const p = halfReactionProperties(hr);
  const g = temperatureC === 25 ? p.dG : reactionGibbs(p, kelvin(temperatureC));
  if (Number.isNaN(g)) {
    throw new NotFoundError('the species table gives ΔfG° only for a species of this reaction: its E° is known at 25 °C only');
  }
  return -g / (hr.n * FARADAY_C_PER_MOL);
}
