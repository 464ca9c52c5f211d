import { describe, expect, it } from 'vitest';
import { applyChange, pinnedCopy } from '../../src/store/copy';
import {
  MAX_STORED_CHARS,
  STORED_FORMAT,
  builtinChecksum,
  contentChecksum,
  forgetLastRead,
  readStoredText,
  writeSchema1Text,
  writeStoredText,
} from '../../src/store/stored';
import { builtin, manyCouples, someElectrodes } from './fixtures';

const B = builtin();
const written = (c = pinnedCopy(B), revision = 1) => writeStoredText({ ...c, revision, changedAt: '2026-01-02T03:04:05.000Z' });

describe('stored table: round trip', () => {
  it('reads back what it wrote, with the same rows, checksum and revision', () => {
    const edited = applyChange(null, B, { kind: 'put', rowKind: 'couple', originalKey: 'Cu2+/Cu', record: { ...B.couples.find((c) => c.key === 'Cu2+/Cu')!, e0: 0.3521, source: 'our lab, 2026' } });
    const text = written(edited, 7);
    const r = readStoredText(text, B);
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.schema).toBe(3);
    expect(r.copy.revision).toBe(7);
    expect(r.copy.couples).toEqual(edited.couples);
    expect(r.copy.own.couples).toEqual(['Cu2+/Cu']);
    expect(r.table.findCouple('Cu(2+)/Cu')!.e0).toBe(0.3521);
    expect(r.table.findCouple('Cu2+/Cu')!.n).toBe(2);
    expect(r.checksum).toBe(contentChecksum(edited));
    expect(writeStoredText(r.copy)).toBe(text);
  });

  it('gives a freshly pinned copy the built-in table checksum, and any edit a different one', () => {
    const pinned = readStoredText(written(), B);
    expect(pinned.ok && pinned.checksum).toBe(builtinChecksum(B));
    const edited = applyChange(null, B, { kind: 'delete', rowKind: 'couple', key: 'Zn2+/Zn' });
    expect(contentChecksum(edited)).not.toBe(builtinChecksum(B));
    // Revision and time are not part of the checksum: the same rows always give the same checksum.
    expect(contentChecksum({ ...edited, changedAt: "x" } as typeof edited)).toBe(contentChecksum(edited));
  });

  it('stores 2,000 rows within the size limit and reads them back', () => {
    const copy = applyChange(null, B, { kind: 'import', mode: 'merge', couples: manyCouples(2000), electrodes: someElectrodes() });
    const t0 = performance.now();
    const text = written(copy, 3);
    forgetLastRead();
    const r = readStoredText(text, B);
    const ms = performance.now() - t0;
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.table.couples.length).toBe(B.couples.length + 2000);
    expect(r.table.findCouple('C1999H3998O/C1999H4000O')!.n).toBe(2);
    expect(text.length).toBeLessThan(MAX_STORED_CHARS);
    // For DEVELOPERS.md and the resolving note.
    console.log(`stored size for ${r.table.couples.length} couples + ${r.table.electrodes.length} electrodes: ${text.length} characters, ${new TextEncoder().encode(text).length} bytes UTF-8; write + read ${ms.toFixed(0)} ms`);
  });

  it('refuses to write a table larger than the limit', () => {
    const long = 'x'.repeat(900); // sources hold at most 1,000 characters
    const copy = applyChange(null, B, { kind: 'import', mode: 'merge', couples: manyCouples(2400, long), electrodes: [] });
    expect(() => written(copy)).toThrow(/characters in the workbook/);
  });
});

