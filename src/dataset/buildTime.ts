/**
 * Values the production build computes once from the built-in data, so that the add-in does not
 * compute them at every start: the built-in potential table already checked (src/table/prebuilt.ts),
 * its content checksum, the checksums of the built-in data parts and the two checksums over those
 * (src/dataset/checksum.ts).
 *
 * This file is what the sources say: nothing computed ahead (BUILD_TIME is null), and the built-in
 * table's records, which src/table/builtin.ts then checks and builds at first use. Tests and scripts
 * that import the sources run that way. In the bundles the build replaces this module by the values
 * scripts/lib/buildTime.mjs computes with these same sources and data (scripts/lib/buildTimeLoader.cjs,
 * webpack.config.cjs), and BUILTIN_RECORDS by null, so the records are not carried twice.
 * tests/dataset/buildTime.test.ts checks the replacement against the sources.
 */
import couples from '../../data/couples.json';
import electrodes from '../../data/electrodes.json';
import type { PrebuiltTable } from '../table/prebuilt';
import type { DataPartName } from './parts';

/** What the build computes ahead. */
export interface BuildTimeValues {
  /** The built-in table, checked (buildTable of data/couples.json and data/electrodes.json). */
  readonly table: PrebuiltTable;
  /** The built-in table's content checksum (builtinChecksum of its records). */
  readonly tableChecksum: string;
  /** The checksum of each built-in data part (partChecksum of its content). */
  readonly partChecksums: Readonly<Record<DataPartName, string>>;
  /** partsChecksum of the built-in parts' checksums. */
  readonly partsChecksum: string;
  /** dataSetChecksum of the built-in table's and parts' checksums. */
  readonly dataSetChecksum: string;
}

/** Null in the sources; the values computed at build time in the bundles. */
export const BUILD_TIME: BuildTimeValues | null = null;

/** The built-in table's records (null in the bundles, which carry BUILD_TIME.table instead). */
export const BUILTIN_RECORDS: { readonly couples: readonly unknown[]; readonly electrodes: readonly unknown[] } | null = {
  couples: couples.couples,
  electrodes: electrodes.electrodes,
};
