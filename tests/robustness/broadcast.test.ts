/**
 * A range call answers cell by cell exactly what
 * the function answers for that cell's values given one by one. For every function of
 * functions.json, arguments are generated (mostly valid, sometimes anything), the broadcast ones
 * shaped as ranges that can be combined (R×C, 1×C, R×1, 1×1), and each cell of the range result
 * is compared with a call on single values: the same number (bit for bit), text or logical, or an
 * error with the same code and message. This pins down the adapter's broadcasting, its number fast
 * path (bounds checked inline) against the domain checks of the slow path, and the rule that a
 * cell's error is the first error among its arguments in argument order.
 *
 * Arguments read whole (lists) are passed unchanged to both calls. FUZZ_RUNS/5 cases per function.
 */
import fc from 'fast-check';
import { beforeAll, describe, expect, it } from 'vitest';
import { FakeError, type FunctionMetadata, type LoadedBundle, loadBundle } from '../bundle/harness';
import { RUNS, SEED, describe as show, plausibleCell, wildCell } from './support';

let b: LoadedBundle;
beforeAll(() => {
  b = loadBundle();
});

const ids = loadBundle().metadata.functions.map((f) => f.id);
const CASES = Math.max(50, Math.floor(RUNS / 5));

/** Which parameters broadcast (a 3×1 column alone spills 3 rows), and the width of one result. */
function layout(meta: FunctionMetadata): { broadcast: boolean[]; width: number } {
  const broadcast = meta.parameters.map((_p, i) => {
    const args: unknown[] = meta.parameters.map(() => null);
    args[i] = [[1], [1], [1]];
    const r = b.call(meta.id, ...args);
    return Array.isArray(r) && r.length === 3;
  });
  const one = b.call(meta.id, ...meta.parameters.map(() => null)) as unknown[][];
  return { broadcast, width: one[0].length };
}

type Shaped = { value: unknown } | { rows: number; cols: number; data: unknown[][] };

/** A cell's value (anything but an array: an array given alone is a range, not a cell). */
function cellArb(param: string): fc.Arbitrary<unknown> {
  return fc.oneof({ weight: 6, arbitrary: plausibleCell(param) }, { weight: 1, arbitrary: wildCell.filter((v) => !Array.isArray(v)) });
}

/** One argument: a single value, or a range of a shape that combines with R×C. */
function argArb(param: string, broadcast: boolean, rows: number, cols: number): fc.Arbitrary<Shaped> {
  // a header switch adds a row of labels on top by design (tests/bundle/electrolysis.test.ts checks it)
  if (param === 'header') return fc.constant({ value: null });
  const cell = cellArb(param);
  const grid = (r: number, c: number) =>
    fc.array(fc.array(cell, { minLength: c, maxLength: c }), { minLength: r, maxLength: r }).map((data) => ({ rows: r, cols: c, data }));
  if (!broadcast) return cell.map((value) => ({ value }));
  return fc.oneof(
    { weight: 3, arbitrary: cell.map((value) => ({ value })) },
    { weight: 3, arbitrary: grid(rows, cols) },
    { weight: 1, arbitrary: grid(1, cols) },
    { weight: 1, arbitrary: grid(rows, 1) },
    { weight: 1, arbitrary: grid(1, 1) },
  );
}

const raw = (a: Shaped): unknown => ('value' in a ? a.value : a.data);
const at = (a: Shaped, r: number, c: number): unknown => ('value' in a ? a.value : a.data[a.rows === 1 ? 0 : r][a.cols === 1 ? 0 : c]);

function same(x: unknown, y: unknown): boolean {
  if (x instanceof FakeError || y instanceof FakeError) {
    return x instanceof FakeError && y instanceof FakeError && x.code === y.code && x.message === y.message;
  }
  return Object.is(x, y);
}

describe('a range call answers each cell as a call with that cell’s values would', () => {
  for (const id of ids) {
    it(
      id,
      () => {
        const meta = b.metadata.functions.find((f) => f.id === id)!;
        const { broadcast, width } = layout(meta);
        const arb = fc
          .tuple(fc.integer({ min: 1, max: 4 }), fc.integer({ min: 1, max: 4 }))
          .chain(([rows, cols]) => {
            const c = width > 1 ? 1 : cols; // functions with a row per result take columns
            return fc.tuple(fc.constant([rows, c] as const), fc.tuple(...meta.parameters.map((p, i) => argArb(p.name, broadcast[i], rows, c))));
          });
        fc.assert(
          fc.property(arb, ([[R, C], args]) => {
            const rows = args.reduce((m, a) => ('value' in a ? m : Math.max(m, a.rows)), 1);
            const cols = args.reduce((m, a) => ('value' in a ? m : Math.max(m, a.cols)), 1);
            const whole = b.call(id, ...args.map(raw)) as unknown[][];
            const where = () => `${id}(${show(args.map(raw))}) as ${R}×${C}`;
            if (whole.length === 1 && whole[0].length === 1 && rows * cols > 1 && whole[0][0] instanceof FakeError) {
              // one error for the whole call (a list argument that cannot be read): every cell agrees
              for (let r = 0; r < rows; r++) {
                for (let c = 0; c < cols; c++) {
                  const single = b.call(id, ...args.map((a) => at(a, r, c))) as unknown[][];
                  if (!same(single[0][0], whole[0][0])) throw new Error(`${where()}: one error ${show([whole[0][0]])} but cell (${r + 1}, ${c + 1}) alone gives ${show([single[0][0]])}`);
                }
              }
              return;
            }
            expect(whole.length, where()).toBe(rows);
            for (let r = 0; r < rows; r++) {
              expect(whole[r].length, where()).toBe(width > 1 ? width : cols);
              for (let c = 0; c < cols; c++) {
                const single = b.call(id, ...args.map((a) => at(a, r, c))) as unknown[][];
                for (let j = 0; j < width; j++) {
                  const got = whole[r][width > 1 ? j : c];
                  const want = single[0][j];
                  if (!same(got, want)) {
                    throw new Error(`${where()}: cell (${r + 1}, ${c + 1}) is ${show([got])} in the range call but ${show([want])} alone`);
                  }
                }
              }
            }
          }),
          { numRuns: CASES, seed: SEED },
        );
      },
      Math.max(60_000, CASES * 100),
    );
  }
});
