import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { cellPotential } from '../../src/cells/cellPotential';
import { e0AtTemperature } from '../../src/cells/e0AtTemperature';
import { emf } from '../../src/cells/emf';
import { InputError } from '../../src/errors';
import { builtinTable } from '../../src/table/builtin';

const t = builtinTable();
const cu = t.findCouple('Cu2+/Cu')!;
const zn = t.findCouple('Zn2+/Zn')!;

describe('cellPotential', () => {
  it('Daniell cell with a(Zn2+)/a(Cu2+) = 100: 1.1000 − (0.05916/2)·2 = 1.0408 V', () => {
    // E° 0.3372 and −0.7628 V: data/couples.json (Thermoddem V1.10 / MINTEQA2 v4, computed from the cited log K); RT ln10/F = 59.159 mV at 25 °C (CODATA 2018)
    expect(cellPotential(cu, zn, 100, 25)).toBeCloseTo(0.3372 + 0.7628 - 0.0591593, 6);
  });

  it('uses n = lcm of the two half-reactions: permanganate/iron(II), n = 5', () => {
    // E° 1.5111 and 0.7697 V: data/couples.json (Thermoddem V1.10 / MINTEQA2 v4, computed from the cited log K); one decade of Q moves E by 59.16/5 mV
    const mn = t.findCouple('MnO4-/Mn2+')!;
    const fe = t.findCouple('Fe3+/Fe2+')!;
    expect(cellPotential(mn, fe, 10, 25)).toBeCloseTo(1.5111 - 0.7697 - 0.0591593 / 5, 6);
  });

  it('CELLPOTENTIAL at Q = 1 equals EMF at every temperature (property)', () => {
    const withDedt = t.couples.filter((r) => r.dEdT_mV_K !== undefined);
    fc.assert(fc.property(
      fc.integer({ min: 0, max: withDedt.length - 1 }),
      fc.integer({ min: 0, max: withDedt.length - 1 }),
      fc.double({ min: 0, max: 100, noNaN: true }),
      (i, j, tc) => {
        const a = withDedt[i];
        const b = withDedt[j];
        expect(cellPotential(a, b, 1, tc)).toBe(emf(e0AtTemperature(a, tc), e0AtTemperature(b, tc)));
      },
    ));
  });

  it('refuses Q ≤ 0', () => {
    expect(() => cellPotential(cu, zn, 0, 25)).toThrow(InputError);
    expect(() => cellPotential(cu, zn, -1, 25)).toThrow(InputError);
  });
});
