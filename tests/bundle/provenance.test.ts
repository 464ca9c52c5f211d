/**
 * TABLEINFO: through the production bundle (node:vm, built-in table) and, for the workbook's own,
 * pinned and unreadable tables, through the functions' channel (functions/workbookHost.ts) the pane uses.
 */
import { readFileSync } from 'node:fs';
import { afterEach, beforeAll, describe, expect, it } from 'vitest';
import { TABLEINFO, excelSerial } from '../../functions/families/provenance';
import { usePinnedValue, useStoredValue } from '../../functions/workbookHost';
import { builtinPartChecksums, dataSetChecksum } from '../../src/dataset/checksum';
import { BUILTIN_PARTS, DATA_PARTS } from '../../src/dataset/parts';
import { writePinnedText } from '../../src/dataset/pinned';
import { applyChange, pinnedCopy } from '../../src/store/copy';
import { recordsOf } from '../../src/store/rows';
import { builtinChecksum, writeStoredText } from '../../src/store/stored';
import { builtinTable } from '../../src/table/builtin';
import { ErrorCode, FakeError, type LoadedBundle, isError, loadBundle, one } from './harness';

const pkgVersion = (JSON.parse(readFileSync('package.json', 'utf8')) as { version: string }).version;
const builtin = recordsOf(builtinTable());

let b: LoadedBundle;
beforeAll(() => {
  b = loadBundle();
});
const call = async (...args: unknown[]) => (await b.call('TABLEINFO', ...args)) as unknown[][];

describe('TABLEINFO in the production bundle (built-in table)', () => {
  it('answers every field of the built-in table', async () => {
    expect(one(await call('origin'))).toBe('built-in');
    expect(one(await call('version'))).toBe(builtin.version);
    expect(one(await call('checksum'))).toBe(builtinChecksum(builtin));
    expect(one(await call('checksum'))).toMatch(/^sha256:[0-9a-f]{64}$/);
    expect(one(await call('couples'))).toBe(builtin.couples.length);
    expect(one(await call('electrodes'))).toBe(builtin.electrodes.length);
    expect(one(await call('addin'))).toBe(pkgVersion); // the version baked in at build
  });
  it('answers the data set: its version, its checksum over every part\'s, the parts pinned, one part\'s checksum', async () => {
    const table = builtinChecksum(builtin);
    expect(one(await call('dataset'))).toBe(builtin.version);
    expect(one(await call('datasetchecksum'))).toBe(dataSetChecksum({ table, ...builtinPartChecksums() }));
    expect(one(await call('pinned'))).toBe('none');
    expect(one(await call('checksum:table'))).toBe(table);
    expect(one(await call('Checksum: AtomicWeights'))).toBe(builtinPartChecksums().atomicweights);
    const r = one(await call('checksum:lasers')) as { code: string; message: string };
    expect(r.code).toBe('#N/A');
    expect(r.message).toMatch(/^unknown part "lasers" of the data set; the parts are "table", "atomicweights", "species"/);
  });
  it('ignores case and spaces around the field; a range of fields spills', async () => {
    expect(one(await call(' Origin '))).toBe('built-in');
    const r = await call([['version'], ['couples'], ['addin']]);
    expect(r.map((x) => x[0])).toEqual([builtin.version, builtin.couples.length, pkgVersion]);
  });
  it('revision and changed do not exist for the built-in table: #N/A saying so', async () => {
    const rev = one(await call('revision')) as { code: string; message: string };
    expect(rev.code).toBe('#N/A');
    expect(rev.message).toMatch(/built-in table has no revision/);
    const ch = one(await call('changed')) as { code: string; message: string };
    expect(ch.code).toBe('#N/A');
    expect(ch.message).toMatch(/no change time/);
  });
  it('an unknown field is #N/A listing the fields; an omitted field is #VALUE!', async () => {
    const r = one(await call('owner')) as { code: string; message: string };
    expect(r.code).toBe('#N/A');
    expect(r.message).toBe('unknown field "owner"; the fields are "origin", "version", "checksum", "revision", "changed", "couples", "electrodes", "addin", "dataset", "datasetchecksum", "pinned", or "checksum:<part>" for one part of the data set');
    expect(isError(one(await call(null)), '#VALUE!')).toBe(true);
  });
});

