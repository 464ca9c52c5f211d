import { finite } from '../errors';
import { alloyThickness } from './alloyThickness';

/**
 * Time to plate a thickness of an alloy, in min: alloyThickness solved for t (it is linear in t),
 * t = h·F·ρ/(j·ε·EW).
 *
 * Syntax: alloyPlateTime(thickness_um, current_density_A_dm2, alloy, valences, density_g_cm3, efficiency)
 * Example: alloyPlateTime(8, 2, "Zn86Ni14", [2], 7.1, 0.6) → 39 min
 * See also: alloyThickness, alloyEquiv, plateTime
 */
export function alloyPlateTime(
  thicknessUm: number,
  currentDensityA_dm2: number,
  alloy: string,
  valences: readonly number[],
  densityG_cm3: number,
  efficiency: number,
): number {
  return finite(thicknessUm / alloyThickness(currentDensityA_dm2, 1, alloy, valences, densityG_cm3, efficiency), 'the time');
}
