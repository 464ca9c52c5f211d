import { describe, expect, it } from 'vitest';
import { normalizeCoupleKey, normalizeElectrodeKey, splitCoupleKey } from '../../src/table/keys';

describe('normalizeCoupleKey', () => {
  it('treats every charge spelling and white space alike', () => {
    const forms = ['Cu2+/Cu', 'Cu(2+)/Cu', 'Cu^2+/Cu', 'Cu+2/Cu', ' Cu2+ / Cu ', 'Cu 2+/Cu'];
    for (const f of forms) expect(normalizeCoupleKey(f)).toBe('Cu2+/Cu');
  });
  it('normalizes both sides', () => {
    expect(normalizeCoupleKey('Fe(3+)/Fe+2')).toBe(normalizeCoupleKey('Fe3+/Fe2+'));
    expect(normalizeCoupleKey('Cr2O7^2-/Cr3+')).toBe(normalizeCoupleKey('Cr2O7(2-)/Cr(3+)'));
    expect(normalizeCoupleKey('MnO4-/Mn2+')).toBe(normalizeCoupleKey('MnO4(-)/Mn^2+'));
  });
  it('ignores phase marks', () => {
    expect(normalizeCoupleKey('O2(g)/H2O(l)')).toBe(normalizeCoupleKey('O2/H2O'));
  });
  it('keeps element symbols case-sensitive: Co is not CO', () => {
    expect(normalizeCoupleKey('Co2+/Co')).not.toBe(normalizeCoupleKey('CO2+/CO'));
    expect(normalizeCoupleKey('cu2+/cu')).not.toBe(normalizeCoupleKey('Cu2+/Cu'));
  });
  it('distinguishes Hg2+ (mercury(II)) from Hg2^2+ (mercury(I))', () => {
    expect(normalizeCoupleKey('Hg2+/Hg')).not.toBe(normalizeCoupleKey('Hg2^2+/Hg'));
    expect(normalizeCoupleKey('Hg22+/Hg')).toBe(normalizeCoupleKey('Hg2^2+/Hg'));
  });
  it('returns text that is not Ox/Red without white space', () => {
    expect(normalizeCoupleKey('Cu 2+')).toBe('Cu2+');
    expect(normalizeCoupleKey('a/b/c')).toBe('a/b/c');
  });
});

describe('splitCoupleKey', () => {
  it('splits Ox/Red and trims', () => {
    expect(splitCoupleKey(' MnO4- / Mn2+ ')).toEqual({ ox: 'MnO4-', red: 'Mn2+' });
    expect(splitCoupleKey('Cu2+')).toBeUndefined();
    expect(splitCoupleKey('/Cu')).toBeUndefined();
  });
});

describe('normalizeElectrodeKey', () => {
  it('ignores case and white space', () => {
    expect(normalizeElectrodeKey(' Ag/AgCl/KCl (sat) ')).toBe(normalizeElectrodeKey('ag/agcl/kcl(SAT)'));
    expect(normalizeElectrodeKey('SCE')).toBe('sce');
  });
});
