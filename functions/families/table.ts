/** Table look-ups: E°, n, the half-reaction and the source of a couple of the table in use. */
import { e0AtTemperature } from '../../src/cells/e0AtTemperature';
import type { CoupleRow } from '../../src/table/types';
import { worksheet } from '../adapter';
import { couple, temperatureC } from '../args';


export const STDPOTENTIAL = worksheet({
  id: 'STDPOTENTIAL',
  args: [couple(), temperatureC],
  compute: (row: CoupleRow, t: number) => e0AtTemperature(row, t),
  usesTable: true,
});

export const ELECTRONS = worksheet({ id: 'ELECTRONS', args: [couple()], compute: (row: CoupleRow) => row.n, usesTable: true });

export const HALFREACTION = worksheet({ id: 'HALFREACTION', args: [couple()], compute: (row: CoupleRow) => row.halfReaction, usesTable: true });

export const SOURCE = worksheet({ id: 'SOURCE', args: [couple()], compute: (row: CoupleRow) => row.source, usesTable: true });
