import { finite } from '../errors';
import { activityModel } from './activityModel';
import { log10ActivityCoef } from './log10ActivityCoef';

/**
 * Single-ion activity coefficient γ of an ion of charge z at ionic strength I (mol/kg), by the
 * Debye–Hückel limiting law ("DHLL"), the extended Debye–Hückel equation ("EDH", needs the ion
 * size in Å) or the Davies equation ("DAVIES"); A and B follow temperature (0…100 °C).
 * A neutral species (z = 0) has γ = 1 in all three.
 *
 * Syntax: activityCoef(charge, ionicStrength, model, temperatureC, ionSizeA)
 * Example: activityCoef(2, 0.1, "DAVIES", 25, null) → 0.372
 * See also: meanActivityCoef, ionicStrength
 *
 * @param charge charge number z
 * @param ionicStrength I, mol/kg (≥ 0)
 * @param model "DHLL", "EDH" or "DAVIES"
 * @param temperatureC temperature, °C
 * @param ionSizeA ion size parameter a, Å (EDH only; null otherwise)
 */
export function activityCoef(charge: number, ionicStrength: number, model: string, temperatureC: number, ionSizeA: number | null): number {
  const m = activityModel(model);
  return finite(Math.pow(10, log10ActivityCoef(charge * charge, ionicStrength, m, temperatureC, ionSizeA)), 'the activity coefficient');
}
