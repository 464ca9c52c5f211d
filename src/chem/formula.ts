/**
 * Chemical formula and species parsing.
 *
 * A species is a formula with an optional charge and an optional phase mark:
 *   "Cu2+", "Cu^2+", "Cu(2+)", "Cu+2", "MnO4-", "Cr2O7^2-", "SO4--", "H2O(l)", "O2(g)", "Hg2Cl2(s)",
 *   "Ni(OH)2", "Fe(CN)6^3-",
 *   "CuSO4·5H2O" (hydrate dots ·, * or .), and the electron "e-". Unicode subscripts and
 *   superscripts read as ASCII ("NiSO₄" is "NiSO4", "Cu²⁺" is "Cu2+").
 *
 * Charge rules (the written text decides; element symbols stay case-sensitive):
 *   - "^" introduces the charge: everything after it is digits and signs ("^2+", "^+2", "^3-").
 *   - a trailing group "(2+)", "(+2)", "(-)" is a charge;
 *   - a sign followed by digits is a charge ("Cu+2"); repeated signs count ("SO4--" is 2−);
 *   - one digit directly before a single trailing sign is the charge when what precedes it is a lone
 *     element symbol ("Cu2+", "Fe3+", "S2-") or itself ends in a digit ("SO42-", "Hg22+", "UO22+");
 *     otherwise the digit is a count and the charge is 1 ("MnO4-", "NH4+", "NO3-", "VO2+").
 *   Write "^" wherever a digit could be read either way ("VO^2+" is vanadyl).
 */
import { InputError } from '../errors';
import { MAX_FORMULA_CHARS } from '../textLimits';
import { asciiFormula } from './asciiFormula';
import { isElementSymbol } from './elements';

export type Phase = 's' | 'l' | 'g' | 'aq';

export interface Species {
  /** The formula as written, without charge, phase or white space ("Cu", "MnO4", "CuSO4·5H2O"). */
  readonly body: string;
  /** Net charge in units of e (0 for neutral species, −1 for the electron). */
  readonly charge: number;
  /** Phase mark when one was written. */
  readonly phase?: Phase;
  /** Element counts (the electron has none). */
  readonly elements: Readonly<Record<string, number>>;
  /** True for the electron "e-". */
  readonly isElectron: boolean;
  /**
   * True when the charge came from a digit before a single sign next to a lone element ("I3-" read
   * as I with 3−): if the digit was meant as a count, the text should have been written "I3^-".
   */
  readonly chargeFromDigit?: boolean;
  /** Canonical text (see canonicalSpecies): "Cu2+", "MnO4-", "Cr2O7^2-"; equal for every spelling of one species. */
  readonly key: string;
}

const PHASE_RE = /\((s|l|g|aq|cr|c)\)$/;

/** Writes a charge the way the table writes keys: "" for 0, "+" / "-" for ±1, "2+" / "3-" otherwise. */
export function chargeSuffix(charge: number): string {
  if (charge === 0) return '';
  const sign = charge > 0 ? '+' : '-';
  const mag = Math.abs(charge);
  return mag === 1 ? sign : `${mag}${sign}`;
}

/**
 * Canonical text of a species: the body, then "^" and the charge when the body ends in a digit
 * (so "Cr2O7" with 2− reads "Cr2O7^2-" and cannot be mistaken), else the charge directly ("Cu2+").
 * Two spellings of the same species have the same canonical text.
 */
export function canonicalSpecies(body: string, charge: number): string {
  if (charge === 0) return body;
  const plain = `${body}${chargeSuffix(charge)}`;
  try {
    const back = splitSpecies(plain);
    if (back.body === body && back.charge === charge) return plain;
  } catch {
    /* fall through to the caret form */
  }
  const mag = Math.abs(charge);
  return `${body}^${mag === 1 ? '' : mag}${charge > 0 ? '+' : '-'}`;
}

function parseSigns(s: string): number | undefined {
  // "+", "++", "-", "--"
  if (/^\++$/.test(s)) return s.length;
  if (/^-+$/.test(s)) return -s.length;
  return undefined;
}

function parseChargeText(t: string): number | undefined {
  // "2+", "+2", "+", "--", "3-"
  let m = /^(\d+)([+-])$/.exec(t);
  if (m) return (m[2] === '+' ? 1 : -1) * Number(m[1]);
  m = /^([+-])(\d+)$/.exec(t);
  if (m) return (m[1] === '+' ? 1 : -1) * Number(m[2]);
  return parseSigns(t);
}

/**
 * A trailing charge group "(2+)", "(+2)", "(-)", "(--)" not at the start: its inner text and where it
 * starts. Scanned from the end, once (no pattern that could backtrack).
 */
