/**
 * The stored table: the reader (src/store/stored.ts, readStoredText) is fed damaged,
 * truncated, oversized and foreign content. It must answer every input without throwing, refuse
 * what it cannot use with a problem of a known kind and a one-line message in plain words, change
 * nothing it was given (the built-in records are frozen), and accept only tables that are whole:
 * what it accepts writes back and reads again to the same checksum.
 *
 * Damage is applied to real stored texts (a pinned copy and a copy with an added, an edited and a
 * deleted row): cuts, deleted slices, changed and inserted characters, changed JSON fields with
 * and without a recomputed checksum (so that the row checks behind the checksum are reached too).
 *
 * Through the production bundle: a damaged value handed to the functions' workbook channel makes
 * every table look-up answer #N/A with the reason (never the built-in table silently), and the
 * built-in table comes back when the value is removed.
 */
import fc from 'fast-check';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { FakeError, type LoadedBundle, loadBundle } from '../bundle/harness';
import { type WorkbookCopy, pinnedCopy } from '../../src/store/copy';
import { recordsOf, type VersionedRecords } from '../../src/store/rows';
import {
  MAX_READ_CHARS,
  STORED_FORMAT,
  STORED_SCHEMA,
  type StoredRead,
  contentChecksum,
  forgetLastRead,
  readStoredText,
  writeStoredText,
} from '../../src/store/stored';
import { builtinTable } from '../../src/table/builtin';
import { RUNS, SEED, messageProblem } from './support';

const KINDS = new Set(['empty', 'too-large', 'not-json', 'not-ours', 'newer-schema', 'damaged', 'checksum', 'rows', 'log']);
const CASES = Math.max(1000, Math.floor(RUNS / 5));

function deepFreeze<T>(x: T): T {
  if (typeof x === 'object' && x !== null && !Object.isFrozen(x)) {
    Object.freeze(x);
    for (const v of Object.values(x)) deepFreeze(v);
  }
  return x;
}

const builtin: VersionedRecords = deepFreeze(structuredClone(recordsOf(builtinTable())));
const stamp = { revision: 3, changedAt: '2026-11-30T12:00:00.000Z' };

/** Valid stored texts: the pinned built-in table, and a copy with an added, an edited and a deleted row. */
function validTexts(): string[] {
  const pinned: WorkbookCopy = { ...pinnedCopy(builtin), ...stamp };
  const [first, second, ...rest] = pinned.couples;
  const edited = { ...second, e0: second.e0 + 0.001, source: 'lab measurement, 2026' };
  // quinone/hydroquinone, E° 0.6992 V (CRC Electrochemical Series)
  const added = { key: 'C6H4O2/C6H6O2', halfReaction: 'C6H4O2 + 2H+ + 2e- -> C6H6O2', e0: 0.6992, source: 'CRC Handbook, Electrochemical Series' };
  const changed: WorkbookCopy = {
    ...pinned,
    couples: [edited, ...rest, added],
    own: { couples: [edited.key, added.key], electrodes: [] },
    removed: { couples: [first.key], electrodes: [] },
  };
  return [writeStoredText(pinned), writeStoredText(changed)];
}

/** Reads without the reader's one-text memo, so every case is checked in full. */
function read(text: unknown): StoredRead {
  forgetLastRead();
  return readStoredText(text, builtin);
}

/** What is wrong with a read result, or null. */
function problemWith(r: unknown): string | null {
  if (typeof r !== 'object' || r === null) return `the reader answered ${String(r)}`;
  const res = r as StoredRead;
  if (res.ok === true) {
    // accepted: it must be a whole table that writes back and reads again to the same checksum
    const again = read(writeStoredText({ ...res.copy, revision: res.copy.revision + 1 }));
    if (!again.ok) return `accepted a table that does not read back: ${again.problem.message}`;
    if (again.checksum !== res.checksum) return 'accepted a table whose checksum changes when written back';
    for (const c of res.table.couples) if (res.table.findCouple(c.key) !== c) return `accepted a table where "${c.key}" cannot be found`;
    return null;
  }
  if (res.ok !== false || typeof res.problem !== 'object') return 'an answer that is neither accepted nor refused';
  if (!KINDS.has(res.problem.kind)) return `an unknown problem kind ${String(res.problem.kind)}`;
  if (!Array.isArray(res.problem.details)) return 'a problem without details';
  // Shown in the task pane, not in a cell: the 300-character limit of cell messages does not
  // apply (the functions shorten the reason they show). It may echo the offending JSON value, so
  // the word null is allowed there.
  const m = res.problem.message;
  if (m.length > 2000) return `a message of ${m.length} characters`;
  return messageProblem(new FakeError('#VALUE!', m.slice(0, 300).replace(/\bnull\b/g, 'nil').trim()));
}

