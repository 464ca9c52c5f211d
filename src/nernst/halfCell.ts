import { speciesState } from '../chem/halfReaction';
import { FARADAY_C_PER_MOL, GAS_CONSTANT_J_PER_MOL_K, LN10, kelvin } from '../constants';
import { InputError } from '../errors';
import { e0AtTemperature } from '../cells/e0AtTemperature';
import type { CoupleRow } from '../table/types';
import { speciesPKw } from '../species/speciesPKw';

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
 * @throws InputError for activities ≤ 0 or T outside 0…100 °C
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
  if (!(aOx > 0) || !(aRed > 0)) throw new InputError(`ox_activity and red_activity must be > 0; got ${aOx} and ${aRed}`);
  const plan = planOf(row);
  const e0 = e0AtTemperature(row, temperatureC);
  let lnQ = 0;
  if (pH !== null && pH !== undefined) {
    if (!Number.isFinite(pH)) throw new InputError('pH must be a finite number');
    // ln a_H+ = −pH·ln 10 and ln a_OH- = (pH − pKw)·ln 10 while the activity is a normal double
    // (within ±300 decades); beyond that the activity itself is formed and its logarithm taken,
    // so that an activity that underflows to 0 or overflows is refused, not extrapolated.
    if (plan.usesH) {
      if (pH >= -300 && pH <= 300) lnQ -= plan.nuH * pH * LN10;
      else lnQ += plan.nuH * lnOfActivity(Math.pow(10, -pH), 'H+');
    }
    if (plan.usesOH) {
      const d = pH - pKwAt(temperatureC);
      if (d >= -300 && d <= 300) lnQ += plan.nuOH * d * LN10;
      else lnQ += plan.nuOH * lnOfActivity(Math.exp(d * LN10), 'OH-');
    }
  }
  if (plan.usesOx) lnQ -= plan.nuOx * lnOfActivity(aOx, 'the oxidized-side species');
  if (plan.usesRed) lnQ += plan.nuRed * lnOfActivity(aRed, 'the reduced-side species');
  return e0 - ((GAS_CONSTANT_J_PER_MOL_K * kelvin(temperatureC)) / (plan.n * FARADAY_C_PER_MOL)) * lnQ;
}

/** ln a of an activity that must be a finite number > 0. */
function lnOfActivity(a: number, what: string): number {
  if (!(a > 0) || a === Infinity) throw new InputError(`the activity of ${what} must be a finite number > 0; got ${a}`);
  return Math.log(a);
}

/**
 * A couple row compiled for halfCell from the terms of its half-reaction: n, and for ln Q the net
 * exponent of each activity halfCell takes (ν summed over the terms that use it, + on the reduced
 * side, − on the oxidized side written as the ox exponent), with whether any term uses it at all.
 * ln Q = Σ ν·ln a over the terms is then a few products per cell instead of a walk over the terms.
 */
interface HalfCellPlan {
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
  return { n: row.n, nuOx, nuRed, nuH, nuOH, usesOx, usesRed, usesH, usesOH };
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
