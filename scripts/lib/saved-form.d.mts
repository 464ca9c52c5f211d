// Types for scripts/lib/saved-form.mjs (used by the demo tests).
export declare const UDF_PREFIX: string;
export declare const APPLICATION: string;
export declare function toSavedFormula(formula: string, namespace?: string): string;
export declare function fromSavedFormula(formula: string, namespace?: string): string;
export declare function toSavedForm(input: Buffer | Uint8Array | ArrayBuffer): Promise<{ bytes: Buffer; arrays: number; formulas: number }>;
