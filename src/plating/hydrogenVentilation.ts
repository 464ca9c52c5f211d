import { dataPart } from '../dataset/active';
import { InputError, finite } from '../errors';
import { normalGasFlow } from '../electrolysis/normalGasFlow';

/**
 * Hydrogen from a plating tank's cathodes and the air that dilutes it. The part of the current that
 * deposits no metal, I·(1 − ε), is taken as all evolving hydrogen (2 electrons per H2): an upper
 * bound, since some of it may reduce other bath species (Cr(VI) to Cr(III) in a chromium bath).
 * The hydrogen flow is dry ideal gas in normal m³/h at the named reference (normalGasFlow). The air
 * flow is what keeps the perfectly mixed stream at the chosen share f of the lower flammability
 * limit: x = V̇_H2/(V̇_H2 + V̇_air) = f·LFL, so V̇_air = V̇_H2·(1/(f·LFL) − 1), at the same reference.
 * Real hoods do not mix perfectly and hydrogen collects under roofs and covers: a screening figure,
 * not a ventilation design.
 *
 * Syntax: hydrogenVentilation(currentA, efficiency, lflFraction, reference, lflPercent)
 * Example: hydrogenVentilation(2000, 0.95, 0.25, "0C", null) → [0.0418, 4.14] Nm³/h
 * See also: normalGasFlow, hydrogenInAir
 *
 * @param currentA tank current, A (≥ 0)
 * @param efficiency cathode current efficiency of the metal deposition, a fraction 0…1
 * @param lflFraction share of the lower flammability limit not to exceed, (0, 1] (0.25 for 25 % LFL)
 * @param reference reference conditions of the normal m³: "0C", "15C" or "20C"
 * @param lflPercent lower flammability limit of hydrogen in air, vol %; null: the data set's (4.0)
 */
export function hydrogenVentilation(currentA: number, efficiency: number, lflFraction: number, reference: string, lflPercent: number | null): [number, number] {
  const lfl = lflPercent ?? (dataPart('electrolysis').hydrogenLFL.volumePercent);
  const h2 = normalGasFlow(currentA * (1 - efficiency), 2, 1, 1, reference);
  const xMax = (lflFraction * lfl) / 100;
  if (!(xMax < 1)) throw new InputError(`lfl_fraction × lfl_percent must stay below 100 vol %; got ${lflFraction} × ${lfl}`);
  return [h2, finite(h2 * (1 / xMax - 1), 'the air flow')];
}
