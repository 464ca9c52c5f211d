/**
 * Every worksheet function in dist/functions.json, called through the production bundle
 * the way Excel calls it, with arbitrary arguments (see support.ts for what is generated), answers
 * with something Excel can show:
 *   a finite number, a text, a boolean, a CustomFunctions.Error, or a non-empty rectangular 2-D
 *   array of those; never NaN, ±Infinity, undefined, null, a plain object, a ragged array, a thrown
 *   non-Excel error, or a promise that does not settle;
 * and its error values follow the message style: #N/A and #VALUE! carry a message in plain words
 * (at most 300 characters, one line, no leaked internals), #NUM! carries none.
 *
 * The functions are discovered from the metadata, so new ones are covered without editing this file.
 * FUZZ_RUNS (default 1000) cases per function; `npm run fuzz` runs 100000.
 */
import fc from 'fast-check';
import { afterAll, beforeAll, describe as suite, expect, it } from 'vitest';
import { type LoadedBundle, loadBundle } from '../bundle/harness';
import { RUNS, SEED, SLOW_CALL_MS, argumentsFor, describe, errorInputs, problemWith, settle } from './support';

let bundle: LoadedBundle;
const casesRun = new Map<string, number>();
const slowest = { id: '', ms: 0 };

beforeAll(() => {
  bundle = loadBundle();
});

afterAll(() => {
  const total = [...casesRun.values()].reduce((a, b) => a + b, 0);
  // One line for the resolving note and for anyone reading CI output.
  console.log(
    `robustness fuzz: ${casesRun.size} functions, ${total} cases (${RUNS} per function), slowest call ${slowest.ms.toFixed(1)} ms (${slowest.id})`,
  );
});

// The metadata is read once at collection time, so each function gets its own test.
const ids = loadBundle().metadata.functions.map((f) => f.id);

suite('every worksheet function answers every input with a value Excel can show', () => {
  it('the bundle registers every function of functions.json', () => {
    const registered = [...bundle.registered.keys()].sort();
    expect(registered).toEqual([...ids].sort());
  });

  for (const id of ids) {
    it(
      id,
      async () => {
        const meta = bundle.metadata.functions.find((f) => f.id === id)!;
        let n = 0;
        await fc.assert(
          fc.asyncProperty(argumentsFor(meta), async (args) => {
            n++;
            const settled = await settle(() => bundle.call(id, ...args));
            if (!settled.ok) throw new Error(`${id}(${describe(args)}) ${settled.problem}`);
            if (settled.ms > slowest.ms) Object.assign(slowest, { id, ms: settled.ms });
            if (settled.ms > SLOW_CALL_MS) throw new Error(`${id}(${describe(args)}) took ${settled.ms.toFixed(0)} ms`);
            const problem = problemWith(settled.value, errorInputs(args));
            if (problem !== null) throw new Error(`${id}(${describe(args)}) gave ${problem}`);
          }),
          { numRuns: RUNS, seed: SEED },
        );
        casesRun.set(id, n);
      },
      Math.max(60_000, RUNS * 60),
    );
  }
});
