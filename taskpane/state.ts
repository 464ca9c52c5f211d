/** The pane's state: the table model, the built-in table and what the user is doing. */
import { type CsvImport } from '../src/store/csv';
import { type RowKind, recordsOf } from '../src/store/rows';
import { builtinTable } from '../src/table/builtin';
import { TableModel } from './model';

export const builtin = recordsOf(builtinTable());
export const model = new TableModel({ builtin, host: () => globalThis.cellwrightFunctionsHost });

/** Rows shown at most in a list (a filter narrows the rest). */
export const MAX_SHOWN = 200;
/** How often the pane looks for changes made elsewhere (another pane, a co-author), while it is visible. */
export const CHECK_EVERY_MS = 20_000;

export const KINDS: readonly RowKind[] = ['couple', 'electrode'];
export const noun = (k: RowKind) => (k === 'couple' ? 'couple' : 'reference electrode');

export const ui = {
  busy: false,
  ready: false,
  loadError: null as string | null,
  editing: { couple: null, electrode: null } as Record<RowKind, { originalKey: string | null; touched: Set<string>; showAll: boolean } | null>,
  importCheck: null as null | { result: CsvImport; mode: 'merge' | 'replace' },
};
