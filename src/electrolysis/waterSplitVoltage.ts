import { FARADAY_C_PER_MOL, GAS_CONSTANT_J_PER_MOL_K, kelvin } from '../constants';
import { InputError } from '../errors';
import { standardDecompositionVoltage } from './standardDecompositionVoltage';

/**
 * Reversible voltage of water electrolysis, H2O(l) → H2 + ½O2, positive:
 * U = U°(T) + (RT/2F)·ln(p_H2·p_O2^½ / a_w), with p_H2 = p_O2 = pressure_bar (the partial pressures of
 * the dry gases, bar; ideal gases) and a_w the water activity of the electrolyte (1 for pure water,
 * lower in concentrated KOH).
 *
 * Syntax: waterSplitVoltage(temperatureC, pressureBar, waterActivity)
 * Example: waterSplitVoltage(80, 30, 0.7) → 1.2427 V
 * See also: standardDecompositionVoltage, thermoneutralVoltage
 *
 * @throws InputError for a pressure or water activity ≤ 0 or a water activity > 1
 */
export function waterSplitVoltage(temperatureC: number, pressureBar: number, waterActivity: number): number {
  if (!(pressureBar > 0)) throw new InputError(`pressure_bar must be > 0; got ${pressureBar}`);
  if (!(waterActivity > 0 && waterActivity <= 1)) throw new InputError(`water_activity must be in (0, 1]; got ${waterActivity}`);
  const u0 = standardDecompositionVoltage('H2O', temperatureC);
  const rt2f = (GAS_CONSTANT_J_PER_MOL_K * kelvin(temperatureC)) / (2 * FARADAY_C_PER_MOL);
  return u0 + rt2f * (1.5 * Math.log(pressureBar) - Math.log(waterActivity));
}
