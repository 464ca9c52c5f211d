import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  fixedHalfReaction,
  displaySpecies,
  formatCoefficient,
  formatHalfReaction,
  lnReactionQuotient,
  parseHalfReaction,
  reactionQuotient,
  speciesState,
} from '../../src/chem/halfReaction';
import { parseSpecies } from '../../src/chem/formula';
import { InputError } from '../../src/errors';

function coefficients(text: string): Record<string, number> {
  const hr = parseHalfReaction(text);
  const out: Record<string, number> = {};
  for (const t of hr.species) out[`${t.side}:${t.species.key}`] = t.coefficient;
  return out;
}

describe('parseHalfReaction: reading', () => {
  it('reads permanganate in acid: n = 5 and every coefficient', () => {
    // MnO4- + 8H+ + 5e- -> Mn2+ + 4H2O: the standard balanced half-reaction (CRC Handbook, Electrochemical Series)
    const hr = parseHalfReaction('MnO4- + 8H+ + 5e- -> Mn2+ + 4H2O');
    expect(hr.n).toBe(5);
    expect(coefficients('MnO4- + 8H+ + 5e- -> Mn2+ + 4H2O')).toEqual({ 'ox:MnO4-': 1, 'ox:H+': 8, 'red:Mn2+': 1, 'red:H2O': 4 });
    expect(hr.species.map((t) => t.side)).toEqual(['ox', 'ox', 'red', 'red']);
    expect(hr.text).toBe('MnO4- + 8H+ + 5e- -> Mn2+ + 4H2O');
  });

  it.each(['->', '→', '=', '<=>', '⇌', '<->', '⇄', '⟶'])('accepts the arrow %s', (arrow) => {
    expect(parseHalfReaction(`Fe3+ + e- ${arrow} Fe2+`).n).toBe(1);
  });

  it('reads dichromate with a caret charge and n = 6', () => {
    // Cr2O7^2- + 14H+ + 6e- -> 2Cr3+ + 7H2O (CRC Handbook, Electrochemical Series)
    const c = coefficients('Cr2O7^2- + 14H+ + 6e- -> 2Cr3+ + 7H2O');
    expect(c).toEqual({ 'ox:Cr2O72-': 1, 'ox:H+': 14, 'red:Cr3+': 2, 'red:H2O': 7 });
    expect(parseHalfReaction('Cr2O7^2- + 14H+ + 6e- -> 2Cr3+ + 7H2O').n).toBe(6);
  });

  it('reads every charge spelling', () => {
    for (const cu of ['Cu2+', 'Cu^2+', 'Cu(2+)', 'Cu+2']) {
      const hr = parseHalfReaction(`${cu} + 2e- -> Cu`);
      expect(hr.species[0].species.key).toBe('Cu2+');
      expect(hr.species[0].species.charge).toBe(2);
    }
  });

  it('reads fractions, decimals and spaced coefficients alike', () => {
    const forms = ['1/2 O2 + 2H+ + 2e- -> H2O', '0.5O2 + 2H+ + 2e- -> H2O', '0.5 O2 + 2 H+ + 2 e- -> 1 H2O', '1/2O2 + 2H+ + 2e- = H2O(l)'];
    for (const f of forms) {
      const hr = parseHalfReaction(f);
      expect(hr.n).toBe(2);
      expect(hr.species.find((t) => t.species.key === 'O2')!.coefficient).toBe(0.5);
    }
  });

  it('reads text without spaces when the "+" signs can be read one way only', () => {
    expect(coefficients('Cu2++2e-->Cu')).toEqual({ 'ox:Cu2+': 1, 'red:Cu': 1 });
    expect(coefficients('MnO4-+8H++5e-->Mn2++4H2O')).toEqual(coefficients('MnO4- + 8H+ + 5e- -> Mn2+ + 4H2O'));
    expect(coefficients('Cu+2 +2e- -> Cu')).toEqual({ 'ox:Cu2+': 1, 'red:Cu': 1 });
  });

  it('keeps phase marks', () => {
    const hr = parseHalfReaction('AgCl(s) + e- -> Ag(s) + Cl-(aq)');
    expect(hr.species.map((t) => t.phase)).toEqual(['s', 's', 'aq']);
    expect(hr.n).toBe(1);
  });

  it('adds up a species written twice on one side', () => {
    expect(coefficients('O2 + 2H+ + 2H+ + 4e- -> 2H2O')).toEqual({ 'ox:O2': 1, 'ox:H+': 4, 'red:H2O': 2 });
  });

  it('reads alkaline hydrogen evolution with OH- on the right', () => {
    // 2H2O + 2e- -> H2 + 2OH- (CRC Handbook, Electrochemical Series)
    expect(coefficients('2H2O + 2e- -> H2 + 2OH-')).toEqual({ 'ox:H2O': 2, 'red:H2': 1, 'red:OH-': 2 });
  });

  it('reads complex ions with brackets', () => {
    const hr = parseHalfReaction('Fe(CN)6^3- + e- -> Fe(CN)6^4-');
    expect(hr.n).toBe(1);
    expect(hr.species[0].species.elements).toEqual({ Fe: 1, C: 6, N: 6 });
  });
});

