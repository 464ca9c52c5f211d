/**
 * Worksheet declarations: plating-shop arithmetic.
 *
 * Each declaration is JSDoc for custom-functions-metadata-plugin (which writes dist/functions.json
 * and appends the CustomFunctions.associate calls) and a body of one call into the adapter-built
 * function of the same id in functions/families/plating.ts. Arguments are any[][] so that each
 * accepts a single value or a range; results are 2-D arrays and spill.
 */
/* eslint-disable @typescript-eslint/no-explicit-any */
import * as F from '../families/plating';

/**
 * Mass fraction of a metal in a salt (hydrates and cyanide complexes included), from IUPAC standard atomic weights.
 * @customfunction METALFRACTION
 * @helpurl https://localhost:3000/docs/functions.html#metalfraction
 * @param salt Formula of the salt, e.g. "NiSO4·6H2O", "KAu(CN)2" (element symbols are case-sensitive).
 * @param metal Element symbol of the metal, e.g. "Ni", "Au".
 * @returns Mass fraction (0 to 1).
 */
function metalFraction(salt: any[][], metal: any[][]): any[][] {
  return F.METALFRACTION(salt, metal) as any;
}

/**
 * Mass of a salt, in kg, for a metal concentration in a bath volume (make-up, or an addition to raise the metal by that much): c·V/(1000·w). Takes the salt as pure: divide by its assay. Follow the supplier's safety data sheet when dissolving.
 * @customfunction SALTMASS
 * @helpurl https://localhost:3000/docs/functions.html#saltmass
 * @param metal_g_L Metal concentration to add, in g/L.
 * @param volume_L Bath volume, in L.
 * @param salt Formula of the salt, e.g. "NiSO4·6H2O".
 * @param metal Element symbol of the metal, e.g. "Ni".
 * @returns Salt mass in kg.
 */
function saltMass(metal_g_L: any[][], volume_L: any[][], salt: any[][], metal: any[][]): any[][] {
  return F.SALTMASS(metal_g_L, volume_L, salt, metal) as any;
}

/**
 * Concentration ratio process tank : last rinse of n counterflow rinse stages at steady state, (r^(n+1) − 1)/(r − 1) with r = rinse flow / drag-out flow (perfectly mixed stages, equal drag-out from each). Check discharge limits against the applicable permit.
 * @customfunction RINSERATIO
 * @helpurl https://localhost:3000/docs/functions.html#rinseratio
 * @param flow_ratio Rinse-water flow divided by drag-out flow (same units), > 0.
 * @param stages Number of counterflow stages, a whole number from 1 to 20.
 * @returns C(process tank) / C(last rinse).
 */
function rinseRatio(flow_ratio: any[][], stages: any[][]): any[][] {
  return F.RINSERATIO(flow_ratio, stages) as any;
}

/**
 * Average deposit thickness, in µm, from the ampere-hours passed on an area (the ampere-hour meter): Q·3600·ε·M/(n·F·ρ·A). Ampere-hours, not an Excel time: multiply a time value by 24 to get hours. Recesses run thinner than the average.
 * @customfunction THICKNESSFROMAH
 * @helpurl https://localhost:3000/docs/functions.html#thicknessfromah
 * @param ampere_hours Charge passed, in A·h.
 * @param area_dm2 Plated area, in dm².
 * @param species Deposited metal ("Ni") or its molar mass in g/mol.
 * @param n Electrons per atom deposited.
 * @param density_g_cm3 Density of the deposit, in g/cm³.
 * @param [efficiency] Cathode current efficiency, a fraction in (0, 1] (default 1).
 * @returns Thickness in µm.
 */
function thicknessFromAh(ampere_hours: any[][], area_dm2: any[][], species: any[][], n: any[][], density_g_cm3: any[][], efficiency?: any[][]): any[][] {
  return F.THICKNESSFROMAH(ampere_hours, area_dm2, species, n, density_g_cm3, efficiency) as any;
}
