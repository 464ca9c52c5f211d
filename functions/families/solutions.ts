/** Solutions: ionic strength and Debye–Hückel / Davies activity coefficients. */
import { activityCoef } from '../../src/solutions/activityCoef';
import { ionicStrength } from '../../src/solutions/ionicStrength';
import { meanActivityCoef } from '../../src/solutions/meanActivityCoef';
import { type ArgSpec, type Domain, domains, worksheet } from '../adapter';
import { optNum, temperatureC } from '../args';

const charge = (name: string, domain: Domain = domains.integer): ArgSpec => ({ name, kind: 'number', domain, unit: '' });
const strength: ArgSpec = { name: 'ionic_strength', kind: 'number', domain: domains.nonNegative, unit: 'mol/kg' };
const model: ArgSpec = { name: 'model', kind: 'text', optional: true, default: 'DAVIES' };
const ionSize: ArgSpec = optNum('ion_size_A', null, domains.positive, 'Å');

export const IONICSTRENGTH = worksheet({
  id: 'IONICSTRENGTH',
  args: [
    { name: 'molalities', kind: 'numberList', domain: domains.nonNegative, unit: 'mol/kg' },
    { name: 'charges', kind: 'numberList', domain: domains.integer, unit: '' },
  ],
  compute: ionicStrength,
});

export const ACTIVITYCOEF = worksheet({
  id: 'ACTIVITYCOEF',
  args: [charge('charge'), strength, model, temperatureC, ionSize],
  compute: activityCoef,
});

export const MEANACTIVITYCOEF = worksheet({
  id: 'MEANACTIVITYCOEF',
  args: [charge('z_cation', domains.nonZeroInteger), charge('z_anion', domains.nonZeroInteger), strength, model, temperatureC, ionSize],
  compute: meanActivityCoef,
});