describe('parseHalfReaction: balance and errors in plain words', () => {
  const fails = (text: string) => {
    try {
      parseHalfReaction(text);
    } catch (e) {
      expect(e).toBeInstanceOf(InputError);
      return (e as Error).message;
    }
    throw new Error(`"${text}" was accepted`);
  };

  it('names the element that does not balance with both totals', () => {
    expect(fails('MnO4- + 8H+ + 5e- -> Mn2+ + 3H2O')).toMatch(/O: 4 on the left, 3 on the right/);
    expect(fails('MnO4- + 8H+ + 5e- -> Mn2+ + 3H2O')).toMatch(/H: 8 on the left, 6 on the right/);
  });

  it('names a fractional imbalance exactly', () => {
    expect(fails('1/3 O2 + 2H+ + 2e- -> H2O')).toMatch(/O: 2\/3 on the left, 1 on the right/);
  });

  it('reports a charge imbalance, electrons included', () => {
    expect(fails('Fe3+ + 2e- -> Fe2+')).toMatch(/charge does not balance: \+1 on the left \(electrons included\), \+2 on the right/);
  });

  it('wants electrons, on the left, a whole number of them', () => {
    expect(fails('Zn2+ -> Zn')).toMatch(/no electrons/);
    expect(fails('Zn -> Zn2+ + 2e-')).toMatch(/electrons are on the right/);
    expect(fails('1/2 Cu2+ + e- + 1/2 e- -> 3/4 Cu + 1/4 Cu')).toMatch(/number of electrons is 3\/2/);
  });

  it('wants exactly one arrow and something on both sides', () => {
    expect(fails('Zn2+ + 2e- Zn')).toMatch(/no arrow/);
    expect(fails('Zn2+ + 2e- -> Zn -> Zn')).toMatch(/more than one arrow/);
    expect(fails(' -> Zn')).toMatch(/left side .* empty/);
    expect(fails('')).toMatch(/empty/);
    expect(fails('2e- -> ')).toMatch(/right side .* empty/);
  });

  it('rejects a zero coefficient, a bare number and a non-element', () => {
    expect(fails('0H+ + Zn2+ + 2e- -> Zn')).toMatch(/coefficient .* is 0/);
    expect(fails('Zn2+ + 2 + 2e- -> Zn')).toMatch(/cannot read|number without a species/);
    expect(fails('Xx2+ + 2e- -> Xx')).toMatch(/not an element symbol/);
  });

  it('keeps element symbols case-sensitive: CO is not Co', () => {
    expect(fails('Co2+ + 2e- -> CO')).toMatch(/does not balance/);
  });

  it('rejects a dangling "+" and spaces inside a species', () => {
    expect(fails('Cu2+ + + 2e- -> Cu')).toMatch(/empty term|cannot read/);
    expect(fails('Cu2+ + 2e- -> Cu +')).toMatch(/empty term|cannot read|has a charge but no formula/);
    expect(fails('Cu 2+ + 2e- -> Cu')).toMatch(/no spaces inside/);
  });
});

