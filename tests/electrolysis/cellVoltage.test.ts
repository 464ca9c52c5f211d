import { describe, expect, it } from 'vitest';
import { thermalVoltage } from '../../src/constants';
import { BREAKDOWN_LABELS, cellVoltageBreakdown } from '../../src/electrolysis/cellVoltageBreakdown';
import { decompositionVoltage } from '../../src/electrolysis/decompositionVoltage';
import { electrodeOverpotential } from '../../src/electrolysis/electrodeOverpotential';
import { InputError } from '../../src/errors';

describe('electrodeOverpotential (Butler–Volmer, equal coefficients, optional limiting current)', () => {
  it('is the Tafel line (RT/αF)·ln(j/i0) at j ≫ i0', () => {
    // Tafel equation (Bard & Faulkner, Electrochemical Methods, 2nd ed., eq. 3.4.12): η = (RT/αF) ln(i/i0)
    const b = thermalVoltage(25) / 0.5;
    expect(electrodeOverpotential(1000, 1e-3, 0.5, null, 25)).toBeCloseTo(b * Math.log(1e6), 9);
    // 118 mV per decade for α = 0.5 at 25 °C (common practice)
    const perDecade = electrodeOverpotential(1000, 1e-3, 0.5, null, 25) - electrodeOverpotential(100, 1e-3, 0.5, null, 25);
    expect(perDecade).toBeCloseTo(0.1183, 4);
  });
  it('is the linear (charge-transfer resistance) form near equilibrium: η = j·RT/(2αF·i0)', () => {
    // B&F eq. 3.4.11 with αa = αc = α: i = i0·2αfη for small η
    expect(electrodeOverpotential(1e-6, 1, 0.5, null, 25)).toBeCloseTo((1e-6 * thermalVoltage(25)) / (2 * 0.5), 15);
    expect(electrodeOverpotential(0, 1, 0.5, null, 25)).toBe(0);
  });
  it('with a limiting current it is B&F eq. 3.4.15 at high overpotential: (RT/αF)·ln(j·iL/(i0·(iL − j)))', () => {
    const [j, i0, iL, a] = [300, 1e-2, 400, 0.5];
    const expected = (thermalVoltage(50) / a) * Math.log((j * iL) / (i0 * (iL - j)));
    expect(electrodeOverpotential(j, i0, a, iL, 50)).toBeCloseTo(expected, 9);
    // mass transfer adds (RT/αF)·ln(iL/(iL − j)) = ln 4 × 55.7 mV here
    expect(electrodeOverpotential(j, i0, a, iL, 50) - electrodeOverpotential(j, i0, a, null, 50)).toBeCloseTo((thermalVoltage(50) / a) * Math.log(4), 9);
  });
  it('answers where j/i0 is beyond 1e154 (j/i0 squared would overflow) instead of #NUM!', () => {
    // Tafel line again (B&F eq. 3.4.12): η = (RT/αF)·ln(j/i0), here ln(3e303) ≈ 699.0
    const b = thermalVoltage(25) / 0.5;
    expect(electrodeOverpotential(3000, 1e-300, 0.5, null, 25)).toBeCloseTo(b * (Math.log(3000) + 300 * Math.LN10), 9);
    // with a limiting current the factor 1/(1 − j/iL) still adds (RT/αF)·ln 4 (B&F eq. 3.4.15)
    expect(electrodeOverpotential(300, 1e-300, 0.5, 400, 25) - electrodeOverpotential(300, 1e-300, 0.5, null, 25)).toBeCloseTo(b * Math.log(4), 9);
  });
  it('a current density at or above the limiting current is an input error', () => {
    expect(() => electrodeOverpotential(400, 1e-2, 0.5, 400, 50)).toThrow(InputError);
    expect(() => electrodeOverpotential(500, 1e-2, 0.5, 400, 50)).toThrow(/limiting current/);
  });
});

describe('cellVoltageBreakdown', () => {
  const base = {
    reversibleV: 1.18,
    currentDensityA_m2: 3000,
    anodeI0A_m2: 1e-3,
    anodeAlpha: 1.5,
    cathodeI0A_m2: 1,
    cathodeAlpha: 0.5,
    gapMm: 2,
    conductivityS_m: 100,
    gasFraction: 0,
    contactDropV: 0.01,
    busbarDropV: 0.02,
    anodeLimitA_m2: null,
    cathodeLimitA_m2: null,
    temperatureC: 80,
  };
  it('returns the seven parts in label order, the last their sum', () => {
    const r = cellVoltageBreakdown(base);
    expect(r).toHaveLength(BREAKDOWN_LABELS.length);
    expect(r[0]).toBe(1.18);
    expect(r[1]).toBeCloseTo(electrodeOverpotential(3000, 1e-3, 1.5, null, 80), 12);
    expect(r[2]).toBeCloseTo(electrodeOverpotential(3000, 1, 0.5, null, 80), 12);
    expect(r[3]).toBeCloseTo(0.06, 12); // 3000 A/m² × 0.002 m / 100 S/m (Ohm's law)
    expect(r.slice(4, 6)).toEqual([0.01, 0.02]);
    expect(r[6]).toBeCloseTo(r.slice(0, 6).reduce((s, x) => s + x, 0), 12);
  });
  it('a gas fraction raises only the ohmic part, by 1/(1 − ε)^1.5 (Bruggeman)', () => {
    const r = cellVoltageBreakdown({ ...base, gasFraction: 0.3 });
    expect(r[3]).toBeCloseTo(0.06 / 0.7 ** 1.5, 12);
    expect(r[1]).toBe(cellVoltageBreakdown(base)[1]);
  });
});

describe('decompositionVoltage (electrolysis-side sign)', () => {
  it('is the positive voltage a forced reaction needs: E(anode) − E(cathode)', () => {
    // zinc electrowinning, Zn2+/Zn −0.7618 V and O2/H2O 1.229 V vs SHE (CRC Handbook electrochemical series)
    expect(decompositionVoltage(-0.7618, 1.229)).toBeCloseTo(1.9908, 10);
    // water: H+/H2 0 and O2/H2O 1.229 V → 1.229 V
    expect(decompositionVoltage(0, 1.229)).toBeCloseTo(1.229, 12);
  });
});
