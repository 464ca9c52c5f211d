/**
 * Worksheet declarations: half-cell potentials from the stored half-reaction.
 *
 * Each declaration is JSDoc for custom-functions-metadata-plugin (which writes dist/functions.json
 * and appends the CustomFunctions.associate calls) and a body of one call into the adapter-built
 * function of the same id in functions/families/halfcell.ts. Arguments are any[][] so that each
 * accepts a single value or a range; results are 2-D arrays and spill.
 */
/* eslint-disable @typescript-eslint/no-explicit-any */
import * as F from '../families/halfcell';

/**
 * Reduction potential of a half-cell in V vs SHE: E°(T) − (RT/nF)·ln Q over the stored half-reaction. ox_activity applies to each dissolved or gaseous species on the oxidized side (except H+, OH-, H2O), red_activity on the reduced side, each raised to its coefficient; H+ and OH- follow from pH.
 * @customfunction HALFCELL
 * @helpurl https://localhost:3000/docs/functions.html#halfcell
 * @param couple Key of the potential table, written Ox/Red (e.g. "MnO4-/Mn2+").
 * @param [ox_activity] Activity of the oxidized-side species (dimensionless, > 0; a gas: partial pressure in bar) (default 1).
 * @param [red_activity] Activity of the reduced-side species (dimensionless, > 0; a gas: partial pressure in bar) (default 1).
 * @param [pH] pH; sets a(H+) = 10^−pH and a(OH-) = Kw(T)/a(H+) (default: H+ and OH- activities 1).
 * @param [temperature_C] Temperature in °C, 0 to 100 (default 25).
 * @returns E in V vs SHE.
 */
function halfCell(couple: any[][], ox_activity?: any[][], red_activity?: any[][], pH?: any[][], temperature_C?: any[][]): any[][] {
  return F.HALFCELL(couple, ox_activity, red_activity, pH, temperature_C) as any;
}

/**
 * Reduction potential of a half-cell in V vs SHE with an activity for each named species; species not named take activity 1.
 * @customfunction HALFCELLBYSPECIES
 * @helpurl https://localhost:3000/docs/functions.html#halfcellbyspecies
 * @param couple Key of the potential table, written Ox/Red (e.g. "MnO4-/Mn2+").
 * @param species Species as written in the half-reaction (a range, e.g. "MnO4-", "Mn2+", "H+").
 * @param activities Activity of each species (a range of the same size; dimensionless, > 0; a gas: partial pressure in bar).
 * @param [temperature_C] Temperature in °C, 0 to 100 (default 25).
 * @returns E in V vs SHE.
 */
function halfCellBySpecies(couple: any[][], species: any[][], activities: any[][], temperature_C?: any[][]): any[][] {
  return F.HALFCELLBYSPECIES(couple, species, activities, temperature_C) as any;
}
