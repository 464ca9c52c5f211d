import { InputError } from '../errors';
import { salinityFromRatio } from './salinityFromRatio';

/** Conductivity of standard seawater, S = 35 at 15 °C (IPTS-68) and 1 atm: 42.914 mS/cm (UNESCO 1983). */
export const C35_15_S_PER_M = 4.2914;
/** rt(t) = C(35, t, 0)/C(35, 15, 0), UNESCO 1983 eq. 3. */
const C = [0.6766097, 2.00564e-2, 1.104259e-4, -6.9698e-7, 1.0031e-9];

/**
 * Resistivity of seawater at atmospheric pressure from its practical salinity and temperature, by
 * the practical salinity scale PSS-78 (UNESCO 1983) solved for the conductivity ratio, in Ω·m.
 * PSS-78 holds for 2 ≤ S ≤ 42 and −2 to 35 °C; outside that range the result is refused (#VALUE!).
 * The temperature is on ITS-90 and converted to IPTS-68 (t68 = 1.00024·t90) for the formula.
 *
 * Syntax: seawaterResistivity(salinity, temperatureC)
 * Example: seawaterResistivity(35, 15) → 0.2330 Ω·m
 * See also: salinityFromRatio, wennerResistivity
 */
export function seawaterResistivity(salinity: number, temperatureC: number): number {
  if (!(salinity >= 2 && salinity <= 42)) throw new InputError(`salinity ${salinity} is outside the range of PSS-78 (2 to 42; open seawater is about 35)`);
  if (!(temperatureC >= -2 && temperatureC <= 35)) throw new InputError(`temperature ${temperatureC} °C is outside the range of PSS-78 (−2 to 35 °C)`);
  const t68 = 1.00024 * temperatureC;
  // Newton on Rt: S(Rt) is smooth and increasing; start from S/35
  let rt = salinity / 35;
  for (let k = 0; k < 50; k++) {
    const f = salinityFromRatio(rt, t68) - salinity;
    const h = 1e-7 * Math.max(rt, 1e-3);
    const df = (salinityFromRatio(rt + h, t68) - salinityFromRatio(rt - h, t68)) / (2 * h);
    const step = f / df;
    rt -= step;
    if (Math.abs(step) < 1e-13) break;
  }
  let r = 0;
  for (let i = C.length - 1; i >= 0; i--) r = r * t68 + C[i];
  return 1 / (rt * r * C35_15_S_PER_M);
}
