/**
 * Converters: each reads one raw element of one argument (a number, numeric text, text, a
 * boolean, null for omitted or empty, an error value from another cell) and returns the converted
 * value or an Excel error value; none throws. Couple and electrode keys are looked up in the table
 * in use through a memo per table.
 */
import { numberTextKind } from '../src/numberText';
import { MAX_NUMBER_CHARS } from '../src/textLimits';
import { quote } from '../src/text/quote';
import { suggestKey } from '../src/table/suggestKey';
import { coupleKeyHint, electrodeKeyHint } from '../src/table/suggest';
import type { CoupleRow, ElectrodeRow, PotentialTable } from '../src/table/types';
import { currentTable } from './context';
import { type Domain, domains } from './domains';
import { asResultError, invalidValue, isErrorValue, notAvailable, notAvailableNaming, toExcelError } from './excelErrors';
import type { ArgSpec, ArgValue } from './spec';

/** A converter: the converted value, or an Excel error value. */
export type Converter = (raw: unknown) => ArgValue | CustomFunctions.Error;

/** Most distinct texts remembered per memo. */
export const MEMO_LIMIT = 4096;

/** Shows a value in a message the way a cell would. */
export function show(v: unknown): string {
  if (typeof v === 'string') return quote(v);
  if (typeof v === 'boolean') return v ? 'TRUE' : 'FALSE';
  if (v === null || v === undefined) return 'an empty cell';
  if (typeof v === 'number') return Number.isFinite(v) ? String(v) : 'a number outside the range of double-precision numbers';
  if (Array.isArray(v)) return 'a range inside a cell';
  return 'a value that is not a number or text';
}

export function isBlank(v: unknown): boolean {
  return v === null || v === undefined || (typeof v === 'string' && v.trim() === '');
}

/** Reads numeric text: trimmed, plain decimal or exponent notation; undefined when it is not. */
function numericText(raw: string): number | undefined {
  if (raw.length > MAX_NUMBER_CHARS) return undefined; // no number is written with more characters
  const t = raw.trim();
  return numberTextKind(t) === 'number' ? Number(t) : undefined;
}

export function numberFrom(raw: unknown, spec: ArgSpec, domain: Domain | undefined = spec.domain): number | CustomFunctions.Error {
  let x: number;
  if (typeof raw === 'number') x = raw;
  else if (typeof raw === 'string') {
    const parsed = numericText(raw);
    if (parsed === undefined) {
      if (raw.trim() === '') return invalidValue(`${spec.name} is required; the cell is empty`);
      return invalidValue(`${spec.name} must be a number; got ${show(raw)}`);
    }
    x = parsed;
  } else if (isErrorValue(raw)) return asResultError(raw, spec.name);
  else if (isBlank(raw)) return invalidValue(`${spec.name} is required; the cell is empty`);
  else return invalidValue(`${spec.name} must be a number; got ${show(raw)}`);
  if (!Number.isFinite(x)) return invalidValue(`${spec.name} must be ${domain?.accepts ?? 'a number'}; got ${show(raw)}`);
  if (x === 0) x = 0; // −0 → 0
  if (domain !== undefined && !domain.test(x)) return outOfDomain(spec.name, domain, x);
  return x;
}

/**
 * #VALUE! for a number the argument does not accept: the user must change it, so the message names
 * the argument, what it accepts and what it got, and a likely slip (a percentage typed for a
 * fraction).
 */
function outOfDomain(name: string, domain: Domain, x: number): CustomFunctions.Error {
  const b = domain.bounds;
  const percent = b !== undefined && b.hi === 1 && x > 1 && x <= 100 ? `; a percentage? write ${x} % as ${x / 100}` : '';
  return invalidValue(`${name} must be ${domain.accepts}; got ${x}${percent}`);
}

export function textFrom(raw: unknown, spec: ArgSpec): string | CustomFunctions.Error {
  if (typeof raw === 'string') {
    if (raw.length > 1000) return invalidValue(`${spec.name} is too long (${raw.length} characters; at most 1000)`);
    if (raw.trim() === '') return invalidValue(`${spec.name} is required; the cell is empty`);
    return raw;
  }
  if (typeof raw === 'number' && Number.isFinite(raw)) return String(raw === 0 ? 0 : raw);
  if (isErrorValue(raw)) return asResultError(raw, spec.name);
  if (isBlank(raw)) return invalidValue(`${spec.name} is required; the cell is empty`);
  return invalidValue(`${spec.name} must be text; got ${show(raw)}`);
}

export function booleanFrom(raw: unknown, spec: ArgSpec): boolean | CustomFunctions.Error {
  if (typeof raw === 'boolean') return raw;
  if (raw === 0 || raw === 1) return raw === 1;
  if (typeof raw === 'string') {
    const t = raw.trim().toUpperCase();
    if (t === 'TRUE' || t === 'FALSE') return t === 'TRUE';
  }
  if (isErrorValue(raw)) return asResultError(raw, spec.name);
  return invalidValue(`${spec.name} must be TRUE or FALSE; got ${show(raw)}`);
}

