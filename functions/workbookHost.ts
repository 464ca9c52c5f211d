/**
 * The worksheet functions' side of the channel between the task pane and the functions (the contract,
 * its types and the global's name, is workbook/channel.ts).
 *
 * In Excel's shared runtime the page loads functions.js and taskpane.js as two bundles with separate
 * module instances, so the pane cannot reach functions/context.ts by import. The functions bundle
 * therefore puts one narrow object on globalThis:
 *
 *   globalThis.cellwrightFunctionsHost = {
 *     apiVersion: 1,
 *     useStoredValue(value) → status   // the functions use this stored value from now on:
 *                                      //   null/undefined → the built-in table;
 *                                      //   a stored text → read with the same reader as at start-up
 *                                      //   (src/store/stored.ts); unreadable → #N/A with the reason.
 *     status() → status                // what the functions use now
 *   }
 *
 * The pane passes the value it just wrote or read, never a table object, so the functions check it
 * themselves and both sides agree on what the workbook holds. Nothing else crosses the channel; the
 * caller recalculates afterwards (workbook/store.ts, recalculateAll).
 */
import { recordsOf } from '../src/store/rows';
import { InstallOrder } from '../src/store/installOrder';
import { type StoredRead, readStoredText } from '../src/store/stored';
import { builtinTableChecksum } from '../src/dataset/checksum';
import { BUILTIN_TABLE_SOURCE, builtinTable } from '../src/table/builtin';
import { applyPinnedValue, dataPartsChecksum, dataSetInUse, lastPinnedValue, markDataUnreadable } from './dataHost';
import type { CellwrightFunctionsHost, FunctionsHostStatus } from '../workbook/channel';
import { type TableInUse, beginTableLoad, setTableInUse, tableInUse, tablePending } from './context';

/** Longest reason put into an #N/A message (the whole message stays well under 300 characters). */
const MAX_REASON = 200;

let details: { revision?: number; checksum?: string; changedAt?: string } = {};
/** The stored value the table in use came from (undefined before any was read). */
let lastValue: unknown = undefined;
/** The value seen after a failed read: equal to no stored value, so the next read is always used. */
const READ_FAILED: unknown = Object.freeze({ readFailed: true });
/** The order of installs: a read that finishes after a newer read or handover is dropped. */
const order = new InstallOrder();

function shorten(reason: string): string {
  const one = reason.replace(/\s+/g, ' ').trim();
  return one.length > MAX_REASON ? `${one.slice(0, MAX_REASON - 1)}…` : one;
}

/**
 * What a stored value means for the functions (null/undefined: the built-in table). Also remembers the
 * revision and checksum for status().
 */
export function tableForStoredValue(value: unknown): TableInUse {
  const builtin = builtinTable();
  lastValue = value ?? null;
  if (value === null || value === undefined) {
    details = { checksum: builtinTableChecksum() };
    return { kind: 'builtin', table: builtin };
  }
  let read: StoredRead;
  try {
    read = readStoredText(value, recordsOf(builtin));
  } catch (e) {
    read = { ok: false, problem: { kind: 'damaged', message: `the stored table could not be checked (${e instanceof Error ? e.message : String(e)})`, details: [] } };
  }
  if (!read.ok) {
    details = {};
    return { kind: 'unreadable', reason: shorten(read.problem.message) };
  }
  details = { revision: read.copy.revision, checksum: read.checksum, changedAt: read.copy.changedAt };
  return { kind: 'workbook', table: read.table };
}

/** The stored value the table in use came from (null: none, the built-in table; undefined: not read yet). */
export function lastStoredValue(): unknown {
  return lastValue;
}

export function hostStatus(): FunctionsHostStatus {
  if (tablePending() !== null) return { state: 'loading' };
  const t = tableInUse();
  if (t.kind === 'unreadable') return { state: 'unreadable', reason: t.reason, dataChecksum: dataPartsChecksum() };
  if (t.kind === 'builtin' && details.checksum === undefined) details = { checksum: builtinTableChecksum() };
  const ds = dataSetInUse(tablePart());
  return {
    state: t.kind,
    dataset: { version: ds.version, checksum: ds.checksum, pinned: ds.parts.filter((p) => p.pinned).map((p) => p.name) },
    dataChecksum: dataPartsChecksum(),
    version: t.table.version,
    ...(t.kind === 'workbook' ? { revision: details.revision } : {}),
    checksum: details.checksum,
    couples: t.table.couples.length,
    electrodes: t.table.electrodes.length,
  };
}

