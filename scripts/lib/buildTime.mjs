#!/usr/bin/env node
// Computes, from the TypeScript sources and data/, what the production build carries instead of
// computing it at every start (src/dataset/buildTime.ts): the built-in potential table checked
// (src/table/prebuilt.ts), its content checksum, the built-in data parts' checksums and the two
// checksums over those. Prints them
// as one line of JSON. Run in a process of its own by the build (scripts/lib/buildTimeLoader.cjs), so
// that each build reads the sources afresh; the sources are read through scripts/lib/ts-hooks.mjs,
// where src/dataset/buildTime.ts is as written (nothing computed ahead), so these are the values the
// sources compute.
import { register } from 'node:module';
import { resolve } from 'node:path';
import { pathToFileURL } from 'node:url';

const ROOT = resolve(import.meta.dirname, '../..');
register('./ts-hooks.mjs', import.meta.url);
const src = (p) => import(pathToFileURL(resolve(ROOT, 'src', p)).href);

const { builtinTable, builtinTableProblems } = await src('table/builtin.ts');
const { prebuildTable } = await src('table/prebuilt.ts');
const { builtinDataSetChecksum, builtinPartChecksums, builtinPartsChecksum, builtinTableChecksum } = await src('dataset/checksum.ts');
const { BUILD_TIME } = await src('dataset/buildTime.ts');
if (BUILD_TIME !== null) throw new Error('src/dataset/buildTime.ts must compute nothing ahead in the sources');

const values = {
  table: prebuildTable({ table: builtinTable(), problems: builtinTableProblems() }),
  tableChecksum: builtinTableChecksum(),
  partChecksums: builtinPartChecksums(),
  partsChecksum: builtinPartsChecksum(),
  dataSetChecksum: builtinDataSetChecksum(),
};
process.stdout.write(`${JSON.stringify(values)}\n`);
