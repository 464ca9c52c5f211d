import { InputError, finite } from '../errors';
import { normalGasFlow } from './normalGasFlow';

/**
 * Faradaic efficiency from a metered gas flow: the measured dry flow in normal m³/h over the flow
 * the current would make at 100 % (normalGasFlow at efficiency 1). The meter's flow must be dry
 * and at the same reference conditions.
 *
 * Syntax: gasFlowEfficiency(flowNm3H, currentA, n, cells, reference)
 * Example: gasFlowEfficiency(40.98, 1000, 2, 100, "0C") → 0.980
 * See also: normalGasFlow, currentForGasFlow
 *
 * @param flowNm3H metered dry flow, normal m³/h
 * @param currentA current through the cells, A (> 0)
 * @param n electrons per gas molecule
 * @param cells number of cells in series
 * @param reference "0C", "15C" or "20C"
 */
export function gasFlowEfficiency(flowNm3H: number, currentA: number, n: number, cells: number, reference: string): number {
  const eff = finite(flowNm3H / normalGasFlow(currentA, n, 1, cells, reference), 'the efficiency');
  if (eff > 1.05) {
    throw new InputError(
      `the metered flow is ${eff < 1e6 ? `${(eff * 100).toFixed(1)} % of` : 'far more than'} what the current can make; check the flow's reference conditions and that it is dry, the current and the cell count`,
    );
  }
  return eff;
}
