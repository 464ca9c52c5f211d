/**
 * Half-reactions: reading, balance checking, writing back, and the reaction quotient.
 *
 * A half-reaction is written as a reduction, electrons on the left (the oxidized side):
 *   "MnO4- + 8H+ + 5e- -> Mn2+ + 4H2O"
 *   "1/2 O2 + 2H+ + 2e- = H2O(l)"
 *   "AgCl(s) + e- ⇌ Ag(s) + Cl-"
 *
 * Arrows: "->", "→", "⟶", "=", "<=>", "⇌", "<->", "⇄", "↔". Coefficients: whole numbers, decimals or
 * fractions ("2H2O", "2 H2O", "0.5O2", "1/2 O2"). Species: every spelling parseSpecies reads
 * (charges "2+", "^2+", "(2+)", "+2"; phase marks "(s)", "(l)", "(g)", "(aq)"). Terms are separated
 * by "+"; put spaces around that "+" when a charge could be read either way.
 *
 * Atoms of every element and charge (electrons included) must balance; the errors say what does
 * not ("O: 4 on the left, 3 on the right").
 */
import { InputError } from '../errors';
import { MAX_FORMULA_CHARS } from '../textLimits';
import { type Phase, type Species, canonicalSpecies, chargeSuffix, parseSpecies, splitSpecies } from './formula';

/** The side of a half-reaction: 'ox' is the oxidized (left) side, 'red' the reduced (right) side. */
export type Side = 'ox' | 'red';

/** One species of a half-reaction with its side and stoichiometric coefficient (> 0). */
export interface HalfReactionTerm {
  readonly species: Species;
  readonly side: Side;
  /** Stoichiometric coefficient, > 0 (may be fractional, e.g. 0.5 for "1/2 O2"). */
  readonly coefficient: number;
  /** Phase mark as written, when one was written. */
  readonly phase?: Phase;
}

/** A parsed, balance-checked half-reaction (a reduction as written). */
export interface HalfReaction {
  /** The text as given. */
  readonly text: string;
  /** Electrons taken up, a whole number ≥ 1 (they stand on the oxidized side). */
  readonly n: number;
  /** Every species except the electron, in the order written, oxidized side first. */
  readonly species: readonly HalfReactionTerm[];
}

/** How a species enters a reaction quotient. */
export type SpeciesState = 'H+' | 'OH-' | 'water' | 'solid' | 'liquid' | 'gas' | 'aqueous';

/* ------------------------------------------------------------------------------------------ */
/* Exact rational coefficients                                                                 */
/* ------------------------------------------------------------------------------------------ */

/** A rational number num/den with den > 0, in lowest terms. */
interface Rational {
  readonly num: number;
  readonly den: number;
}

function gcd(a: number, b: number): number {
  a = Math.abs(a);
  b = Math.abs(b);
  // no destructuring swap: the table is built once, in code not yet optimized, where [a, b] = [b, a % b]
  // allocates an array and walks its iterator on every step
  while (b) {
    const r = a % b;
    a = b;
    b = r;
  }
  return a;
}

function rat(num: number, den = 1): Rational {
  if (den < 0) {
    num = -num;
    den = -den;
  }
  const g = gcd(num, den) || 1;
  return { num: num / g, den: den / g };
}

function ratAdd(a: Rational, b: Rational): Rational {
  return rat(a.num * b.den + b.num * a.den, a.den * b.den);
}

function ratMul(a: Rational, b: Rational): Rational {
  return rat(a.num * b.num, a.den * b.den);
}

function ratValue(a: Rational): number {
  return a.num / a.den;
}

const MAX_COEFFICIENT = 1e6;

/** Reads a coefficient text ("2", "0.5", "1/2") as an exact rational; undefined if it is not one. */
function readCoefficient(t: string): Rational | undefined {
  let m = /^(\d+)\/(\d+)$/.exec(t);
  if (m) {
    const den = Number(m[2]);
    if (den === 0) return undefined;
    return rat(Number(m[1]), den);
  }
  m = /^(\d*)\.(\d+)$/.exec(t) ?? /^(\d+)\.()$/.exec(t);
  if (m) {
    const digits = m[2];
    if (digits.length > 6) return undefined;
    const den = 10 ** digits.length;
    return rat(Number(m[1] || '0') * den + Number(digits || '0'), den);
  }
  if (/^\d+$/.test(t)) return rat(Number(t));
  return undefined;
}

