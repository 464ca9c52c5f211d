import { asciiFormula } from '../chem/asciiFormula';
import { InputError, NotFoundError } from '../errors';
import { atomicWeight } from '../faraday/atomicWeight';
import { quote } from '../text/quote';
import { MAX_FORMULA_CHARS } from '../textLimits';

/** An alloy read from its composition: element symbols, mass fractions (summing to 1) and atomic weights. */
export interface Alloy {
  readonly symbols: readonly string[];
  readonly fractions: readonly number[];
  readonly atomicWeights: readonly number[];
}

/** How far the mass percentages may sum from 100 (rounding in a written composition). */
const SUM_TOLERANCE = 0.5;

const EXAMPLE = 'each element symbol followed by its mass percent, e.g. "Zn86Ni14" or "Sn60Pb40"';

/**
 * Reads an alloy composition written as element symbols each followed by its mass (weight) percent,
 * the way solder and plated alloys are designated ("Sn60Pb40" is 60 wt % tin): "Zn86Ni14",
 * "Sn96.5Ag3Cu0.5", spaces allowed between the parts ("Zn 86 Ni 14"). The percentages must sum to
 * 100 within ±0.5 and are then scaled to sum exactly to 1. Numbers that sum to 1 ("Zn0.86Ni0.14")
 * are refused with a message: they read as fractions (or as atom fractions of a chemical formula),
 * and taking them as either would be a guess. Atomic weights are IUPAC standard atomic weights.
 *
 * Syntax: parseAlloy(text)
 * Example: parseAlloy("Zn86Ni14") → { symbols: ["Zn", "Ni"], fractions: [0.86, 0.14], atomicWeights: [65.38, 58.693] }
 * See also: alloyEquiv, alloyDensity
 */
export function parseAlloy(text: string): Alloy {
  if (text.length > MAX_FORMULA_CHARS) throw new InputError(`an alloy composition has at most ${MAX_FORMULA_CHARS} characters`);
  const s = asciiFormula(text).trim();
  if (s === '') throw new InputError(`give the alloy as ${EXAMPLE}`);
  const token = /\s*([A-Za-z][a-z]?)\s*(\d+(?:\.\d*)?|\.\d+)?\s*/y;
  const symbols: string[] = [];
  const percents: number[] = [];
  let at = 0;
  while (at < s.length) {
    token.lastIndex = at;
    const m = token.exec(s);
    if (m === null || m[2] === undefined || !/^[A-Z]/.test(m[1])) {
      throw new InputError(`cannot read the alloy ${quote(s)} at ${quote(s.slice(at, at + 12))}; write ${EXAMPLE} (element symbols are case-sensitive)`);
    }
    if (symbols.includes(m[1])) throw new InputError(`the alloy ${quote(s)} names ${m[1]} twice`);
    symbols.push(m[1]);
    percents.push(Number(m[2]));
    at = token.lastIndex;
  }
  const atomicWeights = symbols.map((e) => {
    try {
      return atomicWeight(e);
    } catch (err) {
      if (err instanceof NotFoundError) throw new NotFoundError(`the alloy ${quote(s)}: ${err.message}`);
      throw err;
    }
  });
  const sum = percents.reduce((a, b) => a + b, 0);
  if (sum > 0.99 && sum < 1.01) {
    throw new InputError(`the numbers of the alloy ${quote(s)} sum to 1; write mass percent, not fractions (e.g. "Zn86Ni14" for 14 wt % nickel)`);
  }
  if (!(Math.abs(sum - 100) <= SUM_TOLERANCE)) {
    throw new InputError(`the mass percentages of the alloy ${quote(s)} sum to ${+sum.toPrecision(6)}; they must sum to 100 (±${SUM_TOLERANCE})`);
  }
  return { symbols, fractions: percents.map((p) => p / sum), atomicWeights };
}
