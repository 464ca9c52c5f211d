/**
 * Standard thermodynamic properties of one species (data/species.json), 298.15 K and 1 bar.
 */
export type SpeciesPhaseCode = 's' | 'l' | 'g' | 'aq';

export interface SpeciesRecord {
  /** The formula as written in half-reactions ("Cu2+", "Cr2O7^2-", "Hg"). */
  readonly formula: string;
  readonly state: SpeciesPhaseCode;
  /** ΔfH° in kJ/mol, when published. */
  readonly dfH_kJ_mol?: number;
  /** ΔfG° in kJ/mol, when published. */
  readonly dfG_kJ_mol?: number;
  /** S° in J/(mol·K), when published. */
  readonly S_J_mol_K?: number;
  /** Cp° in J/(mol·K), when published. */
  readonly Cp_J_mol_K?: number;
  readonly source: string;
  readonly note?: string;
}

/** Standard reaction properties at 298.15 K (J/mol, J/(mol·K)); a field is absent when some species lacks it. */
export interface ReactionProperties {
  /** ΔrG° at 298.15 K, J/mol (from ΔfG°, or ΔfH° − T·S° where ΔfG° is not published). */
  readonly dG: number;
  readonly dH?: number;
  readonly dS?: number;
  /** ΔrCp°, J/(mol·K): present only when Cp° is published for every species. */
  readonly dCp?: number;
}
