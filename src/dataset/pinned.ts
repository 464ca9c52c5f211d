/**
 * The stored form of a workbook's pinned data: the parts of the data set besides the potential table
 * (src/dataset/parts.ts), kept in the workbook under their own settings key (workbook/pinnedData.ts),
 * beside the potential table's (which src/store/stored.ts describes). One JSON text:
 *
 *   format    "cellwright.pinned-data"   (anything else is not ours)
 *   schema    1
 *   version   the add-in data version the parts were pinned from, e.g. "2026.1"
 *   pinnedAt  time of the pinning, ISO 8601 UTC
 *   checksum  "sha256:" + SHA-256 of the canonical JSON of { <part>: checksum, … } over the parts held
 *   parts     { <part>: { checksum, content }, … }  content: the part exactly as the add-in's data file
 *             holds it; checksum: partChecksum(content)
 *
 * A workbook may hold any of the known parts (a part it does not hold follows the add-in's built-in
 * data, and is listed as built-in). Reading checks everything and uses nothing partially: JSON, ours, a
 * known schema, every field present with the right type and nothing unknown, every part's checksum,
 * the overall checksum, and every part's content against the shape this add-in reads (shape.ts) and
 * the part's own rules (atomic weights positive and of element symbols, species formulas readable).
 * Any failure makes the whole pinned data unreadable with a plain-words reason.
 */
import { isElementSymbol } from '../chem/elements';
import { parseSpecies } from '../chem/formula';
import { isTableVersion } from '../store/tableVersion';
import { isUtcTimestamp } from '../store/utcTimestamp';
import { partChecksum } from './checksum';
import { BUILTIN_PARTS, DATA_PARTS, type DataPartName, type DataParts, PART_INFO, isDataPartName } from './parts';
import { type Shape, shapeOf, shapeProblems } from './shape';

export const PINNED_FORMAT = 'cellwright.pinned-data';
export const PINNED_SCHEMA = 1;
/** The reader does not try to read texts longer than this. */
export const MAX_PINNED_READ_CHARS = 8_000_000;

/** Pinned parts as read: what each holds and its checksum. */
export interface PinnedData {
  readonly version: string;
  readonly pinnedAt: string;
  /** Over the per-part checksums of the parts held. */
  readonly checksum: string;
  /** The parts as stored (what the checksums cover and what an update compares). */
  readonly parts: Partial<DataParts>;
  readonly checksums: Partial<Record<DataPartName, string>>;
  /**
   * The parts as the functions read them: as stored, plus any field that this add-in's built-in part
   * has and the stored part predates (data pinned by an earlier add-in version), taken from the
   * built-in part. Such fields are listed in `fromBuiltin`.
   */
  readonly inUse: Partial<DataParts>;
  /** Per part, the fields (paths) taken from the built-in part because the pinned part predates them. */
  readonly fromBuiltin: Partial<Record<DataPartName, readonly string[]>>;
  /** Checksums of the parts as the functions read them: `checksums`, except for parts with fields from the built-in part. */
  readonly inUseChecksums: Partial<Record<DataPartName, string>>;
}

export interface PinnedProblem {
  readonly kind: 'empty' | 'too-large' | 'not-json' | 'not-ours' | 'newer-schema' | 'damaged' | 'checksum';
  /** One sentence for people. */
  readonly message: string;
  /** Further lines, possibly empty. */
  readonly details: readonly string[];
}

export type PinnedRead = { readonly ok: true; readonly pinned: PinnedData } | { readonly ok: false; readonly problem: PinnedProblem };

/** The checksum over the per-part checksums of the parts held (in the order of DATA_PARTS). */
export function pinnedChecksum(checksums: Partial<Record<DataPartName, string>>): string {
  const ordered: Record<string, string> = {};
  for (const p of DATA_PARTS) if (checksums[p] !== undefined) ordered[p] = checksums[p];
  return partChecksum(ordered);
}

