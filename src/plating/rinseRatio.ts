import { finite } from '../errors';

/**
 * Dilution of drag-out across n counterflow rinse stages at steady state: the ratio of the
 * concentration in the process tank to that in the last rinse, C0/Cn = (r^(n+1) − 1)/(r − 1) with
 * r = rinse-water flow / drag-out flow (n + 1 when r = 1). The stages are taken as perfectly mixed
 * and the drag-out volume as equal from every tank (mass balance of a counterflow cascade).
 * For r ≫ 1 this tends to the familiar r^n.
 *
 * Syntax: rinseRatio(flow_ratio, stages)
 * Example: rinseRatio(20, 2) → 421
 * See also: dragOutLoss
 */
export function rinseRatio(flowRatio: number, stages: number): number {
  if (flowRatio === 1) return stages + 1;
  return finite((Math.pow(flowRatio, stages + 1) - 1) / (flowRatio - 1), 'the rinse ratio');
}
