/** Trade units: current density, thickness, penetration rate, concentration, charge, gas amount, energy. */
import { convertUnit } from '../../src/units/convertUnit';
import { domains, worksheet } from '../adapter';
import { num } from '../args';

export const CONVERTUNIT = worksheet({
  id: 'CONVERTUNIT',
  description: 'Converts a value between two units of one kind, with factors from NIST SP 811 and the SI Brochure: current density (A/dm2, A/m2, mA/cm2, uA/cm2, mA/m2, A/ft2 = ASF), thickness (um, mm, mil, uin, in), penetration rate (mm/y, um/y, mpy, in/y; year of 365 days), concentration (g/L, mg/L, oz/gal avoirdupois, ozt/gal troy for precious-metal baths, g/gal; U.S. gallon), charge (C, Ah, mAh, kAh, F), gas amount (mol, kmol, Nm3 and NL at 0 °C and 101.325 kPa, Sm3(15C), m3(20C), kg H2, kg O2; ideal gas), volume (m3, L, gal), specific energy (kWh/kg, kWh/t, MJ/kg, J/kg) and energy per gas amount (kWh/Nm3, kWh/kg H2, kWh/kg O2, kJ/mol). Case, spaces and · are ignored; µ may be typed u.',
  args: [
    { ...num('value', domains.any), help: 'Value to convert, in from_unit.' },
    { name: 'from_unit', kind: 'text', help: 'Unit of the value, e.g. "ASF", "mil", "oz/gal", "kWh/kg H2".' },
    { name: 'to_unit', kind: 'text', help: 'Unit wanted, of the same kind, e.g. "A/dm2", "um", "g/L", "kWh/Nm3".' },
  ],
  result: 'The value in to_unit; an unknown unit or two units of different kinds give #N/A with the accepted units.',
  helpAnchor: 'convertunit',
  compute: convertUnit,
});
