/**
 * Worksheet declarations: look-ups in the potential table in use (the workbook's, else the
 * built-in one).
 *
 * Each declaration is JSDoc for custom-functions-metadata-plugin (which writes dist/functions.json
 * and appends the CustomFunctions.associate calls) and a body of one call into the adapter-built
 * function of the same id in functions/families/table.ts. Arguments are any[][] so that each
 * accepts a single value or a range; results are 2-D arrays and spill.
 */
/* eslint-disable @typescript-eslint/no-explicit-any */
import * as F from '../families/table';

/**
 * Standard potential of a couple, in V vs SHE at the same temperature. Away from 25 °C the table's E° moves by the species data (NBS 1982, ΔrH, ΔrS, ΔrCp) where they cover every species, else by the row's dE°/dT (E0BASIS says which). #N/A when neither covers the couple and T ≠ 25 °C; #NUM! outside 0…100 °C.
 * @customfunction STDPOTENTIAL
 * @helpurl https://localhost:3000/docs/functions.html#stdpotential
 * @param couple Key of the potential table, written Ox/Red (e.g. "Cu2+/Cu", "O2/H2O").
 * @param [temperature_C] Temperature in °C, 0 to 100 (default 25).
 * @returns E° in V vs SHE.
 */
function stdPotential(couple: any[][], temperature_C?: any[][]): any[][] {
  return F.STDPOTENTIAL(couple, temperature_C) as any;
}

/**
 * Electrons n taken up by a couple's half-reaction as written (dimensionless).
 * @customfunction ELECTRONS
 * @helpurl https://localhost:3000/docs/functions.html#electrons
 * @param couple Key of the potential table, written Ox/Red (e.g. "MnO4-/Mn2+").
 * @returns n, a whole number.
 */
function electrons(couple: any[][]): any[][] {
  return F.ELECTRONS(couple) as any;
}

/**
 * The half-reaction of a couple as text, written as a reduction (e.g. "MnO4- + 8H+ + 5e- -> Mn2+ + 4H2O").
 * @customfunction HALFREACTION
 * @helpurl https://localhost:3000/docs/functions.html#halfreaction
 * @param couple Key of the potential table, written Ox/Red.
 * @returns The half-reaction (text).
 */
function halfReaction(couple: any[][]): any[][] {
  return F.HALFREACTION(couple) as any;
}

/**
 * The published source of a couple's E° (and dE°/dT), or of a reference electrode's potential, as text.
 * @customfunction SOURCE
 * @helpurl https://localhost:3000/docs/functions.html#source
 * @param couple Key of the potential table: a couple written Ox/Red, or a reference electrode (e.g. "CSE").
 * @param [criterion] With an electrode key: a protection-criterion condition ("standard", "polarisation", "limit"), to get the clause and source of PROTECTIONCRITERION's answer.
 * @returns The source (text).
 */
function source(couple: any[][], criterion?: any[][]): any[][] {
  return F.SOURCE(couple, criterion) as any;
}
