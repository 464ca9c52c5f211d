import { FARADAY_C_PER_MOL } from '../constants';
import { finite } from '../errors';
import { speciesMolarMass } from '../faraday/speciesMolarMass';

/**
 * Average thickness, in µm, of a deposit from the ampere-hours passed on an area:
 * h = Q·3600·ε·M / (n·F·ρ·A), with Q in A·h, A in dm² (100 cm²) and ρ in g/cm³.
 *
 * Syntax: thicknessFromAh(ampere_hours, area_dm2, species, n, density_g_cm3, efficiency)
 * Example: thicknessFromAh(10, 20, "Ni", 2, 8.9, 0.95) → 5.84 µm
 * See also: plateThickness, depositMass
 */
export function thicknessFromAh(
  ampereHours: number,
  areaDm2: number,
  species: string | number,
  n: number,
  densityG_cm3: number,
  efficiency: number,
): number {
  const grams = (ampereHours * 3600 * efficiency * speciesMolarMass(species)) / (n * FARADAY_C_PER_MOL);
  const cm = grams / (densityG_cm3 * areaDm2 * 100);
  return finite(cm * 1e4, 'the thickness');
}
