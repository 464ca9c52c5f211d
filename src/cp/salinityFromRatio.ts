/** PSS-78 coefficients (UNESCO 1983, Fofonoff & Millard, Tech. Pap. Mar. Sci. 44, eqs. 1–3). */
const A = [0.008, -0.1692, 25.3851, 14.0941, -7.0261, 2.7081];
const B = [0.0005, -0.0056, -0.0066, -0.0375, 0.0636, -0.0144];
const K = 0.0162;

/**
 * Practical salinity (PSS-78) from the conductivity ratio Rt of a sample to standard seawater
 * (S = 35) at the same temperature and atmospheric pressure:
 * S = Σ aᵢ·Rt^(i/2) + (t − 15)/(1 + k(t − 15))·Σ bᵢ·Rt^(i/2), t on the IPTS-68 scale.
 *
 * Syntax: salinityFromRatio(rt, temperature68C)
 * Example: salinityFromRatio(1, 15) → 35
 * See also: seawaterResistivity
 */
export function salinityFromRatio(rt: number, temperature68C: number): number {
  const x = Math.sqrt(rt);
  let s = 0;
  let ds = 0;
  let p = 1;
  for (let i = 0; i < 6; i++) {
    s += A[i] * p;
    ds += B[i] * p;
    p *= x;
  }
  const dt = temperature68C - 15;
  return s + (dt / (1 + K * dt)) * ds;
}