/** The converter of one element of an argument that is broadcast (every kind but the lists). */
export function makeConverter(spec: ArgSpec): Converter {
  const withDefault = (inner: Converter): Converter => {
    if (!spec.optional && spec.default === undefined) return inner;
    const def = spec.default === undefined ? null : spec.default;
    return (raw) => (isBlank(raw) ? def : inner(raw));
  };
  switch (spec.kind) {
    case 'number':
      return withDefault((raw) => numberFrom(raw, spec));
    case 'text':
      return withDefault((raw) => textFrom(raw, spec));
    case 'couple':
      return withDefault((raw) => {
        if (typeof raw === 'number') return invalidValue(`${spec.name} must be a couple key such as "Cu2+/Cu"; got ${show(raw)}`);
        const t = textFrom(raw, spec);
        return typeof t === 'string' ? lookUpCouple(t) : t;
      });
    case 'coupleOrPotential':
      return withDefault((raw) => {
        if (typeof raw === 'number' || (typeof raw === 'string' && numericText(raw) !== undefined)) return numberFrom(raw, spec);
        const t = textFrom(raw, spec);
        return typeof t === 'string' ? lookUpCouple(t) : t;
      });
    case 'electrode':
      return withDefault((raw) => {
        const t = textFrom(raw, spec);
        return typeof t === 'string' ? lookUpElectrode(t) : t;
      });
    case 'species': {
      const massDomain = spec.domain ?? domains.positive;
      return withDefault((raw) => {
        if (typeof raw === 'number' || (typeof raw === 'string' && numericText(raw) !== undefined)) return numberFrom(raw, spec, massDomain);
        return textFrom(raw, spec);
      });
    }
    case 'boolean':
      return withDefault((raw) => booleanFrom(raw, spec));
    case 'numberList':
    case 'textList':
      throw new Error('list arguments are read whole, not per element');
  }
}

/*
 * Look-ups, memoized per table: a range of keys repeats the same few keys many times. Only rows
 * found are kept. An unknown key is answered afresh (about a microsecond; within one call the
 * element loop already converts each distinct text once): keeping a million distinct unknown keys'
 * errors in a long-lived map cost more than making them, and would evict the known keys.
 */
let memoTable: PotentialTable | null = null;
const coupleMemo = new Map<string, CoupleRow>();
const electrodeMemo = new Map<string, ElectrodeRow>();

/**
 * Looks a key up in the table in use through a memo that is emptied whenever the table changes
 * (a changed table is a new object, see context.ts). An unknown key answers `missing(key)`.
 */
function memoLookUp<Row>(
  memo: Map<string, Row>,
  key: string,
  find: (table: PotentialTable, key: string) => Row | undefined,
  missing: (key: string, table: PotentialTable) => CustomFunctions.Error,
): Row | CustomFunctions.Error {
  let table: PotentialTable;
  try {
    table = currentTable();
  } catch (e) {
    return toExcelError(e);
  }
  if (table !== memoTable) {
    memoTable = table;
    coupleMemo.clear();
    electrodeMemo.clear();
  }
  let row = memo.get(key);
  if (row === undefined) {
    row = find(table, key);
    if (row === undefined) return missing(key, table);
    if (memo.size >= MEMO_LIMIT) memo.clear();
    memo.set(key, row);
  }
  return row;
}

/** Where an unknown key's message sends the reader, per kind of key. */
const UNKNOWN = {
  couple: { before: 'unknown couple ', where: 'the potential table' },
  'reference electrode': { before: 'unknown reference electrode ', where: 'the electrode table' },
} as const;

/** The last "; use a key of … such as …" made, kept: the same text ends every message of a range. */
let tail = { where: '', example: '', text: '' };

/** #N/A "unknown couple "X"; …" with a key that exists in this table, or a near match of what was typed. */
function unknownKey(what: 'couple' | 'reference electrode', key: string, table: PotentialTable): CustomFunctions.Error {
  const { before, where } = UNKNOWN[what];
  const s = suggestKey(table, what === 'couple' ? 'couple' : 'electrode', key);
  if (s.near !== undefined) return notAvailable(`${before}${show(key)}; did you mean "${s.near}"?`);
  if (s.example === undefined) return notAvailable(`${before}${show(key)}; ${where} has no ${what}s`);
  if (tail.where !== where || tail.example !== s.example) tail = { where, example: s.example, text: `; use a key of ${where} such as "${s.example}"` };
  return notAvailableNaming(before, key, tail.text);
}

function lookUpCouple(key: string): CoupleRow | CustomFunctions.Error {
  return memoLookUp(
    coupleMemo,
    key,
    (t, k) => t.findCouple(k),
    (k, t) => {
      const h = coupleKeyHint(t, k, false);
      return h ? notAvailable(`unknown couple ${show(k)}; ${h}`) : unknownKey('couple', k, t);
    },
  );
}

function lookUpElectrode(key: string): ElectrodeRow | CustomFunctions.Error {
  return memoLookUp(
    electrodeMemo,
    key,
    (t, k) => t.findElectrode(k),
    (k, t) => {
      const h = electrodeKeyHint(t, k, false);
      return h ? notAvailable(`unknown reference electrode ${show(k)}; ${h}`) : unknownKey('reference electrode', k, t);
    },
  );
}
