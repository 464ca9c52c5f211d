/** Half-cells: the Nernst potential of a couple from its stored stoichiometry. */
import { halfCell } from '../../src/nernst/halfCell';
import { halfCellBySpecies } from '../../src/nernst/halfCellBySpecies';
import { domains, worksheet } from '../adapter';
import { activity, couple, temperatureC } from '../args';

export const HALFCELL = worksheet({
  id: 'HALFCELL',
  args: [
    couple(),
    activity('ox_activity'),
    activity('red_activity'),
    { name: 'pH', kind: 'number', optional: true, default: null, domain: domains.pH, unit: '' },
    temperatureC,
  ],
  compute: halfCell,
  usesTable: true,
});

export const HALFCELLBYSPECIES = worksheet({
  id: 'HALFCELLBYSPECIES',
  args: [
    couple(),
    { name: 'species', kind: 'textList', unit: '' },
    { name: 'activities', kind: 'numberList', domain: domains.positive, unit: '' },
    temperatureC,
  ],
  compute: halfCellBySpecies,
  usesTable: true,
});
