import { describe, expect, it } from 'vitest';
import { ecEquiv } from '../../src/faraday/ecEquiv';

describe('ecEquiv: electrochemical equivalents in g/(A·h)', () => {
  // Tables of electrochemical equivalents in standard plating handbooks (e.g. Schlesinger & Paunovic,
  // Modern Electroplating, 5th ed., appendix; Metal Finishing Guidebook), from memory.
  it('copper from Cu(II): 1.186 (1.1855 rounded)', () => expect(Math.abs(ecEquiv('Cu', 2) - 1.186)).toBeLessThan(1e-3));
  it('copper from Cu(I) (cyanide bath): 2.371', () => expect(ecEquiv('Cu', 1)).toBeCloseTo(2.371, 3));
  it('nickel: 1.095', () => expect(ecEquiv('Ni', 2)).toBeCloseTo(1.095, 3));
  it('zinc: 1.220', () => expect(ecEquiv('Zn', 2)).toBeCloseTo(1.22, 3));
  it('silver: 4.025', () => expect(ecEquiv('Ag', 1)).toBeCloseTo(4.025, 3));
  it('chromium from Cr(VI): 0.3234', () => expect(Math.abs(ecEquiv('Cr', 6) - 0.3234)).toBeLessThan(2e-4));
  it('a molar mass in g/mol gives the same as the formula', () => {
    expect(ecEquiv(58.693, 2)).toBe(ecEquiv('Ni', 2));
  });
  it('1 A·h is 1/26.80 mol of electrons: ecEquiv·n/M = 3600/F', () => {
    // 3600 C per A·h / F = 0.037311 mol of electrons (CODATA 2018 F); "26.8 A·h per equivalent", common practice
    expect(ecEquiv(1, 1)).toBeCloseTo(1 / 26.801, 5);
  });
});
