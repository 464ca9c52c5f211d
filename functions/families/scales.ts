/** Reference electrodes and potential scales (SHE, RHE and the electrodes of the table). */
import { convertPotential } from '../../src/scales/convertPotential';
import { refPotential } from '../../src/scales/refPotential';
import { resolveScale } from '../../src/scales/resolveScale';
import { electrodeKeyHint } from '../../src/table/suggest';
import type { ElectrodeRow } from '../../src/table/types';
import { type ArgSpec, domains, worksheet } from '../adapter';
import { potential, temperatureC } from '../args';
import { currentTable } from '../context';

const findElectrode = (key: string): ElectrodeRow | undefined => currentTable().findElectrode(key);
const electrodeHint = (key: string): string => electrodeKeyHint(currentTable(), key);

const scaleArg = (name: string): ArgSpec => ({ name, kind: 'text' });

export const REFPOTENTIAL = worksheet({
  id: 'REFPOTENTIAL',
  args: [{ name: 'electrode', kind: 'electrode' }, temperatureC],
  compute: refPotential,
  usesTable: true,
});

export const CONVERTPOTENTIAL = worksheet({
  id: 'CONVERTPOTENTIAL',
  args: [
    potential('potential_V'),
    scaleArg('from_scale'),
    scaleArg('to_scale'),
    { name: 'pH', kind: 'number', optional: true, default: null, domain: domains.pH, unit: '' },
    temperatureC,
  ],
  compute: (e: number, from: string, to: string, pH: number | null, t: number) =>
    convertPotential(e, resolveScale(from, findElectrode, electrodeHint), resolveScale(to, findElectrode, electrodeHint), pH, t),
  usesTable: true,
});
