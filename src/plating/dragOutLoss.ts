import { finite } from '../errors';

/**
 * Bath constituent carried out of a tank by the work: drag-out volume per load × concentration ×
 * loads, in g (for the period the loads count: an hour, a shift, a day). The drag-out volume is
 * the film and cupped solution each load carries out, measured or estimated per load.
 *
 * Syntax: dragOutLoss(dragout_L, concentration_g_L, loads)
 * Example: dragOutLoss(0.15, 250, 24) → 900 g
 * See also: rinseRatio, saltMass
 */
export function dragOutLoss(dragoutL: number, concentrationG_L: number, loads: number): number {
  return finite(dragoutL * concentrationG_L * loads, 'the loss');
}