function trailingChargeGroup(s: string): { charge: string; at: number } | undefined {
  if (!s.endsWith(')')) return undefined;
  const at = s.lastIndexOf('(');
  if (at <= 0) return undefined;
  const inner = s.slice(at + 1, -1);
  // [0-9]*[+-]+ or [+-][0-9]+
  let i = 0;
  while (i < inner.length && inner[i] >= '0' && inner[i] <= '9') i++;
  let j = i;
  while (j < inner.length && (inner[j] === '+' || inner[j] === '-')) j++;
  if (j > i && j === inner.length) return { charge: inner, at };
  if (inner.length >= 2 && (inner[0] === '+' || inner[0] === '-')) {
    let k = 1;
    while (k < inner.length && inner[k] >= '0' && inner[k] <= '9') k++;
    if (k === inner.length) return { charge: inner, at };
  }
  return undefined;
}

/** A trailing sign and digits after a letter or a closing bracket ("Cu+2", "Fe(CN)6-3"): the parts and where the sign stands. */
function signsThenDigits(s: string): { sign: string; digits: string; at: number } | undefined {
  let i = s.length;
  while (i > 0 && s[i - 1] >= '0' && s[i - 1] <= '9') i--;
  if (i === s.length || i < 2) return undefined;
  const sign = s[i - 1];
  if (sign !== '+' && sign !== '-') return undefined;
  const before = s[i - 2];
  if (!((before >= 'A' && before <= 'Z') || (before >= 'a' && before <= 'z') || before === ']' || before === ')')) return undefined;
  return { sign, digits: s.slice(i), at: i - 1 };
}

/** Splits a species text into body, charge and phase. Throws InputError on text it cannot read. */
export function splitSpecies(text: string): { body: string; charge: number; phase?: Phase; chargeFromDigit?: boolean } {
  if (text.length > MAX_FORMULA_CHARS) throw new InputError(`a species is too long (${text.length} characters; at most ${MAX_FORMULA_CHARS})`);
  let s = asciiFormula(text).replace(/\s+/g, '');
  if (s === '') throw new InputError('a species is empty');
  let phase: Phase | undefined;
  const pm = PHASE_RE.exec(s);
  if (pm && pm.index > 0) {
    const p = pm[1];
    phase = p === 'cr' || p === 'c' ? 's' : (p as Phase);
    s = s.slice(0, pm.index);
  }
  let charge = 0;
  let chargeFromDigit = false;
  const caret = s.indexOf('^');
  if (caret >= 0) {
    const c = parseChargeText(s.slice(caret + 1));
    if (c === undefined || caret === 0) throw new InputError(`cannot read the charge in "${text}"; write it as ^2+, (2+), 2+ or +2`);
    charge = c;
    s = s.slice(0, caret);
  } else {
    const bracket = trailingChargeGroup(s);
    const tail = bracket === undefined ? signsThenDigits(s) : undefined;
    if (bracket !== undefined) {
      const c = parseChargeText(bracket.charge);
      if (c === undefined) throw new InputError(`cannot read the charge in "${text}"`);
      charge = c;
      s = s.slice(0, bracket.at);
    } else if (tail !== undefined) {
      // "Cu+2": a sign followed by digits
      charge = (tail.sign === '+' ? 1 : -1) * Number(tail.digits);
      s = s.slice(0, tail.at);
    } else if (s.endsWith('+') || s.endsWith('-')) {
      const sign = s[s.length - 1];
      let at = s.length;
      while (at > 0 && s[at - 1] === sign) at--;
      const count = s.length - at;
      const unit = sign === '+' ? 1 : -1;
      s = s.slice(0, at);
      if (count > 1) {
        charge = unit * count;
      } else {
        const last = s.length > 0 ? s[s.length - 1] : '';
        const d = last >= '0' && last <= '9' ? last : null;
        const rest = d !== null ? s.slice(0, -1) : s;
        const restLast = rest.length > 0 ? rest[rest.length - 1] : '';
        if (d !== null && rest !== '' && (isElementSymbol(rest) || (restLast >= '0' && restLast <= '9'))) {
          // "Cu2+", "S2-" (a lone element) or "SO42-", "Hg22+" (two digits): the last digit is the charge
          charge = unit * Number(d);
          chargeFromDigit = isElementSymbol(rest);
          s = rest;
        } else {
          // "MnO4-", "NH4+", "NO3-": the digit is a count and the charge is 1
          charge = unit;
        }
      }
      if (s === '') throw new InputError(`"${text}" has a charge but no formula`);
    }
  }
  if (s === '') throw new InputError(`"${text}" has no formula`);
  return chargeFromDigit ? { body: s, charge, phase, chargeFromDigit } : { body: s, charge, phase };
}

/**
 * Parses a neutral formula body into element counts: parentheses and square brackets with
 * multipliers, and hydrate dots (·, * or .) each followed by an optional multiplier ("CuSO4·5H2O").
 */
