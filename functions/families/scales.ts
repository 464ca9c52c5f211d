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
  description: 'Potential of a reference electrode vs SHE, in V, from the electrode table; at another temperature E(25 °C) + (dE/dT)·(T − 25).',
  args: [
    { name: 'electrode', kind: 'electrode', help: 'Reference electrode key or alias, e.g. "SCE", "Ag/AgCl/KCl(sat)", "CSE" (case and spaces ignored).' },
    { ...temperatureC, help: 'Temperature in °C (default 25; 0 to 100, and only where the table has dE/dT).' },
  ],
  result: 'Potential in V vs SHE.',
  helpAnchor: 'refpotential',
  compute: refPotential,
  usesTable: true,
});

export const CONVERTPOTENTIAL = worksheet({
  id: 'CONVERTPOTENTIAL',
  description: 'The same potential on another scale, in V: "SHE", "RHE" (needs pH; E_SHE = E_RHE − (RT ln10/F)·pH) or any reference electrode of the table.',
  args: [
    { ...potential('potential_V'), help: 'Potential on the from_scale, in V.' },
    { ...scaleArg('from_scale'), help: 'Scale the potential is given on: "SHE", "RHE" or an electrode key such as "CSE" or "SCE".' },
    { ...scaleArg('to_scale'), help: 'Scale wanted: "SHE", "RHE" or an electrode key.' },
    { name: 'pH', kind: 'number', optional: true, default: null, domain: domains.pH, unit: '', help: 'pH of the solution, needed when either scale is "RHE" (no default).' },
    temperatureC,
  ],
  result: 'Potential in V on the to_scale.',
  helpAnchor: 'convertpotential',
  compute: (e: number, from: string, to: string, pH: number | null, t: number) =>
    convertPotential(e, resolveScale(from, findElectrode, electrodeHint), resolveScale(to, findElectrode, electrodeHint), pH, t),
  usesTable: true,
});
