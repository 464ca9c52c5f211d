/** Solutions: ionic strength and Debye–Hückel / Davies activity coefficients. */
import { activityCoef } from '../../src/solutions/activityCoef';
import { ionicStrength } from '../../src/solutions/ionicStrength';
import { meanActivityCoef } from '../../src/solutions/meanActivityCoef';
import { saltActivityCoef } from '../../src/solutions/saltActivityCoef';
import { type ArgSpec, type Domain, domains, worksheet } from '../adapter';
import { optNum, temperatureC } from '../args';

const charge = (name: string, domain: Domain = domains.integer): ArgSpec => ({ name, kind: 'number', domain, unit: '' });
const strength: ArgSpec = { name: 'ionic_strength', kind: 'number', domain: domains.nonNegative, unit: 'mol/kg' };
const model: ArgSpec = { name: 'model', kind: 'text', optional: true, default: 'DAVIES' };
const ionSize: ArgSpec = optNum('ion_size_A', null, domains.positive, 'Å');

export const IONICSTRENGTH = worksheet({
  id: 'IONICSTRENGTH',
  description: 'Ionic strength ½·Σ mᵢ·zᵢ², in mol/kg.',
  args: [
    { name: 'molalities', kind: 'numberList', domain: domains.nonNegative, unit: 'mol/kg', help: 'Molality of each ion, in mol/kg (a range).' },
    { name: 'charges', kind: 'numberList', domain: domains.integer, unit: '', help: 'Charge of each ion (a range of the same size; whole numbers).' },
  ],
  result: 'Ionic strength in mol/kg.',
  helpAnchor: 'ionicstrength',
  compute: ionicStrength,
});

export const ACTIVITYCOEF = worksheet({
  id: 'ACTIVITYCOEF',
  description: 'Single-ion activity coefficient by "DHLL" (limiting law, I up to 0.005 mol/kg), "EDH" (extended Debye–Hückel, needs the ion size in Å; I up to 0.1) or "DAVIES" (I up to 0.5); beyond its range a model answers #VALUE!. A and B follow temperature (0 to 100 °C).',
  args: [
    { ...charge('charge'), help: 'Charge number of the ion (a whole number).' },
    { ...strength, help: 'Ionic strength, in mol/kg (within the model\'s range).' },
    { ...model, help: '"DHLL", "EDH" or "DAVIES" (default "DAVIES").' },
    temperatureC,
    { ...ionSize, help: 'Ion size parameter, in Å (required by "EDH", ignored otherwise).' },
  ],
  result: 'Activity coefficient (dimensionless).',
  helpAnchor: 'activitycoef',
  compute: activityCoef,
});

export const MEANACTIVITYCOEF = worksheet({
  id: 'MEANACTIVITYCOEF',
  description: 'Mean ionic activity coefficient of a salt by "DHLL" (I up to 0.005 mol/kg), "EDH" (needs the ion size in Å; I up to 0.1) or "DAVIES" (I up to 0.5); beyond its range a model answers #VALUE!. A and B follow temperature (0 to 100 °C).',
  args: [
    { ...charge('z_cation', domains.nonZeroInteger), help: 'Charge of the cation (a whole number; only its magnitude counts).' },
    { ...charge('z_anion', domains.nonZeroInteger), help: 'Charge of the anion (a whole number; only its magnitude counts).' },
    { ...strength, help: 'Ionic strength, in mol/kg (within the model\'s range).' },
    { ...model, help: '"DHLL", "EDH" or "DAVIES" (default "DAVIES").' },
    temperatureC,
    { ...ionSize, help: 'Mean ion size parameter, in Å (required by "EDH", ignored otherwise).' },
  ],
  result: 'Mean activity coefficient (dimensionless).',
  helpAnchor: 'meanactivitycoef',
  compute: meanActivityCoef,
});

export const SALTACTIVITYCOEF = worksheet({
  id: 'SALTACTIVITYCOEF',
  description: 'Mean ionic activity coefficient γ± of a salt alone in water at 25 °C, by the Pitzer equation with the parameters of May et al., J. Chem. Eng. Data 56 (2011) 5066: reaches concentrated baths and liquors (ZnSO4 to 3.5 mol/kg, I = 14) where "DAVIES" stops at I = 0.5. Salts: CuSO4, ZnSO4, NiSO4, MnSO4, CdSO4, CuCl2, NiCl2, CoCl2, ZnCl2, Na2SO4, HCl, NaCl, KCl, NaOH, KOH, each up to its own molality; beyond it, or at another temperature, the answer is #VALUE! with the range. A pure solution of that salt: with acid or other salts present the coefficient differs.',
  args: [
    { name: 'salt', kind: 'text', unit: '', help: 'Formula of the salt, such as "ZnSO4" or "NiCl2".' },
    { name: 'molality_mol_kg', kind: 'number', domain: domains.nonNegative, unit: 'mol/kg', help: 'Molality of the salt, in mol per kg of water (not mol/L of solution).' },
    { ...temperatureC, help: 'Temperature in °C (default 25; the parameters hold at 25 °C only).' },
  ],
  result: 'Mean activity coefficient γ± on the molality scale (dimensionless).',
  helpAnchor: 'saltactivitycoef',
  compute: saltActivityCoef,
});