/** A short description of any value, for failure reports. */
function brief(v: unknown): string {
  try {
    return (typeof v === 'string' ? v : JSON.stringify(v) ?? typeof v).slice(0, 200);
  } catch {
    return Object.prototype.toString.call(v);
  }
}

function readProblem(text: unknown): string | null {
  let r: StoredRead;
  const t0 = performance.now();
  try {
    r = read(text);
  } catch (e) {
    return `threw ${e instanceof Error ? `${e.name}: ${e.message}` : String(e)}`;
  }
  const ms = performance.now() - t0;
  if (ms > 2000) return `took ${ms.toFixed(0)} ms`;
  return problemWith(r);
}

const TEXTS = validTexts();

/** Damage to a text. */
const damaged: fc.Arbitrary<string> = fc
  .tuple(fc.constantFrom(...TEXTS), fc.nat(), fc.nat(), fc.string({ maxLength: 12 }), fc.integer({ min: 0, max: 6 }))
  .map(([t, a, b, s, how]) => {
    const i = a % t.length;
    const j = Math.min(t.length, i + (b % 200));
    switch (how) {
      case 0: return t.slice(0, i); // cut short
      case 1: return t.slice(0, i) + t.slice(j); // a slice lost
      case 2: return t.slice(0, i) + s + t.slice(i + 1); // a character changed
      case 3: return t.slice(0, i) + s + t.slice(i); // text inserted
      case 4: return t.slice(0, j) + t.slice(i, j) + t.slice(j); // a slice repeated
      case 5: return t.slice(i) + t.slice(0, i); // rotated
      default: return `${t}${s}`; // trailing junk
    }
  });

/** A JSON field changed to another value, with the checksum left or recomputed. */
const edited: fc.Arbitrary<string> = fc
  .tuple(fc.constantFrom(...TEXTS), fc.nat(), fc.jsonValue({ maxDepth: 2 }), fc.boolean(), fc.constantFrom('set', 'delete', 'add'))
  .map(([t, pick, value, recompute, op]) => {
    const doc = JSON.parse(t) as Record<string, unknown>;
    const paths: Array<[Record<string, unknown> | unknown[], string | number]> = [];
    const walk = (x: unknown): void => {
      if (Array.isArray(x)) {
        x.forEach((v, k) => {
          paths.push([x, k]);
          walk(v);
        });
      } else if (typeof x === 'object' && x !== null) {
        for (const k of Object.keys(x)) {
          paths.push([x as Record<string, unknown>, k]);
          walk((x as Record<string, unknown>)[k]);
        }
      }
    };
    walk(doc);
    const [holder, key] = paths[pick % paths.length];
    if (op === 'delete') {
      if (Array.isArray(holder)) holder.splice(key as number, 1);
      else delete holder[key as string];
    } else if (op === 'add' && !Array.isArray(holder)) (holder)[`x${pick % 7}`] = value;
    else (holder as Record<string | number, unknown>)[key] = value;
    if (recompute) {
      try {
        doc.checksum = contentChecksum(doc as never);
      } catch {
        /* a structure the checksum cannot be computed over: leave it */
      }
    }
    return JSON.stringify(doc);
  });

/** Content that is not ours at all. */
const foreign: fc.Arbitrary<unknown> = fc.oneof(
  fc.string({ maxLength: 200 }),
  fc.json({ maxDepth: 3 }),
  fc.jsonValue({ maxDepth: 3 }),
  fc.constantFrom<unknown>(
    '',
    '   ',
    'null',
    '{}',
    '[]',
    '"cellwright.potential-table"',
    JSON.stringify({ format: STORED_FORMAT }),
    JSON.stringify({ format: STORED_FORMAT, schema: STORED_SCHEMA + 1 }),
    JSON.stringify({ format: STORED_FORMAT, schema: 0 }),
    JSON.stringify({ format: STORED_FORMAT, schema: 1.5 }),
    JSON.stringify({ format: STORED_FORMAT, schema: '2' }),
    JSON.stringify({ format: 'somebody.else', schema: 2 }),
    '<?xml version="1.0"?><table/>',
    'key,halfReaction,e0\nCu2+/Cu,Cu2+ + 2e- -> Cu,0.3521',
    '\ufeff{}',
    '{"__proto__":{"polluted":true},"format":"cellwright.potential-table"}',
    null,
    undefined,
    0,
    42,
    true,
    {},
    [],
    { format: STORED_FORMAT, schema: 2 },
    new Date(0),
  ),
);

