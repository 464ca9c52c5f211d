import { LN10 } from '../constants';
import { finite } from '../errors';

/** µA per A. */
const UA_PER_A = 1e6;

/**
 * Corrosion current density from linear polarization, the Stern–Geary equation: icorr = B/Rp with
 * B = βa·βc/(ln10·(βa + βc)) (ln 10 = 2.303), in µA/cm².
 *
 * Syntax: sternGeary(betaA_V, betaC_V, rpOhmCm2)
 * Example: sternGeary(0.12, 0.12, 1000) → 26.06 µA/cm²
 * See also: corrosionRate
 *
 * @param betaA_V anodic Tafel slope, V/decade (> 0)
 * @param betaC_V cathodic Tafel slope, V/decade (> 0, its magnitude)
 * @param rpOhmCm2 polarization resistance, Ω·cm²
 */
export function sternGeary(betaA_V: number, betaC_V: number, rpOhmCm2: number): number {
  const b = (betaA_V * betaC_V) / (LN10 * (betaA_V + betaC_V));
  return finite((b / rpOhmCm2) * UA_PER_A, 'the corrosion current');
}
