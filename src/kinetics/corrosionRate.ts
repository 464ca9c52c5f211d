import { FARADAY_C_PER_MOL } from '../constants';
import { finite } from '../errors';

/** A in µA. */
const A_PER_UA = 1e-6;
/** mm in cm. */
const MM_PER_CM = 10;
/** Seconds in a year of 365.25 days (the Julian year). */
const S_PER_YEAR = 365.25 * 86400;

/**
 * K1 of ASTM G102 from Faraday's law: 1 µA/cm² dissolving 1 g per equivalent of a 1 g/cm³ metal
 * penetrates 10⁻⁶·(365.25·86400)·10/F = 3.2707e-3 mm per year (ASTM G102 prints 3.27 × 10⁻³
 * mm·g/(µA·cm·yr)).
 */
export const CORROSION_K1_MM_G_PER_UA_CM_YR = (A_PER_UA * S_PER_YEAR * MM_PER_CM) / FARADAY_C_PER_MOL;

/**
 * Penetration rate of uniform corrosion from the corrosion current density, Faraday's law in the
 * form of ASTM G102: CR = K1·icorr·EW/ρ, in mm/year.
 *
 * Syntax: corrosionRate(icorrUA_cm2, equivalentWeightG, densityG_cm3)
 * Example: corrosionRate(1, 27.92, 7.87) → 0.0116 mm/y (iron)
 * See also: sternGeary
 *
 * @param icorrUA_cm2 corrosion current density, µA/cm²
 * @param equivalentWeightG equivalent weight (g per equivalent: molar mass over electrons per atom)
 * @param densityG_cm3 density of the metal, g/cm³
 */
export function corrosionRate(icorrUA_cm2: number, equivalentWeightG: number, densityG_cm3: number): number {
  return finite((CORROSION_K1_MM_G_PER_UA_CM_YR * icorrUA_cm2 * equivalentWeightG) / densityG_cm3, 'the corrosion rate');
}
