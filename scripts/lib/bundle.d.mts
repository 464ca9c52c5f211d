// Types of scripts/lib/bundle.mjs, for the TypeScript test suite (tests/bundle/harness.ts).
export declare const ROOT: string;
export declare const DIST: string;

export declare class FakeError {
  constructor(code: string, message?: string);
  readonly code: string;
  readonly message?: string;
}

export declare const ErrorCode: {
  readonly invalidValue: '#VALUE!';
  readonly notAvailable: '#N/A';
  readonly divisionByZero: '#DIV/0!';
  readonly invalidNumber: '#NUM!';
  readonly nullReference: '#NULL!';
  readonly invalidName: '#NAME?';
  readonly invalidReference: '#REF!';
};

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
  byId: Map<string, FunctionMetadata>;
  /** The sandbox's global object (to inspect what the bundle defined). */
  sandbox: Record<string, unknown>;
  /** Calls a function by id like Excel: pads omitted parameters with null, appends an invocation. */
  call(id: string, ...args: unknown[]): unknown;
}

export declare function ensureBuilt(options?: { quiet?: boolean }): string;
/** The scripts that make up the functions, in the order the page loads them. */
export declare const FUNCTION_SCRIPTS: readonly string[];
/** The array data.js puts its modules in. */
export declare const CHUNK_GLOBAL: string;
export declare function loadBundle(extraGlobals?: Record<string, unknown>, distDir?: string, options?: { isolated?: boolean }): LoadedBundle;
