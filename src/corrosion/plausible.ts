import { InputError } from '../errors';

/**
 * A physically plausible range for an argument with a unit, and what a value outside it most
 * likely is (a value typed in another unit, or two arguments swapped).
 */
export interface Plausibility {
  /** Smallest plausible magnitude (inclusive). */
  readonly lo: number;
  /** Largest plausible magnitude (inclusive). */
  readonly hi: number;
  /** The range in words, for the message and the help. */
  readonly range: string;
  /** Likely mistakes: a value whose magnitude is in [lo, hi] of a hint gets that hint's words. */
  readonly hints?: ReadonlyArray<{ readonly lo: number; readonly hi: number; readonly says: string }>;
  /** Accept negative values (checked by magnitude). */
  readonly signed?: boolean;
}

/** Plausible ranges shared by the corrosion and cathodic-protection functions. */
export const PLAUSIBLE = {
  /** A potential or a voltage in V. */
  volts: { lo: 0, hi: 5, range: 'between −5 and 5 V', signed: true, hints: [{ lo: 20, hi: 5000, says: 'looks like millivolts; this argument is in V (−850 mV is −0.85)' }] },
  /** A density in g/cm³. */
  densityGcm3: { lo: 0.5, hi: 23, range: '0.5 to 23 g/cm³', hints: [{ lo: 500, hi: 23000, says: 'looks like kg/m³; this argument is g/cm³ (7870 kg/m³ is 7.87)' }] },
  /** A Tafel slope in V/decade (magnitude). */
  tafelV: {
    lo: 0.005,
    hi: 1,
    range: '0.005 to 1 V/decade (its magnitude)',
    signed: true,
    hints: [{ lo: 5, hi: 1000, says: 'looks like mV/decade, or a polarization resistance given in place of a Tafel slope; this argument is in V/decade (120 mV/decade is 0.12)' }],
  },
  /** A polarization resistance in Ω·cm². */
  rpOhmCm2: { lo: 1, hi: 1e9, range: '1 to 1e9 Ω·cm²', hints: [{ lo: 1e-6, hi: 1, says: 'looks like a Tafel slope (in V/decade) in place of the polarization resistance; check the order of the arguments' }] },
  /** An equivalent weight in g. */
  equivalentWeightG: { lo: 2, hi: 250, range: '2 to 250 g', hints: [{ lo: 0.002, hi: 0.25, says: 'looks like kg; this argument is in g (iron is 27.92)' }] },
  /** An apparent transfer coefficient (n included). */
  alpha: { lo: 0.01, hi: 4, range: '0.01 to 4', hints: [{ lo: 5, hi: 100, says: 'looks like a percentage; give the fraction (0.5 for 50 %)' }] },
  /** A design or exposure time in years. */
  years: { lo: 0, hi: 200, range: '0 to 200 years', hints: [{ lo: 200, hi: 2e6, says: 'looks like hours or days; this argument is in years' }] },
  /** An anode capacity in A·h/kg. */
  capacityAhKg: { lo: 100, hi: 3000, range: '100 to 3000 A·h/kg', hints: [{ lo: 0.1, hi: 3, says: 'looks like kA·h/kg or a fraction; this argument is A·h/kg (zinc about 780)' }] },
} satisfies Record<string, Plausibility>;

/**
 * Checks that a value with a unit is physically plausible; throws InputError (→ #VALUE!) naming
 * the argument, the likely mistake and the accepted range otherwise. Returns the value.
 *
 * Syntax: plausible(name, value, rule)
 * Example: plausible("density_g_cm3", 7870, PLAUSIBLE.densityGcm3) → throws "density_g_cm3 7870 looks like kg/m³; …"
 * See also: corrosionRate, sternGeary
 */
export function plausible(name: string, value: number, rule: Plausibility): number {
  if (value < 0 && !rule.signed) throw new InputError(`${name} must not be negative; got ${value} (plausible: ${rule.range})`);
  const m = Math.abs(value);
  if (m >= rule.lo && m <= rule.hi) return value;
  const hint = rule.hints?.find((h) => m >= h.lo && m <= h.hi);
  if (hint) throw new InputError(`${name} ${value} ${hint.says}; plausible: ${rule.range}`);
  throw new InputError(`${name} ${value} is outside the physically plausible range ${rule.range}`);
}
