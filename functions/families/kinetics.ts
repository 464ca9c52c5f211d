/** Electrode kinetics and corrosion: Butler–Volmer and its inverse, Tafel slope, concentration overpotential, ASTM G102 rate, Stern–Geary. */
import { butlerVolmer } from '../../src/kinetics/butlerVolmer';
import { concentrationOverpotential } from '../../src/kinetics/concentrationOverpotential';
import { corrosionRate } from '../../src/kinetics/corrosionRate';
import { overpotential } from '../../src/kinetics/overpotential';
import { sternGeary } from '../../src/kinetics/sternGeary';
import { tafelConcentrationOverpotential } from '../../src/kinetics/tafelConcentrationOverpotential';
import { tafelSlope } from '../../src/kinetics/tafelSlope';
import { PLAUSIBLE, plausible } from '../../src/corrosion/plausible';
import { type ArgSpec, domains, worksheet } from '../adapter';
import { electrons, num, optNum, temperatureC } from '../args';


/** Apparent transfer coefficients (n included): > 0, may exceed 1. */
const alphaA: ArgSpec = num('alpha_a', domains.positive, '');
const alphaC: ArgSpec = optNum('alpha_c', null, domains.positive);
const i0: ArgSpec = num('i0', domains.positive, 'any current-density unit');

export const BUTLERVOLMER = worksheet({
  id: 'BUTLERVOLMER',
  description: 'Butler–Volmer current density i0·[exp(αa·Fη/RT) − exp(−αc·Fη/RT)], in i0\'s units (anodic positive).',
  args: [{ ...i0, help: 'Exchange current density (> 0), in any current-density unit.' }, { ...num('overpotential_V', domains.any, 'V'), help: 'Overpotential, in V (−5 to 5; a value like 250 is refused as millivolts).' }, { ...alphaA, help: 'Apparent anodic transfer coefficient (> 0, n included).' }, { ...alphaC, help: 'Apparent cathodic transfer coefficient (> 0; default 1 − alpha_a, which holds for single-electron steps only: give alpha_c for multi-electron reactions).' }, temperatureC],
  result: 'Current density in i0\'s units.',
  helpAnchor: 'butlervolmer',
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
  description: 'Tafel slope RT·ln10/(αF), in V per decade (0.118 V for α = 0.5 at 25 °C).',
  args: [{ ...num('alpha', domains.positive, ''), help: 'Apparent transfer coefficient (> 0, n included; 0.01 to 4, a value like 50 is refused as a percentage).' }, temperatureC],
  result: 'V per decade.',
  helpAnchor: 'tafelslope',
  compute: (a: number, t: number) => tafelSlope(plausible('alpha', a, PLAUSIBLE.alpha), t),
});

/** Current densities of the concentration terms, magnitudes in any one unit. */
const magnitude = (name: string, domain = domains.positive): ArgSpec => num(name, domain, 'any current-density unit');

export const CONCOVERPOTENTIAL = worksheet({
  id: 'CONCOVERPOTENTIAL',
  description:
    'Concentration (mass-transfer) overpotential of a cathodic reaction fed by diffusion, (RT/nF)·ln(1 − i/iL), in V (Bard & Faulkner, Electrochemical Methods, §1.4). Current densities as magnitudes; the result is negative (electrode-kinetics convention: a cathodic overpotential is negative; the voltage the cell needs is its magnitude). At or above the limiting current density, #VALUE!.',
  args: [
    { ...magnitude('current_density', domains.nonNegative), help: 'Magnitude of the cathodic current density (≥ 0), in the unit of the limiting current density.' },
    { ...magnitude('limiting_current_density'), help: 'Magnitude of the limiting current density (> 0), same unit.' },
    { ...electrons, help: 'Electrons transferred per ion reduced (2 for Cu2+, Zn2+, Ni2+).' },
    temperatureC,
  ],
  result: 'Overpotential in V (≤ 0).',
  helpAnchor: 'concoverpotential',
  compute: concentrationOverpotential,
});

