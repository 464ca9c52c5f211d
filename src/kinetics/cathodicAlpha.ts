import { DomainError } from '../errors';

/**
 * The cathodic transfer coefficient to use: the one given, or 1 − αa when none is given (a
 * one-step, one-electron reaction with symmetric barrier factors). Throws DomainError when the
 * default would not be > 0 (αa ≥ 1: give αc).
 *
 * Syntax: cathodicAlpha(alphaA, alphaC)
 * Example: cathodicAlpha(0.4, null) → 0.6
 * See also: butlerVolmer, overpotential
 */
export function cathodicAlpha(alphaA: number, alphaC: number | null): number {
  if (alphaC !== null) return alphaC;
  const c = 1 - alphaA;
  if (!(c > 0)) throw new DomainError('alpha_c defaults to 1 − alpha_a, which is not > 0 here; give alpha_c');
  return c;
}
