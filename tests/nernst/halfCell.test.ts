import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { halfCell } from '../../src/nernst/halfCell';
import { e0AtTemperature } from '../../src/cells/e0AtTemperature';
import { FARADAY_C_PER_MOL, GAS_CONSTANT_J_PER_MOL_K } from '../../src/constants';
import { InputError, NotFoundError } from '../../src/errors';
import { builtinTable } from '../../src/table/builtin';

const t = builtinTable();
const row = (k: string) => t.findCouple(k)!;
// RT ln10/F at 25 °C = 0.0591593 V (CODATA 2018 R and F)
const S = 0.0591593;

describe('halfCell: handbook checks', () => {
  it('MnO4-/Mn2+ at pH 3 drops by (8/5)·0.05916·3 V', () => {
    // E° 1.5111 V: data/couples.json (Thermoddem V1.10, computed from the cited log K); 8 H+ per 5 e- (Bard & Faulkner; any textbook Nernst example)
    expect(halfCell(row('MnO4-/Mn2+'), null, null, 3, 25)).toBeCloseTo(1.5111 - (8 / 5) * S * 3, 6);
  });

  it('Cu2+/Cu at a(Cu2+) = 0.01: 0.3372 − 0.02958·2 = 0.2780 V', () => {
    // E° 0.3372 V: data/couples.json (Thermoddem V1.10, computed from the cited log K)
    expect(halfCell(row('Cu2+/Cu'), 0.01, null, null, 25)).toBeCloseTo(0.3372 - S, 6);
    // the metal is a solid: red_activity does not change E
    expect(halfCell(row('Cu2+/Cu'), 0.01, 0.5, null, 25)).toBe(halfCell(row('Cu2+/Cu'), 0.01, 1, null, 25));
  });

  it('hydrogen electrode at pH 7: −0.414 V', () => {
    // E = −0.05916·pH for 1 bar H2: −0.414 V at pH 7 (Bard & Faulkner; common practice in corrosion, Pourbaix diagrams)
    expect(halfCell(row('H+/H2'), null, null, 7, 25)).toBeCloseTo(-0.414, 3);
    // a gas's activity is its pressure in bar: 10 bar H2 lowers E by 0.05916/2 V
    expect(halfCell(row('H+/H2'), null, 10, 0, 25)).toBeCloseTo(-S / 2, 6);
  });

  it('AgCl/Ag with a(Cl-) = 0.1: 0.2225 + 0.05916 V', () => {
    // E° 0.2225 V: data/couples.json (Thermoddem V1.10, computed from the cited log K) (the CRC Handbook, 92nd ed., lists 0.22233 V); Cl- is the only dissolved species, on the reduced side
    expect(halfCell(row('AgCl/Ag'), null, 0.1, null, 25)).toBeCloseTo(0.2225 + S, 6);
  });

  it('dichromate: ox activity to Cr2O7^2-, red activity to Cr3+ squared', () => {
    // E° 1.3065 V: data/couples.json (Thermoddem V1.10, computed from the cited log K); Q = a(Cr3+)²/a(Cr2O7^2-) = 1e-4/0.1 = 1e-3 at pH 0
    expect(halfCell(row('Cr2O7^2-/Cr3+'), 0.1, 0.01, 0, 25)).toBeCloseTo(1.3065 + (S / 6) * 3, 6);
  });

  it('the acid and alkaline forms of one couple agree at every pH within the data (≤ 1 mV)', () => {
    // O2/H2O (1.2292 V) and O2/OH- (0.4008 V), H+/H2 (0) and H2O/H2 (−0.8283 V): data/couples.json (Thermoddem V1.10);
    // pKw 13.995 at 25 °C (Bandura & Lvov 2006)
    fc.assert(fc.property(fc.double({ min: 0, max: 14, noNaN: true }), (pH) => {
      expect(Math.abs(halfCell(row('O2/H2O'), 1, null, pH, 25) - halfCell(row('O2/OH-'), 1, null, pH, 25))).toBeLessThan(0.001);
      expect(Math.abs(halfCell(row('H+/H2'), null, 1, pH, 25) - halfCell(row('H2O/H2'), null, 1, pH, 25))).toBeLessThan(0.001);
    }));
  });

  it('uses E°(T) and RT/nF at the temperature', () => {
    // Cu2+/Cu at 50 °C, a = 0.01: E°(50) = 0.3372 + 25·ΔrS/2F with ΔrS = 33.150 + 99.6 − 130.684 J/(mol·K)
    // (NBS 1982; Cu2+ has no Cp°, so ΔrCp = 0). Bratsch 1989's +0.011 mV/K is the same slope.
    const e = halfCell(row('Cu2+/Cu'), 0.01, null, null, 50);
    const slope = (GAS_CONSTANT_J_PER_MOL_K * 323.15) / (2 * FARADAY_C_PER_MOL);
    expect(e).toBeCloseTo(0.3372 + (25 * (33.15 + 99.6 - 130.684)) / (2 * FARADAY_C_PER_MOL) - slope * Math.log(100), 9);
    // O2/H2O at 80 °C and pH 0: the E°(T) of the reversible oxygen electrode; the row's linear (Thermoddem V1.10)
    // 1.2292 − 0.845e-3·55 V agrees within 1 mV
    expect(halfCell(row('O2/H2O'), 1, null, 0, 80)).toBeCloseTo(e0AtTemperature(row('O2/H2O'), 80), 12);
    expect(Math.abs(halfCell(row('O2/H2O'), 1, null, 0, 80) - (1.2292 - 0.845e-3 * 55))).toBeLessThan(1e-3);
  });
});