/** Writes a positive coefficient: "" for 1, "2", "1/2", "3/4"; a decimal when no small fraction fits. */
export function formatCoefficient(x: number): string {
  if (x === 1) return '';
  if (Number.isInteger(x)) return String(x);
  for (let den = 2; den <= 1000; den++) {
    const num = Math.round(x * den);
    if (Math.abs(num / den - x) < 1e-12 * Math.max(1, x)) return `${num}/${den}`;
  }
  return String(Number(x.toPrecision(12)));
}

/* ------------------------------------------------------------------------------------------ */
/* Reading                                                                                      */
/* ------------------------------------------------------------------------------------------ */

const ARROW_RE = /<=>|<->|⇌|⇄|↔|⟶|→|->|=/g;

interface RawTerm {
  readonly coefficient: Rational;
  readonly species: Species;
  readonly text: string;
}

/** Reads one term "2H2O", "1/2 O2(g)", "e-"; throws InputError. */
function readTerm(text: string): RawTerm {
  const t = text.trim();
  if (t === '') throw new InputError('a term is empty (two "+" in a row, or a "+" at an end)');
  const m = /^(\d+\/\d+|\d*\.\d+|\d+\.?)?\s*(.*)$/.exec(t)!;
  let coefficient: Rational = rat(1);
  if (m[1] !== undefined) {
    const c = readCoefficient(m[1]);
    if (c === undefined) throw new InputError(`cannot read the coefficient "${m[1]}" in "${t}"`);
    if (c.num === 0) throw new InputError(`the coefficient of "${t}" is 0; leave the term out instead`);
    if (ratValue(c) > MAX_COEFFICIENT) throw new InputError(`the coefficient of "${t}" is too large`);
    coefficient = c;
  }
  const body = m[2];
  if (body === '') throw new InputError(`"${t}" is a number without a species`);
  if (/\s/.test(body)) throw new InputError(`cannot read "${t}": a species has no spaces inside; separate terms with " + "`);
  const species = parseSpecies(body);
  return { coefficient, species, text: t };
}

/**
 * Splits one side into terms. A "+" with white space on both sides always separates terms; inside
 * what remains, each "+" may be a separator or part of a charge, and the one reading in which
 * every term is a valid species is taken (several readings → InputError asking for spaces).
 */
function readSide(sideText: string, which: string): RawTerm[] {
  const s = sideText.trim();
  if (s === '') throw new InputError(`the ${which} side of the half-reaction is empty`);
  const out: RawTerm[] = [];
  for (const chunk of s.split(/\s+\+\s+/)) out.push(...readChunk(chunk, which));
  return out;
}

function readChunk(chunk: string, which: string): RawTerm[] {
  const c = chunk.trim();
  if (c === '') throw new InputError(`the ${which} side has an empty term (two "+" in a row, or a "+" at an end)`);
  const plus: number[] = [];
  for (let i = 0; i < c.length; i++) if (c[i] === '+') plus.push(i);
  if (plus.length === 0) return [readTerm(c)];
  if (plus.length > 40) throw new InputError(`the ${which} side has too many "+" signs to read; separate terms with " + "`);
  // cuts: -1 (start) … plus positions … c.length (end). ways[i]: readings of c[cut_i+1 .. end)
  const cuts = [-1, ...plus, c.length];
  const memo = new Map<number, { count: number; terms: RawTerm[] | null; error?: InputError }>();
  const solve = (i: number): { count: number; terms: RawTerm[] | null; error?: InputError } => {
    const hit = memo.get(i);
    if (hit) return hit;
    let count = 0;
    let best: RawTerm[] | null = null;
    let firstError: InputError | undefined;
    for (let j = i + 1; j < cuts.length; j++) {
      const piece = c.slice(cuts[i] + 1, cuts[j]);
      if (piece.trim() === '') continue;
      let term: RawTerm;
      try {
        term = readTerm(piece);
      } catch (e) {
        if (firstError === undefined && e instanceof InputError) firstError = e;
        continue;
      }
      if (j === cuts.length - 1) {
        count += 1;
        if (best === null) best = [term];
      } else {
        const rest = solve(j);
        if (rest.count > 0) {
          count += rest.count;
          if (best === null) best = [term, ...rest.terms!];
        } else if (firstError === undefined) firstError = rest.error;
      }
      if (count > 1) break;
    }
    const r = { count, terms: best, error: firstError };
    memo.set(i, r);
    return r;
  };
  const r = solve(0);
  if (r.count === 0) {
    if (plus.length > 0 && r.error) {
      // prefer the message of the plain whole-chunk reading when it is a single term
      throw new InputError(`cannot read "${c}" on the ${which} side: ${r.error.message}`);
    }
    throw new InputError(`cannot read "${c}" on the ${which} side`);
  }
  if (r.count > 1) {
    throw new InputError(`"${c}" on the ${which} side can be read in more than one way; put spaces around the "+" between terms`);
  }
  return r.terms!;
}