/**
 * The stored text pinning `parts` (by default every built-in part) as of `version` at `pinnedAt`.
 *
 * Syntax: writePinnedText({ version, pinnedAt, parts })
 * Example: readPinnedText(writePinnedText({ version: "2026.1", pinnedAt: "2026-01-05T10:00:00.000Z" })).ok → true
 */
export function writePinnedText(p: { readonly version: string; readonly pinnedAt: string; readonly parts?: Partial<DataParts> }): string {
  const parts = p.parts ?? BUILTIN_PARTS;
  const out: Record<string, { checksum: string; content: unknown }> = {};
  const sums: Partial<Record<DataPartName, string>> = {};
  for (const name of DATA_PARTS) {
    const content = parts[name];
    if (content === undefined) continue;
    sums[name] = partChecksum(content);
    out[name] = { checksum: sums[name], content };
  }
  const text = JSON.stringify({ format: PINNED_FORMAT, schema: PINNED_SCHEMA, version: p.version, pinnedAt: p.pinnedAt, checksum: pinnedChecksum(sums), parts: out });
  lastRead = null;
  return text;
}

/** The last text read and what it reads as: reading the same text again (the pane, then the functions) costs nothing. */
let lastRead: { text: string; result: PinnedRead } | null = null;

/** Forgets the remembered text (tests measure a first read with it). */
export function forgetLastPinnedRead(): void {
  lastRead = null;
}

const fail = (kind: PinnedProblem['kind'], message: string, details: readonly string[] = []): PinnedRead => ({ ok: false, problem: { kind, message, details } });

const isRecord = (x: unknown): x is Record<string, unknown> => typeof x === 'object' && x !== null && !Array.isArray(x);

const shapes = new Map<DataPartName, Shape>();
function builtinShape(name: DataPartName): Shape {
  let s = shapes.get(name);
  if (s === undefined) {
    s = shapeOf(BUILTIN_PARTS[name]);
    shapes.set(name, s);
  }
  return s;
}

/** The part's own rules, beyond its shape (the content has the shape already). */
function ruleProblems(name: DataPartName, content: unknown): string[] {
  const problems: string[] = [];
  if (name === 'atomicweights') {
    const seen = new Set<string>();
    for (const e of (content as DataParts['atomicweights']).elements) {
      if (!isElementSymbol(e.symbol)) problems.push(`atomic weights: "${e.symbol.slice(0, 20)}" is not an element symbol`);
      else if (seen.has(e.symbol)) problems.push(`atomic weights: ${e.symbol} is listed twice`);
      if (!(e.atomicWeight > 0 && e.atomicWeight < 300)) problems.push(`atomic weights: ${e.symbol.slice(0, 20)} has the weight ${e.atomicWeight}, not between 0 and 300 g/mol`);
      seen.add(e.symbol);
    }
  } else if (name === 'species') {
    const seen = new Set<string>();
    for (const s of (content as { species: { formula: string; state: string }[] }).species) {
      const where = `species "${s.formula.slice(0, 40)}" (${s.state.slice(0, 10)})`;
      if (!['s', 'l', 'g', 'aq'].includes(s.state)) problems.push(`${where}: the state is not s, l, g or aq`);
      try {
        const k = `${parseSpecies(s.formula).key}|${s.state}`;
        if (seen.has(k)) problems.push(`${where} is listed twice`);
        seen.add(k);
      } catch {
        problems.push(`${where}: the formula cannot be read`);
      }
    }
  }
  return problems.slice(0, 20);
}

/**
 * Reads a stored pinned-data text. Never throws.
 *
 * Syntax: readPinnedText(text)
 * Example: readPinnedText(writePinnedText({ version: "2026.1", pinnedAt })).ok → true
 */
