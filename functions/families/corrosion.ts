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
  args: [
    arg({ name: 'mass_loss_g', kind: 'number', domain: domains.nonNegative, unit: 'g', help: 'Mass loss of the cleaned coupon.' }),
    arg({ name: 'area_cm2', kind: 'number', domain: domains.positive, unit: 'cm²', help: 'Exposed area.' }),
    arg({ name: 'time_h', kind: 'number', domain: domains.positive, unit: 'h', help: 'Exposure time.' }),
    arg({ name: 'density_g_cm3', kind: 'number', domain: domains.positive, unit: 'g/cm³', help: 'Density of the metal, 0.5 to 23 g/cm³ (7870 is refused as kg/m³).' }),
    arg({ name: 'unit', kind: 'text', optional: true, default: 'mm/y', unit: '', help: '"mm/y" (default), "um/y", "mpy" or "in/y".' }),
  ],
  compute: massLossRate,
});

export const PITTINGFACTOR = worksheet({
  id: 'PITTINGFACTOR',
  args: [
    arg({ name: 'deepest_pit', kind: 'number', domain: domains.positive, unit: 'any length', help: 'Depth of the deepest pit.' }),
    arg({ name: 'average_penetration', kind: 'number', domain: domains.positive, unit: 'same unit', help: 'Average penetration from mass loss, same unit.' }),
  ],
  compute: pittingFactor,
});

export const STERNGEARYB = worksheet({
  id: 'STERNGEARYB',
  args: [
    arg({ name: 'B_V', kind: 'number', domain: domains.positive, unit: 'V', help: 'Stern–Geary constant B in V (e.g. 0.026; 0 to 0.2 V, a value like 26 is refused as mV).' }),
    arg({ name: 'polarization_resistance_ohm_cm2', kind: 'number', domain: domains.positive, unit: 'Ω·cm²', help: 'Polarization resistance Rp (1 to 1e9 Ω·cm²).' }),
  ],
  compute: icorrFromB,
});

export const RATECONVERT = worksheet({
  id: 'RATECONVERT',
  args: [
    arg({ name: 'value', kind: 'number', domain: domains.nonNegative, unit: 'from_unit', help: 'The rate or current density to convert.' }),
    arg({ name: 'from_unit', kind: 'text', unit: '', help: '"uA/cm2", "mA/m2", "A/m2", "mm/y", "um/y" or "mpy".' }),
    arg({ name: 'to_unit', kind: 'text', unit: '', help: 'Unit wanted, as from_unit.' }),
    arg({ name: 'equivalent_weight_g', kind: 'number', optional: true, default: null, domain: domains.positive, unit: 'g', help: 'Equivalent weight (EQUIVWEIGHT; 2 to 250 g), needed between a current and a penetration.' }),
    arg({ name: 'density_g_cm3', kind: 'number', optional: true, default: null, domain: domains.positive, unit: 'g/cm³', help: 'Density (0.5 to 23 g/cm³), needed between a current and a penetration.' }),
  ],
  compute: rateConvert,
});

export const EQUIVWEIGHT = worksheet({
  id: 'EQUIVWEIGHT',
  args: [
    arg({ name: 'elements', kind: 'textList', unit: '', help: 'Element symbols (a range), e.g. Fe, Cr, Ni.' }),
    arg({ name: 'mass_fractions', kind: 'numberList', domain: domains.nonNegative, unit: '', help: 'Mass fractions (0 to 1), same length.' }),
    arg({ name: 'valences', kind: 'numberList', domain: domains.positiveInteger, unit: '', help: 'Electrons given up per atom, same length.' }),
  ],
  compute: equivWeight,
});

export const GALVANICSERIES = worksheet({
  id: 'GALVANICSERIES',
  args: [arg({ name: 'alloy', kind: 'text', unit: '', help: 'Alloy name as in the series (e.g. "Zinc", "Mild steel, cast iron", "Stainless steel type 316, 317 (passive)"); a unique part of a name is enough.' })],
  compute: (alloy: string) => {
    const r = galvanicSeries(alloy);
    return [r.min_V, r.max_V];
  },
  rowResult: 2,
});
