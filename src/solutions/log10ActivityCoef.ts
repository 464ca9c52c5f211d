import { dataPart } from '../dataset/active';
import { InputError } from '../errors';
import type { ActivityModel } from './activityModel';
import { debyeHuckelParameters } from './debyeHuckelParameters';

/**
 * log10 of an activity coefficient for a charge product |z₁z₂| (z² for a single ion, |z₊z₋| for the
 * mean of a salt) at ionic strength I (mol/kg):
 *   DHLL    −A·zz·√I
 *   EDH     −A·zz·√I/(1 + B·a·√I)        (a, the ion size in Å, is required)
 *   DAVIES  −A·zz·(√I/(1 + √I) − c·I)    (c = 0.3, Davies 1962)
 * with A and B of water at the temperature (debyeHuckelParameters).
 *
 * Each model holds up to an ionic strength (data/debye-huckel.json, validity): DHLL 0.005, EDH 0.1,
 * DAVIES 0.5 mol/kg. Beyond it the function throws InputError naming the range (never a number: the
 * Davies equation gives γ = 53 for z = 2 at I = 5.13 mol/kg).
 *
 * Syntax: log10ActivityCoef(zz, ionicStrength, model, temperatureC, ionSizeA)
 * Example: log10ActivityCoef(1, 0.1, "DAVIES", 25, null) → −0.1074
 * See also: activityCoef, meanActivityCoef
 */
export function log10ActivityCoef(zz: number, ionicStrength: number, model: ActivityModel, temperatureC: number, ionSizeA: number | null): number {
  const data = dataPart('debyehuckel');
  const max = data.validity[model].maxIonicStrength_mol_kg;
  if (ionicStrength > max) {
    const name = model === 'DHLL' ? 'the limiting law (DHLL)' : model === 'EDH' ? 'the extended Debye–Hückel model (EDH)' : 'the Davies model';
    throw new InputError(
      `ionic strength ${ionicStrength} mol/kg is outside ${name}, which holds for I from 0 to ${max} mol/kg; no model here reaches plating-bath strengths`,
    );
  }
  const { A, B } = debyeHuckelParameters(temperatureC);
  const s = Math.sqrt(ionicStrength);
  switch (model) {
    case 'DHLL':
      return -A * zz * s;
    case 'EDH':
      if (ionSizeA === null) throw new InputError('the EDH model needs ion_size_A, the ion size parameter in Å (e.g. 9 for H+, 4 for Cl-)');
      return (-A * zz * s) / (1 + B * ionSizeA * s);
    case 'DAVIES':
      return -A * zz * (s / (1 + s) - data.davies.c * ionicStrength);
  }
}
