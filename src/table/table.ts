/**
 * Building the potential table from plain records, with every row checked.
 *
 * One builder serves the built-in table (data/*.json), a workbook's own copy and the task pane's
 * validation as you type. A row with a problem is left out of the table and reported with its
 * index, key and a plain-words message; the other rows are used. Look-ups go through Maps keyed by
 * normalized keys, so their cost does not grow with the table's size.
 */
import { parseSpecies } from '../chem/formula';
import { type HalfReaction, parseHalfReaction } from '../chem/halfReaction';
import { CellwrightError } from '../errors';
import { MAX_FORMULA_CHARS, MAX_KEY_CHARS, MAX_NOTE_CHARS, MAX_SOURCE_CHARS } from '../textLimits';
import { normalizeCoupleKey, normalizeElectrodeKey, splitCoupleKey } from './keys';
import { coupleKeySignature } from './coupleKeySignature';
import type { CoupleRow, ElectrodeRow, PotentialTable } from './types';
import { quote } from '../text/quote';
import { shorten } from '../text/shorten';

/** Plausible range of E° in V vs SHE (the aqueous electrochemical series spans about −3.1…+3.1 V). */
export const E0_RANGE_V = { min: -4, max: 4 } as const;
/** Plausible range of dE°/dT in mV/K (tabulated aqueous values lie within about ±2 mV/K). */
export const DEDT_RANGE_MV_K = { min: -5, max: 5 } as const;

/** A row that was left out of the table, and why. */
export interface RowProblem {
  readonly kind: 'couple' | 'electrode';
  /** Index of the record in the list given (0-based). */
  readonly index: number;
  /** The record's key as written ("" when it had none). */
  readonly key: string;
  /** What is wrong, in plain words. */
  readonly message: string;
}

/** The result of checking one record: the row when it is usable, and every problem found. */
export interface Validated<Row> {
  readonly row?: Row;
  readonly problems: readonly string[];
}

export interface BuiltTable {
  readonly table: PotentialTable;
  /** The rows left out, in record order (couples first, then electrodes). */
  readonly problems: readonly RowProblem[];
}

function isObject(x: unknown): x is Record<string, unknown> {
  return typeof x === 'object' && x !== null && !Array.isArray(x);
}

/** Longest message passed on from the half-reaction or species reader (it may quote the text read). */
const READER_MESSAGE_MAX_CHARS = 160;

/**
 * A value as a message shows it, always short: a number as a number, text quoted and cut to 40
 * characters, a list or an object by what it is, never written out.
 */
function echo(x: unknown): string {
  if (x === undefined || x === null) return 'nothing';
  if (typeof x === 'number') return String(x);
  if (typeof x === 'string') return quote(x);
  if (typeof x === 'boolean') return String(x);
  if (Array.isArray(x)) return 'a list';
  if (typeof x === 'object') return 'an object';
  return `a value of type ${typeof x}`;
}

function checkNumber(x: unknown, what: string, range: { min: number; max: number }, unit: string, problems: string[]): number | undefined {
  if (typeof x !== 'number' || !Number.isFinite(x)) {
    problems.push(`${what} must be a number; got ${echo(x)}`);
    return undefined;
  }
  if (x < range.min || x > range.max) {
    problems.push(`${what} ${x} ${unit} is outside the plausible range ${range.min}…${range.max} ${unit}`);
    return undefined;
  }
  return x;
}

function checkText(x: unknown, what: string, problems: string[], required: boolean, max: number): string | undefined {
  if (x === undefined || x === null) {
    if (required) problems.push(`${what} is missing`);
    return undefined;
  }
  if (typeof x !== 'string') {
    problems.push(`${what} must be text`);
    return undefined;
  }
  if (x.length > max) {
    problems.push(`${what} is too long (${x.length} characters; at most ${max})`);
    return undefined;
  }
  if (required && x.trim() === '') {
    problems.push(`${what} is empty`);
    return undefined;
  }
  return x.trim();
}

/**
 * Checks one couple record and, when it is usable, makes its row: the half-reaction parses and
 * balances; the key is Ox/Red with Ox among the species on the left and Red among those on the
 * right; n comes from the half-reaction; E° is a finite number within −4…+4 V; dE°/dT, when given,
 * within −5…+5 mV/K; the source is not empty.
 *
 * Syntax: validateCoupleRecord(record)
 * Example: validateCoupleRecord({ key: "Cu2+/Cu", halfReaction: "Cu2+ + 2e- -> Cu", e0: 0.3419, source: "CRC" }).row.n → 2
 * See also: buildTable, validateElectrodeRecord
 */
