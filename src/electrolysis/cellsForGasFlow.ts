import { finite } from '../errors';
import { normalGasFlow } from './normalGasFlow';

/** Relative slack before rounding up, so that a flow met exactly is not pushed to one more cell. */
const SLACK = 1e-9;

/**
 * Whole number of cells in series needed for a target gas flow at a given current: the flow per
 * cell from normalGasFlow, rounded up (a flow met to within 1 part in 10⁹ counts as met).
 *
 * Syntax: cellsForGasFlow(flowNm3H, currentA, n, efficiency, reference)
 * Example: cellsForGasFlow(100, 2500, 2, 1, "0C") → 96 cells
 * See also: normalGasFlow, currentForGasFlow
 *
 * @param flowNm3H target flow, normal m³/h
 * @param currentA current through the cells, A
 * @param n electrons per gas molecule
 * @param efficiency Faradaic efficiency, a fraction (0, 1]
 * @param reference "0C", "15C" or "20C"
 */
export function cellsForGasFlow(flowNm3H: number, currentA: number, n: number, efficiency: number, reference: string): number {
  const exact = flowNm3H / normalGasFlow(currentA, n, efficiency, 1, reference);
  return finite(Math.ceil(exact * (1 - SLACK)), 'the number of cells');
}
