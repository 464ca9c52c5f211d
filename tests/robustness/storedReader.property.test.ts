/**
 * The stored-table reader never throws, whatever the JSON holds: every stored value either reads as a
 * table or is refused with a problem (the "unreadable" state: functions answer #N/A with the reason,
 * the pane offers the stored text for download and an explicit reset).
 *
 * A valid stored text gets one field replaced by hostile JSON written as raw text, so that what
 * JSON.stringify cannot write is reached too: numbers beyond double range (1e999 reads as Infinity),
 * 20,000-deep nesting, strings of hundreds of thousands of characters, and values of every wrong
 * type, in every field (top-level fields, a field of a couple or an electrode row, a key of the
 * own/removed lists, a whole row, a revision log entry and its rows). The checksums are left as it was or recomputed where it can be, so
 * both the checks before the checksum and the row checks behind it are reached.
 *
 * Cases: FUZZ_RUNS (1,000 by default; `npm run fuzz` runs 100,000). FUZZ_SEED replays a failure.
 */
import fc from 'fast-check';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { pinnedCopy, type WorkbookCopy } from '../../src/store/copy';
import { recordsOf, type VersionedRecords } from '../../src/store/rows';
import { type StoredRead, contentChecksum, forgetLastRead, readStoredText, writeStoredText } from '../../src/store/stored';
import { builtinTable } from '../../src/table/builtin';
import { EMPTY_LOG, appendEntry, logChecksum, logEntry } from '../../src/store/log';
import { normalizeCoupleKey } from '../../src/table/keys';
import { customFunctionsGlobal, FakeCfError } from '../taskpane/mockExcel';
import { RUNS, SEED } from './support';

const g = globalThis as Record<string, unknown>;
const builtin: VersionedRecords = recordsOf(builtinTable());
const KINDS = new Set(['empty', 'too-large', 'not-json', 'not-ours', 'newer-schema', 'damaged', 'checksum', 'rows', 'log']);

function validTexts(): string[] {
  const pinned: WorkbookCopy = { ...pinnedCopy(builtin), revision: 2, changedAt: '2026-11-30T12:00:00.000Z' };
  const [first, ...rest] = pinned.couples;
  const changed: WorkbookCopy = {
    ...pinned,
    couples: rest.slice(0, 20),
    electrodes: pinned.electrodes.slice(0, 4),
    removed: { couples: [first.key, ...rest.slice(20).map((c) => c.key)], electrodes: pinned.electrodes.slice(4).map((e) => e.key) },
  };
  // A table with a revision log of three entries (a pin, an edit, a deletion), so log entries, their
  // rows and their field values are fuzzed too.
  const cu = pinned.couples.find((c) => c.key === 'Cu2+/Cu')!;
  const edited: WorkbookCopy = { ...pinned, revision: 3, couples: pinned.couples.map((c) => (c === cu ? { ...c, e0: 0.35, note: 'lab value' } : c)) };
  const entry = (revision: number, action: 'pin' | 'edit' | 'delete', before: WorkbookCopy, after: WorkbookCopy) =>
    logEntry({ by: 'A. Tester', why: `reason ${revision}`, revision, at: '2026-11-30T12:00:00.000Z', action, basedOn: builtin.version, before, after });
  let log = appendEntry(EMPTY_LOG, entry(1, 'pin', pinned, pinned));
  log = appendEntry(log, entry(2, 'edit', pinned, edited));
  log = appendEntry(log, entry(3, 'delete', edited, changed));
  return [writeStoredText(pinned), writeStoredText(changed), writeStoredText({ ...changed, revision: 3, log })];
}
const TEXTS = validTexts();

const PLACEHOLDER = '\u0000hostile\u0000';
const nest = (d: number, open: string, close: string, inner = '1') => `${open.repeat(d)}${inner}${close.repeat(d)}`;

