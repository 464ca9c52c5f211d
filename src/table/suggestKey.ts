/**
 * A key to suggest when a look-up finds nothing: a near match of what was typed when the table has
 * one (same letters and digits, other case, spacing or charge brackets: "cu2+/cu" → "Cu2+/Cu"), else an
 * example that exists in this table (the preferred example when it has not been deleted, else its
 * first row), else nothing (the table has no rows of that kind). Built once per table; each call is
 * one pass over the typed text and one map look-up.
 */
import type { PotentialTable } from './types';

const PREFERRED = { couple: 'Cu2+/Cu', electrode: 'SCE' } as const;

interface Suggestions {
  readonly near: Map<string, string>;
  readonly example: string | undefined;
}

const cache = { couple: new WeakMap<PotentialTable, Suggestions>(), electrode: new WeakMap<PotentialTable, Suggestions>() };

/** The loose form of a key: letters, digits, "/", "+" and "-" only, lower case. */
function loose(key: string): string {
  let out = '';
  for (let i = 0; i < key.length; i++) {
    const c = key[i];
    if ((c >= 'a' && c <= 'z') || (c >= '0' && c <= '9') || c === '/' || c === '+' || c === '-') out += c;
    else if (c >= 'A' && c <= 'Z') out += c.toLowerCase();
  }
  return out;
}

function suggestionsOf(table: PotentialTable, kind: 'couple' | 'electrode'): Suggestions {
  let s = cache[kind].get(table);
  if (s === undefined) {
    const keys = kind === 'couple' ? table.couples.map((r) => r.key) : table.electrodes.map((r) => r.key);
    const near = new Map<string, string>();
    for (const k of keys) if (!near.has(loose(k))) near.set(loose(k), k);
    const has = kind === 'couple' ? table.findCouple(PREFERRED.couple) !== undefined : table.findElectrode(PREFERRED.electrode) !== undefined;
    s = { near, example: has ? PREFERRED[kind] : keys[0] };
    cache[kind].set(table, s);
  }
  return s;
}

/**
 * The key to suggest for an unknown key: { near } when one is close to what was typed, else
 * { example } (a key of this table), else {} when the table has no rows of that kind.
 *
 * Syntax: suggestKey(table, "couple" | "electrode", typed)
 * Example: suggestKey(builtinTable(), "couple", "cu2+/cu") → { near: "Cu2+/Cu" }
 * See also: PotentialTable.findCouple, PotentialTable.findElectrode
 */
export function suggestKey(table: PotentialTable, kind: 'couple' | 'electrode', typed: string): { near?: string; example?: string } {
  const s = suggestionsOf(table, kind);
  const near = typed.length <= 1000 ? s.near.get(loose(typed)) : undefined;
  if (near !== undefined) return { near };
  return s.example === undefined ? {} : { example: s.example };
}
