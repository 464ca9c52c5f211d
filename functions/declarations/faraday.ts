/**
 * Worksheet declarations: Faraday's law and production.
 *
 * Each declaration is JSDoc for custom-functions-metadata-plugin (which writes dist/functions.json
 * and appends the CustomFunctions.associate calls) and a body of one call into the adapter-built
 * function of the same id in functions/families/faraday.ts. Arguments are any[][] so that each
 * accepts a single value or a range; results are 2-D arrays and spill.
 */
/* eslint-disable @typescript-eslint/no-explicit-any */
import * as F from '../families/faraday';

/**
 * Molar mass of a formula in g/mol from IUPAC standard atomic weights, summed exactly in decimal; parentheses, square brackets and hydrate dots (·, * or .) understood. A space is read only as a hydrate dot before a number ("CuSO4 5H2O" = "CuSO4·5H2O"); any other space inside a formula is #VALUE!. Case matters: a capital starts a new element, so "CO" is carbon monoxide (28.01) and "Co" cobalt (58.93); the deposition functions refuse "NI", "CU", "CO"… and ask which element was meant. Unicode subscripts and superscripts (NiSO₄, Cu²⁺) read as ASCII.
 * @customfunction MOLARMASS
 * @helpurl https://localhost:3000/docs/functions.html#molarmass
 * @param formula Chemical formula, e.g. "NiSO4·6H2O" or "K3[Fe(CN)6]" (element symbols are case-sensitive).
 * @returns Molar mass in g/mol.
 */
function molarMass(formula: any[][]): any[][] {
  return F.MOLARMASS(formula) as any;
}

/**
 * Electrochemical equivalent M·3600/(nF), in g/(A·h).
 * @customfunction ECEQUIV
 * @helpurl https://localhost:3000/docs/functions.html#ecequiv
 * @param species Formula such as "Ni", or a molar mass in g/mol.
 * @param n Electrons per formula unit (a whole number ≥ 1).
 * @returns g/(A·h).
 */
function ecEquiv(species: any[][], n: any[][]): any[][] {
  return F.ECEQUIV(species, n) as any;
}

/**
 * Mass deposited or dissolved by a current (Faraday's law), in g.
 * @customfunction DEPOSITMASS
 * @helpurl https://localhost:3000/docs/functions.html#depositmass
 * @param current_A Current, in A.
 * @param time_h Time, in h (an Excel time value is a fraction of a day: multiply it by 24).
 * @param species Formula such as "Cu", or a molar mass in g/mol.
 * @param n Electrons per formula unit (a whole number ≥ 1).
 * @param [efficiency] Current efficiency as a fraction, 0 to 1 (default 1).
 * @returns Mass in g.
 */
function depositMass(current_A: any[][], time_h: any[][], species: any[][], n: any[][], efficiency?: any[][]): any[][] {
  return F.DEPOSITMASS(current_A, time_h, species, n, efficiency) as any;
}

/**
 * Time to deposit a mass at a current (Faraday's law), in h.
 * @customfunction DEPOSITTIME
 * @helpurl https://localhost:3000/docs/functions.html#deposittime
 * @param mass_g Mass wanted, in g.
 * @param current_A Current, in A.
 * @param species Formula such as "Cu", or a molar mass in g/mol.
 * @param n Electrons per formula unit (a whole number ≥ 1).
 * @param [efficiency] Current efficiency as a fraction, 0 to 1 (default 1).
 * @returns Time in h.
 */
function depositTime(mass_g: any[][], current_A: any[][], species: any[][], n: any[][], efficiency?: any[][]): any[][] {
  return F.DEPOSITTIME(mass_g, current_A, species, n, efficiency) as any;
}

/**
 * Thickness of a uniform deposit, in µm, from current density (A/dm²), time (min) and deposit density (g/cm³).
 * @customfunction PLATETHICKNESS
 * @helpurl https://localhost:3000/docs/functions.html#platethickness
 * @param current_density_A_dm2 Current density, in A/dm².
 * @param time_min Plating time, in min (an Excel time value is a fraction of a day: multiply it by 1440).
 * @param species Formula such as "Ni", or a molar mass in g/mol.
 * @param n Electrons per formula unit (a whole number ≥ 1).
 * @param density_g_cm3 Density of the deposit, in g/cm³.
 * @param [efficiency] Cathode current efficiency as a fraction, 0 to 1 (default 1).
 * @returns Thickness in µm.
 */
