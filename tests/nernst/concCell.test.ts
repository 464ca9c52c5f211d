import { describe, expect, it } from 'vitest';
import { concCell } from '../../src/nernst/concCell';

describe('concCell', () => {
  it('Cu|Cu2+(0.01)||Cu2+(1)|Cu gives 59.16 mV', () => {
    // (RT/2F) ln 100 at 25 °C = 0.05916 V (CODATA 2018 constants; standard textbook concentration-cell example)
    expect(concCell(0.01, 1, 2, 25)).toBeCloseTo(0.059159, 6);
  });
  it('equal activities give 0 and swapping sides changes the sign', () => {
    expect(concCell(0.3, 0.3, 1, 25)).toBe(0);
    expect(concCell(0.5, 0.05, 1, 40)).toBeCloseTo(-concCell(0.05, 0.5, 1, 40), 15);
  });
});
