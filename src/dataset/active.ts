/**
 * The data parts the core reads now: the add-in's built-in parts, or the parts a workbook pinned, or
 * none at all when the workbook's pinned data cannot be read (every read then throws NotFoundError with
 * the reason, which the worksheet functions show as #N/A). The core's modules read their data through
 * dataPart() instead of importing the JSON files, so the functions runtime can hand them a workbook's
 * pinned data once, at start-up or when the pane pins; nothing is re-read per call.
 */
import { NotFoundError } from '../errors';
import { BUILTIN_PARTS, type DataPartName, type DataParts } from './parts';

type ActiveData = { readonly kind: 'parts'; readonly parts: DataParts } | { readonly kind: 'unreadable'; readonly reason: string };

let active: ActiveData = { kind: 'parts', parts: BUILTIN_PARTS };

/**
 * The part `name` of the data in use. Throws NotFoundError when the workbook's pinned data could not be
 * read (never falls back to the built-in part silently).
 *
 * Syntax: dataPart(name)
 * Example: dataPart("atomicweights").elements[0].symbol → "H"
 * See also: useDataParts, BUILTIN_PARTS
 */
export function dataPart<K extends DataPartName>(name: K): DataParts[K] {
  if (active.kind === 'unreadable') throw new NotFoundError(`the workbook's pinned data set could not be read: ${active.reason}`);
  return active.parts[name];
}

/** The parts in use (null when the pinned data is unreadable). */
export function dataPartsInUse(): DataParts | null {
  return active.kind === 'parts' ? active.parts : null;
}

/**
 * Makes the core read `parts` from now on (null: the built-in parts), or nothing when given
 * `{ unreadable: reason }`. Caches built from a part are keyed by the part object (cachedOf), so they
 * are rebuilt once after a switch.
 */
export function useDataParts(next: DataParts | null | { readonly unreadable: string }): void {
  if (next === null) active = { kind: 'parts', parts: BUILTIN_PARTS };
  else if ('unreadable' in next) active = { kind: 'unreadable', reason: next.unreadable };
  else active = { kind: 'parts', parts: next };
}

/**
 * A value built from a part, rebuilt only when the part in use is another object: one comparison per
 * call.
 *
 * Syntax: const weights = cachedOf("atomicweights", (p) => new Map(...)); weights()
 */
export function cachedOf<K extends DataPartName, T>(name: K, build: (part: DataParts[K]) => T): () => T {
  let from: DataParts[K] | null = null;
  let value: T;
  return () => {
    const part = dataPart(name);
    if (part !== from) {
      value = build(part);
      from = part;
    }
    return value;
  };
}
