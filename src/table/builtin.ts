/**
 * The built-in potential table, built once from data/couples.json and data/electrodes.json and
 * cached. It is the table in use whenever no workbook table is (functions/context.ts).
 *
 * Every built-in row must pass the same checks as a workbook's rows (tests/table/builtin.test.ts
 * holds the data to that); a row that did not would be left out and listed by
 * builtinTableProblems() rather than break every function.
 */
import couplesFile from '../../data/couples.json';
import electrodesFile from '../../data/electrodes.json';
import type { CouplesFile, ElectrodesFile } from './records';
import { type BuiltTable, type RowProblem, buildTable } from './table';
import type { PotentialTable } from './types';

const couplesData = couplesFile as unknown as CouplesFile;
const electrodesData = electrodesFile as unknown as ElectrodesFile;

/** Version of the built-in table (the "version" of data/couples.json), e.g. "2026.1". */
export const BUILTIN_TABLE_VERSION: string = couplesData.version;

/** The compilation the built-in couples come from (the "source" of data/couples.json). */
export const BUILTIN_TABLE_SOURCE: string = couplesData.source ?? '';

let cached: BuiltTable | null = null;

function build(): BuiltTable {
  if (cached === null) {
    cached = buildTable(BUILTIN_TABLE_VERSION, couplesData.couples ?? [], electrodesData.electrodes ?? []);
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
