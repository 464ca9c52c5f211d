import { describe, expect, it } from 'vitest';
import { waterPKw } from '../../src/nernst/waterPKw';
import { InputError } from '../../src/errors';

describe('waterPKw (Bandura & Lvov 2006 on the saturation curve)', () => {
  // Check values: Bandura & Lvov, J. Phys. Chem. Ref. Data 35 (2006) 15, pKw of liquid water at 0.1 MPa
  // (saturation pressure at 100 °C), from memory.
  it.each([
    [0, 14.946],
    [25, 13.995],
    [50, 13.264],
    [100, 12.252],
  ])('pKw at %s °C is %s', (tc, pkw) => {
    // the model here follows the saturation curve (0.6–101 kPa); at 0.1 MPa pKw is lower by at most 0.0004
    expect(Math.abs(waterPKw(tc) - pkw)).toBeLessThan(0.001);
  });

  it('falls steadily from 0 to 100 °C', () => {
    let last = Infinity;
    for (let tc = 0; tc <= 100; tc += 5) {
      const p = waterPKw(tc);
      expect(p).toBeLessThan(last);
      last = p;
    }
  });

  it('refuses temperatures where it does not apply', () => {
    expect(() => waterPKw(-1)).toThrow(InputError);
    expect(() => waterPKw(400)).toThrow(InputError);
    expect(() => waterPKw(Number.NaN)).toThrow(InputError);
  });
});