function plateThickness(
  current_density_A_dm2: any[][],
  time_min: any[][],
  species: any[][],
  n: any[][],
  density_g_cm3: any[][],
  efficiency?: any[][],
): any[][] {
  return F.PLATETHICKNESS(current_density_A_dm2, time_min, species, n, density_g_cm3, efficiency) as any;
}

/**
 * Time to plate a thickness, in min, at a current density (A/dm²) and deposit density (g/cm³).
 * @customfunction PLATETIME
 * @helpurl https://localhost:3000/docs/functions.html#platetime
 * @param thickness_um Thickness wanted, in µm.
 * @param current_density_A_dm2 Current density, in A/dm².
 * @param species Formula such as "Ni", or a molar mass in g/mol.
 * @param n Electrons per formula unit (a whole number ≥ 1).
 * @param density_g_cm3 Density of the deposit, in g/cm³.
 * @param [efficiency] Cathode current efficiency as a fraction, 0 to 1 (default 1).
 * @returns Time in min.
 */
function plateTime(
  thickness_um: any[][],
  current_density_A_dm2: any[][],
  species: any[][],
  n: any[][],
  density_g_cm3: any[][],
  efficiency?: any[][],
): any[][] {
  return F.PLATETIME(thickness_um, current_density_A_dm2, species, n, density_g_cm3, efficiency) as any;
}

/**
 * Current efficiency: mass obtained over the Faraday's-law mass for the charge passed, as a fraction (above 1 means a measurement to question).
 * @customfunction CURRENTEFFICIENCY
 * @helpurl https://localhost:3000/docs/functions.html#currentefficiency
 * @param mass_g Mass obtained, in g.
 * @param current_A Current, in A.
 * @param time_h Time, in h (an Excel time value is a fraction of a day: multiply it by 24).
 * @param species Formula such as "Cu", or a molar mass in g/mol.
 * @param n Electrons per formula unit (a whole number ≥ 1).
 * @returns Efficiency as a fraction.
 */
function currentEfficiency(mass_g: any[][], current_A: any[][], time_h: any[][], species: any[][], n: any[][]): any[][] {
  return F.CURRENTEFFICIENCY(mass_g, current_A, time_h, species, n) as any;
}

/**
 * Specific electrical energy of an electrolysis, U·nF/(efficiency·M), in kWh per kg of product.
 * @customfunction SPECIFICENERGY
 * @helpurl https://localhost:3000/docs/functions.html#specificenergy
 * @param cell_voltage_V Cell voltage, in V.
 * @param species Product formula such as "Cu", or a molar mass in g/mol.
 * @param n Electrons per formula unit (a whole number ≥ 1).
 * @param [efficiency] Current efficiency as a fraction, 0 to 1 (default 1).
 * @returns kWh/kg.
 */
function specificEnergy(cell_voltage_V: any[][], species: any[][], n: any[][], efficiency?: any[][]): any[][] {
  return F.SPECIFICENERGY(cell_voltage_V, species, n, efficiency) as any;
}

/**
 * Volume of gas evolved by a current (ideal gas, dry basis unless saturated is TRUE), in L.
 * @customfunction GASVOLUME
 * @helpurl https://localhost:3000/docs/functions.html#gasvolume
 * @param current_A Current, in A.
 * @param time_h Time, in h (hours, not an Excel time value: an Excel time is a fraction of a day, multiply it by 24; 30 min is 0.5).
 * @param n Electrons per gas molecule (2 for H2 and Cl2, 4 for O2).
 * @param [efficiency] Current efficiency as a fraction, 0 to 1 (default 1).
 * @param [temperature_C] Gas temperature in °C (default 25).
 * @param [pressure_bar] Total gas pressure in bar (default 1).
 * @param [saturated] FALSE (default): dry gas at the total pressure. TRUE: gas saturated with water vapour at the temperature (IAPWS-IF97 saturation pressure), so the volume is larger by p/(p − p_water).
 * @returns Volume in L.
 */
function gasVolume(current_A: any[][], time_h: any[][], n: any[][], efficiency?: any[][], temperature_C?: any[][], pressure_bar?: any[][], saturated?: any[][]): any[][] {
  return F.GASVOLUME(current_A, time_h, n, efficiency, temperature_C, pressure_bar, saturated) as any;
}
