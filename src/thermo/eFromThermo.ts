import { FARADAY_C_PER_MOL, kelvin } from '../constants';

/**
 * Potential from enthalpy and entropy taken as constant: E = −(ΔH − TΔS)/(nF).
 *
 * Syntax: eFromThermo(deltaHkJ, deltaSJK, n, temperatureC)
 * Example: eFromThermo(285.83, 163.34, 2, 25) → −1.229 V (water electrolysis as written)
 * See also: thermoneutral, deltaG
 *
 * @param deltaHkJ ΔH in kJ/mol
 * @param deltaSJK ΔS in J/(mol·K)
 */
export function eFromThermo(deltaHkJ: number, deltaSJK: number, n: number, temperatureC: number): number {
  const dG = deltaHkJ * 1000 - kelvin(temperatureC) * deltaSJK;
  return -dG / (n * FARADAY_C_PER_MOL);
}
