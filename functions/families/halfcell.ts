/** Half-cells: the Nernst potential of a couple from its stored stoichiometry. */
import { halfCell } from '../../src/nernst/halfCell';
import { halfCellBySpecies } from '../../src/nernst/halfCellBySpecies';
import { type ArgSpec, domains, worksheet } from '../adapter';
import { temperatureC } from '../args';

const couple: ArgSpec = { name: 'couple', kind: 'couple', unit: '' };
const activity = (name: string): ArgSpec => ({ name, kind: 'number', optional: true, default: 1, domain: domains.positive, unit: '' });

export const HALFCELL = worksheet({
  id: 'HALFCELL',
  args: [
    couple,
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
    couple,
    { name: 'species', kind: 'textList', unit: '' },
    { name: 'activities', kind: 'numberList', domain: domains.positive, unit: '' },
    temperatureC,
  ],
  compute: halfCellBySpecies,
  usesTable: true,
});
