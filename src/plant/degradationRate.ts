import { InputError, finite } from '../errors';

/** µV per V. */
const UV_PER_V = 1e6;

/** Fewest points accepted by default: two points leave no residual to judge the line by. */
export const MIN_DEGRADATION_POINTS = 3;

/**
 * Degradation rate of a cell or stack from a voltage log: the ordinary least-squares slope of the
 * voltage against operating hours, b = Σ(t − t̄)(U − Ū)/Σ(t − t̄)², in µV/h (the same slope as the
 * spreadsheet's SLOPE(voltages, hours) × 10⁶), with its standard error
 * s_b = √(Σ residual²/(N − 2) / Σ(t − t̄)²) in µV/h and the number of points N. Positive is a rising
 * voltage (a cell losing performance at constant current). The voltage change per operating hour at
 * constant operating conditions is the usual figure of merit; comparing rates needs the same current
 * density, temperature and pressure, which the log itself does not show.
 *
 * Syntax: degradationRate(voltagesV, hours, minPoints)
 * Example: degradationRate([1.80, 1.81, 1.82], [0, 1000, 2000], 3) → [10, 0, 3]
 * See also: cellVoltageBreakdown
 *
 * @param voltagesV logged cell (or stack) voltages, V
 * @param hours operating hours of the same readings, h
 * @param minPoints fewest points accepted (a whole number ≥ 3)
 */
export function degradationRate(voltagesV: readonly number[], hours: readonly number[], minPoints: number): [number, number, number] {
  if (voltagesV.length !== hours.length) {
    throw new InputError(`the log needs one operating-hours value per voltage; got ${voltagesV.length} voltages and ${hours.length} hours`);
  }
  if (!(minPoints >= MIN_DEGRADATION_POINTS)) throw new InputError(`min_points must be a whole number ≥ ${MIN_DEGRADATION_POINTS}; got ${minPoints}`);
  const n = voltagesV.length;
  if (n < minPoints) throw new InputError(`the log has ${n} points with both a voltage and hours; at least ${minPoints} are needed`);
  let tMean = 0;
  let uMean = 0;
  for (let i = 0; i < n; i++) {
    tMean += hours[i];
    uMean += voltagesV[i];
  }
  tMean /= n;
  uMean /= n;
  let stt = 0;
  let stu = 0;
  for (let i = 0; i < n; i++) {
    const dt = hours[i] - tMean;
    stt += dt * dt;
    stu += dt * (voltagesV[i] - uMean);
  }
  if (!(stt > 0)) throw new InputError('every reading of the log is at the same operating hour; a slope needs readings at different hours');
  const slope = stu / stt;
  let sse = 0;
  for (let i = 0; i < n; i++) {
    const r = voltagesV[i] - uMean - slope * (hours[i] - tMean);
    sse += r * r;
  }
  const se = Math.sqrt(sse / (n - 2) / stt);
  return [finite(slope * UV_PER_V, 'the degradation rate'), finite(se * UV_PER_V, 'its standard error'), n];
}
