import type { LoadedBundle } from './bundle.mjs';
export interface TableStatus {
  state: 'builtin' | 'workbook' | 'unreadable';
  version?: string;
  revision?: number;
  checksum?: string;
  couples?: number;
  electrodes?: number;
  reason?: string;
}
export function loadBundleWithTable(stored: unknown, distDir?: string): Promise<{ bundle: LoadedBundle; status: TableStatus }>;
