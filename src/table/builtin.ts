/**
 * The built-in potential table, built once from data/couples.json and data/electrodes.json and
 * cached. It is the table in use whenever no workbook table is (functions/context.ts). In the
 * bundles its rows were checked when the add-in was built (src/dataset/buildTime.ts), so the first
 * look-up only assembles the look-up maps.
 *
 * Every built-in row must pass the same checks as a workbook's rows (tests/table/builtin.test.ts
 * holds the data to that); a row that did not would be left out and listed by
 * builtinTableProblems() rather than break every function.
 */
import couplesFile from '../../data/couples.json';
import { BUILD_TIME, BUILTIN_RECORDS } from '../dataset/buildTime';
import { tableFromPrebuilt } from './prebuilt';
import { type BuiltTable, type RowProblem, buildTable } from './table';
import type { PotentialTable } from './types';

// Only the version and the source of data/couples.json are read here, as properties (so that the
// bundles carry only those two of the file): the rows come from src/dataset/buildTime.ts (the records
// in the sources, the table checked at build time in the bundles).

/** Version of the built-in table (the "version" of data/couples.json), e.g. "2026.1". */
export const BUILTIN_TABLE_VERSION: string = couplesFile.version;

/** The compilation the built-in couples come from (the "source" of data/couples.json). */
export const BUILTIN_TABLE_SOURCE: string = couplesFile.source;

let cached: BuiltTable | null = null;

function build(): BuiltTable {
  if (cached === null) {
    if (BUILD_TIME !== null) cached = tableFromPrebuilt(BUILD_TIME.table);
    else cached = buildTable(BUILTIN_TABLE_VERSION, BUILTIN_RECORDS?.couples ?? [], BUILTIN_RECORDS?.electrodes ?? []);
  }
  return cached;
}

/**
 * The built-in table (built on first use, then cached).
 *
 * Syntax: builtinTable()
 * Example: builtinTable().findCouple("Cu2+/Cu").e0 → 0.3372
 * See also: buildTable, builtinTableProblems
 */
export function builtinTable(): PotentialTable {
  return build().table;
}

/** Rows of the built-in data left out of the table, with the reason (empty when the data is sound). */
export function builtinTableProblems(): readonly RowProblem[] {
  return build().problems;
}
