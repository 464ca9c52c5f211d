/** Thermodynamics: ΔG, K and E, and adding half-reactions through free energies. */
import { combine } from '../../src/thermo/combine';
import { deltaG } from '../../src/thermo/deltaG';
import { eFromDeltaG } from '../../src/thermo/eFromDeltaG';
import { eFromK } from '../../src/thermo/eFromK';
import { eFromLogK } from '../../src/thermo/eFromLogK';
import { eFromThermo } from '../../src/thermo/eFromThermo';
import { keq } from '../../src/thermo/keq';
import { logK } from '../../src/thermo/logK';
import { thermoneutral } from '../../src/thermo/thermoneutral';
import { domains, worksheet } from '../adapter';
import { electrons, num, potential, temperatureC } from '../args';

export const DELTAG = worksheet({ id: 'DELTAG', args: [potential(), electrons], compute: deltaG });

export const EFROMDELTAG = worksheet({ id: 'EFROMDELTAG', args: [num('deltaG_kJ', domains.any, 'kJ/mol'), electrons], compute: eFromDeltaG });

export const LOGK = worksheet({ id: 'LOGK', args: [potential(), electrons, temperatureC], compute: logK });

export const KEQ = worksheet({ id: 'KEQ', args: [potential(), electrons, temperatureC], compute: keq });

export const EFROMK = worksheet({ id: 'EFROMK', args: [num('K', domains.positive), electrons, temperatureC], compute: eFromK });

export const EFROMLOGK = worksheet({ id: 'EFROMLOGK', args: [num('logK'), electrons, temperatureC], compute: eFromLogK });

export const COMBINE = worksheet({
  id: 'COMBINE',
  args: [
    { name: 'potentials', kind: 'numberList', domain: domains.any, unit: 'V' },
    { name: 'electrons', kind: 'numberList', domain: domains.nonZeroInteger, unit: '' },
  ],
  compute: combine,
});

export const EFROMTHERMO = worksheet({
  id: 'EFROMTHERMO',
  args: [num('deltaH_kJ', domains.any, 'kJ/mol'), num('deltaS_J_K', domains.any, 'J/(mol·K)'), electrons, temperatureC],
  compute: eFromThermo,
});

export const THERMONEUTRAL = worksheet({ id: 'THERMONEUTRAL', args: [num('deltaH_kJ', domains.any, 'kJ/mol'), electrons], compute: thermoneutral });
