/**
 * Which potential table the worksheet functions use.
 *
 * - At start the built-in table is in use.
 * - When a workbook can be reached (shared runtime), the start-up (functions/runtime.ts, through
 *   functions/workbookHost.ts) calls `beginTableLoad(promise)`: functions that read the table wait on it, so no cell ever
 *   shows a value computed from the built-in table when the workbook has its own.
 * - An unreadable workbook table makes every look-up answer #N/A with the reason; it never
 *   falls back to the built-in table silently.
 */
import { NotFoundError } from '../src/errors';
import { builtinTable } from '../src/table/builtin';
import type { PotentialTable } from '../src/table/types';

export type TableInUse =
  | { readonly kind: 'builtin'; readonly table: PotentialTable }
  | { readonly kind: 'workbook'; readonly table: PotentialTable }
  | { readonly kind: 'unreadable'; readonly reason: string };

let inUse: TableInUse | null = null;
let pending: Promise<unknown> | null = null;

/** The table in use now (the built-in one until a workbook's table is set). */
export function tableInUse(): TableInUse {
  if (inUse === null) inUse = { kind: 'builtin', table: builtinTable() };
  return inUse;
}

/** The table for look-ups. Throws NotFoundError when the workbook's table could not be read. */
export function currentTable(): PotentialTable {
  const t = tableInUse();
  if (t.kind === 'unreadable') throw new NotFoundError(`the workbook's potential table could not be read: ${t.reason}`);
  return t.table;
}

/** A promise while the workbook's table is being read, else null. */
export function tablePending(): Promise<unknown> | null {
  return pending;
}

/** Switches the table in use (called by the workbook loader and the task pane). */
export function setTableInUse(next: TableInUse): void {
  inUse = next;
}

/**
 * Marks the table as loading until `load` settles; its result, when it is a table, becomes the table
 * in use (a load that installs its result itself resolves to nothing). A rejected load makes the table
 * unreadable with the rejection's message.
 */
export function beginTableLoad(load: Promise<TableInUse | void>): Promise<void> {
  const p = load.then(
    (t) => {
      if (t !== undefined) inUse = t;
    },
    (e: unknown) => {
      inUse = { kind: 'unreadable', reason: e instanceof Error ? e.message : String(e) };
    },
  );
  const tracked = p.finally(() => {
    if (pending === tracked) pending = null;
  });
  pending = tracked;
  return tracked;
}
