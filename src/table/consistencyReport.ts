import type { HalfReactionTerm } from '../chem/halfReaction';
import { FARADAY_C_PER_MOL } from '../constants';
import { NotFoundError } from '../errors';
import { speciesE0 } from '../species/speciesE0';
import { speciesRecord } from '../species/speciesRecord';
import type { CoupleRow, PotentialTable } from './types';

/** One line of the consistency report. */
export interface ConsistencyLine {
  /**
   * 'species': a row against its species-derived E°; 'cycle': a row against two rows whose
   * half-reactions add up to it; 'link': a row whose species are not all in the species table
   * against another row and the ΔfG° of the species that differ between them.
   */
  readonly kind: 'species' | 'cycle' | 'link';
  /** The row checked, then (for a cycle) the two rows that make it up. */
  readonly keys: readonly string[];
  /** E° of the row, V. */
  readonly tableV: number;
  /** E° the species data or the other rows give, V. */
  readonly derivedV: number;
  /** tableV − derivedV, in mV. */
  readonly differenceMV: number;
  /** True when |difference| ≤ the tolerance. */
  readonly ok: boolean;
  /** The explanation given for this row (when one is on file). */
  readonly note?: string;
}

/** The net species vector of a half-reaction (reduced side +, oxidized side −), as sortable text. */
function vectorOf(row: CoupleRow): Map<string, number> {
  const v = new Map<string, number>();
  for (const t of row.parsed.species) {
    const k = t.species.key;
    v.set(k, (v.get(k) ?? 0) + (t.side === 'red' ? t.coefficient : -t.coefficient));
  }
  return v;
}

function textOf(v: Map<string, number>): string {
  return [...v.entries()]
    .filter(([, c]) => Math.abs(c) > 1e-12)
    .sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0))
    .map(([k, c]) => `${k}:${+c.toFixed(9)}`)
    .join(' ');
}

/**
 * Checks a potential table against itself and against the species data, at 25 °C:
 * - every row whose species are all in data/species.json against its species-derived E°;
 * - every row C whose half-reaction is the sum of two other rows A and B (Fe3+/Fe2+ + Fe2+/Fe =
 *   Fe3+/Fe; O2/H2O2 + H2O2/H2O = O2/H2O; Cu2+/Cu+ + Cu+/Cu = Cu2+/Cu) against
 *   (nA·EA + nB·EB)/nC.
 * - every row whose species are not all in the species table against another row sharing a species
 *   with it, where the two half-reactions differ only by species that the table covers
 *   (Cr2O7^2-/Cr3+ against HCrO4-/Cr3+ and the ΔfG° of Cr2O7^2-, HCrO4- and H2O):
 *   E_C = E_A − ΔG°(difference per electron)/F.
 * It reports; it never blocks. A line carries the note on file for it: by the row's key for a species
 * line, by "C = A + B" for a cycle.
 *
 * Syntax: consistencyReport(table, notes, toleranceMV)
 * Example: consistencyReport(builtinTable()).filter((l) => !l.ok && !l.note) → []
 * See also: speciesE0, e0AtTemperature
 *
 * @param table the potential table (built-in or a workbook's)
 * @param notes explanations by couple key (data/consistency.json for the built-in table)
 * @param toleranceMV the difference accepted without a note, mV (default 5)
 */
