import { finite } from '../errors';

/**
 * Heat a stack gives off, in W: Q = N·I·(U − U_tn). Positive: heat to remove (the cells run
 * above the thermoneutral voltage); negative: heat to supply.
 *
 * Syntax: cellHeat(cells, currentA, cellVoltageV, thermoneutralV)
 * Example: cellHeat(100, 5000, 1.9, 1.481) → 209,500 W
 * See also: voltageEfficiency, heatingValueVoltage
 *
 * @param cells number of cells in series
 * @param currentA current through the cells, A
 * @param cellVoltageV mean cell voltage, V
 * @param thermoneutralV thermoneutral voltage of the cell reaction, V (positive)
 */
export function cellHeat(cells: number, currentA: number, cellVoltageV: number, thermoneutralV: number): number {
  return finite(cells * currentA * (cellVoltageV - thermoneutralV), 'the heat');
}
