export const NAMESPACE: string;
export class UnreadableError extends Error {}
export function typedForm(formula: string): string;
export function isAddinFormula(formula: string): boolean;
export function show(v: unknown): string;
export function agrees(stored: unknown, recomputed: unknown, tolerance: number): boolean;
export interface CheckReport {
  table: { origin: string; version?: string; revision: number | null; checksum?: string; couples?: number; electrodes?: number; note: string };
  tolerance: number;
  counts: { formulas: number; addinFormulas: number; agreeing: number; differing: number; notEvaluable: number; sheets: number };
  differing: Array<{ sheet: string; address: string; anchor: string; formula: string; stored: unknown; recomputed: unknown }>;
  notEvaluable: Array<{ sheet: string; address: string; formula: string; reason: string }>;
  values?: Map<string, unknown>;
  seconds: number;
  ok: boolean;
}
export function checkWorkbook(
  buffer: Uint8Array | ArrayBuffer,
  options?: { tolerance?: number; tableCsv?: string | null; tableCsvName?: string | null; onProgress?: ((done: number, total: number) => void) | null; collect?: boolean },
): Promise<CheckReport>;
export function reportLines(report: CheckReport, file: string): string[];
