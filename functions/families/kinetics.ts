/** Electrode kinetics and corrosion: Butler–Volmer and its inverse, Tafel slope, ASTM G102 rate, Stern–Geary. */
import { butlerVolmer } from '../../src/kinetics/butlerVolmer';
import { corrosionRate } from '../../src/kinetics/corrosionRate';
import { overpotential } from '../../src/kinetics/overpotential';
import { sternGeary } from '../../src/kinetics/sternGeary';
import { tafelSlope } from '../../src/kinetics/tafelSlope';
import { type ArgSpec, type Domain, domains, worksheet } from '../adapter';
import { temperatureC } from '../args';

const req = (name: string, domain: Domain, unit: string): ArgSpec => ({ name, kind: 'number', domain, unit });

/** Apparent transfer coefficients (n included): > 0, may exceed 1. */
const alphaA: ArgSpec = req('alpha_a', domains.positive, '');
const alphaC: ArgSpec = { name: 'alpha_c', kind: 'number', optional: true, default: null, domain: domains.positive, unit: '' };
const i0: ArgSpec = req('i0', domains.positive, 'any current-density unit');

export const BUTLERVOLMER = worksheet({
  id: 'BUTLERVOLMER',
  args: [i0, req('overpotential_V', domains.any, 'V'), alphaA, alphaC, temperatureC],
  compute: butlerVolmer,
});

export const OVERPOTENTIAL = worksheet({
  id: 'OVERPOTENTIAL',
  args: [req('i', domains.any, "i0's unit"), i0, alphaA, alphaC, temperatureC],
  compute: overpotential,
});

export const TAFELSLOPE = worksheet({ id: 'TAFELSLOPE', args: [req('alpha', domains.positive, ''), temperatureC], compute: tafelSlope });

export const CORROSIONRATE = worksheet({
  id: 'CORROSIONRATE',
  args: [req('icorr_uA_cm2', domains.nonNegative, 'µA/cm²'), req('equivalent_weight_g', domains.positive, 'g'), req('density_g_cm3', domains.positive, 'g/cm³')],
  compute: corrosionRate,
});

export const STERNGEARY = worksheet({
  id: 'STERNGEARY',
  args: [req('beta_a_V', domains.positive, 'V/decade'), req('beta_c_V', domains.positive, 'V/decade'), req('polarization_resistance_ohm_cm2', domains.positive, 'Ω·cm²')],
  compute: sternGeary,
});
