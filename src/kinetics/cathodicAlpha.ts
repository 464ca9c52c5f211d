import { InputError } from '../errors';

/**
 * The cathodic transfer coefficient to use: the one given, or 1 − αa when none is given (a
 * one-step, one-electron reaction with symmetric barrier factors). Throws InputError when the
 * default would not be > 0 (αa ≥ 1: give αc).
 *
 * Syntax: cathodicAlpha(alphaA, alphaC)
 * Example: cathodicAlpha(0.4, null) → 0.6
 * See also: butlerVolmer, overpotential
 */
export function cathodicAlpha(alphaA: number, alphaC: number | null): number {
  if (alphaC !== null) return alphaC;
  const c = 1 - alphaA;
  if (!(c > 0)) throw new InputError(`alpha_c defaults to 1 − alpha_a, which is not > 0 for alpha_a = ${alphaA}; give alpha_c (> 0), or an alpha_a below 1`);
  return c;
}
