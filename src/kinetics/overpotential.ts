import { thermalVoltage } from '../constants';
import { DomainError, finite } from '../errors';
import { cathodicAlpha } from './cathodicAlpha';

/**
 * Solves a·x + ln(1 − e^(−s·x)) = L for x > 0 (s = a + c > a > 0), i.e. e^(a·x) − e^(−c·x) = e^L,
 * in log space so that nothing overflows however large L is. The left side is increasing and
 * concave in x, so Newton steps from the left approach the root monotonically; a bracket keeps
 * every step inside [lo, hi] and falls back to bisection when a step would leave it.
 */
function solvePositive(a: number, c: number, L: number): number {
  const s = a + c;
  const g = (x: number): number => {
    const sx = s * x;
    const tail = sx > Math.LN2 ? Math.log1p(-Math.exp(-sx)) : Math.log(-Math.expm1(-sx));
    return a * x + tail - L;
  };
  const dg = (x: number): number => a + s / Math.expm1(s * x);

  // Starting point: the Tafel line for large currents, the linear (micro-polarisation) law for small ones.
  let x = L > 0 ? L / a : Math.exp(L) / s;
  if (x === 0) return 0; // the root is below the smallest positive double
  let lo = 0;
  let hi = Infinity;
  // Bracket the root: g(lo) < 0 ≤ g(hi).
  for (let k = 0; k < 2100 && hi === Infinity; k++) {
    if (g(x) < 0) {
      lo = x;
      x *= 2;
      if (!Number.isFinite(x)) throw new DomainError('the overpotential is outside the range of double-precision numbers');
    } else hi = x;
  }
  if (hi === Infinity) throw new DomainError('the overpotential could not be bracketed');
  x = lo > 0 ? lo : hi;
  for (let k = 0; k < 400; k++) {
    const gx = g(x);
    if (gx === 0) return x;
    if (gx < 0) lo = x;
    else hi = x;
    let next = x - gx / dg(x);
    if (!(next > lo && next < hi)) next = lo + (hi - lo) / 2;
    if (Math.abs(next - x) <= 1e-15 * x || next === lo || next === hi) return next;
    x = next;
  }
  return x;
}

/**
 * The overpotential η that gives a current density i by the Butler–Volmer equation, the inverse of
 * butlerVolmer, solved numerically to better than 1e-9 V (in practice to a few units in the last
 * place). Works in log space (ln|i| − ln i0), so it stays exact at large overpotentials where
 * exp(αF·η/RT) or a plain Newton step would overflow. i = 0 gives 0; a cathodic (negative) current a
 * negative η. αc defaults to 1 − αa.
 *
 * Syntax: overpotential(i, i0, alphaA, alphaC, temperatureC)
 * Example: overpotential(6.858e-3, 1e-3, 0.5, null, 25) → 0.100 V
 * See also: butlerVolmer, tafelSlope
 *
 * @param i current density, in the units of i0 (anodic positive)
 * @param i0 exchange current density (> 0)
 * @param alphaA anodic transfer coefficient (> 0)
 * @param alphaC cathodic transfer coefficient (> 0), or null for 1 − αa
 * @param temperatureC temperature, °C
 */
export function overpotential(i: number, i0: number, alphaA: number, alphaC: number | null, temperatureC: number): number {
  const c = cathodicAlpha(alphaA, alphaC);
  if (i === 0) return 0;
  const vt = thermalVoltage(temperatureC);
  const L = Math.log(Math.abs(i)) - Math.log(i0);
  const x = i > 0 ? solvePositive(alphaA, c, L) : -solvePositive(c, alphaA, L);
  return finite(x * vt, 'the overpotential');
}
