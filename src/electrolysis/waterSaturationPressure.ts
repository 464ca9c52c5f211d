import { dataPart } from '../dataset/active';
import { kelvin } from '../constants';
import { InputError } from '../errors';

/** bar per MPa. */
const BAR_PER_MPA = 10;

/**
 * Saturation (vapour) pressure of pure water, in bar, from the saturation-pressure equation of
 * IAPWS-IF97 (region 4, eq. 30), valid from 0 °C (273.15 K) to the critical point (647.096 K).
 *
 * Syntax: waterSaturationPressure(temperatureC)
 * Example: waterSaturationPressure(26.85) → 0.0353659 bar (IF97 check value 300 K)
 * See also: gasVolume
 *
 * @param temperatureC temperature, °C
 */
export function waterSaturationPressure(temperatureC: number): number {
  const ws = dataPart('electrolysis').waterSaturation;
  const N = ws.n;
  const [T_MIN, T_MAX] = ws.temperature_K;
  const T = kelvin(temperatureC);
  if (!(T >= T_MIN - 1e-9 && T <= T_MAX)) {
    throw new InputError(`temperature ${temperatureC} °C is outside the range of the water saturation equation, 0 to 373.946 °C`);
  }
  const th = T + N[8] / (T - N[9]);
  const A = th * th + N[0] * th + N[1];
  const B = N[2] * th * th + N[3] * th + N[4];
  const C = N[5] * th * th + N[6] * th + N[7];
  const x = (2 * C) / (-B + Math.sqrt(B * B - 4 * A * C));
  return x * x * x * x * BAR_PER_MPA;
}
