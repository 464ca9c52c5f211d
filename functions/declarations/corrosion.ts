/**
 * Worksheet declarations: corrosion rates and materials.
 *
 * Each declaration is JSDoc for custom-functions-metadata-plugin and a body of one call into the
 * adapter-built function of the same id in functions/families/corrosion.ts.
 */
/* eslint-disable @typescript-eslint/no-explicit-any */
import * as F from '../families/corrosion';

/**
 * Corrosion rate of a coupon from its mass loss, K·W/(A·T·D) (ASTM G1 §8.1.2; G31), with K = 8.76e4 for mm/y, 8.76e7 µm/y, 3.45e6 mpy, 3.45e3 in/y.
 * @customfunction MASSLOSSRATE
 * @helpurl https://localhost:3000/docs/functions.html#masslossrate
 * @param mass_loss_g Mass loss, g.
 * @param area_cm2 Exposed area, cm².
 * @param time_h Exposure time, h.
 * @param density_g_cm3 Density, g/cm³ (0.5 to 23).
 * @param [unit] "mm/y" (default), "um/y", "mpy" or "in/y".
 * @returns Rate in the unit asked.
 */
function massLossRate(mass_loss_g: any[][], area_cm2: any[][], time_h: any[][], density_g_cm3: any[][], unit?: any[][]): any[][] {
  return F.MASSLOSSRATE(mass_loss_g, area_cm2, time_h, density_g_cm3, unit) as any;
}

/**
 * Pitting factor (ASTM G46): deepest pit over average penetration (1 = uniform).
 * @customfunction PITTINGFACTOR
 * @helpurl https://localhost:3000/docs/functions.html#pittingfactor
 * @param deepest_pit Deepest pit depth.
 * @param average_penetration Average penetration, same unit.
 * @returns Pitting factor (dimensionless).
 */
function pittingFactor(deepest_pit: any[][], average_penetration: any[][]): any[][] {
  return F.PITTINGFACTOR(deepest_pit, average_penetration) as any;
}

/**
 * Corrosion current density B/Rp from a given Stern–Geary constant, in µA/cm² (ASTM G59, G102).
 * @customfunction STERNGEARYB
 * @helpurl https://localhost:3000/docs/functions.html#sterngearyb
 * @param B_V Stern–Geary constant B, V (e.g. 0.026).
 * @param polarization_resistance_ohm_cm2 Polarization resistance, Ω·cm².
 * @returns Current density in µA/cm².
 */
function sternGearyB(B_V: any[][], polarization_resistance_ohm_cm2: any[][]): any[][] {
  return F.STERNGEARYB(B_V, polarization_resistance_ohm_cm2) as any;
}

/**
 * Converts between µA/cm², mA/m², A/m², mm/y, µm/y and mpy; between a current density and a penetration rate by ASTM G102 (K1 = 3.27e-3 mm·g/(µA·cm·y)), which needs the equivalent weight and density.
 * @customfunction RATECONVERT
 * @helpurl https://localhost:3000/docs/functions.html#rateconvert
 * @param value Value to convert.
 * @param from_unit "uA/cm2", "mA/m2", "A/m2", "mm/y", "um/y" or "mpy".
 * @param to_unit Unit wanted.
 * @param [equivalent_weight_g] Equivalent weight, g.
 * @param [density_g_cm3] Density, g/cm³.
 * @returns The value in to_unit.
 */
function rateConvert(value: any[][], from_unit: any[][], to_unit: any[][], equivalent_weight_g?: any[][], density_g_cm3?: any[][]): any[][] {
  return F.RATECONVERT(value, from_unit, to_unit, equivalent_weight_g, density_g_cm3) as any;
}

/**
 * Alloy equivalent weight EW = 1/Σ(fᵢ·nᵢ/Wᵢ) in g (ASTM G102 §5.2), from element symbols, mass fractions and valences (ranges of equal length; IUPAC atomic weights).
 * @customfunction EQUIVWEIGHT
 * @helpurl https://localhost:3000/docs/functions.html#equivweight
 * @param elements Element symbols, a range.
 * @param mass_fractions Mass fractions 0 to 1, a range.
 * @param valences Valences, a range.
 * @returns Equivalent weight in g.
 */
function equivWeight(elements: any[][], mass_fractions: any[][], valences: any[][]): any[][] {
  return F.EQUIVWEIGHT(elements, mass_fractions, valences) as any;
}

/**
 * Corrosion-potential range of an alloy in flowing seawater from a practical galvanic series, spills 1×2 [most negative, most positive] in V vs SCE. Measured corrosion potentials, for comparing alloys; not standard potentials (GALVANIC).
 * @customfunction GALVANICSERIES
 * @helpurl https://localhost:3000/docs/functions.html#galvanicseries
 * @param alloy Alloy name, e.g. "Zinc", "Mild steel, cast iron", "Copper".
 * @returns Two potentials in V vs SCE.
 */
function galvanicSeries(alloy: any[][]): any[][] {
  return F.GALVANICSERIES(alloy) as any;
}
