// Types for scripts/lib/formula.mjs (used by the demo and docs tests).
export interface ErrorValue {
  code: string;
  message?: string;
}
export type Scalar = number | string | boolean | null | ErrorValue;
export type Value = Scalar | Scalar[][];
export type Tree = { k: string; [key: string]: unknown };
export interface EvalContext {
  cell(r: number, c: number): Promise<Scalar> | Scalar;
  known(id: string): boolean;
  dimensionality(id: string, i: number): string | undefined;
  call(id: string, args: unknown[]): unknown;
}
export class FormulaError implements ErrorValue {
  constructor(code: string, message?: string);
  code: string;
  message?: string;
}
export function isErrorValue(v: unknown): v is ErrorValue;
export function colName(c: number): string;
export function address(r: number, c: number): string;
export function parseAddress(a: string): { r: number; c: number };
export function parseFormula(text: string): Tree;
export function cellwrightCalls(tree: Tree, out?: Set<string>): Set<string>;
export function unwrap(v: unknown): unknown;
export function evaluate(tree: Tree, ctx: EvalContext): Promise<Value>;
