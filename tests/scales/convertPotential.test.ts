import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { InputError, NotFoundError } from '../../src/errors';
import { convertPotential } from '../../src/scales/convertPotential';
import { type Scale, resolveScale } from '../../src/scales/resolveScale';
import { builtinTable } from '../../src/table/builtin';

const table = builtinTable();
const find = (k: string) => table.findElectrode(k);
const scale = (name: string): Scale => resolveScale(name, find);
const conv = (e: number, from: string, to: string, pH: number | null = null, t = 25) => convertPotential(e, scale(from), scale(to), pH, t);

describe('convertPotential: handbook checks', () => {
  it('the NACE SP0169 criterion −0.85 V vs CSE is −0.534 V vs SHE', () => {
    // NACE SP0169 (AMPP): −850 mV vs CSE; CSE = +0.316 V vs SHE (Szabó & Bakos, Int. J. Corros. 2010, Table 2)
    expect(conv(-0.85, 'CSE', 'SHE')).toBeCloseTo(-0.534, 6);
  });
  it('… and −0.775 V vs SCE', () => {
    // NACE SP0169 criterion on the SCE scale: −0.85 + 0.316 − 0.2412 (SCE, Bard & Faulkner) = −0.7752 V;
    // CP practice quotes about −0.78 V vs SCE (common practice)
    expect(conv(-0.85, 'CSE', 'SCE')).toBeCloseTo(-0.7752, 4);
    expect(conv(-0.85, 'Cu/CuSO4(sat)', 'Hg/Hg2Cl2/KCl(sat)')).toBeCloseTo(-0.7752, 4);
  });
  it('the seawater criteria −0.80 V vs Ag/AgCl and +0.25 V vs zinc are the same potential', () => {
    // Cathwell, "Monitoring cathodic protection": −800 mV vs Ag/AgCl ≡ +250 mV vs Zn (seawater electrodes)
    expect(conv(-0.8, 'Ag/AgCl/seawater', 'Zn/seawater')).toBeCloseTo(0.25, 9);
    // the soil criterion −0.85 V CSE lands 16 mV short of it: −0.85 + 0.316 (Szabó & Bakos 2010) + 0.80 = +0.266 V vs Zn
    expect(conv(-0.85, 'CSE', 'Zn/seawater')).toBeCloseTo(0.266, 9);
  });
  it('0 V vs RHE at pH 7 is −0.414 V vs SHE at 25 °C', () => {
    // E(H+/H2) at pH 7 = −0.414 V (the biochemists' E°′ of the hydrogen electrode, e.g. Lehninger; from memory);
    // −(RT ln10/F)·7 = −0.41411 V with CODATA 2018 constants
    expect(conv(0, 'RHE', 'SHE', 7)).toBeCloseTo(-0.4141, 4);
    expect(conv(0, 'SHE', 'RHE', 7)).toBeCloseTo(0.4141, 4);
  });
  it('RHE follows temperature: at 60 °C and pH 14 it sits 0.925 V below the SHE', () => {
    // −(RT ln10/F)·14 at 333.15 K = −0.92546 V (CODATA 2018 constants)
    expect(conv(0, 'RHE', 'SHE', 14, 60)).toBeCloseTo(-0.92546, 5);
  });
  it('SCE to Ag/AgCl (sat. KCl): +0.044 V', () => {
    // 0.2412 − 0.197 (Bard & Faulkner, inside back cover): a potential of 0 V vs SCE is +0.0442 V vs Ag/AgCl(sat)
    expect(conv(0, 'SCE', 'Ag/AgCl/KCl(sat)')).toBeCloseTo(0.0442, 4);
  });
});

describe('convertPotential: rules', () => {
  it('RHE without pH is an input error with a message', () => {
    expect(() => conv(0.1, 'RHE', 'SHE')).toThrow(InputError);
    expect(() => conv(0.1, 'SCE', 'RHE')).toThrow(/pH/);
  });
  it('an unknown scale is not found, by name', () => {
    expect(() => conv(0.1, 'NHE?', 'SHE')).toThrow(NotFoundError);
    expect(() => conv(0.1, 'SHE', 'Pt/PtO')).toThrow(/Pt\/PtO/);
  });
  it('SHE and RHE ignore case and white space', () => {
    expect(scale(' she ').kind).toBe('SHE');
    expect(scale('r h e').kind).toBe('RHE');
  });
  it('a scale to itself is the identity even without dE/dT or pH', () => {
    expect(conv(0.123, 'Ag/AgCl/KCl(3M)', 'Ag/AgCl/KCl(3 mol/L)', null, 60)).toBe(0.123);
    expect(conv(0.123, 'RHE', 'RHE')).toBe(0.123);
  });
  it('electrodes with neither dE/dT nor a fixed or saturated filling cannot be converted away from 25 °C', () => {
    expect(() => conv(0.1, 'Ag/AgCl/seawater', 'SHE', null, 40)).toThrow(NotFoundError);
  });
});

describe('convertPotential: there and back is the identity (property)', () => {
  const names = ['SHE', 'RHE', ...table.electrodes.flatMap((r) => [r.key, ...r.aliases])];
  const withDEdT = new Set(table.electrodes.filter((r) => r.dEdT_mV_K !== undefined).flatMap((r) => [r.key, ...r.aliases]));
  it('for every pair of scales, any potential, pH and temperature', () => {
    fc.assert(
      fc.property(
        fc.double({ min: -5, max: 5, noNaN: true }),
        fc.constantFrom(...names),
        fc.constantFrom(...names),
        fc.double({ min: -2, max: 16, noNaN: true }),
        // calomel electrodes are used up to 80 °C (data/electrode-e0.json, temperatureLimits)
        fc.double({ min: 0, max: 80, noNaN: true }),
        (e, a, b, pH, t) => {
          const temp = withDEdT.has(a) && withDEdT.has(b) ? t : 25;
          const there = conv(e, a, b, pH, temp);
          expect(Math.abs(conv(there, b, a, pH, temp) - e)).toBeLessThan(1e-12);
        },
      ),
      { numRuns: 2000 },
    );
  });
  it('going through SHE equals going directly', () => {
    fc.assert(
      fc.property(fc.double({ min: -3, max: 3, noNaN: true }), fc.constantFrom(...names), fc.constantFrom(...names), (e, a, b) => {
        expect(conv(conv(e, a, 'SHE', 7), 'SHE', b, 7)).toBeCloseTo(conv(e, a, b, 7), 12);
      }),
    );
  });
});

describe('NHE is a name of the SHE scale', () => {
  it('converts the same as SHE (common practice: the normal hydrogen electrode is used as a name of the standard one)', () => {
    const t = builtinTable();
    const find = (k: string) => t.findElectrode(k);
    expect(convertPotential(0.5, resolveScale('NHE', find), resolveScale('SCE', find), null, 25)).toBe(
      convertPotential(0.5, resolveScale('SHE', find), resolveScale('SCE', find), null, 25),
    );
    expect(resolveScale(' nhe ', find)).toEqual({ kind: 'SHE' });
  });
});
