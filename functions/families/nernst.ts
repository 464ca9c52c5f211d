/** Nernst equation, its slope, and concentration cells. */
import { concCell } from '../../src/nernst/concCell';
import { nernst } from '../../src/nernst/nernst';
import { nernstSlope } from '../../src/nernst/nernstSlope';
import { domains, worksheet } from '../adapter';
import { electrons, num, potential, temperatureC } from '../args';

export const NERNST = worksheet({
  id: 'NERNST',
  args: [potential('E0_V'), electrons, num('Q', domains.positive), temperatureC],
  compute: nernst,
});

export const NERNSTSLOPE = worksheet({ id: 'NERNSTSLOPE', args: [electrons, temperatureC], compute: nernstSlope });

export const CONCCELL = worksheet({
  id: 'CONCCELL',
  args: [num('activity_dilute', domains.positive), num('activity_concentrated', domains.positive), electrons, temperatureC],
  compute: concCell,
});
