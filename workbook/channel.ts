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
}

export interface CellwrightFunctionsHost {
  readonly apiVersion: 1;
  useStoredValue(value: unknown): FunctionsHostStatus;
  status(): FunctionsHostStatus;
}

declare global {
  var cellwrightFunctionsHost: CellwrightFunctionsHost | undefined;
}

