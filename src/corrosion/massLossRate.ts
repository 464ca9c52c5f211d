import { PLAUSIBLE, plausible } from './plausible';
import { InputError, finite } from '../errors';

/**
 * K of ASTM G1 §8.1.2 (also G31) for CR = K·W/(A·T·D), with W in g, A in cm², T in h, D in g/cm³.
 * Per unit of the result.
 */
export const MASS_LOSS_K: Readonly<Record<string, number>> = {
  'mm/y': 8.76e4,
  'um/y': 8.76e7,
  mpy: 3.45e6,
  'in/y': 3.45e3,
};

/**
 * Corrosion rate of a coupon from its mass loss (ASTM G1 §8.1.2; ASTM G31): CR = K·W/(A·T·D), with
 * K = 8.76 × 10⁴ for mm/y, 8.76 × 10⁷ for µm/y, 3.45 × 10⁶ for mils per year and 3.45 × 10³ for
 * inches per year. Uniform corrosion is assumed: report pitting separately (pittingFactor).
 *
 * Syntax: massLossRate(massLossG, areaCm2, timeH, densityGcm3, unit)
 * Example: massLossRate(0.65, 28.5, 168, 7.85, "mm/y") → 1.515 mm/y
 * See also: pittingFactor, rateConvert
 */
export function massLossRate(massLossG: number, areaCm2: number, timeH: number, densityGcm3: number, unit: string): number {
  plausible('density_g_cm3', densityGcm3, PLAUSIBLE.densityGcm3);
  const u = unit.trim().toLowerCase().replace('µ', 'u').replace(/\s+/g, '');
  const k = MASS_LOSS_K[u === 'mils/y' || u === 'mil/y' ? 'mpy' : u];
  if (k === undefined) throw new InputError(`unit must be "mm/y", "um/y", "mpy" or "in/y"; got "${unit}"`);
  return finite((k * massLossG) / (areaCm2 * timeH * densityGcm3), 'the corrosion rate');
}
