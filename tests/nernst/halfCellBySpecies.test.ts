import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { halfCell } from '../../src/nernst/halfCell';
import { halfCellBySpecies } from '../../src/nernst/halfCellBySpecies';
import { InputError, NotFoundError } from '../../src/errors';
import { builtinTable } from '../../src/table/builtin';

const t = builtinTable();
const row = (k: string) => t.findCouple(k)!;
const S = 0.0591593; // RT ln10/F at 25 °C, CODATA 2018

describe('halfCellBySpecies', () => {
  it('permanganate with every species named', () => {
    // E° 1.5111 V: data/couples.json (Thermoddem V1.10, computed from the cited log K); Q = 0.01/(0.1·(1e-3)^8) = 1e23, n = 5
    expect(halfCellBySpecies(row('MnO4-/Mn2+'), ['MnO4-', 'Mn2+', 'H+'], [0.1, 0.01, 1e-3], 25)).toBeCloseTo(1.5111 - (S / 5) * 23, 6);
  });

  it('accepts any spelling of a species and gives unnamed species activity 1', () => {
    const a = halfCellBySpecies(row('MnO4-/Mn2+'), ['Mn(2+)'], [0.01], 25);
    expect(a).toBeCloseTo(1.5111 + (S / 5) * 2, 6);
    expect(halfCellBySpecies(row('Fe3+/Fe2+'), ['Fe^3+', 'Fe+2'], [0.2, 0.02], 25)).toBeCloseTo(0.7697 + S, 6); // E° 0.7697 V, data/couples.json (Thermoddem V1.10)
  });

  it('lets water activity be set (concentrated brines)', () => {
    // O2 + 4H+ + 4e- -> 2H2O: a(H2O) = 0.9 raises E by (S/4)·2·log10(1/0.9)
    expect(halfCellBySpecies(row('O2/H2O'), ['H2O'], [0.9], 25)).toBeCloseTo(1.2292 - (S / 4) * 2 * Math.log10(0.9), 7); // E° 1.2292 V, data/couples.json (Thermoddem V1.10)
  });

  it('agrees with halfCell where both apply (property)', () => {
    fc.assert(fc.property(fc.double({ min: 1e-8, max: 100, noNaN: true }), fc.double({ min: 1e-8, max: 100, noNaN: true }), fc.double({ min: 0, max: 14, noNaN: true }), (ox, red, pH) => {
      const r = row('MnO4-/Mn2+');
      expect(halfCellBySpecies(r, ['MnO4-', 'Mn2+', 'H+'], [ox, red, 10 ** -pH], 25)).toBeCloseTo(halfCell(r, ox, red, pH, 25), 9);
    }));
  });

  it('names a species that is not in the half-reaction (#N/A)', () => {
    expect(() => halfCellBySpecies(row('Cu2+/Cu'), ['Zn2+'], [1], 25)).toThrow(NotFoundError);
    expect(() => halfCellBySpecies(row('Cu2+/Cu'), ['Zn2+'], [1], 25)).toThrow(/"Zn2\+" is not in the half-reaction of Cu2\+\/Cu/);
    expect(() => halfCellBySpecies(row('Cu2+/Cu'), ['e-'], [1], 25)).toThrow(NotFoundError);
  });

  it('refuses unequal lists, repeated names and activities ≤ 0; an unreadable or unknown-element name is not in the half-reaction (#N/A)', () => {
    expect(() => halfCellBySpecies(row('Cu2+/Cu'), ['Cu2+', 'Cu'], [1], 25)).toThrow(InputError);
    expect(() => halfCellBySpecies(row('Cu2+/Cu'), ['Cu2+', 'Cu(2+)'], [1, 2], 25)).toThrow(/named twice/);
    expect(() => halfCellBySpecies(row('Cu2+/Cu'), ['Cu2+?'], [1], 25)).toThrow(NotFoundError);
    expect(() => halfCellBySpecies(row('Cu2+/Cu'), ['Xx2+'], [1], 25)).toThrow(/"Xx2\+" is not a species of the half-reaction of Cu2\+\/Cu/);
    expect(() => halfCellBySpecies(row('Cu2+/Cu'), ['Cu2+'], [0], 25)).toThrow(InputError);
  });
});
