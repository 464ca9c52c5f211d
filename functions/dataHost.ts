/**
 * The functions' side of the workbook's pinned data (src/dataset/pinned.ts): which parts the core
 * reads (src/dataset/active.ts) and what the data set in use is, for TABLEINFO and the pane's status.
 *
 * A pinned value that cannot be read makes the whole data set unusable: the core's data reads throw
 * (#N/A with the reason), and functions/workbookHost.ts makes the potential table unreadable too, so no
 * function answers from a mix of pinned and built-in data. Nothing here writes to the workbook.
 */
import { useDataParts } from '../src/dataset/active';
import { builtinPartChecksums, builtinPartsChecksum, partsChecksum } from '../src/dataset/checksum';
import { type DataSetDescription, type TablePart, describeDataSet } from '../src/dataset/describe';
import { DATA_PARTS, type DataPartName } from '../src/dataset/parts';
import { type PinnedData, partsWithPinned, readPinnedText } from '../src/dataset/pinned';

let pinned: PinnedData | null = null;
let problem: string | null = null;
/** The pinned value in use (null: none). */
let lastValue: unknown = null;

/**
 * Makes the core read the parts of a pinned value (null/undefined: the built-in parts). Returns the
 * reason when the value cannot be read (the core then reads nothing), else null.
 */
export function applyPinnedValue(value: unknown): string | null {
  lastValue = value ?? null;
  description = null;
  if (value === null || value === undefined) {
    pinned = null;
    problem = null;
    useDataParts(null);
    return null;
  }
  const read = readPinnedText(value);
  if (!read.ok) {
    pinned = null;
    problem = read.problem.message;
    useDataParts({ unreadable: problem });
    return problem;
  }
  pinned = read.pinned;
  problem = null;
  useDataParts(partsWithPinned(read.pinned));
  return null;
}

/** Makes the core read nothing (a read of the workbook failed: it may pin data the functions could not see). */
export function markDataUnreadable(reason: string): void {
  lastValue = null;
  pinned = null;
  problem = reason;
  description = null;
  useDataParts({ unreadable: reason });
}

/** The pinned value in use (null when the workbook pins nothing besides its table). */
export function lastPinnedValue(): unknown {
  return lastValue;
}

/** Why the pinned data cannot be read (null when it can, or there is none). */
export function pinnedDataProblem(): string | null {
  return problem;
}

/** The pinned data in use (null: none, or unreadable). */
export function pinnedDataInUse(): PinnedData | null {
  return pinned;
}

/**
 * The checksum over the parts besides the table now in use (pinned or built-in), or "unreadable":
 * what the workbook records as the data its results were computed with.
 */
export function dataPartsChecksum(): string {
  if (problem !== null) return 'unreadable';
  if (pinned === null) return builtinPartsChecksum();
  const sums = {} as Record<DataPartName, string>;
  const builtin = builtinPartChecksums();
  // Checksums of what is in use: a pinned part that predates fields of the built-in part is read with them,
  // so a later built-in change to those fields recalculates the workbook like any built-in change.
  for (const p of DATA_PARTS) sums[p] = pinned.inUseChecksums[p] ?? builtin[p];
  return partsChecksum(sums);
}

let description: { table: TablePart; value: DataSetDescription } | null = null;

/** The data set in use, given the table's part (cached while neither changes). */
export function dataSetInUse(table: TablePart): DataSetDescription {
  const d = description;
  if (d !== null && d.table.checksum === table.checksum && d.table.pinned === table.pinned && d.table.version === table.version) return d.value;
  const value = describeDataSet(table, pinned);
  description = { table, value };
  return value;
}
