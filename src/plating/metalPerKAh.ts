import { ecEquiv } from '../faraday/ecEquiv';

/**
 * Metal deposited (or dissolved) per kiloampere-hour, in kg/(kA·h): ε·M·3600/(nF), the number that
 * turns the rectifier's ampere-hour meter into the metal to replenish. Numerically the
 * electrochemical equivalent in g/(A·h) times the efficiency.
 *
 * Syntax: metalPerKAh(species, n, efficiency)
 * Example: metalPerKAh("Ni", 2, 0.95) → 1.040 kg/(kA·h)
 * See also: additiveDose, depositMass, ecEquiv
 */
export function metalPerKAh(species: string | number, n: number, efficiency: number): number {
  return ecEquiv(species, n) * efficiency;
}
