/**
 * Corrosion rates and materials: coupon mass loss (ASTM G1/G31), pitting factor (ASTM G46),
 * Stern–Geary with a given B, rate and current-density conversions (ASTM G102), alloy equivalent
 * weight (ASTM G102) and a practical galvanic series in seawater.
 */
import { equivWeight } from '../../src/corrosion/equivWeight';
import { galvanicSeries } from '../../src/corrosion/galvanicSeries';
import { icorrFromB } from '../../src/corrosion/icorrFromB';
import { massLossRate } from '../../src/corrosion/massLossRate';
import { pittingFactor } from '../../src/corrosion/pittingFactor';
import { rateConvert } from '../../src/corrosion/rateConvert';
import { type ArgSpec, domains, worksheet } from '../adapter';

/** An argument with its help text (the spec carries it for the generated reference). */
type Arg = ArgSpec & { readonly help: string };
const arg = (a: Arg): Arg => a;

export const MASSLOSSRATE = worksheet({
  id: 'MASSLOSSRATE',
  description: 'Corrosion rate of a coupon from its mass loss, K·W/(A·T·D) (ASTM G1 §8.1.2; G31), with K = 8.76e4 for mm/y, 8.76e7 µm/y, 3.45e6 mpy, 3.45e3 in/y.',
  args: [
    arg({ name: 'mass_loss_g', kind: 'number', domain: domains.nonNegative, unit: 'g', help: 'Mass loss, g.' }),
    arg({ name: 'area_cm2', kind: 'number', domain: domains.positive, unit: 'cm²', help: 'Exposed area, cm².' }),
    arg({ name: 'time_h', kind: 'number', domain: domains.positive, unit: 'h', help: 'Exposure time, h.' }),
    arg({ name: 'density_g_cm3', kind: 'number', domain: domains.positive, unit: 'g/cm³', help: 'Density, g/cm³ (0.5 to 23).' }),
    arg({ name: 'unit', kind: 'text', optional: true, default: 'mm/y', unit: '', help: '"mm/y", "um/y", "mpy" or "in/y" (default "mm/y").' }),
  ],
  result: 'Rate in the unit asked.',
  helpAnchor: 'masslossrate',
  compute: massLossRate,
});

export const PITTINGFACTOR = worksheet({
  id: 'PITTINGFACTOR',
  description: 'Pitting factor (ASTM G46): deepest pit over average penetration (1 = uniform).',
  args: [
    arg({ name: 'deepest_pit', kind: 'number', domain: domains.positive, unit: 'any length', help: 'Deepest pit depth.' }),
    arg({ name: 'average_penetration', kind: 'number', domain: domains.positive, unit: 'same unit', help: 'Average penetration, same unit.' }),
  ],
  result: 'Pitting factor (dimensionless).',
  helpAnchor: 'pittingfactor',
  compute: pittingFactor,
});

export const STERNGEARYB = worksheet({
  id: 'STERNGEARYB',
  description: 'Corrosion current density B/Rp from a given Stern–Geary constant, in µA/cm² (ASTM G59, G102).',
  args: [
    arg({ name: 'B_V', kind: 'number', domain: domains.positive, unit: 'V', help: 'Stern–Geary constant B, V (e.g. 0.026).' }),
    arg({ name: 'polarization_resistance_ohm_cm2', kind: 'number', domain: domains.positive, unit: 'Ω·cm²', help: 'Polarization resistance, Ω·cm².' }),
  ],
  result: 'Current density in µA/cm².',
  helpAnchor: 'sterngearyb',
  compute: icorrFromB,
});

export const RATECONVERT = worksheet({
  id: 'RATECONVERT',
  description: 'Converts between µA/cm², mA/m², A/m², mm/y, µm/y and mpy; between a current density and a penetration rate by ASTM G102 (K1 = 3.27e-3 mm·g/(µA·cm·y)), which needs the equivalent weight and density.',
  args: [
    arg({ name: 'value', kind: 'number', domain: domains.nonNegative, unit: 'from_unit', help: 'Value to convert.' }),
    arg({ name: 'from_unit', kind: 'text', unit: '', help: '"uA/cm2", "mA/m2", "A/m2", "mm/y", "um/y" or "mpy".' }),
    arg({ name: 'to_unit', kind: 'text', unit: '', help: 'Unit wanted.' }),
    arg({ name: 'equivalent_weight_g', kind: 'number', optional: true, default: null, domain: domains.positive, unit: 'g', help: 'Equivalent weight, g.' }),
    arg({ name: 'density_g_cm3', kind: 'number', optional: true, default: null, domain: domains.positive, unit: 'g/cm³', help: 'Density, g/cm³.' }),
  ],
  result: 'The value in to_unit.',
  helpAnchor: 'rateconvert',
  compute: rateConvert,
});

export const EQUIVWEIGHT = worksheet({
  id: 'EQUIVWEIGHT',
  description: 'Alloy equivalent weight EW = 1/Σ(fᵢ·nᵢ/Wᵢ) in g (ASTM G102 §5.2), from element symbols, mass fractions and valences (ranges of equal length; IUPAC atomic weights).',
  args: [
    arg({ name: 'elements', kind: 'textList', unit: '', help: 'Element symbols, a range.' }),
    arg({ name: 'mass_fractions', kind: 'numberList', domain: domains.nonNegative, unit: '', help: 'Mass fractions 0 to 1, a range.' }),
    arg({ name: 'valences', kind: 'numberList', domain: domains.positiveInteger, unit: '', help: 'Valences, a range.' }),
  ],
  result: 'Equivalent weight in g.',
  helpAnchor: 'equivweight',
  compute: equivWeight,
});

export const GALVANICSERIES = worksheet({
  id: 'GALVANICSERIES',
  description: 'Corrosion-potential range of an alloy in flowing seawater from a practical galvanic series, spills 1×2 [most negative, most positive] in V vs SCE. Measured corrosion potentials, for comparing alloys; not standard potentials (GALVANIC).',
  args: [arg({ name: 'alloy', kind: 'text', unit: '', help: 'Alloy name, e.g. "Zinc", "Mild steel, cast iron", "Copper".' })],
  result: 'Two potentials in V vs SCE.',
  helpAnchor: 'galvanicseries',
  compute: (alloy: string) => {
    const r = galvanicSeries(alloy);
    return [r.min_V, r.max_V];
  },
  rowResult: 2,
});