export function readPinnedText(text: unknown): PinnedRead {
  if (lastRead !== null && text === lastRead.text) return lastRead.result;
  let result: PinnedRead;
  try {
    result = readUncached(text);
  } catch (e) {
    const detail = e instanceof Error ? `${e.name}: ${e.message}` : String(e);
    result = fail('damaged', 'the pinned data holds something Cellwright cannot check', [detail.slice(0, 300)]);
  }
  if (typeof text === 'string' && result.ok) lastRead = { text, result };
  return result;
}

function readUncached(text: unknown): PinnedRead {
  if (typeof text !== 'string') return fail('not-ours', `the stored value is ${text === null ? 'null' : `a ${typeof text}`}, not the text Cellwright writes`);
  if (text.length > MAX_PINNED_READ_CHARS) return fail('too-large', `the pinned data is ${text.length.toLocaleString('en-US')} characters long, more than Cellwright reads`);
  if (text.trim() === '') return fail('empty', 'the pinned data is empty');
  let doc: unknown;
  try {
    doc = JSON.parse(text);
  } catch (e) {
    return fail('not-json', 'the pinned data is not valid JSON: it may have been cut short or edited by hand', [`JSON reader: ${(e instanceof Error ? e.message : String(e)).slice(0, 300)}`]);
  }
  if (!isRecord(doc) || doc.format !== PINNED_FORMAT) return fail('not-ours', 'the pinned data was not written by Cellwright (its format mark is missing or different)');
  if (typeof doc.schema !== 'number' || !Number.isInteger(doc.schema) || doc.schema < 1) return fail('damaged', 'the pinned data has no valid schema number');
  if (doc.schema > PINNED_SCHEMA) {
    return fail('newer-schema', `the pinned data was written by a newer version of Cellwright (schema ${doc.schema}; this add-in reads schemas up to ${PINNED_SCHEMA}); update the add-in to use it`);
  }
  const problems: string[] = [];
  const top = ['format', 'schema', 'version', 'pinnedAt', 'checksum', 'parts'];
  const extra = Object.keys(doc).filter((k) => !top.includes(k));
  if (extra.length > 0) problems.push(`fields Cellwright does not write: ${extra.slice(0, 5).map((k) => JSON.stringify(k.slice(0, 40))).join(', ')}`);
  const missing = top.filter((k) => !(k in doc));
  if (missing.length > 0) problems.push(`missing fields: ${missing.join(', ')}`);
  if (!isTableVersion(doc.version)) problems.push('"version" is not a data version such as "2026.1"');
  if (!isUtcTimestamp(doc.pinnedAt)) problems.push('"pinnedAt" is not a time written YYYY-MM-DDTHH:MM:SS.sssZ (ISO 8601, UTC)');
  const isSum = (x: unknown): x is string => typeof x === 'string' && /^sha256:[0-9a-f]{64}$/.test(x);
  if (!isSum(doc.checksum)) problems.push('"checksum" is not "sha256:" and 64 hex digits');
  if (!isRecord(doc.parts)) problems.push('"parts" is not a record');
  if (problems.length > 0) return fail('damaged', `the pinned data is damaged: ${problems[0]}`, problems);

  const rawParts = doc.parts as Record<string, unknown>;
  const names = Object.keys(rawParts);
  const unknown = names.filter((n) => !isDataPartName(n));
  if (unknown.length > 0) {
    return fail('damaged', `the pinned data holds parts this add-in does not know: ${unknown.slice(0, 5).map((n) => JSON.stringify(n.slice(0, 40))).join(', ')} (written by a newer add-in, or damaged)`);
  }
  if (names.length === 0) return fail('damaged', 'the pinned data holds no part');
  const parts: Partial<Record<DataPartName, unknown>> = {};
  const checksums: Partial<Record<DataPartName, string>> = {};
  const inUse: Partial<Record<DataPartName, unknown>> = {};
  const fromBuiltin: Partial<Record<DataPartName, readonly string[]>> = {};
  const inUseChecksums: Partial<Record<DataPartName, string>> = {};
  for (const name of DATA_PARTS) {
    if (!(name in rawParts)) continue;
    const entry = rawParts[name];
    const title = PART_INFO[name].title;
    if (!isRecord(entry) || Object.keys(entry).length !== 2 || !isSum(entry.checksum) || !('content' in entry)) {
      return fail('damaged', `the pinned data is damaged: the part "${title}" is not { checksum, content }`);
    }
    const added: string[] = [];
    const content = withFieldsFrom(entry.content, BUILTIN_PARTS[name], name, added);
    const shape = shapeProblems(content, builtinShape(name), name);
    if (shape.length > 0) return fail('damaged', `the pinned part "${title}" is damaged or was written by another add-in version: ${shape[0]}`, shape);
    const sum = partChecksum(entry.content);
    if (sum !== entry.checksum) {
      return fail('checksum', `the checksum of the pinned part "${title}" does not match its content: it was changed outside Cellwright or damaged`, [`stored checksum ${entry.checksum}`, `checksum of the content ${sum}`]);
    }
    const rules = ruleProblems(name, content);
    if (rules.length > 0) return fail('damaged', `the pinned part "${title}" cannot be used: ${rules[0]}`, rules);
    parts[name] = entry.content;
    inUse[name] = content;
    if (added.length > 0) fromBuiltin[name] = added;
    checksums[name] = sum;
    inUseChecksums[name] = added.length > 0 ? partChecksum(content) : sum;
  }
  const overall = pinnedChecksum(checksums);
  if (overall !== doc.checksum) {
    return fail('checksum', 'the checksum of the pinned data does not match its parts: a part was added, removed or replaced outside Cellwright', [`stored checksum ${String(doc.checksum)}`, `checksum of the parts ${overall}`]);
  }
  return {
    ok: true,
    pinned: { version: doc.version as string, pinnedAt: doc.pinnedAt as string, checksum: overall, parts: parts as Partial<DataParts>, checksums, inUse: inUse as Partial<DataParts>, fromBuiltin, inUseChecksums },
  };
}

