import { parseSpecies } from '../chem/formula';
import { type HalfReactionTerm, speciesState } from '../chem/halfReaction';
import type { SpeciesPhaseCode, SpeciesRecord } from './types';
import { cachedOf } from '../dataset/active';

function keyOf(speciesKey: string, state: SpeciesPhaseCode): string {
  return `${speciesKey}|${state}`;
}

/** The rows of the species part in use (built-in or pinned), indexed once per part. */
const index = cachedOf('species', (part): Map<string, SpeciesRecord> => {
  const rows = (part as unknown as { species: SpeciesRecord[] }).species;
  const map = new Map<string, SpeciesRecord>();
  for (const r of rows) map.set(keyOf(parseSpecies(r.formula).key, r.state), r);
  return map;
});

/** The phase a half-reaction term stands in, as species.json writes it. */
function termPhase(term: Pick<HalfReactionTerm, 'species' | 'phase'>): SpeciesPhaseCode {
  switch (speciesState(term.species, term.phase)) {
    case 'H+':
    case 'OH-':
    case 'aqueous':
      return 'aq';
    case 'water':
    case 'liquid':
      return 'l';
    case 'gas':
      return 'g';
    default:
      return 's';
  }
}

/**
 * The species-table row of a half-reaction term (its formula and phase; an unmarked species takes
 * the phase the reaction quotient gives it: ions aqueous, H2/O2/Cl2… gas, H2O liquid, others solid).
 *
 * Syntax: speciesRecord(term)
 * Example: speciesRecord({ species: parseSpecies("Cu2+") }).dfG_kJ_mol → 65.49
 * See also: halfReactionProperties, speciesE0
 *
 * @returns the row, or undefined when data/species.json has none
 */
export function speciesRecord(term: Pick<HalfReactionTerm, 'species' | 'phase'>): SpeciesRecord | undefined {
  return index().get(keyOf(term.species.key, termPhase(term)));
}
