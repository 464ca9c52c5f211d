import { InputError } from '../errors';

/**
 * Current efficiency at a temperature, interpolated linearly in a curve the user supplies (points
 * of temperature and efficiency read from the bath supplier's data or the shop's own panels),
 * for deposits whose efficiency depends strongly on temperature, such as hard chromium. No curve
 * is built in, and none is extrapolated: a temperature outside the points given is an error.
 * The points may be in any order; two points at one temperature are refused.
 *
 * Syntax: efficiencyCurve(temperature_C, temperatures_C, efficiencies)
 * Example: efficiencyCurve(55, [45, 55, 65], [0.2, 0.16, 0.12]) → 0.16
 * See also: plateTime, plateThickness
 */
export function efficiencyCurve(temperatureC: number, temperaturesC: readonly number[], efficiencies: readonly number[]): number {
  if (temperaturesC.length !== efficiencies.length) {
    throw new InputError(`the curve needs as many temperatures as efficiencies; got ${temperaturesC.length} and ${efficiencies.length}`);
  }
  if (temperaturesC.length < 2) throw new InputError('the curve needs at least two points');
  const pts = temperaturesC.map((t, i) => ({ t, e: efficiencies[i] })).sort((a, b) => a.t - b.t);
  for (let i = 0; i < pts.length; i++) {
    const { t, e } = pts[i];
    if (!(e > 0 && e <= 1)) {
      throw new InputError(`the efficiency ${e} at ${t} °C must be a fraction in (0, 1]${e > 1 && e <= 100 ? ` (give ${+(e / 100).toPrecision(6)} for ${e} %)` : ''}`);
    }
    if (i > 0 && t === pts[i - 1].t) throw new InputError(`the curve has two points at ${t} °C`);
  }
  const lo = pts[0].t;
  const hi = pts[pts.length - 1].t;
  if (!(temperatureC >= lo && temperatureC <= hi)) {
    throw new InputError(`${temperatureC} °C is outside the curve, which covers ${lo} to ${hi} °C; add points rather than extrapolate`);
  }
  let j = 1;
  while (pts[j].t < temperatureC) j++;
  const a = pts[j - 1];
  const b = pts[j];
  return a.e + ((b.e - a.e) * (temperatureC - a.t)) / (b.t - a.t);
}
