/** Plating-shop arithmetic: bath make-up, rinsing, thickness from the ampere-hour meter. */
import { metalFraction } from '../../src/plating/metalFraction';
import { rinseRatio } from '../../src/plating/rinseRatio';
import { saltMass } from '../../src/plating/saltMass';
import { thicknessFromAh } from '../../src/plating/thicknessFromAh';
import { type ArgSpec, bounded, domains, worksheet } from '../adapter';
import { electrons, num, optNum } from '../args';

/** Counterflow rinse stages: a whole number from 1 to 20. */
const stagesDomain = bounded({ lo: 1, loIncl: true, hi: 20, hiIncl: true, whole: true }, 'a whole number from 1 to 20');
/** A salt's formula, e.g. "NiSO4·6H2O" or "KAu(CN)2". */
const salt: ArgSpec = { name: 'salt', kind: 'text' };
/** A metal's element symbol as written in the salt's formula, e.g. "Ni". */
const metal: ArgSpec = { name: 'metal', kind: 'text' };

export const METALFRACTION = worksheet({ id: 'METALFRACTION', description: 'Mass fraction of a metal in a salt (hydrates and cyanide complexes included), from IUPAC standard atomic weights.', args: [{ ...salt, help: 'Formula of the salt, e.g. "NiSO4·6H2O", "KAu(CN)2" (element symbols are case-sensitive).' }, { ...metal, help: 'Element symbol of the metal, e.g. "Ni", "Au".' }], result: 'Mass fraction (0 to 1).', helpAnchor: 'metalfraction', compute: metalFraction });

export const SALTMASS = worksheet({
  id: 'SALTMASS',
  description: 'Mass of a salt, in kg, for a metal concentration in a bath volume (make-up, or an addition to raise the metal by that much): c·V/(1000·w). Takes the salt as pure: divide by its assay. Follow the supplier\'s safety data sheet when dissolving.',
  args: [{ ...num('metal_g_L', domains.nonNegative, 'g/L'), help: 'Metal concentration to add, in g/L.' }, { ...num('volume_L', domains.nonNegative, 'L'), help: 'Bath volume, in L.' }, { ...salt, help: 'Formula of the salt, e.g. "NiSO4·6H2O".' }, { ...metal, help: 'Element symbol of the metal, e.g. "Ni".' }],
  result: 'Salt mass in kg.',
  helpAnchor: 'saltmass',
  compute: saltMass,
});

export const RINSERATIO = worksheet({
  id: 'RINSERATIO',
  description: 'Concentration ratio process tank : last rinse of n counterflow rinse stages at steady state, (r^(n+1) − 1)/(r − 1) with r = rinse flow / drag-out flow (perfectly mixed stages, equal drag-out from each). Check discharge limits against the applicable permit.',
  args: [
    { ...num('flow_ratio', domains.positive, ''), help: 'Rinse-water flow divided by drag-out flow (same units), > 0.' },
    { name: 'stages', kind: 'number', domain: stagesDomain, unit: '', help: 'Number of counterflow stages, a whole number from 1 to 20.' },
  ],
  result: 'C(process tank) / C(last rinse).',
  helpAnchor: 'rinseratio',
  compute: rinseRatio,
});

export const THICKNESSFROMAH = worksheet({
  id: 'THICKNESSFROMAH',
  description: 'Average deposit thickness, in µm, from the ampere-hours passed on an area (the ampere-hour meter): Q·3600·ε·M/(n·F·ρ·A). Ampere-hours, not an Excel time: multiply a time value by 24 to get hours. Recesses run thinner than the average.',
  args: [
    { ...num('ampere_hours', domains.nonNegative, 'A·h'), help: 'Charge passed, in A·h.' },
    { ...num('area_dm2', domains.positive, 'dm²'), help: 'Plated area, in dm².' },
    { name: 'species', kind: 'species', domain: domains.positive, unit: 'g/mol', help: 'Deposited metal ("Ni") or its molar mass in g/mol.' },
    { ...electrons, help: 'Electrons per atom deposited.' },
    { ...num('density_g_cm3', domains.positive, 'g/cm³'), help: 'Density of the deposit, in g/cm³.' },
    { ...optNum('efficiency', 1, domains.efficiency), help: 'Cathode current efficiency, a fraction in (0, 1] (default 1).' },
  ],
  result: 'Thickness in µm.',
  helpAnchor: 'thicknessfromah',
  compute: thicknessFromAh,
});
