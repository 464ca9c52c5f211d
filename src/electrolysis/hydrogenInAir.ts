import { InputError } from '../errors';

/**
 * Hydrogen in an air sweep: the volume (mole) fraction x = V̇_H2/(V̇_H2 + V̇_air) of the mixed
 * stream, and that fraction as a share of the lower flammability limit, x/LFL. Both flows must be
 * at the same reference conditions (ideal gas: volume fractions equal mole fractions).
 *
 * Syntax: hydrogenInAir(h2Flow, airFlow, lflPercent)
 * Example: hydrogenInAir(1, 99, 4) → [0.01, 0.25]
 * See also: normalGasFlow
 *
 * @param h2Flow hydrogen flow into the sweep (≥ 0)
 * @param airFlow air flow, same unit and reference (≥ 0; the sum > 0)
 * @param lflPercent lower flammability limit of hydrogen in air, vol % (4.0 by Zabetakis 1965)
 */
export function hydrogenInAir(h2Flow: number, airFlow: number, lflPercent: number): [number, number] {
  const total = h2Flow + airFlow;
  if (!(total > 0)) throw new InputError('the hydrogen and air flows are both 0; give at least one flow > 0');
  const x = h2Flow / total;
  return [x, x / (lflPercent / 100)];
}
