/**
 * Plating-shop checks and sizing: free cyanide by titration, cathode efficiency from thickness
 * readings, rectifier rating, hydrogen from the cathodes and its dilution air, a coating and its
 * substrate in the galvanic series, and coating life at a corrosion rate.
 */
import { coatingLife } from '../../src/corrosion/coatingLife';
import { galvanicPair } from '../../src/corrosion/galvanicPair';
import { freeCyanide } from '../../src/plating/freeCyanide';
import { hydrogenVentilation } from '../../src/plating/hydrogenVentilation';
import { RECTIFIER_LABELS, rectifierRating } from '../../src/plating/rectifierRating';
import { thicknessEfficiency } from '../../src/plating/thicknessEfficiency';
import { type ArgSpec, bounded, domains, worksheet } from '../adapter';
import { electrons, num, optNum } from '../args';
import { withHeader } from './electrolysis';

/** A design margin: a fraction from 0 to 1 (0.2 for 20 %). */
const margin = bounded({ lo: 0, loIncl: true, hi: 1, hiIncl: true }, 'a fraction from 0 to 1 (0.2 for a 20 % margin)');
/** A share of the lower flammability limit, (0, 1]. */
const lflShare = bounded({ lo: 0, hi: 1, hiIncl: true }, 'a fraction in (0, 1] (0.25 for 25 % of the LFL)');
/** A lower flammability limit in vol %. */
const lflPercent = bounded({ lo: 0, hi: 100 }, 'between 0 and 100 vol %');
/** A thickness reading: > 0, so that an empty cell passed as 0 is not averaged in as a reading. */
const readingDomain = bounded({ lo: 0 }, '> 0 (remove empty cells or zeros from the readings)');
/** A metal ("Ni") or its molar mass in g/mol. */
const species: ArgSpec = { name: 'species', kind: 'species', domain: domains.positive, unit: 'g/mol', help: 'Deposited metal ("Ni", "Cu") or its molar mass in g/mol.' };

export const FREECYANIDE = worksheet({
  id: 'FREECYANIDE',
  description:
    'Free NaCN or KCN of a cyanide bath, in g/L, from a silver nitrate titration to the first permanent turbidity (Liebig, 2 CN⁻ + Ag⁺ → Ag(CN)₂⁻; with KI as indicator): 2·V·c·M(salt)/V(sample). Cyanide baths are acutely toxic and release hydrogen cyanide with acid: sample and titrate under extraction, keep acids away, and follow the site\'s procedures and the applicable regulations.',
  args: [
    { ...num('titrant_mL', domains.nonNegative, 'mL'), help: 'Silver nitrate used to the end point, in mL.' },
    { ...num('titrant_mol_L', domains.positive, 'mol/L'), help: 'Molarity of the silver nitrate, in mol/L (0.1 N is 0.1).' },
    { ...num('sample_mL', domains.positive, 'mL'), help: 'Bath sample titrated, in mL.' },
    { name: 'salt', kind: 'text', optional: true, default: 'NaCN', unit: '', help: '"NaCN" or "KCN": the salt the result is given as (default "NaCN").' },
  ],
  result: 'Free cyanide as the salt, in g/L.',
  helpAnchor: 'freecyanide',
  compute: freeCyanide,
});

export const THICKNESSEFFICIENCY = worksheet({
  id: 'THICKNESSEFFICIENCY',
  description:
    'Cathode current efficiency from thickness readings: their mean (blank cells skipped) over the thickness Faraday\'s law gives at 100 % for the same current density, time, metal and density. Above 1 means readings to question (gauge, density, readings where the current density is above the average). Take the readings where the average current density applies, not on edges or in recesses.',
  args: [
    { name: 'readings_um', kind: 'numberList', domain: readingDomain, unit: 'µm', help: 'Thickness readings, in µm, each > 0, a range (blank cells skipped; a 0 is refused, since an empty cell can arrive as 0).' },
    { ...num('current_density_A_dm2', domains.positive, 'A/dm²'), help: 'Average current density, in A/dm².' },
    { ...num('time_min', domains.positive, 'min'), help: 'Plating time, in min (an Excel time value is a fraction of a day: multiply it by 1440).' },
    species,
    { ...electrons, help: 'Electrons per atom deposited.' },
    { ...num('density_g_cm3', domains.positive, 'g/cm³'), help: 'Density of the deposit, in g/cm³.' },
  ],
  result: 'Efficiency as a fraction.',
  helpAnchor: 'thicknessefficiency',
  compute: thicknessEfficiency,
});

const RECTIFIER_ARGS: ArgSpec[] = [
  { ...num('area_dm2', domains.nonNegative, 'dm²'), help: 'Plated area of the largest load, in dm².' },
  { ...num('current_density_A_dm2', domains.nonNegative, 'A/dm²'), help: 'Highest current density planned, in A/dm².' },
  { ...num('tank_V', domains.nonNegative, 'V'), help: 'Tank voltage (anode to cathode) at that current density, in V.' },
  { ...num('lead_drop_V', domains.nonNegative, 'V'), help: 'Drop in bus bars, flexible leads and contacts at that current, in V.' },
  { ...num('current_margin', margin), help: 'Your design margin on the current, a fraction (0.2 for 20 %; 0 for none).' },
  { ...num('voltage_margin', margin), help: 'Your design margin on the voltage, a fraction (0 for none).' },
  { name: 'header', kind: 'boolean', optional: true, default: false, unit: '', help: 'TRUE: a row of labels above the values (default FALSE).' },
];

