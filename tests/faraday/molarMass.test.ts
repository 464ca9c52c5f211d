import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import data from '../../data/atomic-weights.json';
import { InputError, NotFoundError } from '../../src/errors';
import { molarMass } from '../../src/faraday/molarMass';

describe('molarMass: hydrates and complex salts', () => {
  // CRC Handbook of Chemistry and Physics, "Physical Constants of Inorganic Compounds" (from memory). The
  // handbook's molar masses were computed with older atomic weights, so agreement is to 0.03 g/mol.
  const cases: Array<[string, number, string]> = [
    ['CuSO4·5H2O', 249.69, 'CRC, copper(II) sulfate pentahydrate'],
    ['CuSO4.5H2O', 249.69, 'CRC, same with a full stop as the hydrate dot'],
    ['CuSO4*5H2O', 249.69, 'CRC, same with an asterisk'],
    ['NiSO4·6H2O', 262.85, 'CRC, nickel(II) sulfate hexahydrate'],
    ['NiCl2·6H2O', 237.69, 'CRC, nickel(II) chloride hexahydrate'],
    ['ZnSO4·7H2O', 287.56, 'CRC, zinc sulfate heptahydrate'],
    ['Na2SO4·10H2O', 322.2, 'CRC, sodium sulfate decahydrate'],
    ['K3[Fe(CN)6]', 329.24, 'CRC, potassium hexacyanoferrate(III)'],
    ['K4[Fe(CN)6]·3H2O', 422.39, 'CRC, potassium hexacyanoferrate(II) trihydrate'],
    ['K[Au(CN)2]', 288.1, 'CRC, potassium dicyanoaurate(I) (gold plating salt)'],
    ['K[Ag(CN)2]', 199.0, 'CRC, potassium dicyanoargentate(I) (silver plating salt)'],
    ['Ni(NH2SO3)2·4H2O', 322.93, 'nickel sulfamate tetrahydrate, plating handbooks (from memory)'],
    ['CrO3', 99.99, 'CRC, chromium(VI) oxide'],
    ['Fe2(SO4)3', 399.88, 'CRC, iron(III) sulfate'],
    ['CaSO4·0.5H2O', 145.15, 'CRC, calcium sulfate hemihydrate (a decimal hydrate multiplier)'],
  ];
  for (const [formula, expected, source] of cases) {
    it(`${formula} ≈ ${expected} g/mol (${source})`, () => {
      expect(Math.abs(molarMass(formula) - expected)).toBeLessThan(0.03);
    });
  }
  it('water is 18.015 g/mol', () => {
    expect(molarMass('H2O')).toBeCloseTo(18.015, 3); // 2·1.0080 + 15.999, IUPAC 2021 abridged
  });
  it('ignores a charge and a phase mark', () => {
    expect(molarMass('SO4^2-')).toBe(molarMass('SO4'));
    expect(molarMass('Cu2+')).toBe(molarMass('Cu'));
    expect(molarMass('NaCl(s)')).toBe(molarMass('NaCl'));
  });
  it('an unknown element is not found, by name; unreadable text is an input error', () => {
    expect(() => molarMass('Xy2O')).toThrow(NotFoundError);
    expect(() => molarMass('Xy2O')).toThrow(/Xy/);
    expect(() => molarMass('TcO4')).toThrow(NotFoundError); // technetium has no standard atomic weight
    expect(() => molarMass('Cu(SO4')).toThrow(InputError);
    expect(() => molarMass('CuSO4··5H2O')).toThrow(InputError);
    expect(() => molarMass('e-')).toThrow(InputError);
  });
});

describe('molarMass is additive over formula parts (property)', () => {
  const elements = data.elements.map((e) => e.symbol);
  const part = fc.array(fc.tuple(fc.constantFrom(...elements), fc.integer({ min: 1, max: 12 })), { minLength: 1, maxLength: 5 });
  const text = (p: Array<[string, number]>) => p.map(([s, k]) => (k === 1 ? s : `${s}${k}`)).join('');
  const weight = new Map(data.elements.map((e) => [e.symbol, e.atomicWeight]));
  const rel = (a: number, b: number) => Math.abs(a - b) / Math.max(1, Math.abs(b));

  it('a formula is the sum of its element counts × atomic weights', () => {
    fc.assert(
      fc.property(part, (p) => {
        const expected = p.reduce((s, [sym, k]) => s + k * weight.get(sym)!, 0);
        expect(rel(molarMass(text(p)), expected)).toBeLessThan(1e-12);
      }),
      { numRuns: 500 },
    );
  });
  it('A·kB = M(A) + k·M(B), for every hydrate dot', () => {
    fc.assert(
      fc.property(part, part, fc.integer({ min: 1, max: 12 }), fc.constantFrom('·', '.', '*'), (a, b, k, dot) => {
        const whole = molarMass(`${text(a)}${dot}${k}${text(b)}`);
        expect(rel(whole, molarMass(text(a)) + k * molarMass(text(b)))).toBeLessThan(1e-12);
      }),
      { numRuns: 500 },
    );
  });
  it('(A)k and [A]k are k·M(A), and a group adds to what surrounds it', () => {
    fc.assert(
      fc.property(part, part, fc.integer({ min: 1, max: 9 }), (a, b, k) => {
        expect(rel(molarMass(`(${text(a)})${k}`), k * molarMass(text(a)))).toBeLessThan(1e-12);
        expect(rel(molarMass(`${text(b)}[${text(a)}]${k}`), molarMass(text(b)) + k * molarMass(text(a)))).toBeLessThan(1e-12);
      }),
      { numRuns: 500 },
    );
  });
});

describe('molarMass: spaces and exact decimal sums', () => {
  // IUPAC/CIAAW 2021 abridged standard atomic weights as in data/atomic-weights.json:
  // Cu 63.546, S 32.06, O 15.999, H 1.008, Na 22.990
  it('sums in decimal: CuSO4·5H2O is exactly 249.677 (63.546 + 32.06 + 9·15.999 + 10·1.008)', () => {
    expect(molarMass('CuSO4·5H2O')).toBe(249.677);
    expect(molarMass('H2O')).toBe(18.015);
  });
  it('a space before a multiplied formula is a hydrate separator', () => {
    expect(molarMass('CuSO4 5H2O')).toBe(molarMass('CuSO4·5H2O'));
    expect(molarMass('Na2SO4 10H2O')).toBe(molarMass('Na2SO4·10H2O'));
    expect(molarMass('CaSO4  0.5H2O')).toBe(molarMass('CaSO4·0.5H2O'));
    expect(molarMass('  NiSO4·6H2O ')).toBe(molarMass('NiSO4·6H2O'));
  });
  it('any other space inside a formula is an input error naming the rule, never a silent change', () => {
    for (const f of ['Cu SO4', 'CuSO4 H2O', 'SO4 2-', 'CuSO4 5 H2O']) {
      expect(() => molarMass(f), f).toThrow(InputError);
      expect(() => molarMass(f), f).toThrow(/hydrate separator before a number/);
    }
  });
});
