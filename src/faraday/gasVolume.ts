import { FARADAY_C_PER_MOL, GAS_CONSTANT_J_PER_MOL_K, kelvin } from '../constants';
import { finite } from '../errors';

/** Pa per bar. */
const PA_PER_BAR = 1e5;
/** L per m³. */
const L_PER_M3 = 1000;
/** s per h. */
const S_PER_H = 3600;

/**
 * Volume of ideal gas evolved by a current, in L: V = (I·t·ε/(nF))·RT/p, with n the electrons per
 * gas molecule (2 for H2 and Cl2, 4 for O2).
 *
 * Syntax: gasVolume(currentA, timeH, n, temperatureC, pressureBar, efficiency)
 * Example: gasVolume(1, 1, 2, 0, 1.01325, 1) → 0.4182 L of H2 (one ampere-hour at 0 °C and 1 atm)
 * See also: depositMass
 *
 * @param currentA current, A
 * @param timeH time, h
 * @param n electrons per molecule of gas
 * @param temperatureC gas temperature, °C
 * @param pressureBar gas pressure, bar
 * @param efficiency current efficiency as a fraction (0, 1]
 */
export function gasVolume(currentA: number, timeH: number, n: number, temperatureC: number, pressureBar: number, efficiency: number): number {
  const mol = (currentA * timeH * S_PER_H * efficiency) / (n * FARADAY_C_PER_MOL);
  return finite(((mol * GAS_CONSTANT_J_PER_MOL_K * kelvin(temperatureC)) / (pressureBar * PA_PER_BAR)) * L_PER_M3, 'the volume');
}
