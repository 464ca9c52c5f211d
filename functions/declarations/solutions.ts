/**
 * Worksheet declarations: ionic strength and activity coefficients.
 *
 * Each declaration is JSDoc for custom-functions-metadata-plugin (which writes dist/functions.json
 * and appends the CustomFunctions.associate calls) and a body of one call into the adapter-built
 * function of the same id in functions/families/solutions.ts. Arguments are any[][] so that each
 * accepts a single value or a range; results are 2-D arrays and spill.
 */
/* eslint-disable @typescript-eslint/no-explicit-any */
import * as F from '../families/solutions';

/**
 * Ionic strength ½·Σ mᵢ·zᵢ², in mol/kg.
 * @customfunction IONICSTRENGTH
 * @helpurl https://localhost:3000/docs/functions.html#ionicstrength
 * @param molalities Molality of each ion, in mol/kg (a range).
 * @param charges Charge of each ion (a range of the same size; whole numbers).
 * @returns Ionic strength in mol/kg.
 */
function ionicStrength(molalities: any[][], charges: any[][]): any[][] {
  return F.IONICSTRENGTH(molalities, charges) as any;
}

/**
 * Single-ion activity coefficient by "DHLL" (limiting law, I up to 0.005 mol/kg), "EDH" (extended Debye–Hückel, needs the ion size in Å; I up to 0.1) or "DAVIES" (I up to 0.5); beyond its range a model answers #VALUE!. A and B follow temperature (0 to 100 °C).
 * @customfunction ACTIVITYCOEF
 * @helpurl https://localhost:3000/docs/functions.html#activitycoef
 * @param charge Charge number of the ion (a whole number).
 * @param ionic_strength Ionic strength, in mol/kg (within the model's range).
 * @param [model] "DHLL", "EDH" or "DAVIES" (default "DAVIES").
 * @param [temperature_C] Temperature in °C (default 25).
 * @param [ion_size_A] Ion size parameter, in Å (required by "EDH", ignored otherwise).
 * @returns Activity coefficient (dimensionless).
 */
function activityCoef(charge: any[][], ionic_strength: any[][], model?: any[][], temperature_C?: any[][], ion_size_A?: any[][]): any[][] {
  return F.ACTIVITYCOEF(charge, ionic_strength, model, temperature_C, ion_size_A) as any;
}

/**
 * Mean ionic activity coefficient of a salt by "DHLL" (I up to 0.005 mol/kg), "EDH" (needs the ion size in Å; I up to 0.1) or "DAVIES" (I up to 0.5); beyond its range a model answers #VALUE!. A and B follow temperature (0 to 100 °C).
 * @customfunction MEANACTIVITYCOEF
 * @helpurl https://localhost:3000/docs/functions.html#meanactivitycoef
 * @param z_cation Charge of the cation (a whole number; only its magnitude counts).
 * @param z_anion Charge of the anion (a whole number; only its magnitude counts).
 * @param ionic_strength Ionic strength, in mol/kg (within the model's range).
 * @param [model] "DHLL", "EDH" or "DAVIES" (default "DAVIES").
 * @param [temperature_C] Temperature in °C (default 25).
 * @param [ion_size_A] Mean ion size parameter, in Å (required by "EDH", ignored otherwise).
 * @returns Mean activity coefficient (dimensionless).
 */
function meanActivityCoef(
  z_cation: any[][],
  z_anion: any[][],
  ionic_strength: any[][],
  model?: any[][],
  temperature_C?: any[][],
  ion_size_A?: any[][],
): any[][] {
  return F.MEANACTIVITYCOEF(z_cation, z_anion, ionic_strength, model, temperature_C, ion_size_A) as any;
}