describe('stored table: schema upgrade', () => {
  it('reads a schema-1 text, counting rows that differ from the built-in table as set here', () => {
    const rows = B.couples.map((c) => (c.key === 'Ag+/Ag' ? { ...c, e0: 0.8 } : c)).filter((c) => c.key !== 'Li+/Li');
    rows.push({ key: 'Tl+/Tl', halfReaction: 'Tl+ + e- -> Tl', e0: -0.336, source: 'our lab' });
    const text = writeSchema1Text({ basedOn: B.version, changedAt: '2025-06-01T00:00:00Z', couples: rows, electrodes: [] });
    const r = readStoredText(text, B);
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    expect(r.schema).toBe(1);
    expect(r.copy.revision).toBe(0);
    expect([...r.copy.own.couples].sort()).toEqual(['Ag+/Ag', 'Tl+/Tl']);
    expect(r.copy.removed.couples).toEqual(['Li+/Li']);
    expect(r.table.findCouple('Ag+/Ag')!.e0).toBe(0.8);
    // Written back, it is schema 3 (with the log it started, empty here) and reads the same.
    expect(r.copy.log).toEqual({ entries: [], dropped: 0 });
    const again = readStoredText(writeStoredText({ ...r.copy, revision: 1 }), B);
    expect(again.ok && again.schema).toBe(3);
    expect(again.ok && again.copy.couples).toEqual(r.copy.couples);
  });

  it('checks a schema-1 checksum too', () => {
    const text = writeSchema1Text({ basedOn: B.version, changedAt: '2025-06-01T00:00:00Z', couples: B.couples, electrodes: [] }).replace('"e0":0.3372', '"e0":0.3371');
    const r = readStoredText(text, B);
    expect(r.ok).toBe(false);
    expect(!r.ok && r.problem.kind).toBe('checksum');
  });

  it('refuses a newer schema and says so', () => {
    const doc = JSON.parse(written());
    doc.schema = 4;
    const r = readStoredText(JSON.stringify(doc), B);
    expect(!r.ok && r.problem.kind).toBe('newer-schema');
    expect(!r.ok && r.problem.message).toMatch(/newer version of Cellwright \(schema 4/);
  });
});

describe('stored table: damage is found, never papered over', () => {
  const cases: Array<[string, (t: string) => unknown, string]> = [
    ['cut short', (t) => t.slice(0, t.length / 2), 'not-json'],
    ['empty', () => '  ', 'empty'],
    ['a number instead of text', () => 42, 'not-ours'],
    ['someone else\'s JSON', () => JSON.stringify({ theme: 'dark' }), 'not-ours'],
    ['no format mark', (t) => JSON.stringify({ ...JSON.parse(t), format: undefined }), 'not-ours'],
    ['an unknown field', (t) => JSON.stringify({ ...JSON.parse(t), extra: 1 }), 'damaged'],
    ['a field missing', (t) => JSON.stringify({ ...JSON.parse(t), removed: undefined }), 'damaged'],
    ['a bad revision', (t) => JSON.stringify({ ...JSON.parse(t), revision: 'x' }), 'damaged'],
    ['a row that is not a record', (t) => { const d = JSON.parse(t); d.couples[0] = 'Cu'; return JSON.stringify(d); }, 'damaged'],
    ['an unknown row field', (t) => { const d = JSON.parse(t); d.couples[0].colour = 'red'; return JSON.stringify(d); }, 'damaged'],
    ['a changed number', (t) => (t).replace('"e0":0.3372', '"e0":0.3472'), 'checksum'],
    ['a bad checksum text', (t) => (t).replace(/"checksum":"[^"]+"/, '"checksum":"md5:1"'), 'damaged'],
  ];
  for (const [name, damage, kind] of cases) {
    it(`${name} → ${kind}`, () => {
      const r = readStoredText(damage(written()), B);
      expect(r.ok).toBe(false);
      if (r.ok) return;
      expect(r.problem.kind).toBe(kind);
      expect(r.problem.message.length).toBeGreaterThan(10);
    });
  }

  it('finds an unbalanced half-reaction even with a recomputed checksum', () => {
    const doc = JSON.parse(written());
    const i = doc.couples.findIndex((c: { key: string }) => c.key === 'Cu2+/Cu');
    doc.couples[i].halfReaction = 'Cu2+ + e- -> Cu';
    doc.checksum = contentChecksum({ ...doc });
    const r = readStoredText(JSON.stringify(doc), B);
    expect(r.ok).toBe(false);
    expect(!r.ok && r.problem.kind).toBe('rows');
    expect(!r.ok && r.problem.message).toMatch(/charge|balance/i);
  });

  it('finds an E° outside the plausible range and a missing source', () => {
    const doc = JSON.parse(written());
    doc.couples[0].e0 = 40;
    doc.couples[1].source = ' ';
    doc.checksum = contentChecksum({ ...doc });
    const r = readStoredText(JSON.stringify(doc), B);
    expect(!r.ok && r.problem.kind).toBe('rows');
    expect(!r.ok && r.problem.details.length).toBe(2);
  });

  it('finds "own" naming a row that is not there', () => {
    const doc = JSON.parse(written());
    doc.own.couples = ['Xx2+/Xx'];
    doc.checksum = contentChecksum({ ...doc });
    const r = readStoredText(JSON.stringify(doc), B);
    expect(!r.ok && r.problem.kind).toBe('damaged');
  });

  it('has the format mark it claims', () => {
    expect(JSON.parse(written()).format).toBe(STORED_FORMAT);
  });
});

describe('stored table: basedOn, changedAt and revision are checked strictly', () => {
  const doc = () => JSON.parse(written(pinnedCopy(B), 3)) as Parameters<typeof contentChecksum>[0] & Record<string, unknown>;
  const withField = (field: string, value: unknown, recompute = true) => {
    const d = doc();
    d[field] = value;
    if (recompute) d.checksum = contentChecksum(d);
    return JSON.stringify(d);
  };
  const read = (text: string) => {
    forgetLastRead();
    return readStoredText(text, B);
  };

  it('basedOn must be a well-formed version (a formula behind a recomputed checksum is refused)', () => {
    for (const v of ['2026.1,=HYPERLINK("http://x"&A1)', '=1+1', '', ' 2026.1', '2026.1 ', 'v2026', '2026..1', '1.2.3.4.5', '1234567.1']) {
      const r = read(withField('basedOn', v));
      expect(r.ok, v).toBe(false);
      if (!r.ok) expect(r.problem.message).toMatch(/"basedOn" is not a table version/);
    }
    for (const v of ['2026.1', '2099.12', '1', '2026.1.3']) expect(read(withField('basedOn', v)).ok, v).toBe(true);
  });

  it('changedAt must be ISO 8601 in UTC, a real instant', () => {
    for (const v of ['', 'yesterday', 'Tue, 1 Dec 2026 10:00:00 GMT', '2026-12-01', '2026-12-01T10:00:00', '2026-12-01T10:00:00+01:00', '2026-02-30T00:00:00Z', '2026-13-01T00:00:00Z', '2026-12-01T24:00:00Z', '2026-12-01T10:60:00Z', '2026-12-01 10:00:00Z', '+02026-12-01T10:00:00Z', 0, null]) {
      const r = read(withField('changedAt', v, false));
      expect(r.ok, String(v)).toBe(false);
      if (!r.ok) expect(r.problem.message).toMatch(/"changedAt" is not a time/);
    }
    for (const v of ['2026-12-01T10:00:00Z', '2026-12-01T10:00:00.123Z', '2024-02-29T23:59:59.999Z']) expect(read(withField('changedAt', v, false)).ok, v).toBe(true);
  });

  it('revision must be a whole number small enough that the next write can still increase it', () => {
    for (const v of [0, -1, 1.5, 1e300, 2 ** 53, Number.MAX_SAFE_INTEGER, '3', null]) {
      const r = read(withField('revision', v, false));
      expect(r.ok, String(v)).toBe(false);
      if (!r.ok) expect(r.problem.message).toMatch(/"revision" is not a whole number/);
    }
    expect(read(withField('revision', Number.MAX_SAFE_INTEGER - 1, false)).ok).toBe(true);
  });
});
