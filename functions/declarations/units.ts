/**
 * Worksheet declarations: trade units.
 *
 * Each declaration is JSDoc for custom-functions-metadata-plugin (which writes dist/functions.json
 * and appends the CustomFunctions.associate calls) and a body of one call into the adapter-built
 * function of the same id in functions/families/units.ts. Arguments are any[][] so that each
 * accepts a single value or a range; results are 2-D arrays and spill.
 */
/* eslint-disable @typescript-eslint/no-explicit-any */
import * as F from '../families/units';

/**
 * Converts a value between two units of one kind, with factors from NIST SP 811 and the SI Brochure: current density (A/dm2, A/m2, mA/cm2, uA/cm2, mA/m2, A/ft2 = ASF), thickness (um, mm, mil, uin, in), penetration rate (mm/y, um/y, mpy, in/y; year of 365 days), concentration (g/L, mg/L, oz/gal avoirdupois, ozt/gal troy for precious-metal baths, g/gal; U.S. gallon), charge (C, Ah, mAh, kAh, F), gas amount (mol, kmol, Nm3 and NL at 0 °C and 101.325 kPa, Sm3(15C), m3(20C), kg H2, kg O2; ideal gas), volume (m3, L, gal), specific energy (kWh/kg, kWh/t, MJ/kg, J/kg) and energy per gas amount (kWh/Nm3, kWh/kg H2, kWh/kg O2, kJ/mol). Case, spaces and · are ignored; µ may be typed u.
 * @customfunction CONVERTUNIT
 * @helpurl https://localhost:3000/docs/functions.html#convertunit
 * @param value Value to convert, in from_unit.
 * @param from_unit Unit of the value, e.g. "ASF", "mil", "oz/gal", "kWh/kg H2".
 * @param to_unit Unit wanted, of the same kind, e.g. "A/dm2", "um", "g/L", "kWh/Nm3".
 * @returns The value in to_unit; an unknown unit or two units of different kinds give #N/A with the accepted units.
 */
function convertUnit(value: any[][], from_unit: any[][], to_unit: any[][]): any[][] {
  return F.CONVERTUNIT(value, from_unit, to_unit) as any;
}
