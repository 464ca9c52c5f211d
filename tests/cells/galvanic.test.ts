import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { galvanic } from '../../src/cells/galvanic';
import { DomainError, NotFoundError } from '../../src/errors';
import { builtinTable } from '../../src/table/builtin';

const t = builtinTable();
const cu = t.findCouple('Cu2+/Cu')!;
const zn = t.findCouple('Zn2+/Zn')!;

describe('galvanic', () => {
  it('puts copper as the cathode of the Daniell cell, whichever is given first', () => {
    // 0.3419 − (−0.7618) = 1.1037 V (CRC Handbook E° values, from memory)
    expect(galvanic(zn, cu, 25)).toEqual([expect.closeTo(1.1037, 10), 'Cu2+/Cu', 'Zn2+/Zn']);
    expect(galvanic(cu, zn, 25)).toEqual([expect.closeTo(1.1037, 10), 'Cu2+/Cu', 'Zn2+/Zn']);
  });

  it('uses E° at the temperature', () => {
    // E°(T) from the species data (NBS 1982, with ΔrCp for zinc); Bratsch 1989's linear dE°/dT
    // (Cu2+/Cu +0.011, Zn2+/Zn +0.119 mV/K) agrees within 1 mV at 65 °C
    const [e] = galvanic(cu, zn, 65);
    expect(Math.abs(e - (1.1037 + (0.011 - 0.119) * 1e-3 * 40))).toBeLessThan(1e-3);
    expect(() => galvanic(cu, t.findCouple('Au3+/Au')!, 65)).toThrow(NotFoundError);
    expect(() => galvanic(cu, zn, 120)).toThrow(DomainError);
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