const isPlainRecord = (v: unknown): v is Record<string, unknown> => v !== null && typeof v === 'object' && !Array.isArray(v);

/**
 * `stored` with every field of a record that `builtin` has and `stored` lacks copied from `builtin`
 * (records only, recursively; lists are never merged: a row is pinned whole or not at all). The
 * paths copied are appended to `added`. A pinned part written by an earlier add-in version thus
 * keeps every value it holds and gains only what it predates. Returns `stored` itself when nothing
 * is missing.
 */
function withFieldsFrom(stored: unknown, builtin: unknown, path: string, added: string[]): unknown {
  if (!isPlainRecord(stored) || !isPlainRecord(builtin)) return stored;
  let out: Record<string, unknown> | null = null;
  for (const [k, b] of Object.entries(builtin)) {
    const here = `${path}.${k}`;
    if (!Object.prototype.hasOwnProperty.call(stored, k)) {
      out ??= { ...stored };
      out[k] = JSON.parse(JSON.stringify(b)) as unknown;
      added.push(here);
    } else {
      const merged = withFieldsFrom(stored[k], b, here, added);
      if (merged !== stored[k]) {
        out ??= { ...stored };
        out[k] = merged;
      }
    }
  }
  return out ?? stored;
}

/**
 * The parts in use with a pinned data set: the pinned ones (with any field they predate taken from
 * the built-in part, see PinnedData.inUse), the built-in ones for parts it does not hold.
 */
export function partsWithPinned(pinned: PinnedData): DataParts {
  return { ...BUILTIN_PARTS, ...pinned.inUse };
}

/** The parts with a pinned data set as stored (the built-in ones for parts it does not hold): what an update would change. */
export function storedPartsWithPinned(pinned: PinnedData): DataParts {
  return { ...BUILTIN_PARTS, ...pinned.parts };
}