/** The potential table's part of the data set in use (the table must be readable). */
export function tablePart(): { pinned: boolean; version: string; checksum: string; rows: number; source: string } {
  const t = tableInUse();
  if (t.kind === 'unreadable') throw new Error('the table is unreadable');
  const d = tableDetails();
  return {
    pinned: t.kind === 'workbook',
    version: t.table.version,
    checksum: d.checksum ?? '',
    rows: t.table.couples.length + t.table.electrodes.length,
    source: t.kind === 'builtin' ? BUILTIN_TABLE_SOURCE : 'the source given on each row',
  };
}

/** Revision, checksum and change time (ISO 8601) of the table in use, as far as known. */
export function tableDetails(): { readonly revision?: number; readonly checksum?: string; readonly changedAt?: string } {
  const t = tableInUse();
  if (t.kind === 'builtin' && details.checksum === undefined) details = { checksum: builtinTableChecksum() };
  return details;
}

/** Makes the functions use a stored value now (see the channel above): a handover is newer than every read started before it. */
export function useStoredValue(value: unknown): FunctionsHostStatus {
  installStoredValue(readTicket(), value);
  return hostStatus();
}

/** Makes the functions use a pinned-data value now, with the table they use (a handover, like useStoredValue). */
export function usePinnedValue(value: unknown): FunctionsHostStatus {
  installStoredValue(readTicket(), lastValue ?? null, value);
  return hostStatus();
}

/** A ticket for a read of the stored table that starts now (src/store/installOrder.ts). */
export function readTicket(): number {
  return order.ticket();
}

/**
 * Installs what a read of ticket `ticket` found, unless a later read or handover has installed
 * something already; table, status and the value seen change together, in one step. True when it was
 * installed.
 */
export function installStoredValue(ticket: number, value: unknown, pinned: unknown = lastPinnedValue()): boolean {
  return order.install(ticket, () => {
    // The pinned data first: when it cannot be read, nothing of the workbook's data set is used.
    const why = applyPinnedValue(pinned);
    const table = tableForStoredValue(value);
    setTableInUse(why === null ? table : { kind: 'unreadable', reason: shorten(`its pinned data set could not be read: ${why}`) });
  });
}

/** Installs "unreadable" for a read of ticket `ticket` that failed (same ordering as installStoredValue). */
export function installReadFailure(ticket: number, reason: string): boolean {
  return order.install(ticket, () => {
    details = {};
    lastValue = READ_FAILED;
    markDataUnreadable(shorten(reason));
    setTableInUse({ kind: 'unreadable', reason: shorten(reason) });
  });
}

/**
 * Starts reading the workbook's table: table look-ups wait for `read` (functions/context.ts). The
 * result is installed in the order of reads (installStoredValue): dropped when the pane has handed a
 * value over since the read started. A failed read makes the table unreadable with the failure's
 * message: the functions answer #N/A rather than use the built-in table. Returns the read's ticket and
 * a promise that settles when the load has.
 */
export function startTableLoad(read: Promise<{ readonly table: unknown; readonly pinned: unknown }>): { readonly generation: number; readonly done: Promise<void> } {
  const mine = readTicket();
  const load = read.then(
    (value) => void installStoredValue(mine, value.table, value.pinned),
    (e: unknown) => void installReadFailure(mine, `reading it failed: ${e instanceof Error ? e.message : String(e)}`),
  );
  return { generation: mine, done: beginTableLoad(load) };
}

/** Puts the channel on globalThis (once). */
export function installFunctionsHost(): CellwrightFunctionsHost {
  const host: CellwrightFunctionsHost = Object.freeze({ apiVersion: 1 as const, useStoredValue, usePinnedValue, status: hostStatus });
  globalThis.cellwrightFunctionsHost = host;
  return host;
}
