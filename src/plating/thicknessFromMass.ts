import { finite } from '../errors';

/**
 * Average thickness of a coating, in µm, from the mass it added (or the mass stripped) over an
 * area and its density: h = m/(ρ·A), with m in g, A in dm² (100 cm²) and ρ in g/cm³. The mass per
 * unit area gives a thickness only through the density of the coating (ASTM B767 §4.4); for an
 * alloy use its density (ALLOYDENSITY, or measured).
 *
 * Syntax: thicknessFromMass(mass_g, area_dm2, density_g_cm3)
 * Example: thicknessFromMass(1.0, 2, 8.908) → 5.61 µm
 * See also: thicknessFromAh, plateThickness
 */
export function thicknessFromMass(massG: number, areaDm2: number, densityG_cm3: number): number {
  return finite((massG / (densityG_cm3 * areaDm2 * 100)) * 1e4, 'the thickness');
}
