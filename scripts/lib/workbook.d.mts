// Types for scripts/lib/workbook.mjs (used by the demo test).
import type { Tree, Value } from './formula.mjs';
export interface LaidCell {
  r: number;
  c: number;
  addr: string;
  value?: unknown;
  formula?: string;
  tree?: Tree;
  role: string;
  digits?: number;
  unit?: string;
  label?: string;
  expect?: string;
}
export interface LaidSheet {
  sheet: { name: string; title: string; blocks: unknown[] };
  cells: Map<string, LaidCell>;
  placed: unknown[];
  lastRow: number;
}
export interface EvaluatedSheet {
  results: Map<string, Value>;
  spills: Map<string, { rows: number; cols: number }>;
  formulas: LaidCell[];
  valueAt(r: number, c: number): Promise<unknown>;
}
export const COLS: { label: number; value: number; unit: number; note: number };
export function layoutSheet(sheet: unknown): LaidSheet;
export function evaluateSheet(laid: LaidSheet, bundle: unknown): Promise<EvaluatedSheet>;
export function errorsOf(laid: LaidSheet, ev: EvaluatedSheet): Array<{ addr: string; formula: string; code: string; message?: string; count: number; expected: boolean }>;
