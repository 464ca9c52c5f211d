import { describe, expect, it } from 'vitest';
import { specificCapacity } from '../../src/faraday/specificCapacity';

describe('specificCapacity', () => {
  it('LiFePO4 with one electron: about 170 mA·h/g', () => {
    // theoretical capacity of LiFePO4, 170 mA·h/g (common practice); Faraday: 96485.33/(3.6 × 157.76) = 169.9
    expect(specificCapacity('LiFePO4', 1)).toBeCloseTo(169.9, 1);
  });
  it('graphite, one lithium per C6: 372 mA·h/g of carbon', () => {
    // theoretical capacity of graphite (LiC6), 372 mA·h/g per gram of carbon (common practice)
    expect(specificCapacity('C6', 1)).toBeCloseTo(372, 0);
    // per gram of the lithiated LiC6 it is less: 96485.33/(3.6 × 79.01) = 339.2
    expect(specificCapacity('LiC6', 1)).toBeCloseTo(339.2, 1);
  });
  it('a molar mass in g/mol is used as given, and the capacity scales with n', () => {
    expect(specificCapacity(96.48533212, 1)).toBeCloseTo(277.7777, 3); // F/(3.6·M) with M = F/1000
    expect(specificCapacity('Zn', 2)).toBeCloseTo(2 * specificCapacity('Zn', 1), 12);
  });
});
