/**
 * Validation as you type for the pane's two row forms (no DOM: the page shows what this returns).
 *
 * Each check returns an error per field (shown under the field), information per field (for the
 * half-reaction: "Balanced · n = 2"), and the record when every field is acceptable. The rules are the
 * table's own (src/table/table.ts) plus what only the pane knows: the key must not already be used by
 * another row, and a number must be written as a number (a decimal point; a leading "−" is accepted).
 */
import { parseHalfReaction, speciesState, displaySpecies, type HalfReaction } from '../src/chem/halfReaction';
import type { CoupleRecord, ElectrodeRecord } from '../src/table/records';
import { DEDT_RANGE_MV_K, E0_RANGE_V, validateCoupleRecord, validateElectrodeRecord } from '../src/table/table';
import { ALIAS_SEPARATOR } from '../src/store/csv';
import { numberTextKind } from '../src/numberText';
import { MAX_KEY_CHARS, MAX_NOTE_CHARS, MAX_NUMBER_CHARS, MAX_SOURCE_CHARS } from '../src/textLimits';

export interface CoupleFields {
  key: string;
  halfReaction: string;
  e0: string;
  dEdT: string;
  source: string;
  note: string;
}

export interface ElectrodeFields {
  key: string;
  /** One name per line. */
  aliases: string;
  potential: string;
  dEdT: string;
  source: string;
  note: string;
}

export interface FormCheck<F, R> {
  readonly errors: Partial<Record<keyof F, string>>;
  readonly info: Partial<Record<keyof F, string>>;
  readonly record?: R;
}

/** Reads a number typed by a person; a text error when it is not one. */
export function readNumber(text: string, label: string, range: { min: number; max: number }, unit: string, required: boolean): number | undefined | { error: string } {
  if (text.length > MAX_NUMBER_CHARS) return { error: `${label} is too long for a number (at most ${MAX_NUMBER_CHARS} characters)` };
  const t = text.trim().replace(/\u2212/g, '-');
  if (t === '') return required ? { error: `${label} is required` } : undefined;
  const kind = numberTextKind(t);
  if (kind === 'decimal-comma') return { error: `write ${label} with a decimal point (${t.replace(',', '.')})` };
  if (kind !== 'number') return { error: `${label} must be a number, e.g. 0.25` };
  const x = Number(t);
  if (!Number.isFinite(x) || x < range.min || x > range.max) return { error: `${label} must lie between ${range.min} and ${range.max} ${unit}` };
  return x;
}

/** Errors for a key, source or note longer than the table accepts (src/textLimits.ts). */
function lengthErrors(f: { key: string; source: string; note: string }): Partial<Record<'key' | 'source' | 'note', string>> {
  const out: Partial<Record<'key' | 'source' | 'note', string>> = {};
  const too = (what: string, text: string, max: number) => `${what} is too long (${text.trim().length} characters; at most ${max})`;
  if (f.key.trim().length > MAX_KEY_CHARS) out.key = too('the key', f.key, MAX_KEY_CHARS);
  if (f.source.trim().length > MAX_SOURCE_CHARS) out.source = too('the source', f.source, MAX_SOURCE_CHARS);
  if (f.note.trim().length > MAX_NOTE_CHARS) out.note = too('the note', f.note, MAX_NOTE_CHARS);
  return out;
}

/** "Cu2+/Cu" from "Cu2+ + 2e- -> Cu": the first species of each side other than H+, OH- and water. */
export function suggestKey(hr: HalfReaction): string | undefined {
  const pick = (side: 'ox' | 'red') =>
    hr.species.find((t) => t.side === side && !['H+', 'OH-', 'water'].includes(speciesState(t.species, t.phase)));
  const ox = pick('ox');
  const red = pick('red');
  return ox && red ? `${displaySpecies(ox.species)}/${displaySpecies(red.species)}` : undefined;
}

/**
 * Checks the couple form. `keyTaken(key)` says whether another row (not the one being edited) already
 * uses the key.
 */
