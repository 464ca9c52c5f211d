import { FARADAY_C_PER_MOL } from '../constants';
import { finite } from '../errors';
import { speciesMolarMass } from './speciesMolarMass';

/** J per kWh. */
const J_PER_KWH = 3.6e6;
/** g per kg. */
const G_PER_KG = 1000;

/**
 * Specific electrical energy of an electrolysis, in kWh per kg of product: w = U·nF/(ε·M), with
 * U the voltage applied across the cell (> 0, as a rectifier reads it; a negative reversible voltage
 * from EFROMTHERMO or THERMONEUTRAL is entered as its magnitude) and ε the current efficiency.
 *
 * Syntax: specificEnergy(cellVoltageV, species, n, efficiency)
 * Example: specificEnergy(2.0, "Cu", 2, 0.9) → 1.875 kWh/kg
 * See also: ecEquiv
 *
 * @param cellVoltageV cell voltage, V
 * @param species formula text or molar mass in g/mol
 * @param n electrons per formula unit
 * @param efficiency current efficiency as a fraction (0, 1]
 */
export function specificEnergy(cellVoltageV: number, species: string | number, n: number, efficiency: number): number {
  const m = speciesMolarMass(species);
  return finite((cellVoltageV * n * FARADAY_C_PER_MOL * G_PER_KG) / (efficiency * m * J_PER_KWH), 'the energy');
}
