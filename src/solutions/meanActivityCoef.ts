import { finite } from '../errors';
import { activityModel } from './activityModel';
import { log10ActivityCoef } from './log10ActivityCoef';

/**
 * Mean ionic activity coefficient γ± of a salt of cation charge z₊ and anion charge z₋ at ionic
 * strength I (mol/kg): log10 γ± = (model term) with |z₊z₋| in place of z². Only the magnitudes of the
 * charges count (−1 and 1 both describe a univalent anion). Models as for activityCoef.
 *
 * Syntax: meanActivityCoef(zCation, zAnion, ionicStrength, model, temperatureC, ionSizeA)
 * Example: meanActivityCoef(1, −1, 0.1, "DAVIES", 25, null) → 0.781 (NaCl 0.1 mol/kg; measured 0.778)
 * See also: activityCoef, ionicStrength
 *
 * @param zCation charge of the cation
 * @param zAnion charge of the anion
 * @param ionicStrength I, mol/kg (≥ 0)
 * @param model "DHLL", "EDH" or "DAVIES"
 * @param temperatureC temperature, °C
 * @param ionSizeA mean ion size parameter a, Å (EDH only; null otherwise)
 */
export function meanActivityCoef(
  zCation: number,
  zAnion: number,
  ionicStrength: number,
  model: string,
  temperatureC: number,
  ionSizeA: number | null,
): number {
  const m = activityModel(model);
  const zz = Math.abs(zCation * zAnion);
  return finite(Math.pow(10, log10ActivityCoef(zz, ionicStrength, m, temperatureC, ionSizeA)), 'the activity coefficient');
}
