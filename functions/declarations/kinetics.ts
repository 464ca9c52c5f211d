/**
 * Worksheet declarations: electrode kinetics and corrosion.
 *
 * Each declaration is JSDoc for custom-functions-metadata-plugin (which writes dist/functions.json
 * and appends the CustomFunctions.associate calls) and a body of one call into the adapter-built
 * function of the same id in functions/families/kinetics.ts. Arguments are any[][] so that each
 * accepts a single value or a range; results are 2-D arrays and spill.
 */
/* eslint-disable @typescript-eslint/no-explicit-any */
import * as F from '../families/kinetics';

/**
 * Butler–Volmer current density i0·[exp(αa·Fη/RT) − exp(−αc·Fη/RT)], in i0's units (anodic positive).
 * @customfunction BUTLERVOLMER
 * @helpurl https://localhost:3000/docs/functions.html#butlervolmer
 * @param i0 Exchange current density (> 0), in any current-density unit.
 * @param overpotential_V Overpotential, in V (−5 to 5; a value like 250 is refused as millivolts).
 * @param alpha_a Apparent anodic transfer coefficient (> 0, n included).
 * @param [alpha_c] Apparent cathodic transfer coefficient (> 0; default 1 − alpha_a, which holds for single-electron steps only: give alpha_c for multi-electron reactions).
 * @param [temperature_C] Temperature in °C (default 25).
 * @returns Current density in i0's units.
 */
function butlerVolmer(i0: any[][], overpotential_V: any[][], alpha_a: any[][], alpha_c?: any[][], temperature_C?: any[][]): any[][] {
  return F.BUTLERVOLMER(i0, overpotential_V, alpha_a, alpha_c, temperature_C) as any;
}

/**
 * Overpotential that gives a current density by Butler–Volmer (its inverse, solved to 1e-9 V), in V.
 * @customfunction OVERPOTENTIAL
 * @helpurl https://localhost:3000/docs/functions.html#overpotential
 * @param i Current density, in i0's units (anodic positive, cathodic negative).
 * @param i0 Exchange current density (> 0).
 * @param alpha_a Apparent anodic transfer coefficient (> 0, n included).
 * @param [alpha_c] Apparent cathodic transfer coefficient (> 0; default 1 − alpha_a).
 * @param [temperature_C] Temperature in °C (default 25).
 * @returns Overpotential in V.
 */
function overpotential(i: any[][], i0: any[][], alpha_a: any[][], alpha_c?: any[][], temperature_C?: any[][]): any[][] {
  return F.OVERPOTENTIAL(i, i0, alpha_a, alpha_c, temperature_C) as any;
}

/**
 * Tafel slope RT·ln10/(αF), in V per decade (0.118 V for α = 0.5 at 25 °C).
 * @customfunction TAFELSLOPE
 * @helpurl https://localhost:3000/docs/functions.html#tafelslope
 * @param alpha Apparent transfer coefficient (> 0, n included; 0.01 to 4, a value like 50 is refused as a percentage).
 * @param [temperature_C] Temperature in °C (default 25).
 * @returns V per decade.
 */
function tafelSlope(alpha: any[][], temperature_C?: any[][]): any[][] {
  return F.TAFELSLOPE(alpha, temperature_C) as any;
}

/**
 * Uniform corrosion penetration rate K1·icorr·EW/ρ (Faraday's law, K1 of ASTM G102), in mm/year.
 * @customfunction CORROSIONRATE
 * @helpurl https://localhost:3000/docs/functions.html#corrosionrate
 * @param icorr_uA_cm2 Corrosion current density, in µA/cm².
 * @param equivalent_weight_g Equivalent weight, in g (molar mass over electrons per atom; 27.92 for iron; 2 to 250 g; EQUIVWEIGHT for alloys).
 * @param density_g_cm3 Density of the metal, in g/cm³ (0.5 to 23; a value like 7870 is refused as kg/m³).
 * @returns Penetration rate in mm/year.
 */
function corrosionRate(icorr_uA_cm2: any[][], equivalent_weight_g: any[][], density_g_cm3: any[][]): any[][] {
  return F.CORROSIONRATE(icorr_uA_cm2, equivalent_weight_g, density_g_cm3) as any;
}

/**
 * Corrosion current density from linear polarization (Stern–Geary), B/Rp with B = βa·βc/(2.303·(βa + βc)), in µA/cm².
 * @customfunction STERNGEARY
 * @helpurl https://localhost:3000/docs/functions.html#sterngeary
 * @param beta_a_V Anodic Tafel slope, in V per decade (0.005 to 1; a value like 120 is refused as mV/decade).
 * @param beta_c_V Cathodic Tafel slope in V per decade; a negative value, as instruments report it, is taken by its magnitude.
 * @param polarization_resistance_ohm_cm2 Polarization resistance, in Ω·cm² (1 to 1e9; given first by mistake it is refused as a Tafel slope).
 * @returns Corrosion current density in µA/cm².
 */
function sternGeary(beta_a_V: any[][], beta_c_V: any[][], polarization_resistance_ohm_cm2: any[][]): any[][] {
  return F.STERNGEARY(beta_a_V, beta_c_V, polarization_resistance_ohm_cm2) as any;
}