export function checkCoupleForm(f: CoupleFields, keyTaken: (key: string) => boolean): FormCheck<CoupleFields, CoupleRecord> {
  const errors: Partial<Record<keyof CoupleFields, string>> = {};
  const info: Partial<Record<keyof CoupleFields, string>> = {};

  let parsed: HalfReaction | undefined;
  if (f.halfReaction.trim() === '') errors.halfReaction = 'the half-reaction is required';
  else {
    try {
      parsed = parseHalfReaction(f.halfReaction.trim());
      info.halfReaction = `Balanced · n = ${parsed.n} electron${parsed.n === 1 ? '' : 's'}`;
    } catch (e) {
      errors.halfReaction = e instanceof Error ? e.message : String(e);
    }
  }

  const e0 = readNumber(f.e0, 'E°', E0_RANGE_V, 'V', true);
  if (typeof e0 === 'object') errors.e0 = e0.error;
  const dEdT = readNumber(f.dEdT, 'dE°/dT', DEDT_RANGE_MV_K, 'mV/K', false);
  if (typeof dEdT === 'object') errors.dEdT = dEdT.error;
  if (f.source.trim() === '') errors.source = 'a source is required: where do these numbers come from?';
  Object.assign(errors, lengthErrors(f));

  const key = f.key.trim();
  if (parsed !== undefined) {
    const s = suggestKey(parsed);
    if (s !== undefined && s !== key) info.key = `Suggested from the half-reaction: ${s}`;
  }
  if (key === '') errors.key = 'the key is required, written Ox/Red (e.g. Cu2+/Cu)';
  else if (keyTaken(key)) errors.key = `another couple already uses the key ${key}`;
  else if (parsed !== undefined) {
    // The table's own check of the key against the half-reaction (placeholders for fields checked above).
    const v = validateCoupleRecord({ key, halfReaction: f.halfReaction.trim(), e0: 0, source: 'x' });
    const keyProblem = v.problems.find((p) => /key/i.test(p));
    if (keyProblem !== undefined) errors.key = keyProblem;
  } else if (!/^[^/]+\/[^/]+$/.test(key)) errors.key = 'the key must be written Ox/Red, e.g. Cu2+/Cu';

  if (Object.keys(errors).length > 0) return { errors, info };
  const record: CoupleRecord = {
    key,
    halfReaction: f.halfReaction.trim(),
    e0: e0 as number,
    ...(dEdT === undefined ? {} : { dEdT_mV_K: dEdT as number }),
    source: f.source.trim(),
    ...(f.note.trim() === '' ? {} : { note: f.note.trim() }),
  };
  const v = validateCoupleRecord(record);
  if (v.row === undefined) return { errors: { key: v.problems.join('; ') }, info };
  return { errors, info, record };
}

/** Checks the electrode form. `nameTaken(name)` says whether another electrode uses the name as key or other name. */
export function checkElectrodeForm(f: ElectrodeFields, nameTaken: (name: string) => boolean): FormCheck<ElectrodeFields, ElectrodeRecord> {
  const errors: Partial<Record<keyof ElectrodeFields, string>> = {};
  const info: Partial<Record<keyof ElectrodeFields, string>> = {};
  const key = f.key.trim();
  if (key === '') errors.key = 'the name is required';
  else if (nameTaken(key)) errors.key = `another electrode already uses the name ${key}`;
  const aliases = f.aliases.split(/\r?\n/).map((a) => a.trim()).filter((a) => a !== '');
  const bad = aliases.find((a) => a.includes(ALIAS_SEPARATOR));
  const taken = aliases.find((a) => nameTaken(a));
  const lower = aliases.map((a) => a.replace(/\s+/g, '').toLowerCase());
  if (bad !== undefined) errors.aliases = `an other name cannot hold "${ALIAS_SEPARATOR}" (${bad})`;
  else if (taken !== undefined) errors.aliases = `another electrode already uses the name ${taken}`;
  else if (lower.some((a, i) => lower.indexOf(a) !== i) || lower.includes(key.replace(/\s+/g, '').toLowerCase())) errors.aliases = 'each name may appear once';
  const potential = readNumber(f.potential, 'the potential', E0_RANGE_V, 'V', true);
  if (typeof potential === 'object') errors.potential = potential.error;
  const dEdT = readNumber(f.dEdT, 'dE/dT', DEDT_RANGE_MV_K, 'mV/K', false);
  if (typeof dEdT === 'object') errors.dEdT = dEdT.error;
  if (f.source.trim() === '') errors.source = 'a source is required: where does this potential come from?';
  Object.assign(errors, lengthErrors(f));
  if (Object.keys(errors).length > 0) return { errors, info };
  const record: ElectrodeRecord = {
    key,
    aliases,
    potential: potential as number,
    ...(dEdT === undefined ? {} : { dEdT_mV_K: dEdT as number }),
    source: f.source.trim(),
    ...(f.note.trim() === '' ? {} : { note: f.note.trim() }),
  };
  const v = validateElectrodeRecord(record);
  if (v.row === undefined) return { errors: { key: v.problems.join('; ') }, info };
  return { errors, info, record };
}
