import { FARADAY_C_PER_MOL } from '../constants';
import { finite } from '../errors';
import { referenceMolarVolume } from './referenceConditions';

/** s per h. */
const S_PER_H = 3600;

/**
 * Gas production of a stack in normal cubic metres per hour (dry, ideal gas) at a named
 * reference condition: V̇ = N·I·ε/(nF)·3600·V_m.
 *
 * Syntax: normalGasFlow(currentA, n, efficiency, cells, reference)
 * Example: normalGasFlow(1000, 2, 1, 1, "0C") → 0.41815 Nm³/h of H2 (one kiloampere, one cell)
 * See also: currentForGasFlow, cellsForGasFlow, referenceMolarVolume
 *
 * @param currentA current through each cell, A
 * @param n electrons per gas molecule (2 for H2 and Cl2, 4 for O2)
 * @param efficiency Faradaic efficiency, a fraction (0, 1]
 * @param cells number of cells in series carrying the current
 * @param reference "0C", "15C" or "20C"
 */
export function normalGasFlow(currentA: number, n: number, efficiency: number, cells: number, reference: string): number {
  const molPerH = (cells * currentA * efficiency * S_PER_H) / (n * FARADAY_C_PER_MOL);
  return finite(molPerH * referenceMolarVolume(reference), 'the gas flow');
}