describe('the stored-table reader refuses damaged, truncated, oversized and foreign content without throwing', () => {
  it('reads the valid texts it is given as a start', () => {
    for (const t of TEXTS) expect(read(t).ok).toBe(true);
  });

  for (const [name, arb] of [
    ['damaged and truncated texts', damaged],
    ['texts with a field changed (checksum left or recomputed)', edited],
    ['foreign content and values that are not text', foreign],
  ] as const) {
    it(
      name,
      () => {
        let refused = 0;
        fc.assert(
          fc.property(arb as fc.Arbitrary<unknown>, (text) => {
            const p = readProblem(text);
            if (p !== null) throw new Error(`${p} for ${brief(text)}`);
            if (!read(text).ok) refused++;
          }),
          { numRuns: CASES, seed: SEED },
        );
        expect(refused).toBeGreaterThan(CASES / 2);
      },
      Math.max(60_000, CASES * 30),
    );
  }

  it('oversized content is refused as too large, quickly, without being parsed', () => {
    const huge = `${TEXTS[0]}${' '.repeat(MAX_READ_CHARS)}`;
    const t0 = performance.now();
    const r = read(huge);
    expect(performance.now() - t0).toBeLessThan(500);
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.problem.kind).toBe('too-large');
  });

  it('a deeply nested text is refused, not a stack overflow', () => {
    expect(readProblem(`${'['.repeat(100_000)}${']'.repeat(100_000)}`)).toBeNull();
    expect(readProblem(`{"format":"${STORED_FORMAT}","schema":2,"couples":${'['.repeat(50_000)}${']'.repeat(50_000)}}`)).toBeNull();
  });

  it('the built-in records given to the reader are never changed', () => {
    expect(JSON.stringify(builtin)).toBe(JSON.stringify(recordsOf(builtinTable())));
  });
});

describe('through the production bundle: a damaged stored table makes look-ups fail loudly, with the reason', () => {
  let b: LoadedBundle;
  let host: { useStoredValue(v: unknown): { state: string; reason?: string } };
  beforeAll(() => {
    // An Office global makes the bundle open its workbook channel (Office.onReady answers as a host
    // that is not Excel, so no workbook is read at start-up).
    b = loadBundle({
      Office: { onReady: () => Promise.resolve({ host: 'Word' }), HostType: { Excel: 'Excel' }, context: { requirements: { isSetSupported: () => true } } },
      setTimeout,
      clearTimeout,
    });
    host = b.sandbox.cellwrightFunctionsHost as typeof host;
  });
  afterAll(() => {
    host?.useStoredValue(null);
  });

  it(
    'every damaged value: #N/A with a message in plain words from every table look-up; the built-in table only when the value is removed',
    async () => {
      expect(host).toBeDefined();
      const lookups: Array<[string, unknown[]]> = [
        ['STDPOTENTIAL', ['Cu2+/Cu']],
        ['EMF', ['Cu2+/Cu', 'Zn2+/Zn']],
        ['HALFCELL', ['MnO4-/Mn2+', 1, 1, 3]],
        ['REFPOTENTIAL', ['SCE']],
      ];
      const values = fc.sample(fc.oneof(damaged, edited, foreign), { numRuns: Math.max(100, CASES / 5), seed: SEED ?? 5 });
      let refused = 0;
      for (const v of values) {
        const status = host.useStoredValue(v);
        if (status.state !== 'unreadable') continue; // a damage that left a whole table (e.g. white space)
        refused++;
        for (const [id, args] of lookups) {
          const r = await Promise.resolve(b.call(id, ...args));
          const cell = (r as unknown[][])[0][0] as FakeError;
          expect(cell, `${id} with ${brief(v)}`).toBeInstanceOf(FakeError);
          expect(cell.code).toBe('#N/A');
          expect(cell.message).toMatch(/^the workbook's potential table could not be read: /);
          // the reason may echo the offending JSON value (null included), as the reader's does
          expect(messageProblem(new FakeError(cell.code, cell.message?.replace(/\bnull\b/g, 'nil')))).toBeNull();
        }
      }
      expect(refused).toBeGreaterThan(values.length / 2);
      host.useStoredValue(null);
      expect((b.call('STDPOTENTIAL', 'Cu2+/Cu') as unknown[][])[0][0]).toBeCloseTo(0.3372, 4); // data/couples.json (Thermoddem V1.10)
    },
    // CASES / 5 stored values, each read whole and asked four times: at `npm run fuzz` (4,000 values)
    // 87 s alone and 185 s on a loaded machine, so the time allowed grows with the count
    Math.max(120_000, CASES * 30),
  );
});
