import data from '../../data/electrode-e0.json';
import type { HalfReaction } from '../chem/halfReaction';
import { speciesE0 } from '../species/speciesE0';

interface MeasuredTable {
  readonly temperature_C: readonly number[];
  readonly e0_V: readonly number[];
}

const TABLES = new Map<string, MeasuredTable>(data.reactions.map((r) => [r.reaction, r]));

/** Linear interpolation in a table whose temperatures are ascending; t within the table. */
function interpolate(table: MeasuredTable, t: number): number {
  const ts = table.temperature_C;
  let i = 0;
  while (i < ts.length - 2 && t > ts[i + 1]) i++;
  const f = (t - ts[i]) / (ts[i + 1] - ts[i]);
  return table.e0_V[i] + f * (table.e0_V[i + 1] - table.e0_V[i]);
}

/**
 * Measured standard potential E°(T) of a reference-electrode reaction (data/electrode-e0.json), in V vs
 * SHE at the same temperature: linear between the tabulated temperatures; beyond the table, the value
 * at its nearest end moved by the species-derived change of E° (speciesE0), so that E°(T) has no jump.
 * Null when the reaction has no measured table.
 *
 * Syntax: measuredE0(reaction, temperatureC)
 * Example: measuredE0(parseHalfReaction("AgCl + e- -> Ag + Cl-"), 60) → 0.19649 V (Bates & Bower 1954)
 * See also: refPotential, electrodeReaction, speciesE0
 *
 * @param reaction the electrode reaction, matched by its text as electrodeReaction writes it
 * @param temperatureC temperature, °C
 */
export function measuredE0(reaction: HalfReaction, temperatureC: number): number | null {
  const table = TABLES.get(reaction.text);
  if (table === undefined) return null;
  const ts = table.temperature_C;
  const lo = ts[0];
  const hi = ts[ts.length - 1];
  if (temperatureC >= lo && temperatureC <= hi) return interpolate(table, temperatureC);
  const end = temperatureC < lo ? lo : hi;
  return interpolate(table, end) + speciesE0(reaction, temperatureC) - speciesE0(reaction, end);
}
