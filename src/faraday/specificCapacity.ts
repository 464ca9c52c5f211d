import { FARADAY_C_PER_MOL } from '../constants';
import { finite } from '../errors';
import { speciesMolarMass } from './speciesMolarMass';

/** C per mA·h (3.6 C = 1 mA·h). */
const C_PER_MAH = 3.6;

/**
 * Theoretical specific charge capacity of an electrode material, in mA·h per g: q = n·F/(3.6·M),
 * with n the electrons (or lithium ions) exchanged per formula unit and M the molar mass of the
 * formula given. The capacity is per gram of that formula: graphite's 372 mA·h/g is per gram of
 * C6 (the host), while "LiC6" gives the capacity per gram of the lithiated material.
 *
 * Syntax: specificCapacity(species, n)
 * Example: specificCapacity("LiFePO4", 1) → 169.9 mA·h/g
 * See also: specificEnergy, ecEquiv
 *
 * @param species formula text or molar mass in g/mol
 * @param n electrons per formula unit
 */
export function specificCapacity(species: string | number, n: number): number {
  const m = speciesMolarMass(species);
  return finite((n * FARADAY_C_PER_MOL) / (C_PER_MAH * m), 'the capacity');
}
