// Types for demo/scenario.mjs (used by the demo test).
export interface ScenarioSheet {
  name: string;
  title: string;
  intro?: string[];
  blocks: Array<Record<string, unknown>>;
}
export const scenario: {
  title: string;
  summary: string[];
  howToUse: string[];
  cautions: string[];
  sheets: ScenarioSheet[];
};
