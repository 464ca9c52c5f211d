import { FARADAY_C_PER_MOL } from '../constants';
import { finite } from '../errors';
import { speciesMolarMass } from './speciesMolarMass';

/**
 * µm of a uniform deposit per (A/dm²·min·g/mol / (g/cm³)): 60 s/min · 100 (from g/dm² to g/cm²
 * and cm to µm: 1/100 · 10⁴). thickness = j·t·ε·M·6000/(nFρ).
 */
const UM_PER_A_DM2_MIN = 60 * 100;

/**
 * Thickness of a uniform deposit, in µm: h = j·t·ε·M/(nFρ), with j in A/dm², t in min and ρ in
 * g/cm³ (the units of the plating shop).
 *
 * Syntax: plateThickness(currentDensityA_dm2, timeMin, species, n, densityG_cm3, efficiency)
 * Example: plateThickness(1, 60, "Ni", 2, 8.90, 1) → 12.30 µm
 * See also: plateTime, depositMass
 *
 * @param currentDensityA_dm2 current density, A/dm²
 * @param timeMin plating time, min
 * @param species formula text or molar mass in g/mol
 * @param n electrons per formula unit
 * @param densityG_cm3 density of the deposit, g/cm³
 * @param efficiency cathode current efficiency as a fraction (0, 1]
 */
export function plateThickness(
  currentDensityA_dm2: number,
  timeMin: number,
  species: string | number,
  n: number,
  densityG_cm3: number,
  efficiency: number,
): number {
  const m = speciesMolarMass(species);
  return finite((currentDensityA_dm2 * timeMin * efficiency * m * UM_PER_A_DM2_MIN) / (n * FARADAY_C_PER_MOL * densityG_cm3), 'the thickness');
}
