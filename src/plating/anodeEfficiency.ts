import { finite } from '../errors';
import { ecEquiv } from '../faraday/ecEquiv';

/**
 * Apparent anode efficiency from the weight an anode lost: loss / (Q·M·3600/(nF)), with the charge
 * Q in A·h. It is not limited to 1: anodes that also dissolve chemically in the bath (zinc in acid
 * or alkaline zinc baths, nickel and copper in some baths, tin) lose more than Faraday's law
 * allows, and the excess is what builds up metal in the bath. Above 1 is therefore a result, not
 * an error; the cathode's efficiency is CURRENTEFFICIENCY.
 *
 * Syntax: anodeEfficiency(mass_loss_g, ampere_hours, species, n)
 * Example: anodeEfficiency(1300, 1000, "Zn", 2) → 1.066
 * See also: currentEfficiency, metalPerKAh
 */
export function anodeEfficiency(massLossG: number, ampereHours: number, species: string | number, n: number): number {
  return finite(massLossG / (ampereHours * ecEquiv(species, n)), 'the efficiency');
}
