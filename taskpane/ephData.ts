// The numbers of the E–pH view: for couples of the table in use, E vs SHE over pH 0…14 at one
// temperature and one activity of dissolved species (gases at 1 bar), with water's stability lines.
// Every value comes from the core halfCell, the function behind CELLWRIGHT.HALFCELL, called with
// the same arguments a worksheet formula passes, so a point of the view equals the formula's answer.
import { speciesState } from '../src/chem/halfReaction';
import { halfCell } from '../src/nernst/halfCell';
import type { CoupleRow, PotentialTable } from '../src/table/types';

/** The two couples whose lines bound water's stability: O2 evolution above, H2 evolution below. */
export const WATER_COUPLES = { oxygen: 'O2/H2O', hydrogen: 'H+/H2' } as const;

export interface EphConditions {
  /** Temperature, °C. */
  readonly temperatureC: number;
  /** Activity of every dissolved species other than H+ and OH- (> 0). */
  readonly activity: number;
  /** pH values at which E is computed, ascending. */
  readonly pHs: readonly number[];
}

/** The arguments of =CELLWRIGHT.HALFCELL(couple, oxActivity, redActivity, pH, temperature) for one couple. */
export interface HalfCellArgs {
  readonly couple: string;
  readonly oxActivity: number;
  readonly redActivity: number;
}

export interface EphSeries extends HalfCellArgs {
  /** E vs SHE (V) at each pH of the conditions. */
  readonly e: readonly number[];
  /** True when E does not depend on pH (no H+ or OH- in the half-reaction). */
  readonly flat: boolean;
}

export type EphResult =
  | { readonly ok: true; readonly series: readonly EphSeries[]; readonly water: { readonly oxygen: EphSeries; readonly hydrogen: EphSeries } }
  | { readonly ok: false; readonly reason: string };

/** pH 0…14 in steps of `step` (default 0.25). */
export function pHGrid(step = 0.25): number[] {
  const out: number[] = [];
  for (let i = 0; i * step <= 14 + 1e-9; i++) out.push(Math.round(i * step * 1e6) / 1e6);
  return out;
}

/**
 * The HALFCELL activities for a couple under the view's rule: on each side, a dissolved species
 * takes the chosen activity and a gas 1 bar. A side holding both a gas and a dissolved species
 * cannot be given by HALFCELL's one activity per side: the answer then says so.
 */
export function halfCellArgsFor(row: CoupleRow, activity: number): HalfCellArgs | { reason: string } {
  const sideActivity = (side: 'ox' | 'red'): number | string => {
    const states = row.parsed.species.filter((t) => t.side === side).map((t) => speciesState(t.species, t.phase));
    const gas = states.includes('gas');
    const dissolved = states.includes('aqueous');
    if (gas && dissolved) return `the ${side === 'ox' ? 'oxidized' : 'reduced'} side of ${row.key} holds both a gas and a dissolved species, and HALFCELL takes one activity per side`;
    return dissolved ? activity : 1;
  };
  const ox = sideActivity('ox');
  const red = sideActivity('red');
  if (typeof ox === 'string') return { reason: ox };
  if (typeof red === 'string') return { reason: red };
  return { couple: row.key, oxActivity: ox, redActivity: red };
}

function seriesOf(row: CoupleRow, args: HalfCellArgs, c: EphConditions): EphSeries {
  const flat = !row.parsed.species.some((t) => {
    const s = speciesState(t.species, t.phase);
    return s === 'H+' || s === 'OH-';
  });
  return { ...args, flat, e: c.pHs.map((pH) => halfCell(row, args.oxActivity, args.redActivity, pH, c.temperatureC)) };
}

/**
 * The series of the chosen couples and of water's two lines. The answer is { ok: false, reason }
 * when the table is unreadable, a couple is missing or cannot be drawn, or the conditions are
 * outside what HALFCELL accepts; nothing is drawn then.
 */
export function ephSeries(table: PotentialTable | undefined, couples: readonly string[], c: EphConditions): EphResult {
  if (!table) return { ok: false, reason: 'The potential table in use cannot be read, so there is nothing to draw. Open the Couples tab to see why.' };
  if (!(c.activity > 0) || !Number.isFinite(c.activity)) return { ok: false, reason: 'The activity of dissolved species must be a number above 0 (for example 1e-6).' };
  if (!(c.temperatureC >= 0 && c.temperatureC <= 100)) return { ok: false, reason: 'The temperature must be between 0 and 100 °C.' };
  const rowOf = (key: string) => table.findCouple(key);
  const water = { oxygen: rowOf(WATER_COUPLES.oxygen), hydrogen: rowOf(WATER_COUPLES.hydrogen) };
  if (!water.oxygen || !water.hydrogen) return { ok: false, reason: `The table in use lacks ${!water.oxygen ? WATER_COUPLES.oxygen : WATER_COUPLES.hydrogen}, needed for water's stability lines.` };
  const series: EphSeries[] = [];
  try {
    for (const key of couples) {
      const row = rowOf(key);
      if (!row) return { ok: false, reason: `The couple ${key} is not in the table in use.` };
      const args = halfCellArgsFor(row, c.activity);
      if ('reason' in args) return { ok: false, reason: `${args.reason}.` };
      series.push(seriesOf(row, args, c));
    }
    // water: gases at 1 bar, liquid water; the same calls as =CELLWRIGHT.HALFCELL("O2/H2O",1,1,pH,T)
    const line = (row: CoupleRow) => seriesOf(row, { couple: row.key, oxActivity: 1, redActivity: 1 }, c);
    return { ok: true, series, water: { oxygen: line(water.oxygen), hydrogen: line(water.hydrogen) } };
  } catch (e) {
    return { ok: false, reason: e instanceof Error ? e.message : String(e) };
  }
}
