/** Plating-shop arithmetic, second part: alloy deposits, Hull cell, efficiency curves, consumption, drag-out, throwing power. */
import { additiveDose } from '../../src/plating/additiveDose';
import { alloyDensity } from '../../src/plating/alloyDensity';
import { alloyEquiv } from '../../src/plating/alloyEquiv';
import { alloyFraction } from '../../src/plating/alloyFraction';
import { alloyPlateTime } from '../../src/plating/alloyPlateTime';
import { alloyThickness } from '../../src/plating/alloyThickness';
import { anodeEfficiency } from '../../src/plating/anodeEfficiency';
import { dragOutLoss } from '../../src/plating/dragOutLoss';
import { efficiencyCurve } from '../../src/plating/efficiencyCurve';
import { hullCell } from '../../src/plating/hullCell';
import { metalPerKAh } from '../../src/plating/metalPerKAh';
import { partialCurrent } from '../../src/plating/partialCurrent';
import { platingCurrent } from '../../src/plating/platingCurrent';
import { thicknessFromMass } from '../../src/plating/thicknessFromMass';
import { throwingPower } from '../../src/plating/throwingPower';
import { type ArgSpec, domains, worksheet } from '../adapter';
import { electrons, num, optNum } from '../args';

/** An alloy composition in mass percent, e.g. "Zn86Ni14". */
const alloy: ArgSpec = { name: 'alloy', kind: 'text', unit: '', help: 'Composition: each element symbol followed by its mass percent, e.g. "Zn86Ni14", "Sn60Pb40" (summing to 100).' };
/** Valences of an alloy's elements: one for all, or one per element in the composition's order. */
const valences: ArgSpec = {
  name: 'valences',
  kind: 'numberList',
  domain: domains.positiveInteger,
  unit: '',
  help: 'Electrons per atom deposited: one number for every element (2 for Zn–Ni), or a range with one per element in the order of the composition ({1,2} for Cu–Zn from cyanide).',
};
/** Cathode efficiency of the alloy deposition, default 1. */
const efficiency: ArgSpec = { ...optNum('efficiency', 1, domains.efficiency), help: 'Cathode current efficiency of the alloy deposition, a fraction in (0, 1] (default 1).' };
/** A formula text ("Ni") or a molar mass in g/mol. */
const species: ArgSpec = { name: 'species', kind: 'species', domain: domains.positive, unit: 'g/mol', help: 'Metal ("Ni", "Zn") or its molar mass in g/mol.' };

export const ALLOYEQUIV = worksheet({
  id: 'ALLOYEQUIV',
  description: 'Equivalent weight of an alloy deposit, 1/Σ(wᵢ·nᵢ/Mᵢ), in g per mole of electrons, from its composition in mass percent (IUPAC atomic weights). Give it as the molar mass with n = 1 to any Faraday\'s-law function (DEPOSITMASS, PLATETIME…).',
  args: [alloy, valences],
  result: 'Equivalent weight in g.',
  helpAnchor: 'alloyequiv',
  compute: alloyEquiv,
});

export const ALLOYDENSITY = worksheet({
  id: 'ALLOYDENSITY',
  description: 'Density of an alloy from its composition and its elements\' densities with additive volumes, 1/ρ = Σ(wᵢ/ρᵢ), in g/cm³. Phases of the real deposit can differ by a few percent: prefer a measured density.',
  args: [alloy, { name: 'densities_g_cm3', kind: 'numberList', domain: domains.positive, unit: 'g/cm³', help: 'Density of each element, in g/cm³, a range in the order of the composition.' }],
  result: 'Density in g/cm³.',
  helpAnchor: 'alloydensity',
  compute: alloyDensity,
});

export const ALLOYTHICKNESS = worksheet({
  id: 'ALLOYTHICKNESS',
  description: 'Thickness of a uniform alloy deposit, in µm, from current density (A/dm²), time (min), the alloy\'s composition and the density of the deposit: j·t·ε·EW/(F·ρ).',
  args: [
    { ...num('current_density_A_dm2', domains.nonNegative, 'A/dm²'), help: 'Current density, in A/dm².' },
    { ...num('time_min', domains.nonNegative, 'min'), help: 'Plating time, in min (an Excel time value is a fraction of a day: multiply it by 1440).' },
    alloy,
    valences,
    { ...num('density_g_cm3', domains.positive, 'g/cm³'), help: 'Density of the alloy deposit, in g/cm³ (measured, or ALLOYDENSITY).' },
    efficiency,
  ],
  result: 'Thickness in µm.',
  helpAnchor: 'alloythickness',
  compute: alloyThickness,
});

