export const HELP_BASE: string;
export interface FamilySpecs {
  family: string;
  specs: ReadonlyArray<{
    id: string;
    description?: string;
    result?: string;
    helpAnchor?: string;
    args: ReadonlyArray<{ name: string; help?: string; optional?: boolean; default?: number | string | null }>;
  }>;
}
export function specProblems(families: readonly FamilySpecs[]): string[];
export function renderDeclarations(families: readonly FamilySpecs[]): Map<string, string>;
export function familiesOf(modules: Map<string, Record<string, unknown>>, registry: Map<string, { spec: unknown; fn: unknown }>): FamilySpecs[];