export function validateCoupleRecord(record: unknown): Validated<CoupleRow> {
  const problems: string[] = [];
  if (!isObject(record)) return { problems: ['the row is not a record with key, halfReaction, e0 and source'] };
  const key = checkText(record.key, 'the key', problems, true, MAX_KEY_CHARS);
  const text = checkText(record.halfReaction, 'the half-reaction', problems, true, MAX_FORMULA_CHARS);
  const e0 = checkNumber(record.e0, 'E°', E0_RANGE_V, 'V', problems);
  let dEdT: number | undefined;
  if (record.dEdT_mV_K !== undefined && record.dEdT_mV_K !== null) {
    dEdT = checkNumber(record.dEdT_mV_K, 'dE°/dT', DEDT_RANGE_MV_K, 'mV/K', problems);
  }
  const source = checkText(record.source, 'the source', problems, true, MAX_SOURCE_CHARS);
  const note = checkText(record.note, 'the note', problems, false, MAX_NOTE_CHARS);

  let parsed: HalfReaction | undefined;
  if (text !== undefined) {
    try {
      parsed = parseHalfReaction(text);
    } catch (e) {
      problems.push(shorten(e instanceof CellwrightError ? e.message : `the half-reaction cannot be read: ${String(e)}`, READER_MESSAGE_MAX_CHARS));
    }
  }
  if (key !== undefined) {
    const sides = splitCoupleKey(key);
    if (sides === undefined) {
      problems.push(`the key ${echo(key)} must be written Ox/Red, e.g. "Cu2+/Cu"`);
    } else {
      const ox = keySpecies(sides.ox, 'Ox', key, problems);
      const red = keySpecies(sides.red, 'Red', key, problems);
      if (parsed !== undefined) {
        if (ox !== undefined && !parsed.species.some((t) => t.side === 'ox' && t.species.key === ox)) {
          problems.push(`the key's Ox ${echo(sides.ox)} is not on the left of the half-reaction`);
        }
        if (red !== undefined && !parsed.species.some((t) => t.side === 'red' && t.species.key === red)) {
          problems.push(`the key's Red ${echo(sides.red)} is not on the right of the half-reaction`);
        }
      }
    }
  }
  if (problems.length > 0 || key === undefined || text === undefined || e0 === undefined || source === undefined || parsed === undefined) {
    return { problems };
  }
  const row: CoupleRow = {
    key,
    halfReaction: text,
    n: parsed.n,
    e0,
    ...(dEdT === undefined ? {} : { dEdT_mV_K: dEdT }),
    source,
    ...(note === undefined || note === '' ? {} : { note }),
    parsed,
  };
  return { row, problems };
}

function keySpecies(text: string, which: string, key: string, problems: string[]): string | undefined {
  try {
    const s = parseSpecies(text);
    if (s.isElectron) {
      problems.push(`the key ${echo(key)} names the electron as ${which}`);
      return undefined;
    }
    return s.key;
  } catch (e) {
    problems.push(shorten(`the key's ${which} ${echo(text)} is not a species: ${e instanceof Error ? e.message : String(e)}`, READER_MESSAGE_MAX_CHARS));
    return undefined;
  }
}

/**
 * Checks one reference-electrode record and, when it is usable, makes its row: a non-empty key,
 * aliases as a list of texts (may be empty or left out), the potential a finite number within
 * −4…+4 V vs SHE, dE/dT when given within −5…+5 mV/K, a non-empty source.
 *
 * Syntax: validateElectrodeRecord(record)
 * Example: validateElectrodeRecord({ key: "SCE", aliases: [], potential: 0.241, source: "…" }).row.key → "SCE"
 * See also: buildTable, validateCoupleRecord
 */
export function validateElectrodeRecord(record: unknown): Validated<ElectrodeRow> {
  const problems: string[] = [];
  if (!isObject(record)) return { problems: ['the row is not a record with key, aliases, potential and source'] };
  const key = checkText(record.key, 'the key', problems, true, MAX_KEY_CHARS);
  let aliases: string[] = [];
  if (record.aliases !== undefined && record.aliases !== null) {
    if (!Array.isArray(record.aliases) || record.aliases.some((a) => typeof a !== 'string' || a.trim() === '')) {
      problems.push('the aliases must be a list of non-empty texts');
    } else if (record.aliases.some((a) => (a as string).length > MAX_KEY_CHARS)) {
      problems.push(`an other name is too long (at most ${MAX_KEY_CHARS} characters)`);
    } else {
      aliases = (record.aliases as string[]).map((a) => a.trim());
    }
  }
  const potential = checkNumber(record.potential, 'the potential', E0_RANGE_V, 'V', problems);
  let dEdT: number | undefined;
  if (record.dEdT_mV_K !== undefined && record.dEdT_mV_K !== null) {
    dEdT = checkNumber(record.dEdT_mV_K, 'dE/dT', DEDT_RANGE_MV_K, 'mV/K', problems);
  }
  const source = checkText(record.source, 'the source', problems, true, MAX_SOURCE_CHARS);
  const note = checkText(record.note, 'the note', problems, false, MAX_NOTE_CHARS);
  if (problems.length > 0 || key === undefined || potential === undefined || source === undefined) return { problems };
  const row: ElectrodeRow = {
    key,
    aliases,
    potential,
    ...(dEdT === undefined ? {} : { dEdT_mV_K: dEdT }),
    source,
    ...(note === undefined || note === '' ? {} : { note }),
  };
  return { row, problems };
}

