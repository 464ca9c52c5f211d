/** A coating against its substrate in the galvanic series, and coating life at a corrosion rate. */
import { describe, expect, it } from 'vitest';
import { coatingLife } from '../../src/corrosion/coatingLife';
import { galvanicPair } from '../../src/corrosion/galvanicPair';
import { NotFoundError } from '../../src/errors';

/** CODATA 2018 Faraday constant, exact (e·N_A). */
const F = 96485.33212331001;

describe('galvanicPair (practical galvanic series in flowing seawater, V vs SCE)', () => {
  // Ranges from the Australasian Corrosion Association's table "Corrosion potentials in flowing seawater"
  // (data/galvanic-series.json): zinc −1.03 to −0.98, mild steel −0.72 to −0.60, nickel 200 −0.20 to −0.10,
  // copper −0.37 to −0.30, tin −0.33 to −0.30.
  it('zinc on steel: 0.345 V more negative, zinc anodic (sacrificial)', () => {
    const [d, anodic] = galvanicPair('Zinc', 'Mild steel, cast iron');
    expect(d).toBeCloseTo((-1.03 - 0.98) / 2 - (-0.72 - 0.6) / 2, 12);
    expect(anodic).toBe('Zinc');
  });
  it('nickel on copper: nickel 0.185 V more positive, the copper substrate anodic', () => {
    expect(galvanicPair('Nickel 200', 'Copper')).toEqual([0.185, 'Copper']);
  });
  it('tin on copper: the ranges overlap, no anodic member named', () => {
    const [d, anodic] = galvanicPair('Tin', 'Copper');
    expect(d).toBeCloseTo(0.02, 12);
    expect(anodic).toMatch(/overlap/);
  });
  it('an alloy not in the series is #N/A with candidates', () => {
    expect(() => galvanicPair('Unobtainium', 'Copper')).toThrow(NotFoundError);
  });
});

describe('coatingLife: thickness / rate', () => {
  it('a penetration rate: 85 µm at 2.1 µm/y lasts 40.5 years; the same in mm/y and mpy (1 mil = 25.4 µm, NIST SP 811)', () => {
    expect(coatingLife(85, 2.1, 'um/y', null, null, null)).toBeCloseTo(85 / 2.1, 12);
    expect(coatingLife(85, 0.0021, 'mm/y', null, null, null)).toBeCloseTo(85 / 2.1, 9);
    expect(coatingLife(85, 2.1 / 25.4, 'mpy', null, null, null)).toBeCloseTo(85 / 2.1, 9);
  });
  it('a corrosion current: 0.5 µA/cm² on 12 µm of zinc (M/n = 65.38/2, 7.14 g/cm³) by Faraday\'s law, 1.60 years', () => {
    // ASTM G102: CR = K1·i·EW/ρ, K1 = 1e-6 A·(365.25·86400 s)·10 mm/cm / F = 3.2707e-3 mm·g/(µA·cm·y)
    const k1 = (1e-6 * 365.25 * 86400 * 10) / F;
    expect(k1).toBeCloseTo(3.27e-3, 5);
    const umPerYear = k1 * 0.5 * (65.38 / 2) / 7.14 * 1000;
    expect(coatingLife(12, 0.5, 'uA/cm2', 'Zn', 2, 7.14)).toBeCloseTo(12 / umPerYear, 9);
    expect(coatingLife(12, 0.5, 'uA/cm2', 'Zn', 2, 7.14)).toBeCloseTo(1.603, 3);
    // 1 µA/cm² = 10 mA/m² (definition)
    expect(coatingLife(12, 5, 'mA/m2', 'Zn', 2, 7.14)).toBeCloseTo(12 / umPerYear, 9);
  });
  it('a current density without species, n and density, or an unknown unit, is refused', () => {
    expect(() => coatingLife(12, 0.5, 'uA/cm2', 'Zn', null, 7.14)).toThrow(/needs species, n and density_g_cm3/);
    expect(() => coatingLife(12, 0.5, 'g/m2/y', null, null, null)).toThrow(/unknown unit/);
    expect(() => coatingLife(12, 0.5, 'uA/cm2', 'Zn', 2, 7140)).toThrow(/kg\/m³/);
  });
});