export const RECTIFIERSIZE = withHeader(
  worksheet({
    id: 'RECTIFIERSIZE',
    description:
      'DC rating of a plating rectifier, a row of 3: current area × current density × (1 + current margin) in A, voltage (tank voltage + lead drop) × (1 + voltage margin) in V, and their product in kW. The margins are your design choice, not data. A column of inputs gives one row each; header TRUE puts labels on top. Rectifier and bus-bar installation follow the electrical codes that apply.',
    args: RECTIFIER_ARGS,
    result: 'Current in A, voltage in V, power in kW.',
    helpAnchor: 'rectifiersize',
    compute: rectifierRating,
    rowResult: RECTIFIER_LABELS.length,
  }),
  RECTIFIER_LABELS,
  RECTIFIER_ARGS.length - 1,
);

export const H2VENTILATION = worksheet({
  id: 'H2VENTILATION',
  description:
    'Hydrogen from a plating tank\'s cathodes, taking all the current that deposits no metal, I·(1 − ε), as evolving H2 (an upper bound), in normal m³/h at the named reference, and the air flow at the same reference that keeps the perfectly mixed exhaust at the chosen share of the lower flammability limit (4.0 vol %, Zabetakis 1965). A screening figure: hoods do not mix perfectly and hydrogen gathers under covers; ventilation design follows the applicable ventilation and explosion-protection codes.',
  args: [
    { ...num('current_A', domains.nonNegative, 'A'), help: 'Tank current, in A.' },
    { ...num('efficiency', domains.fraction), help: 'Cathode current efficiency of the metal deposition, a fraction from 0 to 1 (0: all the current evolves hydrogen).' },
    { ...num('lfl_fraction', lflShare), help: 'Share of the lower flammability limit not to exceed, a fraction (0.25 for 25 % of the LFL).' },
    { name: 'reference', kind: 'text', optional: true, default: '0C', unit: '', help: 'Reference of the normal m³: "0C" = 0 °C and 101.325 kPa, "15C" or "20C" (at 101.325 kPa) (default "0C").' },
    { ...optNum('lfl_percent', null, lflPercent, 'vol %'), help: 'Lower flammability limit of hydrogen in air, in vol % (default 4.0, from the data set).' },
  ],
  result: 'Hydrogen in Nm³/h and air in Nm³/h.',
  helpAnchor: 'h2ventilation',
  compute: hydrogenVentilation,
  rowResult: 2,
});

export const GALVANICPAIR = worksheet({
  id: 'GALVANICPAIR',
  description:
    'A coating and its substrate in the practical galvanic series in flowing seawater (GALVANICSERIES), a row of 2: E(coating) − E(substrate) between the midpoints of their ranges, in V, and the name of the anodic one (the more negative range, which corrodes at pores and cut edges), or a note that the ranges overlap. The farther apart in the series, the stronger the galvanic effect (MIL-STD-889B, Notice 1, 5.1.2); no verdict here: what difference is acceptable depends on the environment, the area ratio and the design standard that applies.',
  args: [
    { name: 'coating', kind: 'text', unit: '', help: 'Coating (deposit) as named in the series, e.g. "Zinc", "Nickel 200", "Tin".' },
    { name: 'substrate', kind: 'text', unit: '', help: 'Substrate as named in the series, e.g. "Mild steel, cast iron", "Copper".' },
  ],
  result: 'Difference in V, and the anodic alloy.',
  helpAnchor: 'galvanicpair',
  compute: galvanicPair,
  rowResult: 2,
});

export const COATINGLIFE = worksheet({
  id: 'COATINGLIFE',
  description:
    'Years until a coating is consumed by uniform corrosion: thickness / rate, the rate a penetration rate or a corrosion current density turned into one by Faraday\'s law (ASTM G102: K1·i·(M/n)/ρ). Pitting and attack at pores and cut edges are not included; coating standards and exposure data for the site take precedence.',
  args: [
    { ...num('thickness_um', domains.nonNegative, 'µm'), help: 'Coating thickness, in µm.' },
    { ...num('rate', domains.positive), help: 'Corrosion rate, in rate_unit.' },
    { name: 'rate_unit', kind: 'text', unit: '', help: '"um/y", "mm/y", "mpy" (penetration), or "uA/cm2", "mA/m2", "A/m2" (current density).' },
    { name: 'species', kind: 'species', optional: true, default: null, domain: domains.positive, unit: 'g/mol', help: 'The coating\'s metal ("Zn") or its molar mass in g/mol; needed for a current density (default none).' },
    { ...optNum('n', null, domains.positiveInteger), help: 'Electrons per atom dissolved (2 for Zn, Ni, Cu, Cd); needed for a current density (default none).' },
    { ...optNum('density_g_cm3', null, domains.positive, 'g/cm³'), help: 'Density of the coating, in g/cm³; needed for a current density (default none).' },
  ],
  result: 'Life in years.',
  helpAnchor: 'coatinglife',
  compute: coatingLife,
});