function elementCounts(terms: RawTerm[]): Map<string, Rational> {
  const out = new Map<string, Rational>();
  for (const t of terms) {
    for (const el in t.species.elements) {
      const add = ratMul(t.coefficient, rat(t.species.elements[el]));
      out.set(el, ratAdd(out.get(el) ?? rat(0), add));
    }
  }
  return out;
}

function chargeOf(terms: RawTerm[]): Rational {
  let q = rat(0);
  for (const t of terms) q = ratAdd(q, ratMul(t.coefficient, rat(t.species.charge)));
  return q;
}

function showRational(r: Rational): string {
  return r.den === 1 ? String(r.num) : `${r.num}/${r.den}`;
}

function showCharge(r: Rational): string {
  const s = showRational(r);
  return r.num > 0 ? `+${s}` : s;
}

/** Merges repeated species on one side (same canonical key and phase). */
function merge(terms: RawTerm[]): RawTerm[] {
  const out: RawTerm[] = [];
  const at = new Map<string, number>();
  for (const t of terms) {
    const k = `${t.species.key}|${t.species.phase ?? ''}`;
    const i = at.get(k);
    if (i === undefined) {
      at.set(k, out.length);
      out.push(t);
    } else {
      out[i] = { ...out[i], coefficient: ratAdd(out[i].coefficient, t.coefficient) };
    }
  }
  return out;
}

/**
 * When the atoms of an element do not balance and a species of that lone element had its charge
 * read from a digit ("I3-" as I with 3−), says how to write the other reading ("I3^-"), since that
 * is the likely cause. Common ions such as "Cu2+" in a reaction that balances get no hint.
 */
function digitChargeHint(off: ReadonlySet<string>, ...sides: ReadonlyArray<ReadonlyArray<{ species: Species }>>): string {
  for (const side of sides) {
    for (const t of side) {
      const sp = t.species;
      if (sp.chargeFromDigit && off.has(sp.body)) {
        const mag = Math.abs(sp.charge);
        const sign = sp.charge > 0 ? '+' : '-';
        return `; "${sp.body}${mag}${sign}" was read as ${sp.body} with charge ${mag}${sign}: if ${mag} is a count, write "${sp.body}${mag}^${sign}"`;
      }
    }
  }
  return '';
}

/**
 * Reads and checks a half-reaction written as a reduction.
 *
 * Syntax: parseHalfReaction(text)
 * Example: parseHalfReaction("MnO4- + 8H+ + 5e- -> Mn2+ + 4H2O").n → 5
 * See also: formatHalfReaction, lnReactionQuotient
 *
 * @throws InputError when the text cannot be read, has no or misplaced electrons, or does not
 *   balance (the message names the element or the charge and both totals).
 */
