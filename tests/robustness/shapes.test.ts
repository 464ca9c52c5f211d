/**
 * Shape rules (documented in functions/adapter.ts and the README's conventions): ranges
 * broadcast Excel-style (a single value with a range, equal shapes element by element, a single
 * row against a single column gives the full table); shapes that cannot be combined, say 2×3
 * against 3×2, give ONE #VALUE! whose message names each range's shape. Arguments read whole
 * (COMBINE's potentials, HALFCELLBYSPECIES' species, …) are not broadcast and take part in no shape.
 *
 * Every function of dist/functions.json is checked; which of its arguments broadcast is found by
 * calling it with a 3×1 column in that argument alone (a broadcast argument spills 3 rows).
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { FakeError, type LoadedBundle, loadBundle } from '../bundle/harness';

let b: LoadedBundle;
beforeAll(() => {
  b = loadBundle();
});

const column = (n: number, v: unknown): unknown[][] => Array.from({ length: n }, () => [v]);
const block = (rows: number, cols: number, v: unknown): unknown[][] => Array.from({ length: rows }, () => Array.from({ length: cols }, () => v));
const rowsOf = (r: unknown): number => (Array.isArray(r) ? r.length : 1);

/** The indices of the parameters of `id` that broadcast (not read whole). */
function broadcastParams(id: string): number[] {
  const meta = b.metadata.functions.find((f) => f.id === id)!;
  const out: number[] = [];
  meta.parameters.forEach((_p, i) => {
    const args: unknown[] = meta.parameters.map(() => null);
    args[i] = column(3, 1);
    if (rowsOf(b.call(id, ...args)) === 3) out.push(i);
  });
  return out;
}

describe('ranges that cannot be broadcast give one #VALUE! with a message', () => {
  it('NERNST: E0 2×3 against Q 3×2', () => {
    const r = b.call('NERNST', block(2, 3, 0.352), 2, block(3, 2, 10));
    expect(r).toHaveLength(1);
    expect((r as unknown[][])[0]).toHaveLength(1);
    const e = (r as unknown[][])[0][0] as FakeError;
    expect(e).toBeInstanceOf(FakeError);
    expect(e.code).toBe('#VALUE!');
    expect(e.message).toBe(
      'ranges of different shapes cannot be combined (E0_V is 2×3, Q is 3×2); give ranges of the same size, or a single row with a single column',
    );
  });

  it('every function, every pair of broadcast arguments', () => {
    let pairs = 0;
    for (const meta of b.metadata.functions) {
      const params = broadcastParams(meta.id);
      for (let x = 0; x < params.length; x++) {
        for (let y = x + 1; y < params.length; y++) {
          const args: unknown[] = meta.parameters.map(() => null);
          args[params[x]] = block(2, 3, 1);
          args[params[y]] = block(3, 2, 1);
          const r = b.call(meta.id, ...args) as unknown[][];
          const where = `${meta.id}(${meta.parameters[params[x]].name} 2×3, ${meta.parameters[params[y]].name} 3×2)`;
          expect(r.length, where).toBe(1);
          expect(r[0].length, where).toBe(1);
          const e = r[0][0] as FakeError;
          expect(e, where).toBeInstanceOf(FakeError);
          expect(e.code, where).toBe('#VALUE!');
          expect(e.message, where).toContain(`${meta.parameters[params[x]].name} is 2×3`);
          expect(e.message, where).toContain(`${meta.parameters[params[y]].name} is 3×2`);
          pairs++;
        }
      }
    }
    expect(pairs).toBeGreaterThan(40);
  });

  it('a column of 2 against a column of 3 is refused the same way', () => {
    const r = b.call('NERNST', column(2, 0.352), 2, column(3, 10)) as unknown[][];
    expect(r).toHaveLength(1);
    expect((r[0][0] as FakeError).code).toBe('#VALUE!');
    expect((r[0][0] as FakeError).message).toContain('E0_V is 2×1, Q is 3×1');
  });
});

describe('ranges that can be broadcast', () => {
  it('a single row against a single column gives the full table', () => {
    const r = b.call('NERNST', 0, [[1, 2, 3]], column(4, 10)) as number[][];
    expect(r.map((row) => row.length)).toEqual([3, 3, 3, 3]);
    expect(r[3][2]).toBeCloseTo(-0.0591593 / 3, 7);
  });
  it('a 1×1 range is a single value', () => {
    expect(b.call('NERNST', [[0.5]], [[1]], [[1]])).toEqual([[0.5]]);
  });
  it('a result of more than 4,000,000 cells is one #VALUE! with a message, not an attempt', () => {
    const row = [Array.from({ length: 2001 }, () => 10)];
    const r = b.call('NERNST', 0, 1, row, column(2001, 25)) as unknown[][];
    expect(r).toHaveLength(1);
    expect((r[0][0] as FakeError).code).toBe('#VALUE!');
    expect((r[0][0] as FakeError).message).toMatch(/4004001 cells; at most 4000000/);
  });
  it('arguments read whole (COMBINE) take part in no shape', () => {
    expect(b.call('COMBINE', block(2, 3, 0.5), block(3, 2, 1))).toEqual([[0.5]]);
  });
});
