import { dataPart } from '../dataset/active';
import { InputError } from '../errors';

/** mol/m³ per mol/L. */
const MOL_M3_PER_MOL_L = 1000;

/**
 * Specific conductivity of aqueous sulfuric acid at 25 °C, in S/m, from the lead-acid battery
 * correlation of Gu, Wang and Liaw (J. Electrochem. Soc. 144 (1997) 2053):
 * κ = c·exp(a0 + a1·c + a2·c²)·1e-4 (S/m, c in mol/m³). The fit has no temperature term, so only
 * 25 °C is accepted; the concentration range is 1–6 mol/L (the data file says why). Outside either it
 * throws an InputError naming the range (no extrapolation).
 *
 * Syntax: h2so4Conductivity(molarity, temperatureC)
 * Example: h2so4Conductivity(1.8, 25) → about 68.1 S/m (177 g/L of acid, tankhouse strength)
 * See also: electrolyteConductivity, kohConductivity, ohmicDrop
 *
 * @param molarity H2SO4 concentration, mol/L of solution
 * @param temperatureC temperature, °C (25 only)
 */
export function h2so4Conductivity(molarity: number, temperatureC: number): number {
  const H2SO4 = dataPart('electrolysis').conductivity.H2SO4;
  const { a0, a1, a2 } = H2SO4.coefficients;
  const [M_MIN, M_MAX] = H2SO4.concentration_mol_L;
  const [T_MIN, T_MAX] = H2SO4.temperature_C;
  if (!(molarity >= M_MIN && molarity <= M_MAX)) {
    throw new InputError(
      `H2SO4 concentration ${molarity} mol/L is outside the correlation's range ${M_MIN}–${M_MAX} mol/L (Gu, Wang & Liaw 1997); the concentration is in mol per litre of solution (98.08 g/L is 1 mol/L)`,
    );
  }
  if (!(temperatureC >= T_MIN && temperatureC <= T_MAX)) {
    const at = T_MIN === T_MAX ? `${T_MIN} °C only` : `${T_MIN}–${T_MAX} °C`;
    throw new InputError(`temperature ${temperatureC} °C: the H2SO4 correlation (Gu, Wang & Liaw 1997) has no temperature term and holds at ${at}`);
  }
  const c = molarity * MOL_M3_PER_MOL_L;
  return c * Math.exp(a0 + a1 * c + a2 * c * c) * 1e-4;
}
