import { PLAUSIBLE, plausible } from './plausible';
import { InputError, finite } from '../errors';

/**
 * Corrosion current density from polarization resistance with a given Stern–Geary constant
 * (ASTM G59, G102): icorr = B/Rp, in µA/cm², with B in V and Rp in Ω·cm².
 *
 * Syntax: icorrFromB(bV, rpOhmCm2)
 * Example: icorrFromB(0.026, 1000) → 26 µA/cm²
 * See also: sternGeary
 */
export function icorrFromB(bV: number, rpOhmCm2: number): number {
  if (bV > 0.2 && bV <= 200) throw new InputError(`B ${bV} looks like millivolts; this argument is in V (26 mV is 0.026)`);
  if (!(bV > 0 && bV <= 0.2)) throw new InputError(`B ${bV} is outside the plausible range 0 to 0.2 V`);
  plausible('polarization_resistance_ohm_cm2', rpOhmCm2, PLAUSIBLE.rpOhmCm2);
  return finite((bV / rpOhmCm2) * 1e6, 'the corrosion current');
}
