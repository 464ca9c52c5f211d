/**
 * Loads the production bundle dist/functions.js the way Excel's runtime does: evaluated in a
 * fresh context with nothing but a CustomFunctions global (no Office, Excel, window, document),
 * collecting the functions it associates. Calls go by id with every declared parameter passed
 * (null for omitted ones) and an invocation object appended last.
 *
 * Used by the bundle tests, the benchmark and the demo.
 */
import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import vm from 'node:vm';

export const DIST = resolve(__dirname, '../../dist');

export class FakeError {
  constructor(
    public readonly code: string,
    public readonly message?: string,
  ) {}
}

export const ErrorCode = {
  invalidValue: '#VALUE!',
  notAvailable: '#N/A',
  divisionByZero: '#DIV/0!',
  invalidNumber: '#NUM!',
  nullReference: '#NULL!',
  invalidName: '#NAME?',
  invalidReference: '#REF!',
} as const;

export interface FunctionMetadata {
  id: string;
  name: string;
  description?: string;
  helpUrl?: string;
  parameters: Array<{ name: string; description?: string; type?: string; dimensionality?: string; optional?: boolean }>;
  result: { type?: string; dimensionality?: string };
}

export interface LoadedBundle {
  metadata: { functions: FunctionMetadata[] };
  registered: Map<string, (...args: unknown[]) => unknown>;
  /** The sandbox's global object (to inspect what the bundle defined). */
  sandbox: Record<string, unknown>;
  /** Calls a function by id like Excel: pads omitted parameters with null, appends an invocation. */
  call(id: string, ...args: unknown[]): unknown;
}

export function loadBundle(extraGlobals: Record<string, unknown> = {}): LoadedBundle {
  const code = readFileSync(resolve(DIST, 'functions.js'), 'utf8');
  const metadata = JSON.parse(readFileSync(resolve(DIST, 'functions.json'), 'utf8')) as { functions: FunctionMetadata[] };
  const registered = new Map<string, (...args: unknown[]) => unknown>();
  const CustomFunctions = {
    Error: FakeError,
    ErrorCode,
    associate(idOrMap: string | Record<string, (...a: unknown[]) => unknown>, fn?: (...a: unknown[]) => unknown) {
      if (typeof idOrMap === 'string') registered.set(idOrMap.toUpperCase(), fn!);
      else for (const [k, v] of Object.entries(idOrMap)) registered.set(k.toUpperCase(), v);
    },
  };
  const sandbox: Record<string, unknown> = { CustomFunctions, ...extraGlobals };
  vm.createContext(sandbox);
  vm.runInContext(code, sandbox, { filename: 'functions.js' });
  const byId = new Map(metadata.functions.map((f) => [f.id, f]));
  return {
    metadata,
    registered,
    sandbox,
    call(id: string, ...args: unknown[]) {
      const meta = byId.get(id);
      const fn = registered.get(id);
      if (!meta || !fn) throw new Error(`no function ${id} in the bundle`);
      if (args.length > meta.parameters.length) throw new Error(`${id} takes ${meta.parameters.length} arguments`);
      const full = [...args];
      while (full.length < meta.parameters.length) full.push(null);
      full.push({ functionName: id, address: 'Sheet1!A1', setResult() {}, onCanceled: null });
      return fn(...full);
    },
  };
}

/** Unwraps a 1×1 result to its value. */
export function one(result: unknown): unknown {
  if (Array.isArray(result) && result.length === 1 && Array.isArray(result[0]) && result[0].length === 1) return result[0][0];
  return result;
}

/** True when v is an Excel error value, optionally of a given code (e.g. '#N/A'). */
export function isError(v: unknown, code?: string): v is FakeError {
  return v instanceof FakeError && (code === undefined || v.code === code);
}