describe('halfCell: properties and errors', () => {
  it('at unit activities it returns E°(T): pH omitted for every couple, pH 0 for couples without OH- (property)', () => {
    const rows = t.couples.filter((r) => r.dEdT_mV_K !== undefined);
    fc.assert(fc.property(fc.integer({ min: 0, max: rows.length - 1 }), fc.double({ min: 0, max: 100, noNaN: true }), (i, tc) => {
      const r = rows[i];
      expect(halfCell(r, 1, 1, null, tc)).toBeCloseTo(e0AtTemperature(r, tc), 12);
      if (!r.parsed.species.some((s) => s.species.key === 'OH-')) expect(halfCell(r, null, null, 0, tc)).toBeCloseTo(e0AtTemperature(r, tc), 12);
    }));
  });

  it('one decade of ox activity raises E by 0.05916·ν/n (property)', () => {
    fc.assert(fc.property(fc.constantFrom('Fe3+/Fe2+', 'Cu2+/Cu', 'Al3+/Al', 'Ag+/Ag'), fc.double({ min: 1e-6, max: 10, noNaN: true }), (k, a) => {
      const r = row(k);
      expect(halfCell(r, a * 10, null, null, 25) - halfCell(r, a, null, null, 25)).toBeCloseTo(S / r.n, 6);
    }));
  });

  it('refuses activities ≤ 0 and says when E° cannot be moved to T', () => {
    expect(() => halfCell(row('Cu2+/Cu'), 0, null, null, 25)).toThrow(InputError);
    expect(() => halfCell(row('Cu2+/Cu'), 1, -1, null, 25)).toThrow(InputError);
    expect(() => halfCell(row('Bi3+/Bi'), 1, 1, 3, 60)).toThrow(NotFoundError);
    expect(() => halfCell(row('Cu2+/Cu'), 1, 1, 3, 101)).toThrow(InputError);
  });
});

describe('halfCell: activities beyond the range of doubles', () => {
  it('refuses an H+, OH- or species activity that underflows to 0 or overflows, and keeps a subnormal one', () => {
    // 10^−400 is 0 in doubles and 10^400 is +∞: no finite activity, so no potential.
    expect(() => halfCell(row('H+/H2'), null, null, 400, 25)).toThrow(InputError);
    expect(() => halfCell(row('H+/H2'), null, null, -400, 25)).toThrow(InputError);
    expect(() => halfCell(row('Cu2+/Cu'), Number.POSITIVE_INFINITY, null, null, 25)).toThrow(InputError);
    // 10^−310 is a subnormal double (5 significant digits left): E = −0.05916·310 V to those digits.
    expect(halfCell(row('H+/H2'), null, null, 310, 25)).toBeCloseTo(-S * 310, 4);
  });
});
