import { DomainError } from '../errors';
import { logK } from './logK';

/**
 * Equilibrium constant K = 10^(nFE/(RT ln 10)).
 * Throws DomainError when K is outside double range (|log10 K| beyond about 308); logK still answers.
 *
 * Syntax: keq(potentialV, n, temperatureC)
 * Example: keq(0.1, 1, 25) → 49.0
 * See also: logK, eFromK
 */
export function keq(potentialV: number, n: number, temperatureC: number): number {
  const lg = logK(potentialV, n, temperatureC);
  const k = Math.pow(10, lg);
  if (!Number.isFinite(k) || k === 0) throw new DomainError(`K = 10^${lg.toFixed(1)} is outside the range of double-precision numbers`);
  return k;
}
