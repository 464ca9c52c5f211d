import { finite } from '../errors';

/**
 * Number of anodes needed (DNV-RP-B401 §7.8): the larger of the current requirement
 * N ≥ Ic/Ia (give the initial and the final demand with the matching output and take the larger)
 * and, when masses are given, the mass requirement N ≥ Ma/ma; rounded up to a whole anode.
 *
 * Syntax: anodeCount(currentDemandA, outputPerAnodeA, totalMassKg, massPerAnodeKg)
 * Example: anodeCount(30, 2, null, null) → 15
 * See also: anodeOutput, anodeMass
 */
export function anodeCount(currentDemandA: number, outputPerAnodeA: number, totalMassKg: number | null, massPerAnodeKg: number | null): number {
  let n = currentDemandA / outputPerAnodeA;
  if (totalMassKg !== null && massPerAnodeKg !== null) n = Math.max(n, totalMassKg / massPerAnodeKg);
  // a ratio that is a whole number up to rounding (30/2 → 15.000000000000002) is that number
  const whole = Math.round(n);
  return finite(Math.abs(n - whole) < 1e-9 * Math.max(1, n) ? whole : Math.ceil(n), 'the number of anodes');
}
