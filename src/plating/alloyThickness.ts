import { plateThickness } from '../faraday/plateThickness';
import { alloyEquiv } from './alloyEquiv';

/**
 * Thickness of a uniform alloy deposit, in µm: h = j·t·ε·EW/(F·ρ), with the alloy's equivalent
 * weight EW (see alloyEquiv), j in A/dm², t in min and the density ρ of the deposit in g/cm³
 * (measured, or from alloyDensity). ε is the cathode efficiency of the alloy deposition as a whole.
 *
 * Syntax: alloyThickness(current_density_A_dm2, time_min, alloy, valences, density_g_cm3, efficiency)
 * Example: alloyThickness(2, 30, "Zn86Ni14", [2], 7.1, 0.6) → 6.1 µm
 * See also: alloyPlateTime, alloyEquiv, plateThickness
 */
export function alloyThickness(
  currentDensityA_dm2: number,
  timeMin: number,
  alloy: string,
  valences: readonly number[],
  densityG_cm3: number,
  efficiency: number,
): number {
  return plateThickness(currentDensityA_dm2, timeMin, alloyEquiv(alloy, valences), 1, densityG_cm3, efficiency);
}
