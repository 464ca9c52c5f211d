import { createRequire } from 'node:module';
import { describe, expect, it } from 'vitest';
import { BUILD_TIME, BUILTIN_RECORDS } from '../../src/dataset/buildTime';
import { builtinDataSetChecksum, builtinPartChecksums, builtinPartsChecksum, builtinTableChecksum, dataSetChecksum, partChecksum } from '../../src/dataset/checksum';
import { BUILTIN_PARTS, DATA_PARTS } from '../../src/dataset/parts';
import { recordsOf } from '../../src/store/rows';
import { builtinChecksum } from '../../src/store/stored';
import { builtinTable, builtinTableProblems } from '../../src/table/builtin';
import { type PrebuiltTable, tableFromPrebuilt } from '../../src/table/prebuilt';
import { buildTable } from '../../src/table/table';
import couples from '../../data/couples.json';
import electrodes from '../../data/electrodes.json';

// What the production build computes ahead (scripts/lib/buildTimeLoader.cjs → scripts/lib/buildTime.mjs)
// must be what the sources compute at run time; the expected values are computed here from data/.
const require = createRequire(import.meta.url);
const loader = require('../../scripts/lib/buildTimeLoader.cjs') as (this: unknown) => void;

/** Runs the loader as webpack would and returns the module it writes and the dependencies it adds. */
function runLoader(): Promise<{ module: string; dependencies: string[] }> {
  return new Promise((resolve, reject) => {
    const dependencies: string[] = [];
    loader.call({
      async: () => (err: Error | null, text?: string) => (err ? reject(err) : resolve({ module: text ?? '', dependencies })),
      addContextDependency: (d: string) => dependencies.push(d),
    });
  });
}

describe('build-time values (src/dataset/buildTime.ts)', () => {
  it('the sources compute nothing ahead and carry the built-in records', () => {
    expect(BUILD_TIME).toBeNull();
    expect(BUILTIN_RECORDS?.couples).toBe(couples.couples);
    expect(BUILTIN_RECORDS?.electrodes).toBe(electrodes.electrodes);
  });

  it('the build replaces the module by the table and the checksums the sources compute', async () => {
    const { module, dependencies } = await runLoader();
    expect(module).toContain('export const BUILTIN_RECORDS = null;');
    expect(dependencies.map((d) => d.split(/[\\/]/).pop())).toEqual(['src', 'data']);
    const m = /^export const BUILD_TIME = JSON\.parse\((".*")\);$/m.exec(module);
    expect(m).not.toBeNull();
    const values = JSON.parse(JSON.parse(m![1]) as string) as { table: PrebuiltTable; tableChecksum: string; partChecksums: Record<string, string>; partsChecksum: string; dataSetChecksum: string };

    const built = buildTable(couples.version, couples.couples, electrodes.electrodes);
    const fromBuild = tableFromPrebuilt(values.table);
    expect(fromBuild.table.couples).toStrictEqual(built.table.couples);
    expect(fromBuild.table.electrodes).toStrictEqual(built.table.electrodes);
    expect(fromBuild.problems).toStrictEqual(built.problems);
    expect(fromBuild.problems).toEqual(builtinTableProblems());
    expect(values.tableChecksum).toBe(builtinChecksum(recordsOf(built.table)));
    expect(values.tableChecksum).toBe(builtinTableChecksum());
    expect(values.tableChecksum).toBe(builtinChecksum(recordsOf(builtinTable())));
    expect(Object.keys(values.partChecksums)).toEqual([...DATA_PARTS]);
    for (const p of DATA_PARTS) expect(values.partChecksums[p]).toBe(partChecksum(BUILTIN_PARTS[p]));
    expect(values.partChecksums).toEqual(builtinPartChecksums());
    // the checksum over the nine parts' (what a workbook records) and the data set's
    const nine: Record<string, string> = {};
    for (const p of DATA_PARTS) nine[p] = partChecksum(BUILTIN_PARTS[p]);
    expect(values.partsChecksum).toBe(partChecksum(nine));
    expect(values.partsChecksum).toBe(builtinPartsChecksum());
    expect(values.dataSetChecksum).toBe(dataSetChecksum({ table: values.tableChecksum, ...(nine as ReturnType<typeof builtinPartChecksums>) }));
    expect(values.dataSetChecksum).toBe(builtinDataSetChecksum());
  }, 60_000);
});
