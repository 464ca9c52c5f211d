import { NotFoundError } from '../errors';
import { speciesE0 } from '../species/speciesE0';
import type { CoupleRow, PotentialTable } from './types';

/** One line of the consistency report. */
export interface ConsistencyLine {
  /** 'species': a row against its species-derived E°; 'cycle': a row against two rows whose half-reactions add up to it. */
  readonly kind: 'species' | 'cycle';
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
  const line = (kind: 'species' | 'cycle', keys: string[], tableV: number, derivedV: number): ConsistencyLine => {
    const differenceMV = (tableV - derivedV) * 1000;
    const note = notes[kind === 'cycle' ? `${keys[0]} = ${keys[1]} + ${keys[2]}` : keys[0]];
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
    lines.push(line('species', [row.key], row.e0, derived));
  }
  const byVector = new Map<string, CoupleRow>();
  for (const row of table.couples) byVector.set(textOf(vectorOf(row)), row);
  const rows = table.couples;
  for (let i = 0; i < rows.length; i++) {
    for (let j = i + 1; j < rows.length; j++) {
      const a = rows[i];
      const b = rows[j];
      const sum = vectorOf(a);
      for (const [k, c] of vectorOf(b)) sum.set(k, (sum.get(k) ?? 0) + c);
      const c = byVector.get(textOf(sum));
      if (c === undefined || c === a || c === b || c.n !== a.n + b.n) continue;
      lines.push(line('cycle', [c.key, a.key, b.key], c.e0, (a.n * a.e0 + b.n * b.e0) / c.n));
    }
  }
  return lines;
}
