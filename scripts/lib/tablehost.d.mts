import type { LoadedBundle } from './bundle.mjs';
export interface TableStatus {
  state: 'builtin' | 'workbook' | 'unreadable';
  version?: string;
  revision?: number;
  checksum?: string;
  couples?: number;
  electrodes?: number;
  reason?: string;
  dataset?: { version: string; checksum: string; pinned: string[] };
  dataChecksum?: string;
}
export function loadBundleWithTable(stored: unknown, distDir?: string, pinned?: unknown): Promise<{ bundle: LoadedBundle; status: TableStatus }>;
