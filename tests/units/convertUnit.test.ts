import { describe, expect, it } from 'vitest';
import data from '../../data/units.json';
import { NotFoundError } from '../../src/errors';
import { convertUnit } from '../../src/units/convertUnit';
import { unitTable } from '../../src/units/unitTable';

describe('convertUnit', () => {
  it('current density', () => {
    // NIST SP 811 (2008) B.9: foot = 3.048 E-01 m (exact) → 1 ft² = 0.09290304 m²; 1 A/ft² = 0.107639 A/dm²
    expect(convertUnit(1, 'ASF', 'A/dm2')).toBeCloseTo(0.1076391, 7);
    expect(convertUnit(20, 'A/ft²', 'A/dm²')).toBeCloseTo(2.152782, 6);
    expect(convertUnit(1, 'A/dm2', 'A/m2')).toBe(100); // SI prefixes (SI Brochure 9th ed.)
    expect(convertUnit(1, 'mA/cm2', 'A/dm2')).toBeCloseTo(0.1, 12); // 1e-3 A / 1e-4 m² = 10 A/m²
    expect(convertUnit(1, 'µA/cm²', 'mA/m2')).toBeCloseTo(10, 12); // 1e-6 A / 1e-4 m² = 1e-2 A/m²
  });
  it('thickness', () => {
    expect(convertUnit(1, 'mil', 'µm')).toBeCloseTo(25.4, 12); // SP 811 B.9: mil = 2.54 E-05 m (exact)
    expect(convertUnit(1, 'uin', 'nm')).toBeCloseTo(25.4, 12); // SP 811 B.9: microinch = 2.54 E-08 m (exact)
    expect(convertUnit(25, 'um', 'mil')).toBeCloseTo(0.984252, 6);
  });
  it('penetration rate', () => {
    // 1 mpy = 0.0254 mm/y (mil = 2.54e-5 m, SP 811 B.9; same year on both sides)
    expect(convertUnit(1, 'mpy', 'mm/y')).toBeCloseTo(0.0254, 12);
    expect(convertUnit(1, 'mm/y', 'µm/y')).toBeCloseTo(1000, 9);
  });
  it('concentration: avoirdupois and troy ounces per U.S. gallon are told apart', () => {
    // avoirdupois oz/gal (U.S.) = 7.489 152 kg/m³ (SP 811 B.8, from memory); the same figure is
    // 1/0.1335264711843 in the OuncePerUSGallon definition of UnitsNet (MassConcentration.json), read
    expect(convertUnit(1, 'oz/gal', 'g/L')).toBeCloseTo(7.489152, 6);
    // troy ounce = 31.1034768 g, gallon = 231 in³ = 3.785411784 L (NIST Handbook 44, Appendix C): 8.216704 g/L
    expect(convertUnit(1, 'ozt/gal', 'g/L')).toBeCloseTo(31.1034768 / 3.785411784, 9);
    expect(convertUnit(1, 'troy oz/gal', 'oz/gal')).toBeCloseTo(31.1034768 / 28.349523125, 9);
  });
  it('charge', () => {
    expect(convertUnit(1, 'A·h', 'C')).toBe(3600); // SP 811 B.9: ampere hour = 3.6 E+03 C
    expect(convertUnit(1, 'kA h', 'Ah')).toBe(1000);
    // F = 96485.33212 C/mol (CODATA 2018, exact product e·N_A) = 26.8015 A·h
    expect(convertUnit(1, 'F', 'Ah')).toBeCloseTo(26.80148, 5);
  });
  it('gas amount at named reference conditions', () => {
    // molar volume of an ideal gas at 273.15 K and 101.325 kPa: 22.413 969 54 L/mol (CODATA 2018, from memory)
    expect(convertUnit(1, 'mol', 'NL')).toBeCloseTo(22.41396954, 7);
    expect(convertUnit(1, 'Nm3', 'mol')).toBeCloseTo(1000 / 22.41396954, 4);
    // 15 °C reference (ISO 13443): 273.15/288.15 of the 0 °C volume for the same amount
    expect(convertUnit(1, 'Nm3', 'Sm3(15C)')).toBeCloseTo(288.15 / 273.15, 12);
    // 1 kg H2 = 1000/2.016 mol = 11.118 Nm³ ideal gas (M(H2) = 2·1.008, IUPAC CIAAW 2021 abridged)
    expect(convertUnit(1, 'kg H2', 'Nm3')).toBeCloseTo((1000 / 2.016) * 0.02241396954, 6);
  });
  it('energy per amount of gas: kWh/kg H2 against kWh/Nm³', () => {
    // 39.4 kWh/kg (the higher heating value of hydrogen, common practice) is about 3.54 kWh/Nm³
    expect(convertUnit(39.4, 'kWh/kg H2', 'kWh/Nm3')).toBeCloseTo(39.4 / ((1000 / 2.016) * 0.02241396954), 6);
    expect(convertUnit(39.4, 'kWh/kg H2', 'kWh/Nm3')).toBeCloseTo(3.54, 2);
    expect(convertUnit(2000, 'kWh/t', 'kWh/kg')).toBeCloseTo(2, 12); // SP 811 B.9: kW·h = 3.6 E+06 J; t = 1e3 kg
  });
  it('unknown or incompatible units are #N/A with the accepted spellings', () => {
    expect(() => convertUnit(1, 'furlong', 'um')).toThrow(NotFoundError);
    expect(() => convertUnit(1, 'furlong', 'um')).toThrow(/unknown unit "furlong"; units of thickness: m, mm, um, nm, in, mil, uin/);
    expect(() => convertUnit(1, 'furlong', 'parsec')).toThrow(/kinds accepted.*current density \(A\/m2…\)/);
    expect(() => convertUnit(1, 'A/dm2', 'um')).toThrow(/cannot convert current density \("A\/dm2"\) to thickness/);
    expect(() => convertUnit(1, 'L', 'Nm3')).toThrow(/units of volume: m3, L, gal/);
  });
  it('every row has a kind, a positive size, a definition and a source; no spelling names two units', () => {
    const { rows } = unitTable();
    expect(rows.length).toBe((data as { units: unknown[] }).units.length);
    for (const r of rows) {
      expect(r.factor > 0 && Number.isFinite(r.factor), r.unit).toBe(true);
      expect(r.source.length > 10 && r.definition.length > 3, r.unit).toBe(true);
      expect(convertUnit(1, r.unit, r.unit)).toBe(1);
    }
  });
});
