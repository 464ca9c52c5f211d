import { waterSaturationPressure } from '../electrolysis/waterSaturationPressure';
import { FARADAY_C_PER_MOL, GAS_CONSTANT_J_PER_MOL_K, kelvin } from '../constants';
import { InputError, finite } from '../errors';

/** Pa per bar. */
const PA_PER_BAR = 1e5;
/** L per m³. */
const L_PER_M3 = 1000;
/** s per h. */
const S_PER_H = 3600;

/**
 * Volume of ideal gas evolved by a current, in L: V = (I·t·ε/(nF))·RT/p, with n the electrons per
 * gas molecule (2 for H2 and Cl2, 4 for O2). Dry basis: the gas alone at the total pressure p.
 * With `saturated`, the gas carries water vapour at its saturation pressure p_w(T) (IAPWS-IF97)
 * and the wet volume is V·p/(p − p_w); that needs p > p_w(T) (water does not boil).
 *
 * Syntax: gasVolume(currentA, timeH, n, efficiency, temperatureC, pressureBar, saturated)
 * Example: gasVolume(1, 1, 2, 1, 0, 1.01325, false) → 0.4182 L of H2 (one ampere-hour at 0 °C and 1 atm)
 * See also: depositMass, waterSaturationPressure, normalGasFlow
 *
 * @param currentA current, A
 * @param timeH time, h
 * @param n electrons per molecule of gas
 * @param efficiency current efficiency as a fraction (0, 1]
 * @param temperatureC gas temperature, °C
 * @param pressureBar total gas pressure, bar
 * @param saturated true: the gas is saturated with water vapour at the temperature and total pressure
 */
export function gasVolume(
  currentA: number,
  timeH: number,
  n: number,
  efficiency: number,
  temperatureC: number,
  pressureBar: number,
  saturated: boolean,
): number {
  const mol = (currentA * timeH * S_PER_H * efficiency) / (n * FARADAY_C_PER_MOL);
  const dry = ((mol * GAS_CONSTANT_J_PER_MOL_K * kelvin(temperatureC)) / (pressureBar * PA_PER_BAR)) * L_PER_M3;
  if (!saturated) return finite(dry, 'the volume');
  const pw = waterSaturationPressure(temperatureC);
  if (!(pw < pressureBar)) {
    throw new InputError(
      `water boils at ${temperatureC} °C and ${pressureBar} bar (its vapour pressure is ${pw.toPrecision(4)} bar); a saturated gas needs a total pressure above it`,
    );
  }
  return finite((dry * pressureBar) / (pressureBar - pw), 'the volume');
}
