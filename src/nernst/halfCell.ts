import { type HalfReactionTerm, lnReactionQuotient, speciesState } from '../chem/halfReaction';
import { FARADAY_C_PER_MOL, GAS_CONSTANT_J_PER_MOL_K, LN10, kelvin } from '../constants';
import { DomainError } from '../errors';
import { e0AtTemperature } from '../cells/e0AtTemperature';
import type { CoupleRow } from '../table/types';
import { waterPKw } from './waterPKw';

/**
 * Reduction potential of a half-cell vs SHE at given activities, pH and temperature, from the
 * stored half-reaction: E = E°(T) − (RT/nF)·ln Q, Q = Π a_red^ν / Π a_ox^ν.
 *
 * - oxActivity applies to every dissolved or gaseous species on the oxidized side except H+, OH-
 *   and H2O; redActivity likewise on the reduced side; each is raised to its coefficient.
 * - H+ has activity 10^−pH; OH- has Kw(T)/a_H+ (pKw from waterPKw). pH null → both 1.
 * - Solids, liquids, water and electrons have activity 1. (A gas's activity is its partial
 *   pressure in bar.)
 *
 * Syntax: halfCell(row, oxActivity, redActivity, pH, temperatureC)
 * Example: halfCell(copper, 0.01, 1, null, 25) → 0.3419 − 0.02958·2 = 0.2827 V
 * See also: halfCellBySpecies, e0AtTemperature, nernst
 *
 * @param row the couple
 * @param oxActivity activity of the oxidized-side species (> 0), 1 when null
 * @param redActivity activity of the reduced-side species (> 0), 1 when null
 * @param pH pH, or null for unit H+ and OH- activities
 * @param temperatureC temperature, °C (0…100)
 * @throws DomainError for activities ≤ 0 or T outside 0…100 °C
 * @throws NotFoundError at T ≠ 25 °C for a couple without dE°/dT
 */
export function halfCell(
  row: CoupleRow,
  oxActivity: number | null,
  redActivity: number | null,
  pH: number | null,
  temperatureC: number,
): number {
  const aOx = oxActivity ?? 1;
  const aRed = redActivity ?? 1;
  if (!(aOx > 0) || !(aRed > 0)) throw new DomainError('activities must be > 0');
  const e0 = e0AtTemperature(row, temperatureC);
  let aH = 1;
  let aOH = pH === null || pH === undefined ? 1 : NaN; // NaN: from pH and Kw(T), when an OH- term needs it
  if (pH !== null && pH !== undefined) {
    if (!Number.isFinite(pH)) throw new DomainError('pH must be a finite number');
    aH = Math.pow(10, -pH);
  }
  const activity = (t: HalfReactionTerm): number => {
    switch (speciesState(t.species, t.phase)) {
      case 'H+':
        return aH;
      case 'OH-':
        if (Number.isNaN(aOH)) aOH = Math.exp(((pH as number) - waterPKw(temperatureC)) * LN10);
        return aOH;
      case 'water':
      case 'solid':
      case 'liquid':
        return 1;
      case 'gas':
      case 'aqueous':
        return t.side === 'ox' ? aOx : aRed;
    }
  };
  const lnQ = lnReactionQuotient(row.parsed, activity);
  return e0 - ((GAS_CONSTANT_J_PER_MOL_K * kelvin(temperatureC)) / (row.n * FARADAY_C_PER_MOL)) * lnQ;
}
