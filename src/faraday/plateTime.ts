import { finite } from '../errors';
import { plateThickness } from './plateThickness';

/**
 * Time to plate a thickness, in min: plateThickness solved for t (it is linear in t).
 *
 * Syntax: plateTime(thicknessUm, currentDensityA_dm2, species, n, densityG_cm3, efficiency)
 * Example: plateTime(25, 2, "Ni", 2, 8.90, 0.95) → 64.2 min
 * See also: plateThickness
 *
 * @param thicknessUm wanted thickness, µm
 * @param currentDensityA_dm2 current density, A/dm² (> 0)
 * @param species formula text or molar mass in g/mol
 * @param n electrons per formula unit
 * @param densityG_cm3 density of the deposit, g/cm³
 * @param efficiency cathode current efficiency as a fraction (0, 1]
 */
export function plateTime(
  thicknessUm: number,
  currentDensityA_dm2: number,
  species: string | number,
  n: number,
  densityG_cm3: number,
  efficiency: number,
): number {
  const perMinute = plateThickness(currentDensityA_dm2, 1, species, n, densityG_cm3, efficiency);
  return finite(thicknessUm / perMinute, 'the time');
}
