import { describe, expect, it } from 'vitest';
import { InputError, NotFoundError } from '../../src/errors';
import { plateThickness } from '../../src/faraday/plateThickness';
import { metalFraction } from '../../src/plating/metalFraction';
import { rinseRatio } from '../../src/plating/rinseRatio';
import { saltMass } from '../../src/plating/saltMass';
import { thicknessFromAh } from '../../src/plating/thicknessFromAh';

describe('metalFraction', () => {
  it('hydrates and cyanide complexes', () => {
    // nickel sulfate hexahydrate is 22.3 % Ni (common practice); IUPAC CIAAW 2021 abridged weights
    expect(metalFraction('NiSO4·6H2O', 'Ni')).toBeCloseTo(58.693 / (58.693 + 32.06 + 4 * 15.999 + 6 * (2 * 1.008 + 15.999)), 12);
    expect(metalFraction('NiSO4·6H2O', 'Ni')).toBeCloseTo(0.2233, 4);
    // potassium gold cyanide KAu(CN)2 is 68.3 % Au (common practice, from memory)
    expect(metalFraction('KAu(CN)2', 'Au')).toBeCloseTo(0.6836, 3);
    // potassium silver cyanide KAg(CN)2 is 54.2 % Ag (common practice, from memory)
    expect(metalFraction('K[Ag(CN)2]', 'Ag')).toBeCloseTo(0.542, 3);
    expect(metalFraction('NiSO₄·6H₂O', 'Ni')).toBe(metalFraction('NiSO4·6H2O', 'Ni'));
  });
  it('a metal that is not in the salt is #N/A; a miscapitalised one says which element', () => {
    expect(() => metalFraction('CuSO4·5H2O', 'Ni')).toThrow(NotFoundError);
    expect(() => metalFraction('NiSO4', 'NI')).toThrow(InputError);
    expect(() => metalFraction('NiSO4', 'NI')).toThrow('did you mean Ni?');
  });
});

describe('saltMass', () => {
  it('Watts bath: 75 g/L nickel in 1000 L from the hexahydrate', () => {
    // m = c·V/w = 75 g/L · 1000 L / 0.2233 = 335.9 kg (definition of mass fraction)
    expect(saltMass(75, 1000, 'NiSO4·6H2O', 'Ni')).toBeCloseTo(75 / metalFraction('NiSO4·6H2O', 'Ni'), 9);
    expect(saltMass(75, 1000, 'NiSO4·6H2O', 'Ni')).toBeCloseTo(335.9, 1);
  });
});

describe('rinseRatio', () => {
  /** Steady-state mass balance of n perfectly mixed counterflow stages, solved directly (Thomas algorithm). */
  function cascade(r: number, n: number): number {
    // stage i (1..n): C(i−1) + r·C(i+1) = (1 + r)·C(i), with C(0) = 1 (process tank) and C(n+1) = 0 (fresh water)
    const a: number[] = [], b: number[] = [], c: number[] = [], d: number[] = [];
    for (let i = 1; i <= n; i++) {
      a.push(-1);
      b.push(1 + r);
      c.push(-r);
      d.push(i === 1 ? 1 : 0);
    }
    for (let i = 1; i < n; i++) {
      const m = a[i] / b[i - 1];
      b[i] -= m * c[i - 1];
      d[i] -= m * d[i - 1];
    }
    const x = new Array(n).fill(0);
    x[n - 1] = d[n - 1] / b[n - 1];
    for (let i = n - 2; i >= 0; i--) x[i] = (d[i] - c[i] * x[i + 1]) / b[i];
    return 1 / x[n - 1];
  }
  it('matches the mass balance of the cascade', () => {
    for (const [r, n] of [[20, 1], [20, 2], [10, 3], [1, 3], [0.5, 2], [50, 4]]) {
      expect(rinseRatio(r, n) / cascade(r, n)).toBeCloseTo(1, 10);
    }
  });
  it('one stage is r + 1; many stages tend to r^n', () => {
    expect(rinseRatio(20, 1)).toBe(21);
    expect(rinseRatio(100, 3) / 100 ** 3).toBeCloseTo(1, 1);
  });
});

describe('thicknessFromAh', () => {
  it('10 A·h on 20 dm² of nickel at 95 %', () => {
    // m = Q·3600·ε·M/(nF) = 10·3600·0.95·58.693/(2·96485.33212) = 10.402 g; h = m/(ρ·A) = 5.844 µm (Faraday's law)
    expect(thicknessFromAh(10, 20, 'Ni', 2, 8.9, 0.95)).toBeCloseTo(5.844, 3);
  });
  it('agrees with PLATETHICKNESS at the same charge per area', () => {
    // 10 A·h on 20 dm² in 30 min is 1 A/dm²
    expect(thicknessFromAh(10, 20, 'Cu', 2, 8.96, 1)).toBeCloseTo(plateThickness(1, 30, 'Cu', 2, 8.96, 1), 12);
  });
});
