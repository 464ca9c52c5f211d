/**
 * Checksums of the data set: one per part ("sha256:" + SHA-256 of the part's canonical JSON, the same
 * helpers as the potential table's checksum) and one for the whole data set, over the per-part
 * checksums. Equal data always gives equal checksums, whatever version or time it was pinned at.
 */
import { canonicalJson } from '../store/canonical';
import { recordsOf } from '../store/rows';
import { sha256Hex } from '../store/sha256';
import { builtinChecksum } from '../store/stored';
import { builtinTable } from '../table/builtin';
import { BUILD_TIME } from './buildTime';
import { BUILTIN_PARTS, DATA_PARTS, type DataPartName } from './parts';

/**
 * The checksum of one part's content.
 *
 * Syntax: partChecksum(content)
 * Example: partChecksum({ a: 1 }) → "sha256:015abd7f…"
 */
export function partChecksum(content: unknown): string {
  return `sha256:${sha256Hex(canonicalJson(content))}`;
}

let builtinSums: Readonly<Record<DataPartName, string>> | null = null;

/** The checksums of the add-in's built-in parts (computed once, or at build time in the bundles). */
export function builtinPartChecksums(): Readonly<Record<DataPartName, string>> {
  if (builtinSums === null && BUILD_TIME !== null) builtinSums = Object.freeze({ ...BUILD_TIME.partChecksums });
  if (builtinSums === null) {
    const sums = {} as Record<DataPartName, string>;
    for (const p of DATA_PARTS) sums[p] = partChecksum(BUILTIN_PARTS[p]);
    builtinSums = Object.freeze(sums);
  }
  return builtinSums;
}

let builtinTableSum: string | null = null;

/**
 * The built-in table's content checksum, builtinChecksum(recordsOf(builtinTable())) (computed once, or
 * at build time in the bundles).
 *
 * Syntax: builtinTableChecksum()
 * Example: builtinTableChecksum() → "sha256:c95e2cf4…"
 */
export function builtinTableChecksum(): string {
  builtinTableSum ??= BUILD_TIME?.tableChecksum ?? builtinChecksum(recordsOf(builtinTable()));
  return builtinTableSum;
}

/**
 * The checksum over the nine parts' checksums, { atomicweights, species, … } in that order: what a
 * workbook records as the data (besides the table) its results were computed with.
 *
 * Syntax: partsChecksum({ atomicweights, species, … })
 */
export function partsChecksum(sums: Readonly<Record<DataPartName, string>>): string {
  const ordered: Record<string, string> = {};
  for (const p of DATA_PARTS) ordered[p] = sums[p];
  return partChecksum(ordered);
}

let builtinPartsSum: string | null = null;

/** partsChecksum of the built-in parts (computed once, or at build time in the bundles). */
export function builtinPartsChecksum(): string {
  builtinPartsSum ??= BUILD_TIME?.partsChecksum ?? partsChecksum(builtinPartChecksums());
  return builtinPartsSum;
}

let builtinSetSum: string | null = null;

/** dataSetChecksum of the built-in table and parts (computed once, or at build time in the bundles). */
export function builtinDataSetChecksum(): string {
  builtinSetSum ??= BUILD_TIME?.dataSetChecksum ?? dataSetChecksum({ table: builtinTableChecksum(), ...builtinPartChecksums() });
  return builtinSetSum;
}

/**
 * The data set's checksum: "sha256:" + SHA-256 of the canonical JSON of { table, <part>: checksum, … },
 * the potential table's checksum and every other part's.
 *
 * Syntax: dataSetChecksum({ table, atomicweights, … })
 */
export function dataSetChecksum(sums: Readonly<Record<'table' | DataPartName, string>>): string {
  const ordered: Record<string, string> = {};
  for (const k of ['table', ...DATA_PARTS] as const) ordered[k] = sums[k];
  return partChecksum(ordered);
}
