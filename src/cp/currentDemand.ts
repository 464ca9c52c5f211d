import { InputError, finite } from '../errors';

/**
 * Cathodic-protection current demand of a surface (DNV-RP-B401 §7.3; ISO 15589-2):
 * Ic = Ac · ic · fc, in A, from the area, the design current density for the phase (initial, mean
 * or final) and the coating breakdown factor for the same phase (1 for bare steel).
 *
 * Syntax: currentDemand(areaM2, currentDensityAm2, breakdownFactor)
 * Example: currentDemand(1000, 0.1, 0.3) → 30 A
 * See also: coatingBreakdown, anodeMass
 *
 * @param areaM2 surface area, m²
 * @param currentDensityAm2 design current density, A/m²
 * @param breakdownFactor coating breakdown factor, 0…1
 */
export function currentDemand(areaM2: number, currentDensityAm2: number, breakdownFactor: number): number {
  if (currentDensityAm2 > 5) {
    throw new InputError(`current density ${currentDensityAm2} looks like mA/m²; this argument is A/m² (design values are about 0.01–0.3 A/m²)`);
  }
  if (!(breakdownFactor >= 0 && breakdownFactor <= 1)) throw new InputError(`the breakdown factor must be between 0 and 1; got ${breakdownFactor}`);
  return finite(areaM2 * currentDensityAm2 * breakdownFactor, 'the current demand');
}
