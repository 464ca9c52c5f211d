import { InputError, finite } from '../errors';
import { speciesMolarMass } from '../faraday/speciesMolarMass';
import { rateConvert } from './rateConvert';

const CURRENT_UNITS = /^(u|µ)a\/cm(2|²)$|^ma\/m(2|²)$|^a\/m(2|²)$/;

/**
 * Years until a coating is consumed at a steady, uniform corrosion rate: thickness / rate. The rate
 * is a penetration rate (µm/y, mm/y, mpy) or a corrosion current density (µA/cm², mA/m², A/m²),
 * which Faraday's law turns into a penetration rate for the coating's metal, n and density: CR =
 * K1·i·(M/n)/ρ with K1 = 3.2707e-3 mm·g/(µA·cm·y) (ASTM G102, computed from CODATA F; rateConvert).
 *
 * Uniform attack only: pitting, attack at pores and cut edges, and a rate that changes with the
 * seasons or as corrosion products build up all shorten or lengthen the real life. Coating standards
 * and exposure data (for zinc, the corrosivity categories of ISO 9223/9224) take precedence.
 *
 * Syntax: coatingLife(thicknessUm, rate, rateUnit, species, n, densityG_cm3)
 * Example: coatingLife(85, 2.1, "um/y", null, null, null) → 40.5 years;
 *          coatingLife(12, 0.5, "uA/cm2", "Zn", 2, 7.14) → 1.60 years
 * See also: rateConvert, corrosionRate
 *
 * @param thicknessUm coating thickness, µm (≥ 0)
 * @param rate corrosion rate in rateUnit (> 0)
 * @param rateUnit "um/y", "mm/y", "mpy", "uA/cm2", "mA/m2" or "A/m2"
 * @param species the coating's metal or its molar mass in g/mol (current units only)
 * @param n electrons per atom dissolved (current units only)
 * @param densityG_cm3 density of the coating, g/cm³ (current units only)
 */
export function coatingLife(
  thicknessUm: number,
  rate: number,
  rateUnit: string,
  species: string | number | null,
  n: number | null,
  densityG_cm3: number | null,
): number {
  let umPerYear: number;
  if (CURRENT_UNITS.test(rateUnit.trim().toLowerCase().replace(/\s+/g, ''))) {
    if (species === null || n === null || densityG_cm3 === null) {
      throw new InputError(`a corrosion current density (${rateUnit.trim()}) needs species, n and density_g_cm3 to become a penetration rate`);
    }
    umPerYear = rateConvert(rate, rateUnit, 'um/y', speciesMolarMass(species) / n, densityG_cm3);
  } else {
    umPerYear = rateConvert(rate, rateUnit, 'um/y', null, null);
  }
  return finite(thicknessUm / umPerYear, 'the life');
}