export const ALLOYPLATETIME = worksheet({
  id: 'ALLOYPLATETIME',
  description: 'Time to plate a thickness of an alloy, in min, at a current density (A/dm²), from its composition and the density of the deposit.',
  args: [
    { ...num('thickness_um', domains.nonNegative, 'µm'), help: 'Thickness wanted, in µm.' },
    { ...num('current_density_A_dm2', domains.positive, 'A/dm²'), help: 'Current density, in A/dm².' },
    alloy,
    valences,
    { ...num('density_g_cm3', domains.positive, 'g/cm³'), help: 'Density of the alloy deposit, in g/cm³ (measured, or ALLOYDENSITY).' },
    efficiency,
  ],
  result: 'Time in min.',
  helpAnchor: 'alloyplatetime',
  compute: alloyPlateTime,
});

export const PARTIALCURRENT = worksheet({
  id: 'PARTIALCURRENT',
  description: 'The part of a current that deposits one element of an alloy of known composition: ε·I·(w·n/M)_k / Σ(wᵢ·nᵢ/Mᵢ), in the unit of the current given (A, or A/dm² for a current density).',
  args: [
    { ...num('current', domains.nonNegative, 'A'), help: 'Total current (or current density), any unit.' },
    alloy,
    { name: 'element', kind: 'text', unit: '', help: 'Element symbol of the alloy whose partial current is wanted, e.g. "Ni".' },
    valences,
    efficiency,
  ],
  result: 'Partial current in the unit of current.',
  helpAnchor: 'partialcurrent',
  compute: partialCurrent,
});

export const ALLOYFRACTION = worksheet({
  id: 'ALLOYFRACTION',
  description: 'Mass fraction of one element in an alloy deposit from the partial currents of its elements (Faraday\'s law for each metal): (I·M/n)_k / Σ(Iᵢ·Mᵢ/nᵢ).',
  args: [
    { name: 'element', kind: 'text', unit: '', help: 'Element symbol whose mass fraction is wanted, e.g. "Ni" (a range gives one result per element).' },
    { name: 'elements', kind: 'textList', unit: '', help: 'Element symbols of the deposit, a range.' },
    { name: 'partial_currents', kind: 'numberList', domain: domains.nonNegative, unit: 'A', help: 'Partial current of each element (any one unit), a range in the order of elements.' },
    valences,
  ],
  result: 'Mass fraction (0 to 1).',
  helpAnchor: 'alloyfraction',
  compute: alloyFraction,
});

export const HULLCELL = worksheet({
  id: 'HULLCELL',
  description: 'Primary current density along a Hull cell panel from Hull\'s relation I·(C1 − C2·log10 L) (267 mL cell: 27.7 and 48.7 in A/ft² with L in inches; 1000 mL: 18.8 and 28.3), in A/dm², for L from 0.635 to 8.255 cm (0.25–3.25 in). Cyanide and strongly polarised baths deviate.',
  args: [
    { ...num('current_A', domains.positive, 'A'), help: 'Cell current, in A.' },
    { ...num('distance_cm', domains.positive, 'cm'), help: 'Distance from the high-current-density end of the panel, in cm (0.635 to 8.255).' },
    { name: 'cell_mL', kind: 'number', optional: true, default: 267, domain: domains.positive, unit: 'mL', help: 'Cell size, 267 or 1000 mL (default 267).' },
  ],
  result: 'Current density in A/dm².',
  helpAnchor: 'hullcell',
  compute: hullCell,
});

export const EFFICIENCYCURVE = worksheet({
  id: 'EFFICIENCYCURVE',
  description: 'Current efficiency at a temperature, interpolated linearly in a curve you supply (hard chromium, for example, from your supplier\'s data or your panels); no built-in curve and no extrapolation: outside the points, #VALUE!.',
  args: [
    { ...num('temperature_C', domains.temperature, '°C'), help: 'Bath temperature in °C.' },
    { name: 'temperatures_C', kind: 'numberList', domain: domains.temperature, unit: '°C', help: 'Temperatures of the curve\'s points, in °C, a range (any order).' },
    { name: 'efficiencies', kind: 'numberList', domain: domains.positive, unit: '', help: 'Efficiency at each of those temperatures, fractions in (0, 1], a range.' },
  ],
  result: 'Efficiency as a fraction.',
  helpAnchor: 'efficiencycurve',
  compute: efficiencyCurve,
});

export const PLATINGCURRENT = worksheet({
  id: 'PLATINGCURRENT',
  description: 'Current for a rack or barrel load: area × current density × pieces, in A.',
  args: [
    { ...num('area_dm2', domains.nonNegative, 'dm²'), help: 'Area of one piece, in dm² (for a barrel, the area of the whole load with pieces 1).' },
    { ...num('current_density_A_dm2', domains.nonNegative, 'A/dm²'), help: 'Current density, in A/dm².' },
    { ...optNum('pieces', 1, domains.nonNegative), help: 'Number of pieces on the rack (default 1).' },
  ],
  result: 'Current in A.',
  helpAnchor: 'platingcurrent',
  compute: platingCurrent,
});

