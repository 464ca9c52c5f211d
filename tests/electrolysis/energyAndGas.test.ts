import { describe, expect, it } from 'vitest';
import { cellHeat } from '../../src/electrolysis/cellHeat';
import { cellsForGasFlow } from '../../src/electrolysis/cellsForGasFlow';
import { currentForGasFlow } from '../../src/electrolysis/currentForGasFlow';
import { energyPerNormalVolume } from '../../src/electrolysis/energyPerNormalVolume';
import { heatingValueVoltage } from '../../src/electrolysis/heatingValueVoltage';
import { hydrogenInAir } from '../../src/electrolysis/hydrogenInAir';
import { normalGasFlow } from '../../src/electrolysis/normalGasFlow';
import { referenceMolarVolume } from '../../src/electrolysis/referenceConditions';
import { voltageEfficiency } from '../../src/electrolysis/voltageEfficiency';
import { InputError, NotFoundError } from '../../src/errors';

const F = 96485.33212; // CODATA 2018

describe('heating-value voltages and voltage efficiency', () => {
  it('HHV 1.4812 V and LHV 1.2532 V from CODATA Key Values ΔfH° of H2O(l) −285.830 and H2O(g) −241.826 kJ/mol', () => {
    expect(heatingValueVoltage('HHV')).toBeCloseTo(285830 / (2 * F), 9);
    expect(heatingValueVoltage('hhv')).toBeCloseTo(1.4812, 4);
    expect(heatingValueVoltage('LHV')).toBeCloseTo(1.2532, 4);
    // "1.48 V" and "1.25 V" thermoneutral voltages of water electrolysis, common practice
    expect(heatingValueVoltage('HHV')).toBeCloseTo(1.48, 2);
    expect(() => heatingValueVoltage('GCV')).toThrow(NotFoundError);
  });
  it('efficiency is U_ref/U on either basis, or against a number', () => {
    expect(voltageEfficiency(1.9, 'HHV')).toBeCloseTo(1.48121 / 1.9, 5);
    expect(voltageEfficiency(1.9, 'LHV')).toBeCloseTo(1.25317 / 1.9, 5);
    expect(voltageEfficiency(2.0, 1.6)).toBe(0.8);
    expect(voltageEfficiency(2.0, '1.6')).toBe(0.8);
    expect(() => voltageEfficiency(2, -1.48)).toThrow(InputError);
  });
});

describe('normal cubic metres', () => {
  it('molar volume 22.413 969 54 L/mol at 0 °C and 101.325 kPa (CODATA 2018, exact since 2019)', () => {
    expect(referenceMolarVolume('0C')).toBeCloseTo(0.02241396954, 10);
    expect(referenceMolarVolume('0 °C')).toBe(referenceMolarVolume('0C'));
    // R·T/p at 15 °C and 20 °C, 101.325 kPa (ideal gas law)
    expect(referenceMolarVolume('15C')).toBeCloseTo(0.02364483, 8);
    expect(referenceMolarVolume('20')).toBeCloseTo(0.02405512, 8);
    expect(() => referenceMolarVolume('25C')).toThrow(NotFoundError);
  });
  it('1 kA in one cell makes 0.418 Nm³/h of H2 and 0.209 of O2; 2.39 kA·h per Nm³ of H2', () => {
    // 2.39 kA·h per Nm³ H2 and 0.418 L per A·h, common practice
    expect(normalGasFlow(1000, 2, 1, 1, '0C')).toBeCloseTo(0.41815, 5);
    expect(normalGasFlow(1000, 4, 1, 1, '0C')).toBeCloseTo(0.20907, 5);
    expect(currentForGasFlow(1, 2, 1, 1, '0C')).toBeCloseTo(2391.5, 1);
    expect(normalGasFlow(5000, 2, 0.98, 100, '0C')).toBeCloseTo(0.41815 * 5 * 0.98 * 100, 2);
  });
  it('the inverses agree with the forward function', () => {
    const I = currentForGasFlow(500, 2, 0.97, 200, '15C');
    expect(normalGasFlow(I, 2, 0.97, 200, '15C')).toBeCloseTo(500, 9);
    expect(cellsForGasFlow(100, 2500, 2, 1, '0C')).toBe(96); // 100 / (2.5 × 0.41815) = 95.65 → 96
    const exact = normalGasFlow(2500, 2, 1, 96, '0C');
    expect(cellsForGasFlow(exact, 2500, 2, 1, '0C')).toBe(96); // met exactly: not 97
  });
  it('DC energy per Nm³ of H2: 4.3 kWh/Nm³ at 1.8 V, the HHV of 3.54 kWh/Nm³ at 1.4812 V', () => {
    expect(energyPerNormalVolume(1.8, 2, 1, '0C')).toBeCloseTo((1.8 * 2 * F) / 0.02241396954 / 3.6e6, 8);
    // HHV of hydrogen 3.54 kWh/Nm³ (12.7 MJ/Nm³), common practice
    expect(energyPerNormalVolume(heatingValueVoltage('HHV'), 2, 1, '0C')).toBeCloseTo(3.54, 2);
    expect(energyPerNormalVolume(1.8, 2, 0.9, '0C')).toBeCloseTo(energyPerNormalVolume(1.8, 2, 1, '0C') / 0.9, 12);
  });
});

describe('heat and hydrogen in air', () => {
  it('Q = N·I·(U − U_tn)', () => {
    expect(cellHeat(100, 5000, 1.9, 1.481)).toBeCloseTo(209500, 6);
    expect(cellHeat(10, 100, 1.4, 1.481)).toBeCloseTo(-81, 9); // below thermoneutral: heat to supply
  });
  it('H2 fraction of the mixture and its share of the 4 vol % LFL (Zabetakis 1965)', () => {
    expect(hydrogenInAir(1, 99, 4)).toEqual([0.01, 0.25]);
    expect(hydrogenInAir(4, 96, 4)[1]).toBeCloseTo(1, 12);
    expect(() => hydrogenInAir(0, 0, 4)).toThrow(InputError);
  });
});

describe('gasFlowEfficiency', () => {
  it('is the metered flow over the flow at 100 %', async () => {
    const { gasFlowEfficiency } = await import('../../src/electrolysis/gasFlowEfficiency');
    // 100 cells × 1 kA × 0.41815 Nm³/(kA·h) = 41.815 Nm³/h at 100 %
    expect(gasFlowEfficiency(40.98, 1000, 2, 100, '0C')).toBeCloseTo(40.98 / 41.815, 4);
    expect(gasFlowEfficiency(normalGasFlow(1000, 2, 0.97, 100, '20C'), 1000, 2, 100, '20C')).toBeCloseTo(0.97, 12);
    // a flow the current cannot make (wrong reference, wet gas, wrong cell count) is an input error
    expect(() => gasFlowEfficiency(50, 1000, 2, 100, '0C')).toThrow(InputError);
  });
});
