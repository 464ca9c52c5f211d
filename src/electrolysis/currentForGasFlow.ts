import { finite } from '../errors';
import { normalGasFlow } from './normalGasFlow';

/**
 * Current each cell must carry for a target gas flow in normal m³/h: the inverse of
 * normalGasFlow, I = V̇/(V̇ per ampere).
 *
 * Syntax: currentForGasFlow(flowNm3H, n, efficiency, cells, reference)
 * Example: currentForGasFlow(100, 2, 1, 100, "0C") → 2391.5 A
 * See also: normalGasFlow, cellsForGasFlow
 *
 * @param flowNm3H target flow, normal m³/h
 * @param n electrons per gas molecule
 * @param efficiency Faradaic efficiency, a fraction (0, 1]
 * @param cells number of cells in series
 * @param reference "0C", "15C" or "20C"
 */
export function currentForGasFlow(flowNm3H: number, n: number, efficiency: number, cells: number, reference: string): number {
  return finite(flowNm3H / normalGasFlow(1, n, efficiency, cells, reference), 'the current');
}