describe('TABLEINFO with a workbook table (the channel the pane and the start-up read use)', () => {
  beforeAll(() => {
    // the module is used here outside the bundle: give it the error class the runtime provides
    (globalThis as Record<string, unknown>).CustomFunctions = { Error: FakeError, ErrorCode };
  });
  afterEach(() => {
    useStoredValue(null);
  });
  const f = (field: string): unknown => one(TABLEINFO(field));

  it('a pinned built-in table: origin "pinned built-in", its revision and change time as an Excel serial', () => {
    const text = writeStoredText({ ...pinnedCopy(builtin), revision: 1, changedAt: '2026-03-04T12:00:00.000Z' });
    useStoredValue(text);
    expect(f('origin')).toBe('pinned built-in');
    expect(f('checksum')).toBe(builtinChecksum(builtin)); // a pinned copy carries the built-in checksum
    expect(f('revision')).toBe(1);
    // Excel's 1900 date system: 2026-03-04 is serial 46085 (1970-01-01 = 25569, + 20516 days); noon = .5
    expect(f('changed')).toBe(46085.5);
  });
  it('a table changed in the workbook: origin "workbook", its own checksum, counts follow the rows', () => {
    const copy = applyChange(pinnedCopy(builtin), builtin, { kind: 'delete', rowKind: 'couple', key: 'Zn2+/Zn' });
    const text = writeStoredText({ ...copy, revision: 7, changedAt: '2026-05-01T00:00:00Z' });
    useStoredValue(text);
    expect(f('origin')).toBe('workbook');
    expect(f('checksum')).not.toBe(builtinChecksum(builtin));
    expect(f('couples')).toBe(builtin.couples.length - 1);
    expect(f('revision')).toBe(7);
    expect(f('changed')).toBe(46143);
  });
  it('an unreadable table: origin "unreadable", every other table field #N/A with the reason; addin still answers', () => {
    useStoredValue('{"format":"cellwright.potential-table"');
    expect(f('origin')).toBe('unreadable');
    const v = f('version') as FakeError;
    expect(v.code).toBe('#N/A');
    expect(v.message).toMatch(/could not be read/);
    expect(f('addin')).toBe(pkgVersion);
  });
  it('a workbook that pins every part: "pinned" lists them, the data set keeps the built-in checksum; a changed part changes its own checksum', () => {
    useStoredValue(writeStoredText({ ...pinnedCopy(builtin), revision: 1, changedAt: '2026-03-04T12:00:00.000Z' }));
    const builtinSet = dataSetChecksum({ table: builtinChecksum(builtin), ...builtinPartChecksums() });
    usePinnedValue(writePinnedText({ version: builtin.version, pinnedAt: '2026-03-04T12:00:00.000Z' }));
    expect(f('pinned')).toBe(['table', ...DATA_PARTS].join(', '));
    expect(f('datasetchecksum')).toBe(builtinSet);
    const aw = JSON.parse(JSON.stringify(BUILTIN_PARTS.atomicweights)) as typeof BUILTIN_PARTS.atomicweights;
    aw.elements[0].atomicWeight = 1.00794; // hydrogen as IUPAC gave it before the 2009 intervals (from memory)
    usePinnedValue(writePinnedText({ version: '2025.1', pinnedAt: '2025-03-04T12:00:00.000Z', parts: { atomicweights: aw } }));
    expect(f('pinned')).toBe('table, atomicweights');
    expect(f('dataset')).toBe('2025.1');
    expect(f('checksum:atomicweights')).not.toBe(builtinPartChecksums().atomicweights);
    expect(f('checksum:species')).toBe(builtinPartChecksums().species);
    expect(f('datasetchecksum')).not.toBe(builtinSet);
    usePinnedValue(null);
  });
  it('excelSerial: 1970-01-01 is 25569 and 1900-03-01 is 61 (Excel 1900 date system)', () => {
    expect(excelSerial('1970-01-01T00:00:00Z')).toBe(25569);
    expect(excelSerial('1900-03-01T00:00:00Z')).toBe(61);
  });
});
