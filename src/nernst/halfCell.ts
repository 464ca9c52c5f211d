import { type HalfReactionTerm, lnReactionQuotient, speciesState } from '../chem/halfReaction';
import { FARADAY_C_PER_MOL, GAS_CONSTANT_J_PER_MOL_K, LN10, kelvin } from '../constants';
import { DomainError } from '../errors';
import { e0AtTemperature } from '../cells/e0AtTemperature';
import type { CoupleRow } from '../table/types';
import { speciesPKw } from '../species/speciesPKw';
import type { HalfReaction } from '../chem/halfReaction';

/**
 * Reduction potential of a half-cell vs SHE at given activities, pH and temperature, from the
 * stored half-reaction: E = E°(T) − (RT/nF)·ln Q, Q = Π a_red^ν / Π a_ox^ν.
 *
 * - oxActivity applies to every dissolved or gaseous species on the oxidized side except H+, OH-
 *   and H2O; redActivity likewise on the reduced side; each is raised to its coefficient.
 * - H+ has activity 10^−pH; OH- has Kw(T)/a_H+ (pKw from speciesPKw, the same species data as E°(T), so acid and alkaline forms agree). pH null → both 1.
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
  const plan = planOf(row);
  const e0 = e0AtTemperature(plan, temperatureC);
  let lnQ = 0;
  if (pH !== null && pH !== undefined) {
    if (!Number.isFinite(pH)) throw new DomainError('pH must be a finite number');
    // ln a_H+ = −pH·ln 10; ln a_OH- = (pH − pKw)·ln 10. Within ±300 decades 10^x is a normal,
    // finite number, so these equal the logarithms of the activities the general walk forms.
    if (plan.usesH) {
      if (!(pH >= -300 && pH <= 300)) return halfCellByTerms(row, aOx, aRed, pH, temperatureC, e0);
      lnQ -= plan.nuH * pH * LN10;
    }
    if (plan.usesOH) {
      const d = pH - pKwAt(temperatureC);
      if (!(d >= -300 && d <= 300)) return halfCellByTerms(row, aOx, aRed, pH, temperatureC, e0);
      lnQ += plan.nuOH * d * LN10;
    }
  }
  if (plan.usesOx) {
    if (aOx === Infinity) return halfCellByTerms(row, aOx, aRed, pH, temperatureC, e0);
    lnQ -= plan.nuOx * Math.log(aOx);
  }
  if (plan.usesRed) {
    if (aRed === Infinity) return halfCellByTerms(row, aOx, aRed, pH, temperatureC, e0);
    lnQ += plan.nuRed * Math.log(aRed);
  }
  return e0 - ((GAS_CONSTANT_J_PER_MOL_K * kelvin(temperatureC)) / (plan.n * FARADAY_C_PER_MOL)) * lnQ;
}

/**
 * A couple row compiled for halfCell: what E°(T) needs, n, and for ln Q the net exponent of each
 * activity halfCell takes (ν summed over the terms that use it, + on the reduced side, − on the
 * oxidized side written as the ox exponent), with whether any term uses it at all.
 */
interface HalfCellPlan {
  readonly key: string;
  readonly e0: number;
  readonly dEdT_mV_K: number | undefined;
  readonly parsed: HalfReaction;
  readonly n: number;
  /** Σ ν of the dissolved and gaseous species on the oxidized side (each enters ln Q as −ν·ln a_ox). */
  readonly nuOx: number;
  /** Σ ν of the dissolved and gaseous species on the reduced side (each enters ln Q as +ν·ln a_red). */
  readonly nuRed: number;
  /** Net exponent of a_H+ in Q (reduced side minus oxidized side). */
  readonly nuH: number;
  /** Net exponent of a_OH- in Q (reduced side minus oxidized side). */
  readonly nuOH: number;
  readonly usesOx: boolean;
  readonly usesRed: boolean;
  readonly usesH: boolean;
  /** Whether an OH- term is written: only then is Kw(T) needed. */
  readonly usesOH: boolean;
}

/** Plans by row object: each row is compiled once, the first time halfCell meets it. */
const plans = new WeakMap<CoupleRow, HalfCellPlan>();

function planOf(row: CoupleRow): HalfCellPlan {
  let plan = plans.get(row);
  if (plan === undefined) {
    plan = compilePlan(row);
    plans.set(row, plan);
  }
  return plan;
}

function compilePlan(row: CoupleRow): HalfCellPlan {
  let nuOx = 0;
  let nuRed = 0;
  let nuH = 0;
  let nuOH = 0;
  let usesOx = false;
  let usesRed = false;
  let usesH = false;
  let usesOH = false;
  for (const t of row.parsed.species) {
    const signed = t.side === 'red' ? t.coefficient : -t.coefficient;
    switch (speciesState(t.species, t.phase)) {
      case 'H+':
        usesH = true;
        nuH += signed;
        break;
      case 'OH-':
        usesOH = true;
        nuOH += signed;
        break;
      case 'water':
      case 'solid':
      case 'liquid':
        break;
      case 'gas':
      case 'aqueous':
        if (t.side === 'ox') {
          usesOx = true;
          nuOx += t.coefficient;
        } else {
          usesRed = true;
          nuRed += t.coefficient;
        }
        break;
    }
  }
  return { key: row.key, e0: row.e0, dEdT_mV_K: row.dEdT_mV_K, parsed: row.parsed, n: row.n, nuOx, nuRed, nuH, nuOH, usesOx, usesRed, usesH, usesOH };
}

/** pKw at the temperature last asked for (halfCell over a range asks at one temperature). */
let lastKwTemperatureC = NaN;
let lastPKw = NaN;

function pKwAt(temperatureC: number): number {
  if (temperatureC !== lastKwTemperatureC) {
    lastPKw = speciesPKw(temperatureC);
    lastKwTemperatureC = temperatureC;
  }
  return lastPKw;
}

/**
 * halfCell the general way, term by term through lnReactionQuotient: for the inputs the plan's
 * arithmetic does not cover exactly (an activity of H+ or OH- beyond 10^±300, an infinite
 * activity), so that these give the same answer or the same error as always.
 */
function halfCellByTerms(row: CoupleRow, aOx: number, aRed: number, pH: number | null, temperatureC: number, e0: number): number {
  let aH = 1;
  let aOH = pH === null || pH === undefined ? 1 : NaN; // NaN: from pH and Kw(T), when an OH- term needs it
  if (pH !== null && pH !== undefined) aH = Math.pow(10, -pH);
  const activity = (t: HalfReactionTerm): number => {
    switch (speciesState(t.species, t.phase)) {
      case 'H+':
        return aH;
      case 'OH-':
        if (Number.isNaN(aOH)) aOH = Math.exp(((pH as number) - pKwAt(temperatureC)) * LN10);
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
