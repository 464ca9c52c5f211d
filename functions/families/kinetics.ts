/** Electrode kinetics and corrosion: Butler–Volmer and its inverse, Tafel slope, ASTM G102 rate, Stern–Geary. */
import { butlerVolmer } from '../../src/kinetics/butlerVolmer';
import { corrosionRate } from '../../src/kinetics/corrosionRate';
import { overpotential } from '../../src/kinetics/overpotential';
import { sternGeary } from '../../src/kinetics/sternGeary';
import { tafelSlope } from '../../src/kinetics/tafelSlope';
import { PLAUSIBLE, plausible } from '../../src/corrosion/plausible';
import { type ArgSpec, domains, worksheet } from '../adapter';
import { num, optNum, temperatureC } from '../args';


/** Apparent transfer coefficients (n included): > 0, may exceed 1. */
const alphaA: ArgSpec = num('alpha_a', domains.positive, '');
const alphaC: ArgSpec = optNum('alpha_c', null, domains.positive);
const i0: ArgSpec = num('i0', domains.positive, 'any current-density unit');

export const BUTLERVOLMER = worksheet({
  id: 'BUTLERVOLMER',
  args: [i0, num('overpotential_V', domains.any, 'V'), alphaA, alphaC, temperatureC],
  compute: (i: number, eta: number, aa: number, ac: number | null, t: number) => butlerVolmer(i, plausible('overpotential_V', eta, PLAUSIBLE.volts), aa, ac, t),
});

export const OVERPOTENTIAL = worksheet({
  id: 'OVERPOTENTIAL',
  description: 'Overpotential that gives a current density by Butler–Volmer (its inverse, solved to 1e-9 V), in V.',
  args: [
    { ...num('i', domains.any, "i0's unit"), help: 'Current density, in i0\'s units (anodic positive, cathodic negative).' },
    { ...i0, help: 'Exchange current density (> 0).' },
    { ...alphaA, help: 'Apparent anodic transfer coefficient (> 0, n included).' },
    { ...alphaC, help: 'Apparent cathodic transfer coefficient (> 0; default 1 − alpha_a).' },
    temperatureC,
  ],
  result: 'Overpotential in V.',
  helpAnchor: 'overpotential',
  compute: overpotential,
});

export const TAFELSLOPE = worksheet({
  id: 'TAFELSLOPE',
  args: [num('alpha', domains.positive, ''), temperatureC],
  compute: (a: number, t: number) => tafelSlope(plausible('alpha', a, PLAUSIBLE.alpha), t),
});

export const CORROSIONRATE = worksheet({
  id: 'CORROSIONRATE',
  args: [num('icorr_uA_cm2', domains.nonNegative, 'µA/cm²'), num('equivalent_weight_g', domains.positive, 'g'), num('density_g_cm3', domains.positive, 'g/cm³')],
  compute: (i: number, ew: number, rho: number) =>
    corrosionRate(i, plausible('equivalent_weight_g', ew, PLAUSIBLE.equivalentWeightG), plausible('density_g_cm3', rho, PLAUSIBLE.densityGcm3)),
});

export const STERNGEARY = worksheet({
  id: 'STERNGEARY',
  args: [num('beta_a_V', domains.positive, 'V/decade'), num('beta_c_V', domains.nonZero, 'V/decade'), num('polarization_resistance_ohm_cm2', domains.positive, 'Ω·cm²')],
  // a cathodic slope reported as negative is taken by its magnitude
  compute: (ba: number, bc: number, rp: number) =>
    sternGeary(plausible('beta_a_V', ba, PLAUSIBLE.tafelV), Math.abs(plausible('beta_c_V', bc, PLAUSIBLE.tafelV)), plausible('polarization_resistance_ohm_cm2', rp, PLAUSIBLE.rpOhmCm2)),
});
