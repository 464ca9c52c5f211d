import { InputError } from '../errors';
import { parseAlloy } from './parseAlloy';

/**
 * Density of an alloy from its composition and the densities of its elements, taking the volumes
 * as additive: 1/ρ = Σ(wᵢ/ρᵢ) (the mass of the alloy over the sum of the volumes of its parts).
 * Not the mass-weighted average of the densities, which is too high. Solid solutions and
 * intermetallic phases (γ-phase Zn–Ni) can differ from it by a few percent: a measured density
 * of the deposit, where there is one, is better.
 *
 * Syntax: alloyDensity(alloy, densities_g_cm3)
 * Example: alloyDensity("Sn60Pb40", [7.29, 11.34]) → 8.50 g/cm³
 * See also: parseAlloy, alloyPlateTime
 */
export function alloyDensity(alloy: string, densitiesG_cm3: readonly number[]): number {
  const a = parseAlloy(alloy);
  if (densitiesG_cm3.length !== a.symbols.length) {
    throw new InputError(`give one density per element of the alloy (${a.symbols.join(', ')}), in the same order: ${a.symbols.length} values; got ${densitiesG_cm3.length}`);
  }
  let volume = 0;
  for (let i = 0; i < a.symbols.length; i++) {
    const rho = densitiesG_cm3[i];
    if (!(rho > 0 && rho < 30)) throw new InputError(`the density of ${a.symbols[i]} must be in g/cm³, between 0 and 30; got ${rho}`);
    volume += a.fractions[i] / rho;
  }
  return 1 / volume;
}
