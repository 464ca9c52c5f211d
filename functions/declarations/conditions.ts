/**
 * Worksheet declarations: electrolysis at conditions (water splitting, electrowinning).
 *
 * Each declaration is JSDoc for custom-functions-metadata-plugin and a body of one call into the
 * adapter-built function of the same id in functions/families/electrolysis.ts.
 */
/* eslint-disable @typescript-eslint/no-explicit-any */
import * as F from '../families/conditions';

/**
 * Reversible voltage of water electrolysis H2O(l) → H2 + ½O2, positive (the voltage the cell needs): U°(T) + (RT/2F)·ln(p^1.5/a_w), with ΔH(T) and ΔS(T) from the species data (NBS 1982). 0–100 °C; outside, #VALUE!.
 * @customfunction WATERSPLITVOLTAGE
 * @helpurl https://localhost:3000/docs/functions.html#watersplitvoltage
 * @param [temperature_C] Temperature in °C, 0 to 100 (default 25).
 * @param [pressure_bar] Partial pressure of the dry H2 and of the dry O2, each, in bar (default 1; ideal gases).
 * @param [water_activity] Water activity of the electrolyte, in (0, 1] (default 1; lower in concentrated KOH).
 * @returns Reversible voltage in V (positive).
 */
function waterSplitVoltage(temperature_C?: any[][], pressure_bar?: any[][], water_activity?: any[][]): any[][] {
  return F.WATERSPLITVOLTAGE(temperature_C, pressure_bar, water_activity) as any;
}

/**
 * Thermoneutral voltage of water electrolysis ΔH(T)/2F, positive, with ΔH(T) = ΔH(25 °C) + ΔCp·(T − 25) from the species data (1.4812 V at 25 °C, 1.4721 V at 80 °C). Higher-heating-value basis (liquid water). 0–100 °C.
 * @customfunction WATERTHERMONEUTRAL
 * @helpurl https://localhost:3000/docs/functions.html#waterthermoneutral
 * @param [temperature_C] Temperature in °C, 0 to 100 (default 25).
 * @returns Thermoneutral voltage in V (positive).
 */
function waterThermoneutral(temperature_C?: any[][]): any[][] {
  return F.WATERTHERMONEUTRAL(temperature_C) as any;
}

/**
 * Reversible decomposition voltage of electrowinning from sulfate, M2+ + H2O → M + 2H+ + ½O2 (M = Zn, Cu, Ni), positive: U°(T) + (RT/2F)·ln(p_O2^½·a_H+²/(a_M·a_w)), from the species data. 0–100 °C.
 * @customfunction ELECTROWINVOLTAGE
 * @helpurl https://localhost:3000/docs/functions.html#electrowinvoltage
 * @param metal "Zn", "Cu" or "Ni" (or zinc, copper, nickel).
 * @param [temperature_C] Temperature in °C, 0 to 100 (default 25).
 * @param [metal_activity] Activity of the metal ion (default 1).
 * @param [acid_activity] Activity of H+ in the electrolyte (default 1).
 * @param [oxygen_bar] Partial pressure of O2 at the anode, in bar (default 1).
 * @param [water_activity] Water activity of the electrolyte, in (0, 1] (default 1).
 * @returns Decomposition voltage in V (positive).
 */
function electrowinVoltage(metal: any[][], temperature_C?: any[][], metal_activity?: any[][], acid_activity?: any[][], oxygen_bar?: any[][], water_activity?: any[][]): any[][] {
  return F.ELECTROWINVOLTAGE(metal, temperature_C, metal_activity, acid_activity, oxygen_bar, water_activity) as any;
}

/**
 * Thermoneutral voltage of electrowinning from sulfate (Zn, Cu, Ni), ΔH(T)/2F, positive, from the species data (ΔCp = 0 for Cu and Ni, whose ion Cp° is not published in the NBS tables). 0–100 °C.
 * @customfunction ELECTROWINTHERMONEUTRAL
 * @helpurl https://localhost:3000/docs/functions.html#electrowinthermoneutral
 * @param metal "Zn", "Cu" or "Ni" (or zinc, copper, nickel).
 * @param [temperature_C] Temperature in °C, 0 to 100 (default 25).
 * @returns Thermoneutral voltage in V (positive).
 */
function electrowinThermoneutral(metal: any[][], temperature_C?: any[][]): any[][] {
  return F.ELECTROWINTHERMONEUTRAL(metal, temperature_C) as any;
}
