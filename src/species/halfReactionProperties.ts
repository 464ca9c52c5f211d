import { type HalfReaction, displaySpecies } from '../chem/halfReaction';
import { type Species, parseSpecies } from '../chem/formula';
import { cachedOf } from '../dataset/active';
import { NotFoundError } from '../errors';
import { speciesRecord } from './speciesRecord';
import type { ReactionProperties } from './types';

const T0 = 298.15;
// Read on first use, not when the bundle is evaluated.
let hydrogen: { readonly species: Species; readonly phase: 'g' } | null = null;
const HYDROGEN = (): { readonly species: Species; readonly phase: 'g' } => (hydrogen ??= { species: parseSpecies('H2'), phase: 'g' });

/** Reaction properties by half-reaction object, computed once per species data in use. */
const memos = cachedOf('species', () => new WeakMap<HalfReaction, ReactionProperties | NotFoundError>());

/**
 * Standard reaction properties at 298.15 K of a half-reaction written as a reduction, completed
 * against the hydrogen electrode at the same temperature: Ox + n e- → Red becomes
 * Ox + (n/2) H2(g) → Red + n H+(aq). H+ contributes nothing (the aqueous-ion convention); H2 its S°
 * and Cp°. ΔrG° comes from ΔfG° where every species has it (else ΔrH° − T·ΔrS°); ΔrH° and
 * ΔrS° are present when every species has ΔfH° and S°; ΔrCp° when every species has Cp°.
 *
 * Syntax: halfReactionProperties(halfReaction)
 * Example: halfReactionProperties(parseHalfReaction("Cu2+ + 2e- -> Cu")).dG → −65490 J/mol (E° = 0.3394 V)
 * See also: speciesE0, speciesRecord
 *
 * @throws NotFoundError naming each species that data/species.json lacks
 */
export function halfReactionProperties(hr: HalfReaction): ReactionProperties {
  const memo = memos();
  let r = memo.get(hr);
  if (r === undefined) {
    r = compute(hr);
    memo.set(hr, r);
  }
  if (r instanceof NotFoundError) throw r;
  return r;
}

function compute(hr: HalfReaction): ReactionProperties | NotFoundError {
  const terms = hr.species.map((t) => ({ nu: t.side === 'red' ? t.coefficient : -t.coefficient, term: t }));
  terms.push({ nu: -hr.n / 2, term: { ...HYDROGEN(), side: 'ox', coefficient: hr.n / 2 } });
  const missing: string[] = [];
  let g = 0;
  let gFromG = true;
  let h = 0;
  let s = 0;
  let cp = 0;
  let hasHS = true;
  let hasCp = true;
  for (const { nu, term } of terms) {
    const rec = speciesRecord(term);
    if (rec === undefined) {
      missing.push(displaySpecies(term.species, term.phase));
      continue;
    }
    const H = rec.dfH_kJ_mol;
    const S = rec.S_J_mol_K;
    if (H === undefined || S === undefined) hasHS = false;
    else {
      h += nu * H * 1000;
      s += nu * S;
    }
    if (rec.Cp_J_mol_K === undefined) hasCp = false;
    else cp += nu * rec.Cp_J_mol_K;
    if (rec.dfG_kJ_mol !== undefined) g += nu * rec.dfG_kJ_mol * 1000;
    else gFromG = false;
  }
  if (missing.length > 0) {
    return new NotFoundError(`no standard thermodynamic data for ${missing.join(', ')} in the species table`);
  }
  let dG: number;
  if (gFromG) dG = g;
  else if (hasHS) dG = h - T0 * s;
  else return new NotFoundError('the species table lacks ΔfG° (or ΔfH° and S°) for a species of this reaction');
  const out: { dG: number; dH?: number; dS?: number; dCp?: number } = { dG };
  if (hasHS) {
    out.dH = h;
    out.dS = s;
    if (hasCp) out.dCp = cp;
  }
  return out;
}
