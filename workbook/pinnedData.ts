/**
 * Where the workbook keeps its pinned data (the data set's parts besides the potential table:
 * src/dataset/pinned.ts), and the only code that reads or writes it: one text in the workbook's
 * settings for this add-in under its own key, beside the potential table's (workbook/store.ts), so the
 * table's stored form stays as it is. Writes follow the table's rules: the writer names the value it
 * last saw, nothing is written when the workbook holds another, and the write is read back. A value
 * that cannot be read is never written over except by an explicit reset naming it.
 */
import { type PinnedProblem, type PinnedRead, readPinnedText } from '../src/dataset/pinned';
import { type SettingState, readSetting, replaceSetting } from './settings';

/** The settings key of the pinned data. */
export const PINNED_DATA_KEY = 'cellwright.pinnedData';
/**
 * The settings key that records which data parts (besides the table) the workbook's results were last
 * computed with: the checksum over the parts in use (see functions/dataHost.ts), "unreadable" when the
 * pinned data could not be read. The functions runtime recalculates once at start-up when it differs.
 */
export const COMPUTED_WITH_DATA_KEY = 'cellwright.computedWithData';

export type PinnedState = SettingState<Extract<PinnedRead, { ok: true }>, PinnedProblem>;

/** Reads the pinned-data value (null when the workbook has none). */
export async function readPinnedValue(): Promise<unknown> {
  return readSetting(PINNED_DATA_KEY);
}

/** Reads what COMPUTED_WITH_DATA_KEY holds (null when nothing is recorded). */
export async function readComputedWithData(): Promise<string | null> {
  const v = await readSetting(COMPUTED_WITH_DATA_KEY);
  return typeof v === 'string' ? v : null;
}

/** Interprets a pinned-data value. */
export function interpretPinned(raw: unknown): PinnedState {
  if (raw === null || raw === undefined) return { kind: 'none', raw: null };
  const read = readPinnedText(raw);
  if (read.ok) return { kind: 'readable', raw: raw as string, read };
  return { kind: 'unreadable', raw, problem: read.problem };
}

export type PinnedWriteOutcome =
  | { readonly kind: 'written'; readonly state: PinnedState }
  | { readonly kind: 'conflict'; readonly state: PinnedState }
  | { readonly kind: 'overwritten'; readonly state: PinnedState };

/**
 * Replaces the pinned-data value with `next` (null removes it) when the workbook still holds `seen`,
 * then reads it back.
 */
export async function replacePinnedValue(seen: unknown, next: string | null): Promise<PinnedWriteOutcome> {
  const r = await replaceSetting(PINNED_DATA_KEY, seen, next);
  return { kind: r.kind, state: interpretPinned(r.value) };
}

/** Records COMPUTED_WITH_DATA_KEY (after a recalculation Cellwright asked for); a read-only workbook only recalculates again next time. */
export async function recordComputedWithData(value: string): Promise<void> {
  await Excel.run(async (context) => {
    try {
      context.workbook.settings.add(COMPUTED_WITH_DATA_KEY, value);
      await context.sync();
    } catch (e) {
      console.warn(`Cellwright: recording ${COMPUTED_WITH_DATA_KEY} failed`, e);
    }
  });
}
