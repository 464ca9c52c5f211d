/**
 * The built-in table checked once, when the add-in is built, instead of at every start: buildTable's
 * rows, look-up keys and problems in a JSON form (src/dataset/graph.ts) that gives back exactly the
 * same rows. The production build carries it (src/dataset/buildTime.ts); the first table look-up
 * then only assembles the look-up maps instead of reading and balance-checking every half-reaction.
 * tests/table/prebuilt.test.ts holds the two ways to give equal tables.
 */
import { type EncodedGraph, decodeGraph, encodeGraph } from '../dataset/graph';
import { normalizeCoupleKey, normalizeElectrodeKey } from './keys';
import { type BuiltTable, type CheckedRows, type RowProblem, assembleTable } from './table';

/** A built table in its JSON form. */
export interface PrebuiltTable {
  readonly format: 'cellwright.prebuilt-table';
  readonly graph: EncodedGraph;
}

/**
 * The JSON form of a built table: its rows, their look-up keys (computed as buildTable computes
 * them) and the problems.
 *
 * Syntax: prebuildTable(buildTable(version, couples, electrodes))
 * See also: tableFromPrebuilt
 */
export function prebuildTable(built: BuiltTable): PrebuiltTable {
  const { table, problems } = built;
  const rows: CheckedRows & { problems: readonly RowProblem[] } = {
    version: table.version,
    couples: [...table.couples],
    coupleKeys: table.couples.map((r) => normalizeCoupleKey(r.key)),
    electrodes: [...table.electrodes],
    electrodeNames: table.electrodes.map((r) => [...new Set([r.key, ...r.aliases].map(normalizeElectrodeKey))]),
    problems,
  };
  return { format: 'cellwright.prebuilt-table', graph: encodeGraph(rows) };
}

/**
 * The table a PrebuiltTable holds, with the same rows and problems as the buildTable it was made
 * from (no row is checked again: the rows were checked when it was made).
 *
 * Syntax: tableFromPrebuilt(prebuilt)
 * See also: prebuildTable, assembleTable
 */
export function tableFromPrebuilt(prebuilt: PrebuiltTable): BuiltTable {
  if (prebuilt.format !== 'cellwright.prebuilt-table') throw new Error('not a prebuilt table');
  const rows = decodeGraph(prebuilt.graph) as CheckedRows & { problems: RowProblem[] };
  const { problems, ...checked } = rows;
  return { table: assembleTable(checked), problems };
}