/**
 * Builds a potential table from records, checking every row (see validateCoupleRecord and
 * validateElectrodeRecord). Rows with problems, and rows whose key (or, for electrodes, alias)
 * repeats an earlier row's, are left out and listed in `problems`.
 *
 * Syntax: buildTable(version, coupleRecords, electrodeRecords)
 * Example: buildTable("2026.1", [{ key: "Zn2+/Zn", halfReaction: "Zn2+ + 2e- -> Zn", e0: -0.7618, source: "CRC" }], []).table.findCouple("Zn(2+)/Zn").e0 → −0.7618
 * See also: builtinTable, normalizeCoupleKey
 */
export function buildTable(version: string, coupleRecords: readonly unknown[], electrodeRecords: readonly unknown[]): BuiltTable {
  const problems: RowProblem[] = [];
  const keyOf = (r: unknown): string => (isObject(r) && typeof r.key === 'string' ? r.key : '');

  const couples: CoupleRow[] = [];
  const coupleKeys: string[] = [];
  const coupleRowAt = new Map<string, number>();
  coupleRecords.forEach((rec, index) => {
    const v = validateCoupleRecord(rec);
    if (v.row === undefined) {
      problems.push({ kind: 'couple', index, key: keyOf(rec), message: v.problems.join('; ') });
      return;
    }
    const k = normalizeCoupleKey(v.row.key);
    const earlier = coupleRowAt.get(k);
    if (earlier !== undefined) {
      problems.push({ kind: 'couple', index, key: v.row.key, message: `the key ${echo(v.row.key)} repeats the key of row ${earlier + 1}` });
      return;
    }
    coupleRowAt.set(k, index);
    coupleKeys.push(k);
    couples.push(v.row);
  });

  const electrodes: ElectrodeRow[] = [];
  const electrodeNames: string[][] = [];
  const electrodeRowAt = new Map<string, number>();
  electrodeRecords.forEach((rec, index) => {
    const v = validateElectrodeRecord(rec);
    if (v.row === undefined) {
      problems.push({ kind: 'electrode', index, key: keyOf(rec), message: v.problems.join('; ') });
      return;
    }
    const names = [...new Set([v.row.key, ...v.row.aliases].map(normalizeElectrodeKey))];
    const clash = names.find((n) => electrodeRowAt.has(n));
    if (clash !== undefined) {
      problems.push({
        kind: 'electrode',
        index,
        key: v.row.key,
        message: `the name ${echo(clash)} is already used by row ${electrodeRowAt.get(clash)! + 1}`,
      });
      return;
    }
    for (const n of names) electrodeRowAt.set(n, index);
    electrodeNames.push(names);
    electrodes.push(v.row);
  });

  return { table: assembleTable({ version, couples, coupleKeys, electrodes, electrodeNames }), problems };
}

/**
 * The checked rows of a table with their look-up keys: each couple's normalized key
 * (normalizeCoupleKey) and each electrode's normalized names (normalizeElectrodeKey of its key and
 * aliases, without repeats), in row order. What buildTable hands to assembleTable.
 */
export interface CheckedRows {
  readonly version: string;
  readonly couples: CoupleRow[];
  readonly coupleKeys: readonly string[];
  readonly electrodes: ElectrodeRow[];
  readonly electrodeNames: readonly (readonly string[])[];
}

/**
 * The table over rows already checked (by buildTable, or at build time for the built-in table, see
 * src/table/prebuilt.ts): the look-up maps and functions. Freezes the row lists.
 *
 * Syntax: assembleTable({ version, couples, coupleKeys, electrodes, electrodeNames })
 * See also: buildTable
 */
export function assembleTable(rows: CheckedRows): PotentialTable {
  const { version, couples, coupleKeys, electrodes, electrodeNames } = rows;
  const coupleIndex = new Map<string, CoupleRow>();
  // A text whose signature no key has is no key: it is refused without reading its species.
  const coupleSignatures = new Set<number>();
  couples.forEach((row, i) => {
    coupleIndex.set(coupleKeys[i], row);
    coupleSignatures.add(coupleKeySignature(row.key));
  });
  const electrodeIndex = new Map<string, ElectrodeRow>();
  electrodes.forEach((row, i) => {
    for (const n of electrodeNames[i]) electrodeIndex.set(n, row);
  });

  Object.freeze(couples);
  Object.freeze(electrodes);
  return {
    version,
    couples,
    electrodes,
    findCouple(key: string): CoupleRow | undefined {
      if (typeof key !== 'string' || !coupleSignatures.has(coupleKeySignature(key))) return undefined;
      return coupleIndex.get(normalizeCoupleKey(key));
    },
    findElectrode(key: string): ElectrodeRow | undefined {
      if (typeof key !== 'string') return undefined;
      return electrodeIndex.get(normalizeElectrodeKey(key));
    },
  };
}