describe('formatHalfReaction and displaySpecies', () => {
  it('writes a reaction back in the table form', () => {
    expect(formatHalfReaction(parseHalfReaction('MnO4- + 8 H+ + 5 e- = Mn2+ + 4 H2O'))).toBe('MnO4- + 8H+ + 5e- -> Mn2+ + 4H2O');
    expect(formatHalfReaction(parseHalfReaction('Cu(2+) + 2e- ⇌ Cu'))).toBe('Cu2+ + 2e- -> Cu');
    expect(formatHalfReaction(parseHalfReaction('Cr2O7(2-) + 14H+ + 6e- -> 2Cr+3 + 7H2O(l)'))).toBe(
      'Cr2O7^2- + 14H+ + 6e- -> 2Cr3+ + 7H2O(l)',
    );
    expect(formatHalfReaction(parseHalfReaction('0.5O2 + 2H+ + 2e- -> H2O'))).toBe('1/2 O2 + 2H+ + 2e- -> H2O');
  });

  it('puts a "^" where a digit could be read as charge or count', () => {
    expect(displaySpecies(parseSpecies('Hg2^2+'))).toBe('Hg2^2+');
    expect(displaySpecies(parseSpecies('SO4--'))).toBe('SO4^2-');
    expect(displaySpecies(parseSpecies('Fe(CN)6^4-'))).toBe('Fe(CN)6^4-');
    expect(displaySpecies(parseSpecies('MnO4-'))).toBe('MnO4-');
    expect(displaySpecies(parseSpecies('O2^-'))).toBe('O2^-'); // superoxide: "O2-" would read as oxide
    expect(displaySpecies(parseSpecies('Zn2+'))).toBe('Zn2+');
  });

  it('formats coefficients as whole numbers or small fractions', () => {
    expect(formatCoefficient(1)).toBe('');
    expect(formatCoefficient(7)).toBe('7');
    expect(formatCoefficient(0.5)).toBe('1/2');
    expect(formatCoefficient(2 / 3)).toBe('2/3');
    expect(formatCoefficient(0.25)).toBe('1/4');
  });

  it('round-trips: parse(format(parse(x))) has the same species, coefficients and n (property)', () => {
    const reactions = [
      'MnO4- + 8H+ + 5e- -> Mn2+ + 4H2O',
      'Cr2O7^2- + 14H+ + 6e- -> 2Cr3+ + 7H2O',
      'PbO2 + SO4^2- + 4H+ + 2e- -> PbSO4 + 2H2O',
      'Hg2Cl2(s) + 2e- -> 2Hg(l) + 2Cl-',
      'O2 + 2H2O + 4e- -> 4OH-',
      'Fe(CN)6^3- + e- -> Fe(CN)6^4-',
    ];
    fc.assert(
      fc.property(fc.constantFrom(...reactions), fc.integer({ min: 1, max: 6 }), (text, k) => {
        // scale every coefficient by k: still balanced, n scales by k
        const hr = parseHalfReaction(text);
        const scaled = formatHalfReaction({ ...hr, n: hr.n * k, species: hr.species.map((t) => ({ ...t, coefficient: t.coefficient * k })) });
        const back = parseHalfReaction(scaled);
        expect(back.n).toBe(hr.n * k);
        expect(back.species.map((t) => [t.side, t.species.key, t.coefficient, t.phase])).toEqual(
          hr.species.map((t) => [t.side, t.species.key, t.coefficient * k, t.phase]),
        );
      }),
    );
  });
});

