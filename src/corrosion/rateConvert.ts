import { CORROSION_K1_MM_G_PER_UA_CM_YR } from '../kinetics/corrosionRate';
import { PLAUSIBLE, plausible } from './plausible';
import { InputError } from '../errors';

/** mm per mil (0.001 in). */
const MM_PER_MIL = 0.0254;

type Unit = 'uA/cm2' | 'mA/m2' | 'A/m2' | 'mm/y' | 'um/y' | 'mpy';
const UNITS: Record<string, Unit> = {
  'ua/cm2': 'uA/cm2', 'µa/cm2': 'uA/cm2', 'µa/cm²': 'uA/cm2', 'ua/cm²': 'uA/cm2',
  'ma/m2': 'mA/m2', 'ma/m²': 'mA/m2',
  'a/m2': 'A/m2', 'a/m²': 'A/m2',
  'mm/y': 'mm/y', 'mm/yr': 'mm/y', 'mm/a': 'mm/y',
  'um/y': 'um/y', 'µm/y': 'um/y',
  mpy: 'mpy', 'mil/y': 'mpy', 'mils/y': 'mpy',
};
const isCurrent = (u: Unit): boolean => u === 'uA/cm2' || u === 'mA/m2' || u === 'A/m2';
/** One unit in µA/cm² (currents) or in mm/y (penetration). */
const FACTOR: Record<Unit, number> = { 'uA/cm2': 1, 'mA/m2': 0.1, 'A/m2': 100, 'mm/y': 1, 'um/y': 0.001, mpy: MM_PER_MIL };

function unitOf(text: string): Unit {
  const u = UNITS[text.trim().toLowerCase().replace(/\s+/g, '')];
  if (u === undefined) throw new InputError(`unknown unit "${text}"; use µA/cm², mA/m², A/m², mm/y, µm/y or mpy`);
  return u;
}

/**
 * Converts a corrosion current density or a penetration rate between µA/cm², mA/m², A/m², mm/y,
 * µm/y and mpy. Between a current and a penetration it applies Faraday's law with ASTM G102's
 * K1 = 3.27 × 10⁻³ mm·g/(µA·cm·y): CR = K1·icorr·EW/ρ, so it needs the equivalent weight (g) and
 * density (g/cm³); between two currents or two penetrations it needs neither.
 * 1 µA/cm² = 10 mA/m²; 1 mm/y = 39.37 mpy (1 mil = 0.0254 mm).
 *
 * Syntax: rateConvert(value, fromUnit, toUnit, equivalentWeightG, densityGcm3)
 * Example: rateConvert(1, "uA/cm2", "mm/y", 27.92, 7.87) → 0.01160 mm/y
 * See also: corrosionRate, massLossRate
 */
export function rateConvert(value: number, fromUnit: string, toUnit: string, equivalentWeightG: number | null, densityGcm3: number | null): number {
  const from = unitOf(fromUnit);
  const to = unitOf(toUnit);
  let base = value * FACTOR[from];
  if (isCurrent(from) !== isCurrent(to)) {
    if (equivalentWeightG === null || densityGcm3 === null) {
      throw new InputError('between a current density and a penetration rate give equivalent_weight_g and density_g_cm3');
    }
    plausible('equivalent_weight_g', equivalentWeightG, PLAUSIBLE.equivalentWeightG);
    plausible('density_g_cm3', densityGcm3, PLAUSIBLE.densityGcm3);
    const k = (CORROSION_K1_MM_G_PER_UA_CM_YR * equivalentWeightG) / densityGcm3; // mm/y per µA/cm²
    base = isCurrent(from) ? base * k : base / k;
  }
  return base / FACTOR[to];
}
