import Decimal from 'decimal.js';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import atomicWeights from '../../data/atomic-weights.json';
import species from '../../data/species.json';
import verification from '../../data/verification.json';
import { parseSpecies } from '../../src/chem/formula';
import { atomicWeight } from '../../src/faraday/atomicWeight';
import { molarMass } from '../../src/faraday/molarMass';

// molarMass sums the atomic weights with decimal.js-light, the small subset of decimal.js by the same
// author (plus, times, toNumber at the default 20 significant digits, rounding half up). The expected
// value here is the same sum made with decimal.js itself: both must give the same double, bit for bit.
function withDecimalJs(formula: string): number {
  const { elements } = parseSpecies(formula.trim());
  let sum = new Decimal(0);
  for (const symbol of Object.keys(elements)) sum = sum.plus(new Decimal(atomicWeight(symbol)).times(elements[symbol]));
  return sum.toNumber();
}

describe('molarMass with decimal.js-light gives what decimal.js gives', () => {
  it('every element, every species of the species data, every formula of the check cases', () => {
    const formulas = new Set<string>();
    for (const e of atomicWeights.elements) formulas.add(e.symbol);
    for (const s of species.species) if (s.formula !== 'e-') formulas.add(s.formula.replace(/\^?\d*[+-]$/, ''));
    for (const c of verification.cases as Array<{ function: string; args: unknown[] }>) {
      if (c.function === 'MOLARMASS' && typeof c.args[0] === 'string') formulas.add(c.args[0]);
    }
    let compared = 0;
    for (const f of formulas) {
      let expected: number;
      try {
        expected = withDecimalJs(f);
      } catch {
        continue; // not a formula the reader takes (e.g. a charge written another way): nothing to compare
      }
      expect(molarMass(f), f).toBe(expected);
      compared++;
    }
    expect(compared).toBeGreaterThan(100); // 127 when written
  });

  it('random formulas: up to six elements, counts up to 10^6, decimal hydrate multipliers', () => {
    const symbols = atomicWeights.elements.map((e) => e.symbol);
    const part = fc.tuple(fc.constantFrom(...symbols), fc.integer({ min: 1, max: 1_000_000 })).map(([s, n]) => `${s}${n === 1 ? '' : n}`);
    const formula = fc
      .tuple(fc.array(part, { minLength: 1, maxLength: 6 }), fc.option(fc.tuple(fc.constantFrom('0.5', '1.5', '2', '12', '0.25'), fc.array(part, { minLength: 1, maxLength: 3 }))))
      .map(([main, hydrate]) => (hydrate === null ? main.join('') : `${main.join('')}·${hydrate[0]}${hydrate[1].join('')}`));
    fc.assert(
      fc.property(formula, (f) => {
        expect(molarMass(f), f).toBe(withDecimalJs(f));
      }),
      { numRuns: 3000 },
    );
  });
});
