/**
 * Physical constants used throughout Cellwright.
 *
 * Source: CODATA 2018 recommended values (Tiesinga et al., Rev. Mod. Phys. 93, 025010 (2021));
 * since the 2019 SI redefinition e, N_A, k_B and h are exact, and so are F = e·N_A and R = N_A·k_B.
 */

/** Elementary charge e in C. CODATA 2018, exact. */
export const ELEMENTARY_CHARGE_C = 1.602176634e-19;

/** Avogadro constant N_A in 1/mol. CODATA 2018, exact. */
export const AVOGADRO_PER_MOL = 6.02214076e23;

/** Boltzmann constant k_B in J/K. CODATA 2018, exact. */
export const BOLTZMANN_J_PER_K = 1.380649e-23;

/** Faraday constant F = e·N_A in C/mol. CODATA 2018, exact: 96485.33212... C/mol. */
export const FARADAY_C_PER_MOL = ELEMENTARY_CHARGE_C * AVOGADRO_PER_MOL;

/** Molar gas constant R = N_A·k_B in J/(mol·K). CODATA 2018, exact: 8.314462618... J/(mol·K). */
export const GAS_CONSTANT_J_PER_MOL_K = AVOGADRO_PER_MOL * BOLTZMANN_J_PER_K;

/** 0 °C in kelvin (definition of the Celsius scale). */
export const ZERO_CELSIUS_K = 273.15;

/** Standard pressure in bar (IUPAC standard state, 1 bar = 1e5 Pa). */
export const STANDARD_PRESSURE_BAR = 1;

/** Default temperature of every temperature_C argument, °C (the 298.15 K standard temperature). */
export const DEFAULT_TEMPERATURE_C = 25;

/** Natural log of 10, for converting ln to log10. */
export const LN10 = Math.LN10;

/** Absolute temperature in K from °C. */
export function kelvin(temperatureC: number): number {
  return temperatureC + ZERO_CELSIUS_K;
}

/** RT/F in V at a temperature in °C. */
export function thermalVoltage(temperatureC: number): number {
  return (GAS_CONSTANT_J_PER_MOL_K * (temperatureC + ZERO_CELSIUS_K)) / FARADAY_C_PER_MOL;
}
