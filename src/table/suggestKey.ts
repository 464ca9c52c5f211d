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
  /** looseHash of every key of near. */
  readonly hashes: Set<number>;
  readonly example: string | undefined;
  /** The answer when nothing is near (shared: it is the same for every such text). */
  readonly otherwise: Readonly<{ example?: string }>;
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

/**
 * A 32-bit hash of loose(key), computed without building it: a text whose hash no key's loose form
 * has cannot be a near match, and is not rewritten (a range of distinct unknown keys asks once per key).
 */
function looseHash(key: string): number {
  let h = 0x811c9dc5; // FNV-1a
  for (let i = 0; i < key.length; i++) {
    let c = key.charCodeAt(i);
    if (c >= 65 && c <= 90) c += 32;
    else if (!((c >= 97 && c <= 122) || (c >= 48 && c <= 57) || c === 47 || c === 43 || c === 45)) continue;
    h = Math.imul(h ^ c, 0x01000193);
  }
  return h >>> 0;
}

/** The table asked last and its suggestions (a range asks about one table many times). */
const last = { couple: { table: null as PotentialTable | null, s: null as Suggestions | null }, electrode: { table: null as PotentialTable | null, s: null as Suggestions | null } };

function suggestionsOf(table: PotentialTable, kind: 'couple' | 'electrode'): Suggestions {
  const l = last[kind];
  if (l.table === table && l.s !== null) return l.s;
  let s = cache[kind].get(table);
  if (s === undefined) {
    const keys = kind === 'couple' ? table.couples.map((r) => r.key) : table.electrodes.map((r) => r.key);
    const near = new Map<string, string>();
    for (const k of keys) if (!near.has(loose(k))) near.set(loose(k), k);
    const has = kind === 'couple' ? table.findCouple(PREFERRED.couple) !== undefined : table.findElectrode(PREFERRED.electrode) !== undefined;
    const example = has ? PREFERRED[kind] : keys[0];
    s = { near, hashes: new Set(keys.map(looseHash)), example, otherwise: Object.freeze(example === undefined ? {} : { example }) };
    cache[kind].set(table, s);
  }
  l.table = table;
  l.s = s;
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
export function suggestKey(table: PotentialTable, kind: 'couple' | 'electrode', typed: string): Readonly<{ near?: string; example?: string }> {
  const s = suggestionsOf(table, kind);
  const near = typed.length <= 1000 && s.hashes.has(looseHash(typed)) ? s.near.get(loose(typed)) : undefined;
  return near !== undefined ? { near } : s.otherwise;
}