export function parseHalfReaction(text: string): HalfReaction {
  if (typeof text !== 'string' || text.trim() === '') throw new InputError('the half-reaction is empty');
  if (text.length > MAX_FORMULA_CHARS) throw new InputError(`the half-reaction is too long (at most ${MAX_FORMULA_CHARS} characters)`);
  const normalized = text.replace(/[−–]/g, '-');
  const arrows = normalized.match(ARROW_RE) ?? [];
  if (arrows.length === 0) throw new InputError(`no arrow in "${text}"; write the half-reaction as "Ox + n e- -> Red" (or with =, <=>, ⇌)`);
  if (arrows.length > 1) throw new InputError(`more than one arrow in "${text}"`);
  const [leftText, rightText] = normalized.split(ARROW_RE);
  const left = readSide(leftText, 'left');
  const right = readSide(rightText, 'right');

  if (right.some((t) => t.species.isElectron)) {
    throw new InputError('electrons are on the right; write the half-reaction as a reduction, with e- on the left');
  }
  const electrons = left.filter((t) => t.species.isElectron);
  if (electrons.length === 0) throw new InputError('no electrons; a half-reaction takes up n e- on the left');
  let nr = rat(0);
  for (const e of electrons) nr = ratAdd(nr, e.coefficient);
  if (nr.den !== 1) throw new InputError(`the number of electrons is ${showRational(nr)}; scale the half-reaction so that it is a whole number`);

  const leftSpecies = merge(left.filter((t) => !t.species.isElectron));
  const rightSpecies = merge(right);
  if (leftSpecies.length === 0) throw new InputError('the left side has electrons but no species');

  // atom balance
  const lc = elementCounts(leftSpecies);
  const rc = elementCounts(rightSpecies);
  const elements = [...new Set([...lc.keys(), ...rc.keys()])];
  const unbalanced: string[] = [];
  const off = new Set<string>();
  for (const el of elements) {
    const a = lc.get(el) ?? rat(0);
    const b = rc.get(el) ?? rat(0);
    if (a.num !== b.num || a.den !== b.den) {
      unbalanced.push(`${el}: ${showRational(a)} on the left, ${showRational(b)} on the right`);
      off.add(el);
    }
  }
  if (unbalanced.length > 0) {
    throw new InputError(`the half-reaction does not balance (${unbalanced.join('; ')})${digitChargeHint(off, left, right)}`);
  }
  // charge balance, electrons included
  const ql = chargeOf(left);
  const qr = chargeOf(right);
  if (ql.num !== qr.num || ql.den !== qr.den) {
    throw new InputError(
      `the charge does not balance: ${showCharge(ql)} on the left (electrons included), ${showCharge(qr)} on the right`,
    );
  }

  const species: HalfReactionTerm[] = [];
  for (const [side, terms] of [['ox', leftSpecies], ['red', rightSpecies]] as const) {
    for (const t of terms) {
      const term: HalfReactionTerm =
        t.species.phase === undefined
          ? { species: t.species, side, coefficient: ratValue(t.coefficient) }
          : { species: t.species, side, coefficient: ratValue(t.coefficient), phase: t.species.phase };
      species.push(term);
    }
  }
  return { text, n: nr.num, species };
}

/* ------------------------------------------------------------------------------------------ */
/* Writing back                                                                                 */
/* ------------------------------------------------------------------------------------------ */

/**
 * A species as the table writes it: "Cu2+", "MnO4-", "Cr2O7^2-", "Hg2^2+", "Fe(CN)6^3-", with its
 * phase mark when one was written. A charge of 2 or more on a formula ending in a digit is written
 * with "^" so that it reads one way only.
 */
export function displaySpecies(species: Species, phase?: Phase): string {
  let text: string;
  if (species.isElectron) text = 'e-';
  else if (species.charge !== 0 && /\d$/.test(species.body) && Math.abs(species.charge) >= 2) {
    text = `${species.body}^${chargeSuffix(species.charge)}`;
  } else {
    text = canonicalSpecies(species.body, species.charge);
    // canonicalSpecies already falls back to "^" where the plain form would be read otherwise
    try {
      const back = splitSpecies(text);
      if (back.body !== species.body || back.charge !== species.charge) text = `${species.body}^${chargeSuffix(species.charge)}`;
    } catch {
      text = `${species.body}^${chargeSuffix(species.charge)}`;
    }
  }
  return phase === undefined ? text : `${text}(${phase})`;
}

/** One term of a written reaction. */
export interface ReactionTerm {
  readonly species: Species;
  readonly coefficient: number;
  readonly phase?: Phase;
}

function termText(t: ReactionTerm): string {
  const c = formatCoefficient(t.coefficient);
  const s = displaySpecies(t.species, t.phase);
  return c === '' ? s : c.includes('/') || c.includes('.') ? `${c} ${s}` : `${c}${s}`;
}

/** Writes a reaction "A + 2B -> C" from its two sides. */
export function formatReaction(left: readonly ReactionTerm[], right: readonly ReactionTerm[], arrow = '->'): string {
  return `${left.map(termText).join(' + ')} ${arrow} ${right.map(termText).join(' + ')}`;
}

const ELECTRON: Species = { body: 'e', charge: -1, elements: {}, isElectron: true, key: 'e-' };

/**
 * Writes a half-reaction back as text, electrons last on the left:
 * "MnO4- + 8H+ + 5e- -> Mn2+ + 4H2O".
 *
 * Syntax: formatHalfReaction(halfReaction, [arrow])
 * Example: formatHalfReaction(parseHalfReaction("Cu(2+) + 2 e- = Cu")) → "Cu2+ + 2e- -> Cu"
 * See also: parseHalfReaction, formatReaction
 */
