/**
 * The test suite's view of the production bundle. Loading is done by the one loader,
 * scripts/lib/bundle.mjs (also used by the demo, the reference generator and the benchmark):
 * dist/functions.js evaluated with a CustomFunctions global (in this process's context, or alone in
 * node:vm when a test gives extra globals or asks for isolation), calls by id with every declared
 * parameter passed (null for omitted ones) and an invocation object appended last.
 */
import { beforeAll } from 'vitest';
import { DIST, ErrorCode, FakeError, type FunctionMetadata, type LoadedBundle, loadBundle } from '../../scripts/lib/bundle.mjs';

export { DIST, ErrorCode, FakeError, loadBundle };
export type { FunctionMetadata, LoadedBundle };

/** Unwraps a 1×1 result to its value. */
export function one(result: unknown): unknown {
  if (Array.isArray(result) && result.length === 1 && Array.isArray(result[0]) && result[0].length === 1) return result[0][0];
  return result;
}

/** The message an Excel error value carries ('' for any other value). */
export function messageOf(v: unknown): string {
  return v instanceof FakeError ? (v.message ?? '') : '';
}

/** True when v is an Excel error value, optionally of a given code (e.g. '#N/A'). */
export function isError(v: unknown, code?: string): v is FakeError {
  return v instanceof FakeError && (code === undefined || v.code === code);
}

/**
 * The bundle for one test file, loaded before its tests: `bundle()` returns it, `run(id, …)` calls a
 * function and awaits the result (table look-ups may answer with a promise while the table loads).
 */
export function bundleUnderTest(): { bundle: () => LoadedBundle; run: (id: string, ...args: unknown[]) => Promise<unknown> } {
  let loaded: LoadedBundle | null = null;
  beforeAll(() => {
    loaded = loadBundle();
  });
  const bundle = (): LoadedBundle => {
    if (loaded === null) throw new Error('the bundle is loaded before the tests run');
    return loaded;
  };
  return { bundle, run: async (id, ...args) => await bundle().call(id, ...args) };
}