export const METALPERKAH = worksheet({
  id: 'METALPERKAH',
  description: 'Metal deposited or dissolved per kiloampere-hour of the rectifier\'s meter, ε·M·3600/(nF), in kg/(kA·h).',
  args: [species, { ...electrons, help: 'Electrons per atom (2 for Ni, Cu, Zn, Sn from Sn(II); 4 for Sn from stannate).' }, { ...optNum('efficiency', 1, domains.efficiency), help: 'Current efficiency as a fraction, in (0, 1] (default 1).' }],
  result: 'kg per kA·h.',
  helpAnchor: 'metalperkah',
  compute: metalPerKAh,
});

export const ADDITIVEDOSE = worksheet({
  id: 'ADDITIVEDOSE',
  description: 'Additive to add for the charge passed: ampere-hours / 1000 × the dose per kA·h, in the dose\'s unit (mL, g…). Follow the supplier\'s instructions for the additive.',
  args: [
    { ...num('ampere_hours', domains.nonNegative, 'A·h'), help: 'Ampere-hour meter reading since the last addition, in A·h.' },
    { ...num('dose_per_kAh', domains.nonNegative, ''), help: 'Supplier\'s dose per kA·h (mL/kA·h, g/kA·h…).' },
  ],
  result: 'Amount in the unit of the dose.',
  helpAnchor: 'additivedose',
  compute: additiveDose,
});

export const ANODEEFFICIENCY = worksheet({
  id: 'ANODEEFFICIENCY',
  description: 'Apparent anode efficiency from an anode\'s weight loss and the charge passed; above 1 where the anode also dissolves chemically (no clamping: the excess is metal building up in the bath).',
  args: [
    { ...num('mass_loss_g', domains.nonNegative, 'g'), help: 'Weight lost by the anode, in g.' },
    { ...num('ampere_hours', domains.positive, 'A·h'), help: 'Charge passed, in A·h.' },
    species,
    { ...electrons, help: 'Electrons per atom dissolved (2 for Zn, Ni, Cu(II), Sn(II)).' },
  ],
  result: 'Efficiency as a fraction (may exceed 1).',
  helpAnchor: 'anodeefficiency',
  compute: anodeEfficiency,
});

export const DRAGOUTLOSS = worksheet({
  id: 'DRAGOUTLOSS',
  description: 'Bath constituent carried out by the work: drag-out volume per load × concentration × loads, in g. Drag-out goes to the rinses: treat it as the permit requires.',
  args: [
    { ...num('dragout_L', domains.nonNegative, 'L'), help: 'Drag-out per load, in L.' },
    { ...num('concentration_g_L', domains.nonNegative, 'g/L'), help: 'Concentration in the process tank, in g/L.' },
    { ...optNum('loads', 1, domains.nonNegative), help: 'Number of loads (per hour, shift or day) (default 1).' },
  ],
  result: 'Mass in g.',
  helpAnchor: 'dragoutloss',
  compute: dragOutLoss,
});

export const THROWINGPOWER = worksheet({
  id: 'THROWINGPOWER',
  description: 'Throwing power from a Haring–Blum cell, 100·(L − M)/(L + M − 2), in %: +100 equal deposits, 0 the primary distribution, −100 nothing on the far cathode.',
  args: [
    { ...num('distance_ratio', domains.positive, ''), help: 'Far cathode\'s distance from the anode over the near one\'s (L, 5 in the usual cell), > 1.' },
    { ...num('weight_ratio', domains.positive, ''), help: 'Deposit weight on the near cathode over that on the far one (M).' },
  ],
  result: 'Throwing power in %.',
  helpAnchor: 'throwingpower',
  compute: throwingPower,
});

export const THICKNESSFROMMASS = worksheet({
  id: 'THICKNESSFROMMASS',
  description: 'Average coating thickness, in µm, from the mass gained (or stripped) over an area and the coating\'s density: m/(ρ·A). Local thickness in recesses and on edges differs from the average.',
  args: [
    { ...num('mass_g', domains.nonNegative, 'g'), help: 'Mass of the coating (weight gain, or mass stripped), in g.' },
    { ...num('area_dm2', domains.positive, 'dm²'), help: 'Coated area, in dm².' },
    { ...num('density_g_cm3', domains.positive, 'g/cm³'), help: 'Density of the coating, in g/cm³.' },
  ],
  result: 'Thickness in µm.',
  helpAnchor: 'thicknessfrommass',
  compute: thicknessFromMass,
});
