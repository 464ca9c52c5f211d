import { describe, expect, it } from 'vitest';
import { checkCoupleForm, checkElectrodeForm, readNumber } from '../../taskpane/forms';

const ok = { key: 'Cu2+/Cu', halfReaction: 'Cu2+ + 2e- -> Cu', e0: '0.3419', dEdT: '', source: 'CRC', note: '' };
const none = () => false;

describe('couple form, checked as you type', () => {
  it('accepts a good row, derives n, and gives the record', () => {
    const c = checkCoupleForm(ok, none);
    expect(c.errors).toEqual({});
    expect(c.info.halfReaction).toBe('Balanced · n = 2 electrons');
    expect(c.record).toEqual({ key: 'Cu2+/Cu', halfReaction: 'Cu2+ + 2e- -> Cu', e0: 0.3419, source: 'CRC' });
  });

  it('says what is wrong, field by field', () => {
    const c = checkCoupleForm({ key: '', halfReaction: 'Cu2+ + e- -> Cu', e0: 'abc', dEdT: '9', source: ' ', note: '' }, none);
    expect(c.record).toBeUndefined();
    expect(c.errors.halfReaction).toMatch(/charge|balance/i);
    expect(c.errors.e0).toMatch(/must be a number/);
    expect(c.errors.dEdT).toMatch(/between -5 and 5 mV\/K/);
    expect(c.errors.source).toMatch(/source is required/);
    expect(c.errors.key).toMatch(/key is required/);
  });

  it('checks the key against the half-reaction, suggests one, and refuses a key in use', () => {
    expect(checkCoupleForm({ ...ok, key: 'Ag+/Ag' }, none).errors.key).toMatch(/not on the left/);
    expect(checkCoupleForm({ ...ok, key: '' }, none).info.key).toBe('Suggested from the half-reaction: Cu2+/Cu');
    expect(checkCoupleForm({ ...ok, halfReaction: 'MnO4- + 8H+ + 5e- -> Mn2+ + 4H2O', key: '' }, none).info.key).toMatch(/MnO4-\/Mn2\+/);
    expect(checkCoupleForm(ok, (k) => k === 'Cu2+/Cu').errors.key).toMatch(/already uses/);
  });

  it('reads numbers people type: a leading minus sign, a plus, exponents; not a decimal comma; E° within ±4 V', () => {
    expect(readNumber('−0.76', 'E°', { min: -4, max: 4 }, 'V', true)).toBe(-0.76);
    expect(readNumber('+1.5e-1', 'E°', { min: -4, max: 4 }, 'V', true)).toBe(0.15);
    expect(readNumber('0,25', 'E°', { min: -4, max: 4 }, 'V', true)).toEqual({ error: 'write E° with a decimal point (0.25)' });
    expect(readNumber('5', 'E°', { min: -4, max: 4 }, 'V', true)).toEqual({ error: 'E° must lie between -4 and 4 V' });
    expect(readNumber('', 'dE/dT', { min: -5, max: 5 }, 'mV/K', false)).toBeUndefined();
  });
});

describe('electrode form', () => {
  const e = { key: 'Lab SCE', aliases: 'our calomel\n\n  bench SCE ', potential: '0.244', dEdT: '-0.67', source: 'lab', note: '' };
  it('accepts a good row with other names one per line', () => {
    expect(checkElectrodeForm(e, none).record).toEqual({ key: 'Lab SCE', aliases: ['our calomel', 'bench SCE'], potential: 0.244, dEdT_mV_K: -0.67, source: 'lab' });
  });
  it('refuses a name in use, a "|" in a name, repeated names and a missing source', () => {
    expect(checkElectrodeForm(e, (n) => n === 'bench SCE').errors.aliases).toMatch(/already uses/);
    expect(checkElectrodeForm({ ...e, aliases: 'a|b' }, none).errors.aliases).toMatch(/cannot hold/);
    expect(checkElectrodeForm({ ...e, aliases: 'lab sce' }, none).errors.aliases).toMatch(/once/);
    expect(checkElectrodeForm({ ...e, source: '' }, none).errors.source).toMatch(/required/);
  });
});
