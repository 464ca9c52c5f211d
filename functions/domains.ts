/**
 * Domains of number arguments. Each is one record: its bounds (from which both the test and the
 * inline check of the element loop are made) and the words that say what is accepted.
 */

/** Bounds of a domain. Missing bounds are open (−∞, +∞). */
export interface Bounds {
  readonly lo: number;
  readonly loIncl: boolean;
  readonly hi: number;
  readonly hiIncl: boolean;
  /** Only whole numbers. */
  readonly whole: boolean;
  /** 0 is excluded. */
  readonly nonZero: boolean;
}

/** A domain rule for a number: a predicate and the words that describe what is accepted. */
export interface Domain {
  readonly test: (x: number) => boolean;
  /** What is accepted, in plain words ("> 0", "a whole number ≥ 1"). */
  readonly accepts: string;
  /** The bounds the test was made from; a domain without them is checked by calling `test`. */
  readonly bounds?: Bounds;
}

/** A domain from its bounds and its words; the test follows from the bounds. */
export function bounded(b: Partial<Bounds>, accepts: string): Domain {
  const bounds: Bounds = {
    lo: b.lo ?? -Infinity,
    loIncl: b.loIncl ?? false,
    hi: b.hi ?? Infinity,
    hiIncl: b.hiIncl ?? false,
    whole: b.whole ?? false,
    nonZero: b.nonZero ?? false,
  };
  return { bounds, accepts, test: (x) => (x !== 0 || !bounds.nonZero) && within(bounds, x) };
}

/**
 * True when x is within the bounds, 0 excepted (nonZero is the caller's to check). Kept small so
 * that it is inlined into the element loops.
 */
export function within(b: Bounds, x: number): boolean {
  return (x > b.lo || (b.loIncl && x === b.lo)) && (x < b.hi || (b.hiIncl && x === b.hi)) && (!b.whole || Math.floor(x) === x);
}

/** Largest magnitude of a whole-number argument (electrons, charges). */
const MAX_WHOLE = 1e6;

export const domains = {
  any: bounded({}, 'any number'),
  positive: bounded({ lo: 0 }, '> 0'),
  nonNegative: bounded({ lo: 0, loIncl: true }, '≥ 0'),
  nonZero: bounded({ nonZero: true }, '≠ 0'),
  positiveInteger: bounded({ lo: 1, loIncl: true, hi: MAX_WHOLE, hiIncl: true, whole: true }, 'a whole number ≥ 1'),
  integer: bounded({ lo: -MAX_WHOLE, loIncl: true, hi: MAX_WHOLE, hiIncl: true, whole: true }, 'a whole number'),
  nonZeroInteger: bounded({ lo: -MAX_WHOLE, loIncl: true, hi: MAX_WHOLE, hiIncl: true, whole: true, nonZero: true }, 'a whole number ≠ 0'),
  /** Temperatures in °C: above absolute zero (and below 1e6 °C, far beyond any solution chemistry). */
  temperature: bounded({ lo: -273.15, hi: 1e6 }, '> −273.15 °C'),
  /** Faradaic or current efficiency as a fraction. */
  efficiency: bounded({ lo: 0, hi: 1, hiIncl: true }, 'a fraction in (0, 1]'),
  /** Transfer coefficients. */
  unitInterval: bounded({ lo: 0, hi: 1 }, 'a fraction in (0, 1)'),
  /** Fractions 0…1 inclusive (coating breakdown factors). */
  fraction: bounded({ lo: 0, loIncl: true, hi: 1, hiIncl: true }, 'between 0 and 1'),
  pH: bounded({ lo: -5, loIncl: true, hi: 20, hiIncl: true }, 'between −5 and 20'),
} satisfies Record<string, Domain>;
