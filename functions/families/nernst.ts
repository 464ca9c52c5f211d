/** Nernst equation, its slope, and concentration cells. */
import { concCell } from '../../src/nernst/concCell';
import { nernst } from '../../src/nernst/nernst';
import { nernstSlope } from '../../src/nernst/nernstSlope';
import { domains, worksheet } from '../adapter';
import { electrons, num, potential, temperatureC } from '../args';

export const NERNST = worksheet({
  id: 'NERNST',
  description: 'Nernst equation: E = E0 − (RT/nF)·ln Q, in V.',
  args: [
    { ...potential('E0_V'), help: 'Standard potential, in V.' },
    electrons,
    { ...num('Q', domains.positive), help: 'Reaction quotient (> 0).' },
    temperatureC,
  ],
  result: 'E in V.',
  helpAnchor: 'nernst',
  compute: nernst,
});

export const NERNSTSLOPE = worksheet({
  id: 'NERNSTSLOPE',
  description: 'Nernst slope RT·ln10/(nF), in V per decade (0.05916 V at 25 °C for n = 1).',
  args: [
    electrons,
    temperatureC,
  ],
  result: 'V per decade.',
  helpAnchor: 'nernstslope',
  compute: nernstSlope,
});

export const CONCCELL = worksheet({
  id: 'CONCCELL',
  description: 'EMF of a concentration cell: (RT/nF)·ln(a_concentrated/a_dilute), in V.',
  args: [
    { ...num('activity_dilute', domains.positive), help: 'Activity on the dilute side (> 0).' },
    { ...num('activity_concentrated', domains.positive), help: 'Activity on the concentrated side (> 0).' },
    electrons,
    temperatureC,
  ],
  result: 'EMF in V.',
  helpAnchor: 'conccell',
  compute: concCell,
});
