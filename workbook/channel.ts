/**
 * The contract of the channel between the task pane and the worksheet functions: one frozen object the
 * functions bundle puts on globalThis (functions/workbookHost.ts makes it; taskpane/model.ts uses it).
 * The page loads functions.js and taskpane.js as separate bundles with separate module instances, so
 * this global is the only thing they share at run time; this module holds only its types.
 */
export interface FunctionsHostStatus {
  /** loading: the workbook's table is being read at start-up (table look-ups wait). */
  readonly state: 'loading' | 'builtin' | 'workbook' | 'unreadable';
  /** Built-in version in use, or the version the workbook's table is based on. */
  readonly version?: string;
  /** The workbook table's revision. */
  readonly revision?: number;
  /** "sha256:…" of the table in use. */
  readonly checksum?: string;
  readonly couples?: number;
  readonly electrodes?: number;
  /** Why the workbook's table could not be read (state "unreadable"). */
  readonly reason?: string;
  /** The data set in use (all parts: the table and the reference data), when the table can be read. */
  readonly dataset?: { readonly version: string; readonly checksum: string; readonly pinned: readonly string[] };
  /** Checksum over the data parts besides the table in use, or "unreadable" (recorded as cellwright.computedWithData). */
  readonly dataChecksum?: string;
}

export interface CellwrightFunctionsHost {
  readonly apiVersion: 1;
  useStoredValue(value: unknown): FunctionsHostStatus;
  /** The functions use this pinned-data value from now on (null: the built-in data); absent in hosts older than pinned data. */
  usePinnedValue?(value: unknown): FunctionsHostStatus;
  status(): FunctionsHostStatus;
}

declare global {
  var cellwrightFunctionsHost: CellwrightFunctionsHost | undefined;
}

