/** Table look-ups: E°, n, the half-reaction and the source of a couple of the table in use. */
import { e0AtTemperature } from '../../src/cells/e0AtTemperature';
import { NotFoundError } from '../../src/errors';
import type { CoupleRow } from '../../src/table/types';
import { worksheet } from '../adapter';
import { couple, temperatureC } from '../args';
import { currentTable } from '../context';


export const STDPOTENTIAL = worksheet({
  id: 'STDPOTENTIAL',
  args: [couple(), temperatureC],
  compute: (row: CoupleRow, t: number) => e0AtTemperature(row, t),
  usesTable: true,
});

export const ELECTRONS = worksheet({ id: 'ELECTRONS', args: [couple()], compute: (row: CoupleRow) => row.n, usesTable: true });

export const HALFREACTION = worksheet({ id: 'HALFREACTION', args: [couple()], compute: (row: CoupleRow) => row.halfReaction, usesTable: true });

/** The source of a couple's row, or of a reference electrode's row when the key names an electrode. */
function sourceOf(key: string): string {
  const t = currentTable();
  const row = t.findCouple(key) ?? t.findElectrode(key);
  if (row === undefined) throw new NotFoundError(`unknown couple or electrode "${key}"; use a key of the potential table such as "Cu2+/Cu" or "CSE"`);
  return row.source;
}

export const SOURCE = worksheet({ id: 'SOURCE', args: [{ name: 'couple', kind: 'text', unit: '' }], compute: sourceOf, usesTable: true });
