import { finite } from '../errors';

/**
 * Voltage drop in a DC cable run: ΔV = I · R′ · ℓ, in V, with R′ the conductor resistance per km
 * (from the cable data at its temperature) and ℓ the length of conductor in the circuit (both legs
 * where both are cable).
 *
 * Syntax: cableDrop(currentA, lengthM, ohmPerKm)
 * Example: cableDrop(10, 200, 1.15) → 2.3 V
 * See also: rectifierVoltage
 */
export function cableDrop(currentA: number, lengthM: number, ohmPerKm: number): number {
  return finite((currentA * ohmPerKm * lengthM) / 1000, 'the voltage drop');
}
