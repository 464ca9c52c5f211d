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

export const DELTAG = worksheet({
  id: 'DELTAG',
  description: 'Gibbs energy from a potential: ΔG = −nFE, in kJ/mol.',
  args: [
    { ...potential(), help: 'Potential of the reaction as written, in V.' },
    electrons,
  ],
  result: 'ΔG in kJ/mol (negative when the reaction runs by itself).',
  helpAnchor: 'deltag',
  compute: deltaG,
});

export const EFROMDELTAG = worksheet({
  id: 'EFROMDELTAG',
  description: 'Potential from a Gibbs energy: E = −ΔG/(nF), in V.',
  args: [
    { ...num('deltaG_kJ', domains.any, 'kJ/mol'), help: 'ΔG in kJ/mol.' },
    electrons,
  ],
  result: 'E in V.',
  helpAnchor: 'efromdeltag',
  compute: eFromDeltaG,
});

export const LOGK = worksheet({
  id: 'LOGK',
  description: 'Decimal logarithm of the equilibrium constant: log10 K = nFE/(RT ln 10).',
  args: [
    { ...potential(), help: 'Potential of the reaction as written, in V.' },
    electrons,
    temperatureC,
  ],
  result: 'log10 K (dimensionless).',
  helpAnchor: 'logk',
  compute: logK,
});

export const KEQ = worksheet({
  id: 'KEQ',
  description: 'Equilibrium constant K = exp(nFE/RT); #NUM! when K is outside double range (use LOGK).',
  args: [
    { ...potential(), help: 'Potential of the reaction as written, in V.' },
    electrons,
    temperatureC,
  ],
  result: 'K (dimensionless).',
  helpAnchor: 'keq',
  compute: keq,
});

export const EFROMK = worksheet({
  id: 'EFROMK',
  description: 'Potential from an equilibrium constant: E = RT ln K/(nF), in V.',
  args: [
    { ...num('K', domains.positive), help: 'Equilibrium constant (> 0).' },
    electrons,
    temperatureC,
  ],
  result: 'E in V.',
  helpAnchor: 'efromk',
  compute: eFromK,
});

export const EFROMLOGK = worksheet({
  id: 'EFROMLOGK',
  description: 'Potential from log10 K: E = RT ln10 · log10 K/(nF), in V.',
  args: [
    { ...num('logK'), help: 'Decimal logarithm of the equilibrium constant.' },
    electrons,
    temperatureC,
  ],
  result: 'E in V.',
  helpAnchor: 'efromlogk',
  compute: eFromLogK,
});

export const COMBINE = worksheet({
  id: 'COMBINE',
  description: 'E° of a half-reaction made by adding half-reactions: Σ nᵢEᵢ / Σ nᵢ, in V (free energies add, potentials do not).',
  args: [
    { name: 'potentials', kind: 'numberList', domain: domains.any, unit: 'V', help: 'E° of each step, in V (a range).' },
    { name: 'electrons', kind: 'numberList', domain: domains.nonZeroInteger, unit: '', help: 'Electrons of each step (a range of the same size; whole numbers).' },
  ],
  result: 'E° of the sum, in V.',
  helpAnchor: 'combine',
  compute: combine,
});

export const EFROMTHERMO = worksheet({
  id: 'EFROMTHERMO',
  description: 'Potential from ΔH and ΔS taken as constant: E = −(ΔH − TΔS)/(nF), in V. Sign convention: positive when the reaction runs by itself; for water electrolysis (ΔH = +285.83 kJ/mol) it is negative, and the reversible voltage the cell needs is −E.',
  args: [
    { ...num('deltaH_kJ', domains.any, 'kJ/mol'), help: 'ΔH in kJ/mol.' },
    { ...num('deltaS_J_K', domains.any, 'J/(mol·K)'), help: 'ΔS in J/(mol·K).' },
    electrons,
    temperatureC,
  ],
  result: 'E in V.',
  helpAnchor: 'efromthermo',
  compute: eFromThermo,
});

export const THERMONEUTRAL = worksheet({
  id: 'THERMONEUTRAL',
  description: 'Thermoneutral potential −ΔH/(nF), in V. Sign convention: ΔH of the reaction as written, so an electrolysis (ΔH > 0) gives a negative value and the thermoneutral voltage the cell needs is its magnitude (water at 25 °C: 1.481 V on the HHV basis, see VOLTAGEEFFICIENCY); entering ΔH with the other sign flips the result.',
  args: [
    { ...num('deltaH_kJ', domains.any, 'kJ/mol'), help: 'ΔH of the reaction as written, in kJ/mol.' },
    electrons,
  ],
  result: '−ΔH/(nF) in V.',
  helpAnchor: 'thermoneutral',
  compute: thermoneutral,
});
