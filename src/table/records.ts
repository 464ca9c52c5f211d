/**
 * The plain, JSON-able records the potential table is built from: the rows of data/couples.json
 * and data/electrodes.json, and the rows a workbook keeps in its own copy of the table.
 * buildTable (table.ts) checks them and turns them into rows with look-ups.
 */

/** One couple: a half-reaction written as a reduction, with its E° and where it comes from. */
export interface CoupleRecord {
  /** Key written Ox/Red: "Cu2+/Cu", "MnO4-/Mn2+", "O2/H2O" (acid), "O2/OH-" (alkaline). */
  key: string;
  /** The half-reaction, electrons on the left: "MnO4- + 8H+ + 5e- -> Mn2+ + 4H2O". */
  halfReaction: string;
  /** Standard potential in V vs SHE at 25 °C. */
  e0: number;
  /** dE°/dT in mV/K at 25 °C, when a published value exists. */
  dEdT_mV_K?: number;
  /** Published source of the numbers. */
  source: string;
  note?: string;
}

/** One reference electrode. */
export interface ElectrodeRecord {
  /** Key, e.g. "SCE", "Ag/AgCl/KCl(3M)". */
  key: string;
  /** Other names accepted in look-ups. */
  aliases: string[];
  /** Potential in V vs SHE at 25 °C. */
  potential: number;
  /** dE/dT in mV/K, when a published value exists. */
  dEdT_mV_K?: number;
  source: string;
  note?: string;
}

/** The shape of data/couples.json. */
export interface CouplesFile {
  version: string;
  description?: string;
  source?: string;
  couples: CoupleRecord[];
}

/** The shape of data/electrodes.json. */
export interface ElectrodesFile {
  version: string;
  description?: string;
  source?: string;
  electrodes: ElectrodeRecord[];
}
