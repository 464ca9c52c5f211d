import { FARADAY_C_PER_MOL, GAS_CONSTANT_J_PER_MOL_K, kelvin } from '../constants';
import { InputError, NotFoundError } from '../errors';
import { standardDecompositionVoltage } from './standardDecompositionVoltage';

/**
 * Reversible decomposition voltage of metal electrowinning from sulfate, M2+ + H2O → M + 2H+ + ½O2
 * (M = Zn, Cu, Ni), positive: U = U°(T) + (RT/2F)·ln(p_O2^½·a_H+² / (a_M2+·a_w)).
 *
 * Syntax: electrowinVoltage(metal, temperatureC, metalActivity, hydrogenIonActivity, oxygenBar, waterActivity)
 * Example: electrowinVoltage("Zn", 25, 1, 1, 1, 1) → 1.9910 V
 * See also: standardDecompositionVoltage, thermoneutralVoltage, waterSplitVoltage
 *
 * @throws NotFoundError for "H2O" (use waterSplitVoltage) or an unknown metal
 * @throws InputError for an activity or pressure ≤ 0, or a water activity > 1
 */
export function electrowinVoltage(
  metal: string,
  temperatureC: number,
  metalActivity: number,
  hydrogenIonActivity: number,
  oxygenBar: number,
  waterActivity: number,
): number {
  if (/^\s*(h2o|water)\s*$/i.test(String(metal))) {
    throw new NotFoundError('for water electrolysis use WATERSPLITVOLTAGE; ELECTROWINVOLTAGE takes Zn, Cu or Ni');
  }
  if (!(metalActivity > 0) || !(hydrogenIonActivity > 0) || !(oxygenBar > 0)) throw new InputError('metal_activity, acid_activity and oxygen_bar must be > 0');
  if (!(waterActivity > 0 && waterActivity <= 1)) throw new InputError(`water_activity must be in (0, 1]; got ${waterActivity}`);
  const u0 = standardDecompositionVoltage(metal, temperatureC);
  const rt2f = (GAS_CONSTANT_J_PER_MOL_K * kelvin(temperatureC)) / (2 * FARADAY_C_PER_MOL);
  return u0 + rt2f * (0.5 * Math.log(oxygenBar) + 2 * Math.log(hydrogenIonActivity) - Math.log(metalActivity) - Math.log(waterActivity));
}
