import { parseSpecies } from '../chem/formula';
import { lnReactionQuotient } from '../chem/halfReaction';
import { FARADAY_C_PER_MOL, GAS_CONSTANT_J_PER_MOL_K, kelvin } from '../constants';
import { InputError, NotFoundError } from '../errors';
import { e0AtTemperature } from '../cells/e0AtTemperature';
import type { CoupleRow } from '../table/types';

/**
 * Reduction potential of a half-cell vs SHE with an explicit activity for each named species:
 * E = E°(T) − (RT/nF)·ln Q over the stored half-reaction. Species are matched by formula and
 * charge, in any spelling ("Cu(2+)" is "Cu2+"); species not named take activity 1 (so an unnamed
 * H+ means pH 0). Naming water, a solid or a liquid sets its activity too.
 *
 * Syntax: halfCellBySpecies(row, species, activities, temperatureC)
 * Example: halfCellBySpecies(permanganate, ["MnO4-", "Mn2+", "H+"], [0.1, 0.01, 1e-3], 25)
 * See also: halfCell
 *
 * @throws InputError when the lists differ in length or a species is named twice
 * @throws NotFoundError naming a species that is not in the half-reaction (or is not a species at all)
 * @throws InputError for an activity ≤ 0 or T outside 0…100 °C
 */
export function halfCellBySpecies(row: CoupleRow, species: readonly string[], activities: readonly number[], temperatureC: number): number {
  if (species.length !== activities.length) {
    throw new InputError(`${species.length} species but ${activities.length} activities; give one activity per species`);
  }
  const given = new Map<string, number>();
  species.forEach((name, i) => {
    let key: string;
    try {
      key = parseSpecies(name).key;
    } catch {
      // text that is not a species at all cannot be in the half-reaction either
      throw new NotFoundError(`"${name.trim()}" is not a species of the half-reaction of ${row.key} (${row.halfReaction})`);
    }
    if (!row.parsed.species.some((t) => t.species.key === key)) {
      throw new NotFoundError(`"${name.trim()}" is not in the half-reaction of ${row.key} (${row.halfReaction})`);
    }
    if (given.has(key)) throw new InputError(`"${name.trim()}" is named twice`);
    const a = activities[i];
    if (!(a > 0) || !Number.isFinite(a)) throw new InputError(`the activity of ${name.trim()} must be > 0; got ${a}`);
    given.set(key, a);
  });
  const e0 = e0AtTemperature(row, temperatureC);
  const lnQ = lnReactionQuotient(row.parsed, (t) => given.get(t.species.key) ?? 1);
  return e0 - ((GAS_CONSTANT_J_PER_MOL_K * kelvin(temperatureC)) / (row.n * FARADAY_C_PER_MOL)) * lnQ;
}
