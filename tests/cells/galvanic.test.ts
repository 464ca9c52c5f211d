import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { galvanic } from '../../src/cells/galvanic';
import { InputError, NotFoundError } from '../../src/errors';
import { builtinTable } from '../../src/table/builtin';

const t = builtinTable();
const cu = t.findCouple('Cu2+/Cu')!;
const zn = t.findCouple('Zn2+/Zn')!;

describe('galvanic', () => {
  it('puts copper as the cathode of the Daniell cell, whichever is given first', () => {
    // 0.3372 − (−0.7628) = 1.1000 V: data/couples.json (Thermoddem V1.10 / MINTEQA2 v4, computed from the cited log K)
    expect(galvanic(zn, cu, 25)).toEqual([expect.closeTo(1.1, 10), 'Cu2+/Cu', 'Zn2+/Zn']);
    expect(galvanic(cu, zn, 25)).toEqual([expect.closeTo(1.1, 10), 'Cu2+/Cu', 'Zn2+/Zn']);
  });

  it('uses E° at the temperature', () => {
    // E°(T) from the species data (NBS 1982, with ΔrCp for zinc); the rows' linear dE°/dT (Thermoddem V1.10 / MINTEQA2 v4)
    // (Cu2+/Cu −0.002, Zn2+/Zn +0.108 mV/K) agrees within 1 mV at 65 °C
    const [e] = galvanic(cu, zn, 65);
    expect(Math.abs(e - (1.1 + (-0.002 - 0.108) * 1e-3 * 40))).toBeLessThan(1e-3);
    expect(() => galvanic(cu, t.findCouple('Bi3+/Bi')!, 65)).toThrow(NotFoundError);
    expect(() => galvanic(cu, zn, 120)).toThrow(InputError);
  });

  it('always gives E°cell ≥ 0 with the higher couple as cathode (property)', () => {
    const rows = t.couples;
    fc.assert(fc.property(fc.integer({ min: 0, max: rows.length - 1 }), fc.integer({ min: 0, max: rows.length - 1 }), (i, j) => {
      const [e, cathode, anode] = galvanic(rows[i], rows[j], 25);
      expect(e).toBeGreaterThanOrEqual(0);
      expect(t.findCouple(cathode)!.e0).toBeGreaterThanOrEqual(t.findCouple(anode)!.e0);
      expect(new Set([cathode, anode])).toEqual(new Set([rows[i].key, rows[j].key]));
    }));
  });
});
