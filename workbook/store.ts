/**
 * Where the workbook keeps its own potential table, and the only code that reads or writes it.
 *
 * The table is one text (src/store/stored.ts) in the workbook's settings for this add-in,
 * `context.workbook.settings`, key "cellwright.potentialTable" (ExcelApi 1.4). DEVELOPERS.md ("Where the
 * workbook's table is stored") explains the choice. Both bundles use this module: functions/runtime.ts
 * reads the table at start-up; the task pane reads, writes, removes it and asks for recalculation.
 *
 * Writes never lose someone else's table silently. A writer says which stored value it last saw; the
 * write goes ahead only when the workbook still holds exactly that value, and is read back afterwards.
 * When the value changed in between (another pane, another co-author), nothing is written and the caller
 * gets the value that is there now; when a write was itself overwritten at the same moment, the caller is
 * told that too. A stored value that cannot be read is never written over except by an explicit reset
 * that names the exact value it replaces.
 */
import { ChangeError, type WorkbookCopy } from '../src/store/copy';
import { type LogAction, type Signoff, EMPTY_LOG, appendEntry, logEntry, signoffProblem } from '../src/store/log';
import type { VersionedRecords } from '../src/store/rows';
import { type StoredProblem, type StoredRead, readStoredText, writeStoredText } from '../src/store/stored';
import { type SettingState, readSetting, replaceSetting } from './settings';

/** The settings key of the stored table. */
export const TABLE_SETTING_KEY = 'cellwright.potentialTable';
/**
 * The settings key that records which table the workbook's results were last computed with: the
 * checksum of the table in use when Cellwright last recalculated the workbook ("unreadable" when the
 * functions answered #N/A for an unreadable table). At start-up the functions runtime compares it with
 * the table in use and recalculates once when they differ (functions/runtime.ts).
 */
export const COMPUTED_WITH_KEY = 'cellwright.computedWith';

/** What to record under COMPUTED_WITH_KEY for the functions' status (undefined while still loading). */
export function computedWithOf(status: { readonly state: string; readonly checksum?: string } | undefined): string | undefined {
  if (status === undefined || status.state === 'loading') return undefined;
  if (status.state === 'unreadable') return 'unreadable';
  return status.checksum;
}

/** Reads what COMPUTED_WITH_KEY holds (null when nothing is recorded). */
export async function readComputedWith(): Promise<string | null> {
  const v = await readSetting(COMPUTED_WITH_KEY);
  return typeof v === 'string' ? v : null;
}

/** What the workbook holds under the table's key. */
export type StoredState = SettingState<Extract<StoredRead, { ok: true }>, StoredProblem>;

/** Reads the stored value (null when the workbook has none). */
export async function readStoredValue(): Promise<unknown> {
  return readSetting(TABLE_SETTING_KEY);
}

/** Interprets a stored value. */
export function interpret(raw: unknown, builtin: VersionedRecords): StoredState {
  if (raw === null || raw === undefined) return { kind: 'none', raw: null };
  const read = readStoredText(raw, builtin);
  if (read.ok) return { kind: 'readable', raw: raw as string, read };
  return { kind: 'unreadable', raw, problem: read.problem };
}

/** Reads and interprets what the workbook holds. */
export async function readWorkbookTable(builtin: VersionedRecords): Promise<StoredState> {
  return interpret(await readStoredValue(), builtin);
}

export type WriteOutcome =
  /** Written and read back unchanged. */
  | { readonly kind: 'written'; readonly state: StoredState }
  /** Nothing written: the workbook no longer holds the value the caller saw. `state` is what it holds now. */
  | { readonly kind: 'conflict'; readonly state: StoredState }
  /** Written, but another writer replaced it at the same moment. `state` is what the workbook holds now. */
  | { readonly kind: 'overwritten'; readonly state: StoredState };

/** Who made a write, why, and what kind of action it was: recorded in the revision log. */
export interface WriteNote extends Signoff {
  readonly action: LogAction;
}

/**
 * Writes a copy of the table, as the next revision after `seen` (the stored value the caller last read:
 * null when the workbook had no table). `copy.revision` and `copy.log` are ignored: the revision
 * written is the seen one + 1, and the log written is the seen table's log (empty when there was
 * none, or it was of an older schema) with one entry for this write: `note` (who, why, action), the
 * time, and every row that differs from the seen table (the built-in table when there was none).
 * Throws ChangeError when the copy cannot be stored (too large, rows not usable, no name or reason).
 */
export async function writeCopy(copy: WorkbookCopy, seen: unknown, builtin: VersionedRecords, note: WriteNote, now: Date = new Date()): Promise<WriteOutcome> {
  const problem = signoffProblem(note);
  if (problem !== null) throw new ChangeError(`not saved: ${problem}`);
  const seenState = interpret(seen, builtin);
  const previous = seenState.kind === 'readable' ? seenState.read.copy : null;
  const revision = (previous?.revision ?? 0) + 1;
  const at = now.toISOString();
  const entry = logEntry({ ...note, revision, at, basedOn: copy.basedOn, before: previous ?? builtin, after: copy });
  const log = appendEntry(previous?.log ?? EMPTY_LOG, entry);
  const text = writeStoredText({ ...copy, revision, changedAt: at, log });
  return replaceValue(seen, text, builtin);
}

/** Removes the workbook's table (reset to the built-in table), when the workbook still holds `seen`. */
export async function removeTable(seen: unknown, builtin: VersionedRecords): Promise<WriteOutcome> {
  return replaceValue(seen, null, builtin);
}

async function replaceValue(seen: unknown, next: string | null, builtin: VersionedRecords): Promise<WriteOutcome> {
  const r = await replaceSetting(TABLE_SETTING_KEY, seen, next);
  return { kind: r.kind, state: interpret(r.value, builtin) };
}

/**
 * Recalculates every formula in every open workbook, so each cell that uses the table shows the table
 * now in use: `application.calculate(Excel.CalculationType.full)` (ExcelApi 1.1). It costs one full
 * recalculation, the same as Ctrl+Alt+F9 (see README and DEVELOPERS.md). Then records `computedWith`
 * (see COMPUTED_WITH_KEY) when given; a workbook that cannot take the record (read-only) is only
 * recalculated again next time.
 */
export async function recalculateAll(computedWith?: string): Promise<void> {
  await Excel.run(async (context) => {
    context.workbook.application.calculate(Excel.CalculationType.full);
    await context.sync();
    if (computedWith === undefined) return;
    try {
      context.workbook.settings.add(COMPUTED_WITH_KEY, computedWith);
      await context.sync();
    } catch (e) {
      console.warn(`Cellwright: recording ${COMPUTED_WITH_KEY} failed`, e);
    }
  });
}