export function parseFormula(body: string): Record<string, number> {
  if (body.length > MAX_FORMULA_CHARS) throw new InputError(`a formula is too long (${body.length} characters; at most ${MAX_FORMULA_CHARS})`);
  const s = body.replace(/\s+/g, '');
  if (s === '') throw new InputError('a formula is empty');
  const total: Record<string, number> = {};
  // Hydrate dots: ·, * and • always; "." too, except inside a decimal multiplier ("CaSO4·0.5H2O",
  // "CaSO4.0.5H2O"), where a run of digits before the "." and a digit after it make one number.
  const parts: string[] = [];
  for (const piece of s.split(/[·*•]/)) {
    const dotted = piece.split('.');
    let cur = dotted[0];
    for (let k = 1; k < dotted.length; k++) {
      if (/^\d+$/.test(cur) && /^\d/.test(dotted[k])) cur = `${cur}.${dotted[k]}`;
      else {
        parts.push(cur);
        cur = dotted[k];
      }
    }
    parts.push(cur);
  }
  for (const part of parts) {
    if (part === '') throw new InputError(`cannot read the formula "${body}": a hydrate dot needs a formula on each side`);
    const m = /^(\d+(?:\.\d+)?)?(.*)$/.exec(part)!;
    const mult = m[1] ? Number(m[1]) : 1;
    if (m[2] === '') throw new InputError(`cannot read the formula "${body}"`);
    const counts = parseGroup(m[2], body);
    for (const el in counts) total[el] = (total[el] ?? 0) + counts[el] * mult;
  }
  return total;
}

function parseGroup(s: string, whole: string): Record<string, number> {
  // Iterative parser with an explicit stack of open groups.
  const stack: Array<{ counts: Record<string, number>; close: string }> = [{ counts: {}, close: '' }];
  let i = 0;
  const readNumber = (): number => {
    const start = i;
    while (i < s.length && s[i] >= '0' && s[i] <= '9') i++;
    if (i === start) return 1;
    const n = Number(s.slice(start, i));
    if (n === 0) throw new InputError(`cannot read the formula "${whole}": a count of 0`);
    return n;
  };
  while (i < s.length) {
    const ch = s[i];
    if (ch === '(' || ch === '[') {
      stack.push({ counts: {}, close: ch === '(' ? ')' : ']' });
      i++;
    } else if (ch === ')' || ch === ']') {
      const top = stack.pop()!;
      if (stack.length === 0 || top.close !== ch) throw new InputError(`cannot read the formula "${whole}": unbalanced ${ch}`);
      i++;
      const n = readNumber();
      if (Object.keys(top.counts).length === 0) throw new InputError(`cannot read the formula "${whole}": empty group`);
      const into = stack[stack.length - 1].counts;
      for (const el in top.counts) into[el] = (into[el] ?? 0) + top.counts[el] * n;
    } else if (ch >= 'A' && ch <= 'Z') {
      let sym = ch;
      const next = s[i + 1];
      if (next !== undefined && next >= 'a' && next <= 'z' && isElementSymbol(ch + next)) sym = ch + next;
      if (!isElementSymbol(sym)) throw new InputError(`"${sym}" in "${whole}" is not an element symbol (symbols are case-sensitive: Co is cobalt, CO is carbon monoxide)`);
      i += sym.length;
      if (s[i] !== undefined && s[i] >= 'a' && s[i] <= 'z') {
        throw new InputError(`"${ch}${s.slice(i - sym.length + 1, i + 1)}" in "${whole}" is not an element symbol`);
      }
      const n = readNumber();
      const into = stack[stack.length - 1].counts;
      into[sym] = (into[sym] ?? 0) + n;
    } else {
      throw new InputError(`cannot read the formula "${whole}" at "${s.slice(i)}"`);
    }
  }
  if (stack.length !== 1) throw new InputError(`cannot read the formula "${whole}": an opening bracket is not closed`);
  return stack[0].counts;
}

/** Species already read, by text as given (texts that cannot be read are not kept); at most SPECIES_MEMO. */
const speciesMemo = new Map<string, Species>();
const SPECIES_MEMO = 4096;

/**
 * Parses one species (no stoichiometric coefficient). Throws InputError on text it cannot read.
 * A text read before gives the same (immutable) species again: building a table reads "H+", "H2O"
 * and "e-" in row after row, and each couple's species again in its key.
 */
export function parseSpecies(text: string): Species {
  let sp = speciesMemo.get(text);
  if (sp === undefined) {
    sp = readSpecies(text);
    if (speciesMemo.size >= SPECIES_MEMO) speciesMemo.clear();
    speciesMemo.set(text, sp);
  }
  return sp;
}

function readSpecies(text: string): Species {
  const { body, charge, phase, chargeFromDigit } = splitSpecies(text);
  if (body === 'e' || body === 'e−') {
    if (charge !== -1) throw new InputError(`the electron is written "e-"; got "${text}"`);
    return { body: 'e', charge: -1, phase, elements: {}, isElectron: true, key: 'e-' };
  }
  const elements = parseFormula(body);
  const key = canonicalSpecies(body, charge);
  return chargeFromDigit ? { body, charge, phase, elements, isElectron: false, key, chargeFromDigit } : { body, charge, phase, elements, isElectron: false, key };
}
