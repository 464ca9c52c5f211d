import data from '../../data/electrode-e0.json';
import { type HalfReaction, fixedHalfReaction } from '../chem/halfReaction';
import { FARADAY_C_PER_MOL, kelvin } from '../constants';
import { NotFoundError } from '../errors';
import { halfReactionProperties } from '../species/halfReactionProperties';
import { speciesE0 } from '../species/speciesE0';

/** A reaction of data/electrode-e0.json: a measured table, or a reaction derived "from" another by a cell of solids. */
interface Entry {
  readonly reaction: string;
  readonly temperature_C?: readonly number[];
  readonly e0_V?: readonly number[];
  readonly from?: string;
}

interface MeasuredTable {
  readonly temperature_C: readonly number[];
  readonly e0_V: readonly number[];
}

const ENTRIES = new Map<string, Entry>((data.reactions as readonly Entry[]).map((r) => [r.reaction, r]));
/** Linear interpolation in a table whose temperatures are ascending; t within the table. */
function interpolate(table: MeasuredTable, t: number): number {
  const ts = table.temperature_C;
  let i = 0;
  while (i < ts.length - 2 && t > ts[i + 1]) i++;
  const f = (t - ts[i]) / (ts[i + 1] - ts[i]);
  return table.e0_V[i] + f * (table.e0_V[i + 1] - table.e0_V[i]);
}

/**
 * Emf of the cell `reaction − (n/m)·base` (both as reductions against hydrogen, so the hydrogen and
 * electron terms cancel), from ΔrG° and ΔrS° of the species data with ΔrCp° = 0.
 */
function cellEmf(reaction: HalfReaction, base: HalfReaction, temperatureC: number): number {
  const r = halfReactionProperties(reaction);
  const b = halfReactionProperties(base);
  if (r.dS === undefined || b.dS === undefined) {
    throw new NotFoundError(`the species table lacks ΔfH° or S° for the cell between "${reaction.text}" and "${base.text}"`);
  }
  const k = reaction.n / base.n;
  const dG = r.dG - k * b.dG;
  const dS = r.dS - k * b.dS;
  return -(dG - (kelvin(temperatureC) - 298.15) * dS) / (reaction.n * FARADAY_C_PER_MOL);
}

/**
 * Measured standard potential E°(T) of a reference-electrode reaction (data/electrode-e0.json), in V vs
 * SHE at the same temperature: linear between the tabulated temperatures; beyond the table, the value
 * at its nearest end moved by the species-derived change of E° (speciesE0), so that E°(T) has no jump.
 * A reaction listed "from" another (calomel from AgCl/Ag) takes that reaction's E°(T) plus the emf of
 * the cell of solids between them (ΔrG°, ΔrS° of the species data, ΔrCp° = 0).
 * Null when the reaction is not listed.
 *
 * Syntax: measuredE0(reaction, temperatureC)
 * Example: measuredE0(parseHalfReaction("AgCl + e- -> Ag + Cl-"), 60) → 0.19649 V (Bates & Bower 1954);
 *   measuredE0(parseHalfReaction("Hg2Cl2 + 2e- -> 2Hg(l) + 2Cl-"), 25) → 0.26811 V
 * See also: refPotential, electrodeReaction, speciesE0
 *
 * @param reaction the electrode reaction, matched by its text as secondKindReaction writes it
 * @param temperatureC temperature, °C
 */
export function measuredE0(reaction: HalfReaction, temperatureC: number): number | null {
  const entry = ENTRIES.get(reaction.text);
  if (entry === undefined) return null;
  if (entry.from !== undefined) {
    const base = fixedHalfReaction(entry.from);
    const e0 = measuredE0(base, temperatureC);
    return e0 === null ? null : e0 + cellEmf(reaction, base, temperatureC);
  }
  if (entry.temperature_C === undefined || entry.e0_V === undefined) return null;
  const table: MeasuredTable = { temperature_C: entry.temperature_C, e0_V: entry.e0_V };
  const ts = table.temperature_C;
  const lo = ts[0];
  const hi = ts[ts.length - 1];
  if (temperatureC >= lo && temperatureC <= hi) return interpolate(table, temperatureC);
  const end = temperatureC < lo ? lo : hi;
  return interpolate(table, end) + speciesE0(reaction, temperatureC) - speciesE0(reaction, end);
}