/** Hostile JSON, as raw text. */
const hostileJson: fc.Arbitrary<string> = fc.oneof(
  { weight: 6, arbitrary: fc.constantFrom('1e999', '-1e999', '1E400', '-1e400', '1e308', '-1.7976931348623157e308', '5e-324', '-0', '0', '123456789012345678901234567890', '9007199254740993', '1e300', '0.1') },
  { weight: 2, arbitrary: fc.constantFrom(nest(20_000, '[', ']'), nest(20_000, '{"a":', '}'), nest(5_000, '[{"key":', '}]', '"x"'), nest(100, '[', ']')) },
  { weight: 2, arbitrary: fc.constantFrom(200_000, 50_000, 1_001, 101).chain((n) => fc.constantFrom('+', '-', '1', 'x', '(', ' ', '\u00e9', '\ud83d\ude00').map((c) => JSON.stringify(c.repeat(n)))) },
  { weight: 4, arbitrary: fc.constantFrom('true', 'false', 'null', '{}', '[]', '""', '" "', '"x"', '[1]', '["x"]', '{"couples":[],"electrodes":[]}', '"2026.1,=HYPERLINK(\\"http://x\\"&A1)"', '"2026-13-40T99:99:99Z"', '"yesterday"', '"Tue, 1 Dec 2026 10:00:00 GMT"', '1e300', '9007199254740991', '2.5', '-1') },
  { weight: 6, arbitrary: fc.jsonValue({ maxDepth: 3 }).map((v) => JSON.stringify(v) ?? 'null') },
);

/** Every place a value can go: [path of keys into the document]. */
function placesOf(doc: unknown): Array<Array<string | number>> {
  const out: Array<Array<string | number>> = [];
  const walk = (x: unknown, path: Array<string | number>, depth: number): void => {
    if (depth > 7) return;
    if (Array.isArray(x)) x.forEach((v, i) => (out.push([...path, i]), walk(v, [...path, i], depth + 1)));
    else if (typeof x === 'object' && x !== null) for (const k of Object.keys(x)) {
      out.push([...path, k]);
      walk((x as Record<string, unknown>)[k], [...path, k], depth + 1);
    }
  };
  walk(doc, [], 0);
  return out;
}
const PLACES = TEXTS.map((t) => placesOf(JSON.parse(t)));

const storedValue: fc.Arbitrary<string> = fc
  .tuple(fc.nat(TEXTS.length - 1), fc.nat(), hostileJson, fc.boolean(), fc.constantFrom('set', 'add'))
  .map(([ti, pick, raw, recompute, op]) => {
    const doc = JSON.parse(TEXTS[ti]) as Record<string, unknown>;
    const places = PLACES[ti];
    const path = places[pick % places.length];
    let holder = doc as Record<string | number, unknown>;
    for (const k of path.slice(0, -1)) holder = holder[k] as Record<string | number, unknown>;
    const last = path[path.length - 1];
    if (op === 'add' && !Array.isArray(holder)) holder[`x${pick % 3}`] = PLACEHOLDER;
    else holder[last] = PLACEHOLDER;
    if (recompute) {
      try {
        doc.checksum = contentChecksum(doc as never);
        if (doc.log !== undefined) doc.logChecksum = logChecksum(doc.log as never);
      } catch {
        /* not computable over this structure: leave the old checksum */
      }
    }
    return JSON.stringify(doc).replace(JSON.stringify(PLACEHOLDER), () => raw);
  });

function read(text: unknown): StoredRead {
  forgetLastRead();
  return readStoredText(text, builtin);
}

/** What is wrong with reading `text`, or null. */
function readProblem(text: string): string | null {
  let r: StoredRead;
  const t0 = performance.now();
  try {
    r = read(text);
  } catch (e) {
    return `the reader threw ${e instanceof Error ? `${e.name}: ${e.message.slice(0, 200)}` : String(e)}`;
  }
  const ms = performance.now() - t0;
  if (ms > 2000) return `the reader took ${ms.toFixed(0)} ms`;
  if (r.ok) return r.table.couples.length === r.copy.couples.length ? null : 'accepted a table that lost rows';
  if (!KINDS.has(r.problem.kind)) return `an unknown problem kind ${String(r.problem.kind)}`;
  if (typeof r.problem.message !== 'string' || r.problem.message.length === 0 || r.problem.message.length > 2000) return 'a missing or over-long message';
  return null;
}

const brief = (t: string) => (t.length > 300 ? `${t.slice(0, 150)}…(${t.length} chars)…${t.slice(-100)}` : t);

