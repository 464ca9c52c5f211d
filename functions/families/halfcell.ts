/** Half-cells: the Nernst potential of a couple from its stored stoichiometry. */
import { halfCell } from '../../src/nernst/halfCell';
import { halfCellBySpecies } from '../../src/nernst/halfCellBySpecies';
import { domains, worksheet } from '../adapter';
import { activity, couple, temperatureC } from '../args';

export const HALFCELL = worksheet({
  id: 'HALFCELL',
  description: 'Reduction potential of a half-cell in V vs SHE: E°(T) − (RT/nF)·ln Q over the stored half-reaction. ox_activity applies to each dissolved or gaseous species on the oxidized side (except H+, OH-, H2O), red_activity on the reduced side, each raised to its coefficient; H+ and OH- follow from pH.',
  args: [
    { ...couple(), help: 'Key of the potential table, written Ox/Red (e.g. "MnO4-/Mn2+").' },
    { ...activity('ox_activity'), help: 'Activity of the oxidized-side species (dimensionless, > 0; a gas: partial pressure in bar) (default 1).' },
    { ...activity('red_activity'), help: 'Activity of the reduced-side species (dimensionless, > 0; a gas: partial pressure in bar) (default 1).' },
    { name: 'pH', kind: 'number', optional: true, default: null, domain: domains.pH, unit: '', help: 'pH; sets a(H+) = 10^−pH and a(OH-) = Kw(T)/a(H+) (default: H+ and OH- activities 1).' },
    { ...temperatureC, help: 'Temperature in °C, 0 to 100 (default 25).' },
  ],
  result: 'E in V vs SHE.',
  helpAnchor: 'halfcell',
  compute: halfCell,
  usesTable: true,
});

export const HALFCELLBYSPECIES = worksheet({
  id: 'HALFCELLBYSPECIES',
  description: 'Reduction potential of a half-cell in V vs SHE with an activity for each named species; species not named take activity 1.',
  args: [
    { ...couple(), help: 'Key of the potential table, written Ox/Red (e.g. "MnO4-/Mn2+").' },
    { name: 'species', kind: 'textList', unit: '', help: 'Species as written in the half-reaction (a range, e.g. "MnO4-", "Mn2+", "H+").' },
    { name: 'activities', kind: 'numberList', domain: domains.positive, unit: '', help: 'Activity of each species (a range of the same size; dimensionless, > 0; a gas: partial pressure in bar).' },
    { ...temperatureC, help: 'Temperature in °C, 0 to 100 (default 25).' },
  ],
  result: 'E in V vs SHE.',
  helpAnchor: 'halfcellbyspecies',
  compute: halfCellBySpecies,
  usesTable: true,
});
