import { dataPart } from '../dataset/active';
import { kelvin } from '../constants';
import { InputError } from '../errors';

/** S/m per S/cm. */
const S_M_PER_S_CM = 100;

/**
 * Specific conductivity of aqueous potassium hydroxide, in S/m, from the correlation of Gilliam,
 * Graydon, Kirk and Thorpe (Int. J. Hydrogen Energy 32 (2007) 359):
 * κ = A·M + B·M² + C·M·T + D·M/T + E·M³ + F·M²·T² (S/cm, M in mol/L, T in K), fitted over
 * 0–12 mol/L and 0–100 °C. Outside that range it throws (no extrapolation).
 *
 * Syntax: kohConductivity(molarity, temperatureC)
 * Example: kohConductivity(6.9, 80) → about 138.5 S/m (30 wt % KOH at 80 °C)
 * See also: electrolyteConductivity, ohmicDrop
 *
 * @param molarity KOH concentration, mol/L of solution
 * @param temperatureC temperature, °C
 */
export function kohConductivity(molarity: number, temperatureC: number): number {
  const KOH = dataPart('electrolysis').conductivity.KOH;
  const { A, B, C, D, E, F } = KOH.coefficients;
  const [M_MIN, M_MAX] = KOH.concentration_mol_L;
  const [T_MIN, T_MAX] = KOH.temperature_C;
  /** Above this no solution is that concentrated (saturation at 25 °C): a number beyond it is a mass percentage. */
  const M_SATURATED = KOH.saturation_mol_L;
  if (!(molarity >= M_MIN && molarity <= M_MAX)) {
    const percent = molarity > M_SATURATED && molarity <= 100 ? '; a mass percentage? the concentration is in mol per litre of solution' : '';
    throw new InputError(`KOH concentration ${molarity} mol/L is outside the correlation's range ${M_MIN}–${M_MAX} mol/L (Gilliam et al. 2007)${percent}`);
  }
  if (!(temperatureC >= T_MIN && temperatureC <= T_MAX)) {
    throw new InputError(`temperature ${temperatureC} °C is outside the KOH correlation's range ${T_MIN}–${T_MAX} °C (Gilliam et al. 2007)`);
  }
  const M = molarity;
  const T = kelvin(temperatureC);
  const sCm = A * M + B * M * M + C * M * T + (D * M) / T + E * M * M * M + F * M * M * T * T;
  return sCm * S_M_PER_S_CM;
}