describe('the stored-table reader, fed arbitrary JSON in every field', () => {
  it(
    `never throws: every value reads as a table or becomes unreadable with a problem (${RUNS} cases)`,
    () => {
      let refused = 0;
      fc.assert(
        fc.property(storedValue, (text) => {
          const p = readProblem(text);
          if (p !== null) throw new Error(`${p} for ${brief(text)}`);
          if (!read(text).ok) refused++;
        }),
        { numRuns: RUNS, seed: SEED },
      );
      expect(refused).toBeGreaterThan(RUNS / 2);
    },
    Math.max(120_000, RUNS * 40),
  );

  it('the named cases: 1e999, −1e999 and 20,000-deep nesting in a row field, behind a matching or a stale checksum', () => {
    const doc = JSON.parse(TEXTS[0]);
    for (const raw of ['1e999', '-1e999', nest(20_000, '[', ']'), nest(20_000, '{"a":', '}')]) {
      for (const field of ['e0', 'note', 'dEdT_mV_K', 'source']) {
        const d = structuredClone(doc);
        d.couples[3][field] = PLACEHOLDER;
        const text = JSON.stringify(d).replace(JSON.stringify(PLACEHOLDER), () => raw);
        expect(readProblem(text), `${field}: ${raw.slice(0, 20)}`).toBeNull();
        const r = read(text);
        expect(r.ok).toBe(false);
      }
    }
  });
});

describe('through the functions channel: such a value makes table look-ups answer #N/A, never the previous table', () => {
  let host: { useStoredValue(v: unknown): { state: string; reason?: string } };
  let STDPOTENTIAL: (...a: unknown[]) => unknown;
  beforeAll(async () => {
    g.CustomFunctions = customFunctionsGlobal;
    const wh = await import('../../functions/workbookHost');
    host = wh.installFunctionsHost();
    STDPOTENTIAL = (await import('../../functions/families/table')).STDPOTENTIAL as never;
  });
  afterAll(() => {
    host.useStoredValue(null);
    delete globalThis.cellwrightFunctionsHost;
  });

  it(`every value: the channel answers (never throws); unreadable → #N/A with the reason (${Math.max(100, RUNS / 10)} cases)`, () => {
    const values = fc.sample(storedValue, { numRuns: Math.max(100, RUNS / 10), seed: SEED ?? 12 });
    const workbook = writeStoredText({ ...pinnedCopy(builtin), revision: 7, changedAt: '2026-11-30T12:00:00.000Z', couples: pinnedCopy(builtin).couples.map((c) => (c.key === 'Cu2+/Cu' ? { ...c, e0: 0.35 } : c)), own: { couples: ['Cu2+/Cu'], electrodes: [] } });
    for (const v of values) {
      expect(host.useStoredValue(workbook).state).toBe('workbook'); // the previous table
      let st: { state: string; reason?: string };
      try {
        st = host.useStoredValue(v);
      } catch (e) {
        expect.fail(`the channel threw ${String(e).slice(0, 200)} for ${brief(v)}`);
      }
      expect(['workbook', 'unreadable']).toContain(st.state);
      const cell = ((STDPOTENTIAL([['Cu2+/Cu']], null) as unknown[][])[0][0]);
      if (st.state === 'unreadable') {
        expect(cell, brief(v)).toBeInstanceOf(FakeCfError);
        expect((cell as FakeCfError).code).toBe('#N/A');
        expect((cell as FakeCfError).message).toMatch(/^the workbook's potential table could not be read: /);
      } else {
        // a table that reads answers from its own rows: E° when it has the couple, else #N/A naming it
        // (a generated table may have deleted Cu2+/Cu)
        const r = readStoredText(v, builtin);
        const has = r.ok && r.table.couples.some((c) => normalizeCoupleKey(c.key) === 'Cu2+/Cu');
        if (has) expect(typeof cell, `${brief(v)} → ${JSON.stringify(cell)}`).toBe('number');
        else expect((cell as FakeCfError).message, brief(v)).toMatch(/^unknown couple "Cu2\+\/Cu"; /);
      }
    }
  });
});