export function consistencyReport(
  table: PotentialTable,
  notes: Readonly<Record<string, string>> = {},
  toleranceMV = 5,
): ConsistencyLine[] {
  const lines: ConsistencyLine[] = [];
  const covered = new Set<CoupleRow>();
  const line = (kind: 'species' | 'cycle' | 'link', keys: string[], tableV: number, derivedV: number): ConsistencyLine => {
    const differenceMV = (tableV - derivedV) * 1000;
    const noteKey = kind === 'cycle' ? `${keys[0]} = ${keys[1]} + ${keys[2]}` : kind === 'link' ? `${keys[0]} ~ ${keys[1]}` : keys[0];
    const note = notes[noteKey];
    return { kind, keys, tableV, derivedV, differenceMV, ok: Math.abs(differenceMV) <= toleranceMV, ...(note ? { note } : {}) };
  };
  for (const row of table.couples) {
    let derived: number;
    try {
      derived = speciesE0(row.parsed, 25);
    } catch (e) {
      if (e instanceof NotFoundError) continue;
      throw e;
    }
    covered.add(row);
    lines.push(line('species', [row.key], row.e0, derived));
  }
  // Rows by the species they hold (other than H+, OH- and H2O): a link or a cycle needs a shared one,
  // so only rows sharing a species are compared (a table of thousands of rows stays fast).
  const rows = table.couples;
  const bySpecies = new Map<string, number[]>();
  rows.forEach((row, i) => {
    for (const k of new Set(row.parsed.species.map((t) => t.species.key))) {
      if (WATER_IONS.has(k)) continue;
      const list = bySpecies.get(k);
      if (list === undefined) bySpecies.set(k, [i]);
      else list.push(i);
    }
  });
  const sharing = (i: number): number[] => {
    const out = new Set<number>();
    for (const t of rows[i].parsed.species) for (const j of bySpecies.get(t.species.key) ?? []) if (j !== i) out.add(j);
    return [...out].sort((x, y) => x - y);
  };
  const linked = new Set<string>();
  rows.forEach((c, ci) => {
    if (covered.has(c)) return;
    for (const ai of sharing(ci)) {
      const a = rows[ai];
      if (linked.has(`${a.key}\u0000${c.key}`)) continue;
      const g = differenceGibbsPerElectron(c, a);
      if (g === null) continue;
      linked.add(`${c.key}\u0000${a.key}`);
      lines.push(line('link', [c.key, a.key], c.e0, a.e0 - g / FARADAY_C_PER_MOL));
    }
  });
  // Cycles C = A + B. Every C holds a species other than H+, OH- and H2O, which A or B must hold too,
  // so A runs over the rows sharing a species with C and B is looked up as the vector C − A.
  const vectors = rows.map(vectorOf);
  const byVector = new Map<string, number>();
  vectors.forEach((v, i) => byVector.set(textOf(v), i));
  const cycles: Array<[number, number, number]> = [];
  const seen = new Set<string>();
  vectors.forEach((vc, ci) => {
    if (byVector.get(textOf(vc)) !== ci) return;
    for (const ai of sharing(ci)) {
      const rest = new Map(vc);
      for (const [k, x] of vectors[ai]) rest.set(k, (rest.get(k) ?? 0) - x);
      const bi = byVector.get(textOf(rest));
      if (bi === undefined || bi === ai || bi === ci || rows[ci].n !== rows[ai].n + rows[bi].n) continue;
      const [i, j] = ai < bi ? [ai, bi] : [bi, ai];
      if (seen.has(`${i} ${j}`)) continue;
      seen.add(`${i} ${j}`);
      cycles.push([i, j, ci]);
    }
  });
  cycles.sort((x, y) => x[0] - y[0] || x[1] - y[1]);
  for (const [i, j, ci] of cycles) {
    const [a, b, c] = [rows[i], rows[j], rows[ci]];
    lines.push(line('cycle', [c.key, a.key, b.key], c.e0, (a.n * a.e0 + b.n * b.e0) / c.n));
  }
  return lines;
}

const WATER_IONS = new Set(['H+', 'OH-', 'H2O']);

/**
 * ΔG° per electron (J/mol) of the reaction C/nC − A/nA when the two half-reactions share a species
 * other than H+, OH- and H2O, the difference is not empty, and every species left in it has ΔfG° in the
 * species table; null otherwise.
 */
function differenceGibbsPerElectron(c: CoupleRow, a: CoupleRow): number | null {
  const terms = new Map<string, { coef: number; term: HalfReactionTerm }>();
  const add = (row: CoupleRow, sign: number) => {
    for (const t of row.parsed.species) {
      const k = t.species.key;
      const v = (sign * (t.side === 'red' ? t.coefficient : -t.coefficient)) / row.n;
      const cur = terms.get(k);
      terms.set(k, { coef: (cur?.coef ?? 0) + v, term: cur?.term ?? t });
    }
  };
  const keysC = new Set(c.parsed.species.map((t) => t.species.key));
  if (!a.parsed.species.some((t) => keysC.has(t.species.key) && !WATER_IONS.has(t.species.key))) return null;
  add(c, 1);
  add(a, -1);
  let g = 0;
  let any = false;
  for (const { coef, term } of terms.values()) {
    if (Math.abs(coef) < 1e-12) continue;
    any = true;
    const rec = speciesRecord(term);
    if (rec === undefined || rec.dfG_kJ_mol === undefined) return null;
    g += coef * rec.dfG_kJ_mol * 1000;
  }
  return any ? g : null;
}
