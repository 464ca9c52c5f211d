import { finite } from '../errors';
import { metalFraction } from './metalFraction';

/**
 * Mass of a salt, in kg, that brings a volume of bath to (or raises it by) a metal concentration:
 * m = c·V / (1000·w), w the metal's mass fraction in the salt (see metalFraction). The salt is taken
 * as pure and anhydrous beyond its written water of crystallisation; correct for assay separately.
 *
 * Syntax: saltMass(metal_g_L, volume_L, salt, metal)
 * Example: saltMass(75, 1000, "NiSO4·6H2O", "Ni") → 335.9 kg
 * See also: metalFraction
 */
export function saltMass(metalG_L: number, volumeL: number, salt: string, metal: string): number {
  return finite((metalG_L * volumeL) / (1000 * metalFraction(salt, metal)), 'the salt mass');
}
