import { dataPart } from '../dataset/active';
import { NotFoundError } from '../errors';

const norm = (s: string): string => s.toLowerCase().replace(/[\s,()&\-/]+/g, '');

/** One alloy of the practical galvanic series. */
export interface SeriesRow {
  readonly alloy: string;
  readonly min_V: number;
  readonly max_V: number;
  readonly source: string;
  readonly note?: string;
}

/**
 * The corrosion-potential range of an alloy in flowing seawater from the practical galvanic series
 * (data/galvanic-series.json), V vs SCE: measured corrosion potentials, not standard potentials.
 * The name matches a row exactly (case, spaces and punctuation ignored) or as the only row that
 * contains it; an ambiguous or unknown name answers NotFoundError listing candidates.
 *
 * Syntax: galvanicSeries(alloy)
 * Example: galvanicSeries("Zinc") → { min_V: −1.03, max_V: −0.98 }
 * See also: galvanic (standard potentials)
 */
export function galvanicSeries(alloy: string): SeriesRow {
  const k = norm(alloy);
  const rows = dataPart('galvanicseries').series as readonly SeriesRow[];
  const exact = rows.find((r) => norm(r.alloy) === k);
  if (exact) return exact;
  const part = rows.filter((r) => norm(r.alloy).includes(k));
  if (part.length === 1) return part[0];
  if (part.length > 1) throw new NotFoundError(`"${alloy}" matches ${part.length} rows (${part.slice(0, 4).map((r) => r.alloy).join('; ')}…); give the full name`);
  throw new NotFoundError(`"${alloy}" is not in the galvanic series; rows include "Mild steel, cast iron", "Zinc", "Aluminium alloys", "Stainless steel type 316, 317 (passive)", "Copper"`);
}
