import type { HalfReaction } from '../chem/halfReaction';
import { InputError, NotFoundError } from '../errors';
import { speciesE0 } from '../species/speciesE0';
import type { CoupleRow } from '../table/types';

/** Temperatures at which a stored E° may be moved, °C (liquid water at 1 bar). */
export const E0_TEMPERATURE_RANGE_C = { min: 0, max: 100 } as const;

/** What E°(T) of a couple needs: its key, E° at 25 °C, dE°/dT when stored, and its half-reaction. */
export type E0Source = Pick<CoupleRow, 'key' | 'e0' | 'dEdT_mV_K'> & { readonly parsed?: HalfReaction };

/** The species-derived shift E°sp(T) − E°sp(25 °C) of a half-reaction, or null when the species table does not cover it. */
function speciesShift(hr: HalfReaction, temperatureC: number): number | null {
  let e25: number;
  let eT: number;
  try {
    e25 = speciesE0(hr, 25);
    eT = speciesE0(hr, temperatureC);
  } catch (e) {
    if (e instanceof NotFoundError) return null;
    throw e;
  }
  return eT - e25;
}

/**
 * Standard potential of a couple at a temperature, in V vs SHE (the hydrogen electrode at the same
 * temperature). The one place where E°(T) of a couple is decided. Precedence, the first that applies:
 *
 * 1. Species data: when data/species.json gives ΔfH° and S° (and ΔfG°) for every species of the
 *    half-reaction, E°(T) = E°(25 °C) + [E°sp(T) − E°sp(25 °C)], where E°sp is the potential derived
 *    from the species data (speciesE0: ΔrCp° constant where every species has Cp°, else 0). The row's
 *    own E° at 25 °C is kept; only its change with temperature comes from the species.
 * 2. The row's dE°/dT: E°(T) = E°(25 °C) + (dE°/dT)·(T − 25) (a couple the species table does not cover).
 * 3. Otherwise E° is known at 25 °C only (NotFoundError elsewhere).
 *
 * One basis serves a couple over the whole range, so E°(T) has no jump inside 0…100 °C; e0Basis
 * names the basis that answers.
 *
 * Syntax: e0AtTemperature(row, temperatureC)
 * Example: e0AtTemperature(table.findCouple("O2/H2O"), 80) → 1.1826 V
 * See also: e0Basis, speciesE0, halfCell
 *
 * @param row a couple row (key, e0 in V, dEdT_mV_K when stored, the parsed half-reaction)
 * @param temperatureC temperature, °C
 * @throws InputError outside 0…100 °C
 * @throws NotFoundError when T ≠ 25 °C and neither species data nor a dE°/dT covers the couple
 */
export function e0AtTemperature(row: E0Source, temperatureC: number): number {
  if (!(temperatureC >= E0_TEMPERATURE_RANGE_C.min && temperatureC <= E0_TEMPERATURE_RANGE_C.max)) {
    throw new InputError(`temperature ${temperatureC} °C is outside the range of the temperature rules: E° can be moved to ${E0_TEMPERATURE_RANGE_C.min}…${E0_TEMPERATURE_RANGE_C.max} °C only`);
  }
  if (temperatureC === 25) return row.e0;
  if (row.parsed !== undefined) {
    const shift = speciesShift(row.parsed, temperatureC);
    if (shift !== null) return row.e0 + shift;
  }
  if (row.dEdT_mV_K === undefined) {
    throw new NotFoundError(
      `"${row.key}" has neither species data for every species nor a stored dE°/dT: its E° is known at 25 °C only`,
    );
  }
  return row.e0 + (row.dEdT_mV_K / 1000) * (temperatureC - 25);
}
