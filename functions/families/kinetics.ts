/** Electrode kinetics and corrosion: Butler–Volmer and its inverse, Tafel slope, ASTM G102 rate, Stern–Geary. */
import { butlerVolmer } from '../../src/kinetics/butlerVolmer';
import { corrosionRate } from '../../src/kinetics/corrosionRate';
import { overpotential } from '../../src/kinetics/overpotential';
import { sternGeary } from '../../src/kinetics/sternGeary';
import { tafelSlope } from '../../src/kinetics/tafelSlope';
import { type ArgSpec, domains, worksheet } from '../adapter';
import { num, optNum, temperatureC } from '../args';


/** Apparent transfer coefficients (n included): > 0, may exceed 1. */
const alphaA: ArgSpec = num('alpha_a', domains.positive, '');
const alphaC: ArgSpec = optNum('alpha_c', null, domains.positive);
const i0: ArgSpec = num('i0', domains.positive, 'any current-density unit');

export const BUTLERVOLMER = worksheet({
  id: 'BUTLERVOLMER',
  args: [i0, num('overpotential_V', domains.any, 'V'), alphaA, alphaC, temperatureC],
  compute: butlerVolmer,
});

export const OVERPOTENTIAL = worksheet({
  id: 'OVERPOTENTIAL',
  args: [num('i', domains.any, "i0's unit"), i0, alphaA, alphaC, temperatureC],
  compute: overpotential,
});

export const TAFELSLOPE = worksheet({ id: 'TAFELSLOPE', args: [num('alpha', domains.positive, ''), temperatureC], compute: tafelSlope });

export const CORROSIONRATE = worksheet({
  id: 'CORROSIONRATE',
  args: [num('icorr_uA_cm2', domains.nonNegative, 'µA/cm²'), num('equivalent_weight_g', domains.positive, 'g'), num('density_g_cm3', domains.positive, 'g/cm³')],
  compute: corrosionRate,
});

export const STERNGEARY = worksheet({
  id: 'STERNGEARY',
  args: [num('beta_a_V', domains.positive, 'V/decade'), num('beta_c_V', domains.positive, 'V/decade'), num('polarization_resistance_ohm_cm2', domains.positive, 'Ω·cm²')],
  compute: sternGeary,
});
