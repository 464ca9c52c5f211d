import { InputError, finite } from '../errors';

/**
 * Pitting factor (ASTM G46): the deepest pit divided by the average penetration from mass loss,
 * both in the same unit. 1 means uniform corrosion; the larger, the more localised.
 *
 * Syntax: pittingFactor(deepestPit, averagePenetration)
 * Example: pittingFactor(500, 50) → 10
 * See also: massLossRate
 */
export function pittingFactor(deepestPit: number, averagePenetration: number): number {
  if (deepestPit < averagePenetration) {
    throw new InputError(`the deepest pit (${deepestPit}) is shallower than the average penetration (${averagePenetration}): the arguments look swapped`);
  }
  return finite(deepestPit / averagePenetration, 'the pitting factor');
}