export const TAFELCONCOVERPOTENTIAL = worksheet({
  id: 'TAFELCONCOVERPOTENTIAL',
  description:
    'Overpotential of a cathodic reaction as a Tafel (activation) term plus a concentration term, −b·log10(i/i0) + (RT/nF)·ln(1 − i/iL), in V. Current densities as magnitudes in one unit; the result is negative (a cathodic overpotential; the cell needs its magnitude). The Tafel line needs i ≥ 10·i0 (nearer equilibrium use OVERPOTENTIAL); at or above iL, #VALUE!. The two losses are added as independent, the usual engineering form.',
  args: [
    { ...magnitude('current_density'), help: 'Magnitude of the cathodic current density (> 0).' },
    { ...magnitude('i0'), help: 'Exchange current density (> 0), same unit.' },
    { ...num('tafel_slope_V', domains.nonZero, 'V/decade'), help: 'Tafel slope in V per decade (0.005 to 1; a negative value is taken by its magnitude; a value like 120 is refused as mV/decade).' },
    { ...magnitude('limiting_current_density'), help: 'Limiting current density (> 0), same unit.' },
    { ...electrons, help: 'Electrons transferred per ion reduced (2 for Cu2+, Zn2+, Ni2+).' },
    temperatureC,
  ],
  result: 'Overpotential in V (< 0).',
  helpAnchor: 'tafelconcoverpotential',
  compute: (i: number, i0v: number, b: number, iL: number, n: number, t: number) =>
    tafelConcentrationOverpotential(i, i0v, plausible('tafel_slope_V', b, PLAUSIBLE.tafelV), iL, n, t),
});

export const CORROSIONRATE = worksheet({
  id: 'CORROSIONRATE',
  description: 'Uniform corrosion penetration rate K1·icorr·EW/ρ (Faraday\'s law, K1 of ASTM G102), in mm/year.',
  args: [{ ...num('icorr_uA_cm2', domains.nonNegative, 'µA/cm²'), help: 'Corrosion current density, in µA/cm².' }, { ...num('equivalent_weight_g', domains.positive, 'g'), help: 'Equivalent weight, in g (molar mass over electrons per atom; 27.92 for iron; 2 to 250 g; EQUIVWEIGHT for alloys).' }, { ...num('density_g_cm3', domains.positive, 'g/cm³'), help: 'Density of the metal, in g/cm³ (0.5 to 23; a value like 7870 is refused as kg/m³).' }],
  result: 'Penetration rate in mm/year.',
  helpAnchor: 'corrosionrate',
  compute: (i: number, ew: number, rho: number) =>
    corrosionRate(i, plausible('equivalent_weight_g', ew, PLAUSIBLE.equivalentWeightG), plausible('density_g_cm3', rho, PLAUSIBLE.densityGcm3)),
});

export const STERNGEARY = worksheet({
  id: 'STERNGEARY',
  description: 'Corrosion current density from linear polarization (Stern–Geary), B/Rp with B = βa·βc/(2.303·(βa + βc)), in µA/cm².',
  args: [{ ...num('beta_a_V', domains.positive, 'V/decade'), help: 'Anodic Tafel slope, in V per decade (0.005 to 1; a value like 120 is refused as mV/decade).' }, { ...num('beta_c_V', domains.nonZero, 'V/decade'), help: 'Cathodic Tafel slope in V per decade; a negative value, as instruments report it, is taken by its magnitude.' }, { ...num('polarization_resistance_ohm_cm2', domains.positive, 'Ω·cm²'), help: 'Polarization resistance, in Ω·cm² (1 to 1e9; given first by mistake it is refused as a Tafel slope).' }],
  // a cathodic slope reported as negative is taken by its magnitude
  result: 'Corrosion current density in µA/cm².',
  helpAnchor: 'sterngeary',
  compute: (ba: number, bc: number, rp: number) =>
    sternGeary(plausible('beta_a_V', ba, PLAUSIBLE.tafelV), Math.abs(plausible('beta_c_V', bc, PLAUSIBLE.tafelV)), plausible('polarization_resistance_ohm_cm2', rp, PLAUSIBLE.rpOhmCm2)),
});
