/** Table look-ups: E°, n, the half-reaction and the source of a couple of the table in use. */
import { e0AtTemperature } from '../../src/cells/e0AtTemperature';
import { protectionCriterion } from '../../src/cp/protectionCriterion';
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

/**
 * The source of a couple's row, or of a reference electrode's row when the key names an electrode;
 * with a criterion condition, the clause and source of the protection criterion for that electrode.
 */
function sourceOf(key: string, criterion: string | null): string {
  const t = currentTable();
  if (criterion !== null) {
    const e = t.findElectrode(key);
    if (e === undefined) throw new NotFoundError(`unknown reference electrode "${key}"; a criterion's source needs an electrode key such as "CSE"`);
    const c = protectionCriterion(e.key, criterion);
    return `${c.clause}. Source: ${c.source}`;
  }
  const row = t.findCouple(key) ?? t.findElectrode(key);
  if (row === undefined) throw new NotFoundError(`unknown couple or electrode "${key}"; use a key of the potential table such as "Cu2+/Cu" or "CSE"`);
  return row.source;
}

export const SOURCE = worksheet({ id: 'SOURCE', args: [{ name: 'couple', kind: 'text', unit: '' }, { name: 'criterion', kind: 'text', optional: true, default: null, unit: '' }], compute: sourceOf, usesTable: true });
