import { FARADAY_C_PER_MOL } from '../constants';
import { finite } from '../errors';
import { referenceMolarVolume } from './referenceConditions';

/** J per kWh. */
const J_PER_KWH = 3.6e6;

/**
 * DC energy per normal cubic metre of gas, in kWh/Nm³: U·n·F/(ε·V_m), V_m at the named reference.
 *
 * Syntax: energyPerNormalVolume(cellVoltageV, n, efficiency, reference)
 * Example: energyPerNormalVolume(1.8, 2, 1, "0C") → 4.3047 kWh/Nm³ of H2
 * See also: normalGasFlow, specificEnergy
 *
 * @param cellVoltageV cell voltage, V
 * @param n electrons per gas molecule
 * @param efficiency Faradaic efficiency, a fraction (0, 1]
 * @param reference "0C", "15C" or "20C"
 */
export function energyPerNormalVolume(cellVoltageV: number, n: number, efficiency: number, reference: string): number {
  return finite((cellVoltageV * n * FARADAY_C_PER_MOL) / (efficiency * referenceMolarVolume(reference) * J_PER_KWH), 'the specific energy');
}