describe('speciesState', () => {
  it('sorts species the way HALFCELL uses them', () => {
    const s = (t: string) => speciesState(parseSpecies(t));
    expect(s('H+')).toBe('H+');
    expect(s('OH-')).toBe('OH-');
    expect(s('H2O')).toBe('water');
    expect(s('H2O(l)')).toBe('water');
    expect(s('H2O(g)')).toBe('gas');
    expect(s('Cu')).toBe('solid');
    expect(s('Hg(l)')).toBe('liquid');
    expect(s('O2')).toBe('gas');
    expect(s('Cl2')).toBe('gas');
    expect(s('H2O2(aq)')).toBe('aqueous');
    expect(s('Fe3+')).toBe('aqueous');
    expect(s('I2')).toBe('solid');
  });
});

describe('reaction quotient', () => {
  it('Q = Π a_red^ν / Π a_ox^ν', () => {
    const hr = parseHalfReaction('MnO4- + 8H+ + 5e- -> Mn2+ + 4H2O');
    const a: Record<string, number> = { 'MnO4-': 0.1, 'H+': 1e-3, 'Mn2+': 0.01, H2O: 1 };
    // Q = 0.01 / (0.1 · (1e-3)^8) = 1e23
    expect(reactionQuotient(hr, (t) => a[t.species.key])).toBeCloseTo(1e23, -10);
    expect(lnReactionQuotient(hr, (t) => a[t.species.key])).toBeCloseTo(23 * Math.LN10, 10);
  });

  it('stays finite in logarithms where Q itself would overflow', () => {
    const hr = parseHalfReaction('Cr2O7^2- + 14H+ + 6e- -> 2Cr3+ + 7H2O');
    const lnQ = lnReactionQuotient(hr, (t) => (t.species.key === 'H+' ? 1e-30 : 1));
    expect(lnQ).toBeCloseTo(14 * 30 * Math.LN10, 8);
    expect(Number.isFinite(lnQ)).toBe(true);
  });

  it('rejects activities ≤ 0', () => {
    const hr = parseHalfReaction('Cu2+ + 2e- -> Cu');
    expect(() => lnReactionQuotient(hr, () => 0)).toThrow(InputError);
    expect(() => lnReactionQuotient(hr, () => -1)).toThrow(InputError);
  });
});

describe('a charge read from a digit', () => {
  it('a failed balance says how to write the digit as a count ("I3-" → "I3^-")', () => {
    // triiodide: I3- + 2e- -> 3I- (common practice: the tri-iodide couple of iodometry)
    expect(() => parseHalfReaction('I3- + 2e- -> 3I-')).toThrow(/"I3-" was read as I with charge 3-: if 3 is a count, write "I3\^-"/);
    expect(parseHalfReaction('I3^- + 2e- -> 3I-').n).toBe(2);
  });
  it('adds nothing when no such species is involved', () => {
    expect(() => parseHalfReaction('Cu2+ + e- -> Cu')).toThrow(/charge does not balance: \+2 on the left|charge does not balance/);
    try {
      parseHalfReaction('Cu2+ + e- -> Cu');
    } catch (e) {
      expect((e as Error).message).not.toMatch(/was read as/);
    }
  });
});

describe('fixedHalfReaction', () => {
  it('reads a text once and gives the same object after, equal to what parseHalfReaction reads', () => {
    const text = 'HgO + H2O + 2e- -> Hg(l) + 2OH-';
    const first = fixedHalfReaction(text);
    expect(fixedHalfReaction(text)).toBe(first);
    expect(first).toEqual(parseHalfReaction(text));
    expect(first.n).toBe(2);
  });
  it('throws as parseHalfReaction does for a text that does not balance, and keeps nothing', () => {
    expect(() => fixedHalfReaction('Cu2+ + e- -> Cu')).toThrow(InputError);
    expect(() => fixedHalfReaction('Cu2+ + e- -> Cu')).toThrow(InputError);
  });
});
