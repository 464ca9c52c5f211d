/**
 * Hints for a key the table does not have: the couple written the other way round, the fillings of
 * an Ag/AgCl electrode named without one, or the nearest valid keys by edit distance.
 */
import { asciiFormula } from '../chem/asciiFormula';
import { coupleKeySignature } from './coupleKeySignature';
import { normalizeCoupleKey, normalizeElectrodeKey, splitCoupleKey } from './keys';
import type { PotentialTable } from './types';

/** The signatures of each table's couple keys (see coupleKeySignature), made when first needed. */
const signatures = new WeakMap<PotentialTable, Set<number>>();
/** The table asked last and its signatures (a range asks about one table many times). */
let last: { table: PotentialTable | null; signatures: Set<number> } = { table: null, signatures: new Set() };
/**
 * False when the key, written the other way round, cannot be a couple of the table: its signature is
 * no key's, so it is not written out and looked up (a range of distinct unknown keys asks once per key).
 */
function reversedMayExist(table: PotentialTable, key: string): boolean {
  if (table !== last.table) {
    let s = signatures.get(table);
    if (s === undefined) {
      s = new Set(table.couples.map((c) => coupleKeySignature(c.key)));
      signatures.set(table, s);
    }
    last = { table, signatures: s };
  }
  return last.signatures.has(coupleKeySignature(key, true));
}

/**
 * Why a couple key was not found and what to write instead: "write Ox/Red: Zn2+/Zn" when the key
 * is a couple of the table written Red/Ox, else the nearest keys of the table ("nearest keys: …"),
 * or "" when nothing is close.
 *
 * withNearest false leaves out the edit-distance search (the cell messages make their own near match).
 *
 * Syntax: coupleKeyHint(table, key, [withNearest])
 * Example: coupleKeyHint(builtinTable(), "Zn/Zn2+") → "write Ox/Red: Zn2+/Zn"
 * See also: electrodeKeyHint, normalizeCoupleKey
 */
export function coupleKeyHint(table: PotentialTable, key: string, withNearest = true): string {
  const sides = reversedMayExist(table, key) ? splitCoupleKey(asciiFormula(key)) : undefined;
  if (sides !== undefined) {
    const reversed = table.findCouple(`${sides.red}/${sides.ox}`);
    if (reversed !== undefined) return `write Ox/Red: ${reversed.key}`;
  }
  if (!withNearest) return '';
  const near = nearest(normalizeCoupleKey(key).toLowerCase(), table.couples.map((c) => ({ key: c.key, forms: [normalizeCoupleKey(c.key).toLowerCase()] })));
  return near.length > 0 ? `nearest keys: ${near.map((k) => `"${k}"`).join(', ')}` : '';
}

/**
 * Why an electrode key was not found and what to write instead: an Ag/AgCl electrode named without
 * its filling ("Ag/AgCl", "SSC", "silver chloride") lists the fillings of the table; "NHE" (the
 * normal hydrogen electrode, an obsolete name) points to "SHE"; otherwise the nearest keys or aliases.
 *
 * Syntax: electrodeKeyHint(table, key, [withNearest])
 * Example: electrodeKeyHint(builtinTable(), "SSC") → 'Ag/AgCl needs its filling: "Ag/AgCl/KCl(sat)", …'
 * See also: coupleKeyHint, normalizeElectrodeKey
 */
export function electrodeKeyHint(table: PotentialTable, key: string, withNearest = true): string {
  const k = normalizeElectrodeKey(key);
  if (k === 'nhe' || k === 'normalhydrogenelectrode') return 'for the hydrogen scale write "SHE" (standard hydrogen electrode; "NHE" is an obsolete name)';
  if (/^(ssc|ag\/agcl|agcl|silverchloride|silver\/silverchloride|ag\/agcl\/kcl)$/.test(k)) {
    const fillings = table.electrodes.filter((e) => normalizeElectrodeKey(e.key).startsWith('ag/agcl')).map((e) => `"${e.key}"`);
    if (fillings.length > 0) return `Ag/AgCl needs its filling: ${fillings.join(', ')}`;
  }
  if (!withNearest) return '';
  const near = nearest(
    k,
    table.electrodes.map((e) => ({ key: e.key, forms: [e.key, ...e.aliases].map(normalizeElectrodeKey) })),
  );
  return near.length > 0 ? `nearest keys: ${near.map((x) => `"${x}"`).join(', ')}` : '';
}

/** Up to three keys whose closest form is within an edit distance of max(2, a third of the text's length). */
function nearest(text: string, rows: ReadonlyArray<{ key: string; forms: string[] }>): string[] {
  if (text === '' || text.length > 60) return [];
  const limit = Math.max(2, Math.floor(text.length / 3));
  const scored: Array<{ key: string; d: number }> = [];
  for (const row of rows) {
    let best = Infinity;
    for (const f of row.forms) best = Math.min(best, editDistance(text, f, limit));
    if (best <= limit) scored.push({ key: row.key, d: best });
  }
  scored.sort((a, b) => a.d - b.d || a.key.localeCompare(b.key));
  return scored.slice(0, 3).map((s) => s.key);
}

/** Levenshtein distance, or limit + 1 as soon as it must exceed limit. */
function editDistance(a: string, b: string, limit: number): number {
  if (Math.abs(a.length - b.length) > limit) return limit + 1;
  let prev = Array.from({ length: b.length + 1 }, (_, j) => j);
  for (let i = 1; i <= a.length; i++) {
    const cur = [i];
    let rowMin = i;
    for (let j = 1; j <= b.length; j++) {
      const v = Math.min(prev[j] + 1, cur[j - 1] + 1, prev[j - 1] + (a[i - 1] === b[j - 1] ? 0 : 1));
      cur.push(v);
      if (v < rowMin) rowMin = v;
    }
    if (rowMin > limit) return limit + 1;
    prev = cur;
  }
  return prev[b.length];
}
