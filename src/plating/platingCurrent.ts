import { finite } from '../errors';

/**
 * Current for a load: area × current density × number of pieces, in A, with the area in dm² and
 * the current density in A/dm². For a barrel load give the total area of the parts in the barrel
 * (part area × count) and the average current density.
 *
 * Syntax: platingCurrent(area_dm2, current_density_A_dm2, pieces)
 * Example: platingCurrent(1.5, 3, 40) → 180 A
 * See also: plateTime, hullCell
 */
export function platingCurrent(areaDm2: number, currentDensityA_dm2: number, pieces: number): number {
  return finite(areaDm2 * currentDensityA_dm2 * pieces, 'the current');
}
