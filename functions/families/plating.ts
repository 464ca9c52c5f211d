/** Plating-shop arithmetic: bath make-up, rinsing, thickness from the ampere-hour meter. */
import { metalFraction } from '../../src/plating/metalFraction';
import { rinseRatio } from '../../src/plating/rinseRatio';
import { saltMass } from '../../src/plating/saltMass';
import { thicknessFromAh } from '../../src/plating/thicknessFromAh';
import { type ArgSpec, domains, worksheet } from '../adapter';
import { electrons, num, optNum } from '../args';

/** A salt's formula, e.g. "NiSO4·6H2O" or "KAu(CN)2". */
const salt: ArgSpec = { name: 'salt', kind: 'text' };
/** A metal's element symbol as written in the salt's formula, e.g. "Ni". */
const metal: ArgSpec = { name: 'metal', kind: 'text' };

export const METALFRACTION = worksheet({ id: 'METALFRACTION', args: [salt, metal], compute: metalFraction });

export const SALTMASS = worksheet({
  id: 'SALTMASS',
  args: [num('metal_g_L', domains.nonNegative, 'g/L'), num('volume_L', domains.nonNegative, 'L'), salt, metal],
  compute: saltMass,
});

export const RINSERATIO = worksheet({
  id: 'RINSERATIO',
  args: [
    num('flow_ratio', domains.positive, ''),
    { name: 'stages', kind: 'number', domain: { test: (x: number) => Number.isInteger(x) && x >= 1 && x <= 20, accepts: 'a whole number from 1 to 20' }, unit: '' },
  ],
  compute: rinseRatio,
});

export const THICKNESSFROMAH = worksheet({
  id: 'THICKNESSFROMAH',
  args: [
    num('ampere_hours', domains.nonNegative, 'A·h'),
    num('area_dm2', domains.positive, 'dm²'),
    { name: 'species', kind: 'species', domain: domains.positive, unit: 'g/mol' },
    electrons,
    num('density_g_cm3', domains.positive, 'g/cm³'),
    optNum('efficiency', 1, domains.efficiency),
  ],
  compute: thicknessFromAh,
});
