/**
 * Worksheet declarations: reference electrodes and potential scales.
 *
 * Each declaration is JSDoc for custom-functions-metadata-plugin (which writes dist/functions.json
 * and appends the CustomFunctions.associate calls) and a body of one call into the adapter-built
 * function of the same id in functions/families/scales.ts. Arguments are any[][] so that each
 * accepts a single value or a range; results are 2-D arrays and spill.
 */
/* eslint-disable @typescript-eslint/no-explicit-any */
import * as F from '../families/scales';

/**
 * Potential of a reference electrode vs SHE, in V, with the electrode at the temperature: the table's dE/dT where published; else, for Ag/AgCl, calomel, Hg/HgO and Hg/Hg2SO4 with a filling of fixed concentration, E°(T) of the electrode reaction from the species data with the filling's activity held constant. For cathodic protection, compare a reading with the criterion the standard states for the electrode used (PROTECTIONCRITERION), not with a criterion converted from another electrode.
 * @customfunction REFPOTENTIAL
 * @helpurl https://localhost:3000/docs/functions.html#refpotential
 * @param electrode Reference electrode key or alias, e.g. "SCE", "Ag/AgCl/KCl(sat)", "CSE" (case and spaces ignored).
 * @param [temperature_C] Temperature in °C of the electrode (default 25; 0 to 100; saturated and field electrodes without dE/dT answer #N/A away from 25 °C).
 * @returns Potential in V vs SHE.
 */
function refPotential(electrode: any[][], temperature_C?: any[][]): any[][] {
  return F.REFPOTENTIAL(electrode, temperature_C) as any;
}

/**
 * The same potential on another scale, in V: "SHE" (or "NHE"), "RHE" (needs pH; E_SHE = E_RHE − (RT ln10/F)·pH) or any reference electrode of the table. The reference electrode is assumed to be at the stated temperature (its potential at that temperature is used). Not for cathodic-protection criteria: the standards state −0.80 V Ag/AgCl/seawater, while −0.85 V CSE converts to about −0.78 V; compare a reading with the criterion stated for its own electrode (PROTECTIONCRITERION).
 * @customfunction CONVERTPOTENTIAL
 * @helpurl https://localhost:3000/docs/functions.html#convertpotential
 * @param potential_V Potential on the from_scale, in V.
 * @param from_scale Scale the potential is given on: "SHE" (or "NHE"), "RHE" or an electrode key such as "CSE" or "SCE".
 * @param to_scale Scale wanted: "SHE", "RHE" or an electrode key.
 * @param [pH] pH of the solution, needed when either scale is "RHE" (no default).
 * @param [temperature_C] Temperature in °C of the solution and of the reference electrode (default 25).
 * @returns Potential in V on the to_scale.
 */
function convertPotential(potential_V: any[][], from_scale: any[][], to_scale: any[][], pH?: any[][], temperature_C?: any[][]): any[][] {
  return F.CONVERTPOTENTIAL(potential_V, from_scale, to_scale, pH, temperature_C) as any;
}
