import { InputError } from '../errors';

/**
 * Coating breakdown factor of DNV-RP-B401 (§6.4, fc = a + b·t): initial fci = a, mean
 * fcm = a + b·t/2 and final fcf = a + b·t at the design life t. A final factor above 1 is taken as
 * 1 (§6.4.5); when the coating is used up before the design life (a + b·t > 1) the mean is
 * fcm = 1 − (1 − a)²/(2·b·t) (§6.4.5).
 *
 * Syntax: coatingBreakdown(a, b, designLifeYears, phase)
 * Example: coatingBreakdown(0.05, 0.025, 20, "mean") → 0.30
 * See also: currentDemand, anodeMass
 *
 * @param a initial breakdown (0…1)
 * @param b yearly breakdown rate, 1/year (≥ 0)
 * @param designLifeYears design life, years
 * @param phase "initial", "mean" or "final"
 */
export function coatingBreakdown(a: number, b: number, designLifeYears: number, phase: string): number {
  if (!(a >= 0 && a <= 1)) throw new InputError(`a must be a fraction between 0 and 1; got ${a}`);
  if (!(b >= 0 && b <= 1)) throw new InputError(`b must be a yearly fraction between 0 and 1; got ${b}`);
  const p = phase.trim().toLowerCase();
  const t = designLifeYears;
  if (p === 'initial') return a;
  if (p === 'final') return Math.min(1, a + b * t);
  if (p === 'mean') {
    if (a + b * t <= 1) return a + (b * t) / 2;
    return 1 - (1 - a) ** 2 / (2 * b * t);
  }
  throw new InputError(`phase must be "initial", "mean" or "final"; got "${phase}"`);
}
