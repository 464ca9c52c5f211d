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
  description: 'Standard potential of a couple, in V vs SHE at the same temperature. Away from 25 °C the table\'s E° moves by the species data (NBS 1982, ΔrH, ΔrS, ΔrCp) where they cover every species, else by the row\'s dE°/dT (E0BASIS says which). #N/A when neither covers the couple and T ≠ 25 °C; #VALUE! naming the range outside 0…100 °C.',
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

export const SOURCE = worksheet({ id: 'SOURCE', description: 'The published source of a couple\'s E° (and dE°/dT), or of a reference electrode\'s potential, as text.', args: [{ name: 'couple', kind: 'text', unit: '', help: 'Key of the potential table: a couple written Ox/Red, or a reference electrode (e.g. "CSE").' }, { name: 'criterion', kind: 'text', optional: true, default: null, unit: '', help: 'With an electrode key: a protection-criterion condition ("standard", "polarisation", "anaerobic", as PROTECTIONCRITERION takes them), to get the clause and source of PROTECTIONCRITERION\'s answer.' }], result: 'The source (text).', helpAnchor: 'source', compute: sourceOf, usesTable: true });
