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
  description: 'Potential of a reference electrode vs SHE, in V, with the electrode at the temperature: the table\'s dE/dT where published; else, for Ag/AgCl, calomel, Hg/HgO and Hg/Hg2SO4, E°(T) of the electrode reaction (Ag/AgCl and calomel: from Bates & Bower\'s measurement; others: from the species data) with a fixed filling\'s activity held constant, or a saturated filling\'s (KCl, K2SO4, NaCl) set by the salt\'s solubility product at the temperature; liquid junctions neglected. Calomel electrodes are used up to 80 °C, Hg/HgO up to 90 °C. For cathodic protection, compare a reading with the criterion the standard states for the electrode used (PROTECTIONCRITERION), not with a criterion converted from another electrode.',
  args: [
    { name: 'electrode', kind: 'electrode', help: 'Reference electrode key or alias, e.g. "SCE", "Ag/AgCl/KCl(sat)", "CSE" (case and spaces ignored).' },
    { ...temperatureC, help: 'Temperature in °C of the electrode (default 25; 0 to 100, calomel to 80, Hg/HgO to 90; seawater and field electrodes without dE/dT answer #N/A away from 25 °C).' },
  ],
  result: 'Potential in V vs SHE.',
  helpAnchor: 'refpotential',
  compute: refPotential,
  usesTable: true,
});

export const CONVERTPOTENTIAL = worksheet({
  id: 'CONVERTPOTENTIAL',
  description: 'The same potential on another scale, in V: "SHE" (or "NHE"), "RHE" (needs pH; E_SHE = E_RHE − (RT ln10/F)·pH) or any reference electrode of the table. The reference electrode is assumed to be at the stated temperature (its potential at that temperature is used). Not for cathodic-protection criteria: the standards state −0.80 V Ag/AgCl/seawater, while −0.85 V CSE converts to about −0.78 V; compare a reading with the criterion stated for its own electrode (PROTECTIONCRITERION).',
  args: [
    { ...potential('potential_V'), help: 'Potential on the from_scale, in V.' },
    { ...scaleArg('from_scale'), help: 'Scale the potential is given on: "SHE" (or "NHE"), "RHE" or an electrode key such as "CSE" or "SCE".' },
    { ...scaleArg('to_scale'), help: 'Scale wanted: "SHE", "RHE" or an electrode key.' },
    { name: 'pH', kind: 'number', optional: true, default: null, domain: domains.pH, unit: '', help: 'pH of the solution, needed when either scale is "RHE" (no default).' },
    { ...temperatureC, help: 'Temperature in °C of the solution and of the reference electrode (default 25).' },
  ],
  result: 'Potential in V on the to_scale.',
  helpAnchor: 'convertpotential',
  compute: (e: number, from: string, to: string, pH: number | null, t: number) =>
    convertPotential(e, resolveScale(from, findElectrode, electrodeHint), resolveScale(to, findElectrode, electrodeHint), pH, t),
  usesTable: true,
});
