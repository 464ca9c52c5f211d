/**
 * The potential table: couples (half-reactions with E°) and reference electrodes.
 * One model serves the built-in table (data/*.json) and the workbook's own copy.
 */
import type { HalfReaction } from '../chem/halfReaction';

/** A couple row. Keys are written Ox/Red: "Cu2+/Cu", "MnO4-/Mn2+", "O2/H2O" (acid), "O2/OH-" (alkaline). */
export interface CoupleRow {
  /** The key as written in the table, e.g. "Cr2O7^2-/Cr3+". */
  readonly key: string;
  /** The half-reaction as written, reduction left to right: "MnO4- + 8H+ + 5e- -> Mn2+ + 4H2O". */
  readonly halfReaction: string;
  /** Electrons transferred, derived from the half-reaction. */
  readonly n: number;
  /** Standard potential in V vs SHE at 25 °C. */
  readonly e0: number;
  /** dE°/dT in mV/K, when a published value exists. */
  readonly dEdT_mV_K?: number;
  /** Published source of the row's numbers. */
  readonly source: string;
  /** Free note (which edition, which reaction, caveats). */
  readonly note?: string;
  /** The parsed, balance-checked half-reaction. */
  readonly parsed: HalfReaction;
}

/** A reference electrode row. Look-ups ignore case and white space. */
export interface ElectrodeRow {
  /** The key as written, e.g. "SCE", "Ag/AgCl/KCl(3M)", "CSE". */
  readonly key: string;
  /** Other names accepted in look-ups, e.g. "Hg/Hg2Cl2/KCl(sat)". */
  readonly aliases: readonly string[];
  /** Potential in V vs SHE at 25 °C. */
  readonly potential: number;
  /** dE/dT in mV/K, when a published value exists. */
  readonly dEdT_mV_K?: number;
  readonly source: string;
  readonly note?: string;
}

export interface PotentialTable {
  /** Version of the built-in table this table is (or was based on), e.g. "2026.1". */
  readonly version: string;
  readonly couples: readonly CoupleRow[];
  readonly electrodes: readonly ElectrodeRow[];
  /** Finds a couple by key; white space and charge spellings are ignored ("Cu(2+)/Cu" = "Cu2+/Cu"). */
  findCouple(key: string): CoupleRow | undefined;
  /** Finds a reference electrode by key or alias, ignoring case and white space. */
  findElectrode(key: string): ElectrodeRow | undefined;
}
