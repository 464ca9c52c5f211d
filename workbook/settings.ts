/**
 * The add-in's settings in the workbook (`context.workbook.settings`, ExcelApi 1.4): the one place that
 * reads, compares-and-replaces and records a settings value. workbook/store.ts (the potential table)
 * and workbook/pinnedData.ts (the pinned data parts) keep their texts here under their own keys.
 */

/** Reads the value under `key` (null when the workbook has none). */
export async function readSetting(key: string): Promise<unknown> {
  return Excel.run(async (context) => {
    const item = context.workbook.settings.getItemOrNullObject(key);
    item.load('value');
    await context.sync();
    const value: unknown = item.isNullObject ? null : item.value;
    return value;
  });
}

/** True when two stored values are the same (texts compared exactly; other values by their JSON). */
export function sameStoredValue(a: unknown, b: unknown): boolean {
  if (a === null || a === undefined) return b === null || b === undefined;
  if (typeof a === 'string' || typeof b === 'string') return a === b;
  try {
    return JSON.stringify(a) === JSON.stringify(b);
  } catch {
    return false;
  }
}

/**
 * What the workbook holds under a settings key: nothing, a value its reader accepts (`read`, the
 * reader's successful result), or a value it refuses (`problem`). `raw` is the stored value exactly as
 * read (for compare-and-replace and export).
 */
export type SettingState<Read, Problem> =
  | { readonly kind: 'none'; readonly raw: null }
  | { readonly kind: 'readable'; readonly raw: string; readonly read: Read }
  | { readonly kind: 'unreadable'; readonly raw: unknown; readonly problem: Problem };

/**
 * What a compare-and-replace found: `conflict` (nothing written; `value` is what the workbook holds),
 * `written` (written and read back unchanged) or `overwritten` (written, but another writer replaced
 * it at the same moment; `value` is what the workbook holds now).
 */
export interface SettingReplaced {
  readonly kind: 'written' | 'conflict' | 'overwritten';
  readonly value: unknown;
}

/**
 * Replaces the value under `key` with `next` (null removes it) only when the workbook still holds
 * `seen`, then reads it back.
 */
export async function replaceSetting(key: string, seen: unknown, next: string | null): Promise<SettingReplaced> {
  const before = await Excel.run(async (context) => {
    const settings = context.workbook.settings;
    const item = settings.getItemOrNullObject(key);
    item.load('value');
    await context.sync();
    const current: unknown = item.isNullObject ? null : item.value;
    if (!sameStoredValue(current, seen)) return { changed: true as const, current };
    if (next === null) {
      if (!item.isNullObject) item.delete();
    } else {
      settings.add(key, next);
    }
    await context.sync();
    return { changed: false as const, current };
  });
  if (before.changed) return { kind: 'conflict', value: before.current };
  const after = await readSetting(key);
  return { kind: sameStoredValue(after, next) ? 'written' : 'overwritten', value: after };
}
