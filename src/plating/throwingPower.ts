import { InputError } from '../errors';

/**
 * Throwing power of a plating bath from a Haring–Blum cell, in %: T = 100·(L − M)/(L + M − 2), with
 * L the ratio of the far to the near cathode's distance from the anode (the primary current
 * ratio; 5 in the usual cell) and M the ratio of the deposit weight on the near cathode to that on
 * the far one. 0 % is a bath that follows the primary current distribution (M = L), +100 % equal
 * deposits (M = 1), −100 % nothing on the far cathode.
 * Source: the formula for the Haring–Blum cell as in Big Chemical Encyclopedia (chempedia.info,
 * "Haring-Blum cathode") and Corrosionpedia, "Throwing power".
 *
 * Syntax: throwingPower(distance_ratio, weight_ratio)
 * Example: throwingPower(5, 3) → 33.3 %
 * See also: hullCell
 */
export function throwingPower(distanceRatio: number, weightRatio: number): number {
  if (!(distanceRatio > 1)) throw new InputError(`distance_ratio is the far cathode's distance over the near one's and must be > 1; got ${distanceRatio}`);
  const d = distanceRatio + weightRatio - 2;
  if (!(d > 0)) {
    throw new InputError(`weight_ratio ${weightRatio} is at or below 2 − L = ${2 - distanceRatio}, where the formula has no meaning; check that it is the near cathode's weight over the far one's`);
  }
  return (100 * (distanceRatio - weightRatio)) / d;
}
