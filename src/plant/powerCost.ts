import { InputError, finite } from '../errors';
import { specificEnergy } from '../faraday/specificEnergy';

/** kg per tonne. */
const KG_PER_T = 1000;

/**
 * DC and AC energy and the power cost per tonne of product: the DC specific energy
 * w_DC = U·nF/(ε·M) (as SPECIFICENERGY, per tonne), the AC energy drawn from the supply
 * w_AC = w_DC/η_rect with η_rect the rectifier's (transformer and rectifier) AC→DC efficiency, and
 * the cost w_AC × price per kWh. Auxiliary loads (pumps, cooling, lighting) are not included.
 *
 * Syntax: powerCost(cellVoltageV, species, n, rectifierEfficiency, pricePerKWh, efficiency)
 * Example: powerCost(3.3, "Zn", 2, 0.96, 0.08, 0.9) → [3006.0, 3131.3, 250.50] (kWh/t, kWh/t, per t)
 * See also: specificEnergy, energyPerNormalVolume
 *
 * @param cellVoltageV cell voltage, V
 * @param species product formula or molar mass in g/mol
 * @param n electrons per formula unit
 * @param rectifierEfficiency AC→DC efficiency of the rectifier, a fraction in (0, 1]
 * @param pricePerKWh price of one kWh of AC energy, any currency (≥ 0)
 * @param efficiency current efficiency, a fraction in (0, 1]
 */
export function powerCost(
  cellVoltageV: number,
  species: string | number,
  n: number,
  rectifierEfficiency: number,
  pricePerKWh: number,
  efficiency: number,
): [number, number, number] {
  if (!(rectifierEfficiency > 0 && rectifierEfficiency <= 1)) {
    throw new InputError(`rectifier_efficiency must be a fraction in (0, 1]; got ${rectifierEfficiency}`);
  }
  const dc = specificEnergy(cellVoltageV, species, n, efficiency) * KG_PER_T;
  const ac = finite(dc / rectifierEfficiency, 'the AC energy');
  return [dc, ac, finite(ac * pricePerKWh, 'the power cost')];
}
