export function pinnedStoredText(changedAt?: string): Promise<string>;
export function pinnedDataText(pinnedAt?: string): Promise<string>;
export function changedStoredText(text: string, change: unknown, changedAt?: string): Promise<string>;
export function storedTextFromCsv(csvText: string, changedAt?: string): Promise<string>;
