/** Table look-ups: E°, n, the half-reaction and the source of a couple of the table in use. */
import { e0AtTemperature } from '../../src/cells/e0AtTemperature';
import type { CoupleRow } from '../../src/table/types';
import { worksheet } from '../adapter';
import { couple, temperatureC } from '../args';


export const STDPOTENTIAL = worksheet({
  id: 'STDPOTENTIAL',
  description: 'Standard potential of a couple, in V vs SHE; at another temperature E°(25 °C) + (dE°/dT)·(T − 25). #N/A when the couple has no stored dE°/dT and T ≠ 25 °C; #NUM! outside 0…100 °C.',
  args: [
    { ...couple(), help: 'Key of the potential table, written Ox/Red (e.g. "Cu2+/Cu", "O2/H2O").' },
    { ...temperatureC, help: 'Temperature in °C, 0 to 100 (default 25).' },
  ],
  result: 'E° in V vs SHE.',
  helpAnchor: 'stdpotential',
  compute: (row: CoupleRow, t: number) => e0AtTemperature(row, t),
  usesTable: true,
});

export const ELECTRONS = worksheet({
  id: 'ELECTRONS',
  description: 'Electrons n taken up by a couple\'s half-reaction as written (dimensionless).',
  args: [
    { ...couple(), help: 'Key of the potential table, written Ox/Red (e.g. "MnO4-/Mn2+").' },
  ],
  result: 'n, a whole number.',
  helpAnchor: 'electrons',
  compute: (row: CoupleRow) => row.n,
  usesTable: true,
});

export const HALFREACTION = worksheet({
  id: 'HALFREACTION',
  description: 'The half-reaction of a couple as text, written as a reduction (e.g. "MnO4- + 8H+ + 5e- -> Mn2+ + 4H2O").',
  args: [
    { ...couple(), help: 'Key of the potential table, written Ox/Red.' },
  ],
  result: 'The half-reaction (text).',
  helpAnchor: 'halfreaction',
  compute: (row: CoupleRow) => row.halfReaction,
  usesTable: true,
});

export const SOURCE = worksheet({
  id: 'SOURCE',
  description: 'The published source of a couple\'s E° (and dE°/dT), as text.',
  args: [
    { ...couple(), help: 'Key of the potential table, written Ox/Red.' },
  ],
  result: 'The source (text).',
  helpAnchor: 'source',
  compute: (row: CoupleRow) => row.source,
  usesTable: true,
});
