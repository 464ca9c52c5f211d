/** Trade units: current density, thickness, penetration rate, concentration, charge, gas amount, energy. */
import { convertUnit } from '../../src/units/convertUnit';
import { domains, worksheet } from '../adapter';
import { num } from '../args';

export const CONVERTUNIT = worksheet({
  id: 'CONVERTUNIT',
  args: [
    num('value', domains.any),
    { name: 'from_unit', kind: 'text' },
    { name: 'to_unit', kind: 'text' },
  ],
  compute: convertUnit,
});
