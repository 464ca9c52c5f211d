import { InputError, finite } from '../errors';
import { plateThickness } from '../faraday/plateThickness';

/**
 * Cathode current efficiency from thickness readings: the mean of the measured thicknesses over
 * the thickness Faraday's law gives at 100 % for the same current density, time, metal, n and
 * density (plateThickness). Like the efficiency from a weighed panel, a value above 1 is returned as
 * it is: it is a reading to question (gauge calibration, a density or an area that is off, the
 * readings taken where the current density is higher than the average), not an error.
 *
 * The readings should stand for the area the current density was figured on: readings on edges or
 * in recesses measure the local, not the average, current density.
 *
 * Syntax: thicknessEfficiency(readingsUm, currentDensityA_dm2, timeMin, species, n, densityG_cm3)
 * Example: thicknessEfficiency([11.6, 11.9, 12.1], 1, 60, "Ni", 2, 8.908) → 0.963
 * See also: plateThickness, currentEfficiency
 *
 * @param readingsUm thickness readings, µm (blank cells already dropped; at least one)
 * @param currentDensityA_dm2 average current density, A/dm² (> 0)
 * @param timeMin plating time, min (> 0)
 * @param species formula text or molar mass in g/mol
 * @param n electrons per atom deposited
 * @param densityG_cm3 density of the deposit, g/cm³
 */
export function thicknessEfficiency(
  readingsUm: readonly number[],
  currentDensityA_dm2: number,
  timeMin: number,
  species: string | number,
  n: number,
  densityG_cm3: number,
): number {
  if (readingsUm.length === 0) throw new InputError('readings_um holds no thickness reading; give at least one (blank cells are skipped)');
  let sum = 0;
  for (const h of readingsUm) sum += h;
  const faraday = plateThickness(currentDensityA_dm2, timeMin, species, n, densityG_cm3, 1);
  return finite(sum / readingsUm.length / faraday, 'the efficiency');
}