export function formatHalfReaction(hr: HalfReaction, arrow = '->'): string {
  const left: ReactionTerm[] = hr.species.filter((t) => t.side === 'ox');
  const right: ReactionTerm[] = hr.species.filter((t) => t.side === 'red');
  return formatReaction([...left, { species: ELECTRON, coefficient: hr.n }], right, arrow);
}

/* ------------------------------------------------------------------------------------------ */
/* States and the reaction quotient                                                            */
/* ------------------------------------------------------------------------------------------ */

/** Neutral species read as gases when no phase mark is written. */
const UNMARKED_GASES = new Set(['H2', 'O2', 'N2', 'F2', 'Cl2', 'O3', 'CO2', 'CO', 'NO', 'NO2', 'N2O', 'SO2', 'H2S']);

/**
 * How a species enters a reaction quotient. A written phase mark decides, except that H2O in the
 * liquid (or unmarked) is 'water', and H+ and OH- are named apart (their activity follows from pH).
 * Without a mark: charged species are aqueous; H2O is water; H2, O2, N2, F2, Cl2, O3, CO2, CO, NO,
 * NO2, N2O, SO2 and H2S are gases; every other neutral species is a solid (write "(aq)" or "(l)"
 * where it is not: "H2O2(aq)", "Br2(l)", "Hg(l)").
 *
 * Syntax: speciesState(species, [phase])
 * Example: speciesState(parseSpecies("O2")) → 'gas'
 */
export function speciesState(species: Species, phase: Phase | undefined = species.phase): SpeciesState {
  if (species.key === 'H+' && phase !== 'g') return 'H+';
  if (species.key === 'OH-' && phase !== 'g') return 'OH-';
  if (species.key === 'H2O' && (phase === undefined || phase === 'l')) return 'water';
  if (phase === 's') return 'solid';
  if (phase === 'l') return 'liquid';
  if (phase === 'g') return 'gas';
  if (phase === 'aq') return 'aqueous';
  if (species.charge !== 0) return 'aqueous';
  if (UNMARKED_GASES.has(species.body)) return 'gas';
  return 'solid';
}

/**
 * Natural log of the reaction quotient of a half-reaction written as a reduction,
 * ln Q = Σ_red ν·ln a − Σ_ox ν·ln a (electrons excluded), so that E = E° − (RT/nF)·ln Q.
 * `activity` gives each species' activity (> 0); working in logarithms keeps Q from overflowing.
 *
 * Syntax: lnReactionQuotient(halfReaction, activity)
 * Example: lnReactionQuotient(parseHalfReaction("Cu2+ + 2e- -> Cu"), (t) => t.species.key === 'Cu2+' ? 0.01 : 1) → 4.605
 * See also: reactionQuotient, halfCell
 */
export function lnReactionQuotient(hr: HalfReaction, activity: (term: HalfReactionTerm) => number): number {
  let lnQ = 0;
  for (const t of hr.species) {
    const a = activity(t);
    if (!(a > 0) || !Number.isFinite(a)) {
      throw new InputError(`the activity of ${displaySpecies(t.species, t.phase)} must be a finite number > 0; got ${a}`);
    }
    const term = t.coefficient * Math.log(a);
    lnQ += t.side === 'red' ? term : -term;
  }
  return lnQ;
}

/**
 * Reaction quotient Q = Π a_red^ν / Π a_ox^ν of a half-reaction written as a reduction.
 *
 * Syntax: reactionQuotient(halfReaction, activity)
 * Example: reactionQuotient(parseHalfReaction("Fe3+ + e- -> Fe2+"), (t) => t.side === 'ox' ? 0.1 : 0.01) → 0.1
 * See also: lnReactionQuotient
 */
export function reactionQuotient(hr: HalfReaction, activity: (term: HalfReactionTerm) => number): number {
  return Math.exp(lnReactionQuotient(hr, activity));
}

const fixed = new Map<string, HalfReaction>();

/**
 * A half-reaction written in the add-in's own code or data (an electrode's reaction, water's), read on
 * its first use and kept: each text is parsed once however often it is asked for. Not for users' text,
 * which would make the memo grow without bound; parseHalfReaction reads that.
 *
 * Syntax: fixedHalfReaction(text)
 * Example: fixedHalfReaction("AgCl + e- -> Ag + Cl-") === fixedHalfReaction("AgCl + e- -> Ag + Cl-") → true
 * See also: parseHalfReaction
 */
export function fixedHalfReaction(text: string): HalfReaction {
  let hr = fixed.get(text);
  if (hr === undefined) {
    hr = parseHalfReaction(text);
    fixed.set(text, hr);
  }
  return hr;
}
