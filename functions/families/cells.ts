/** Cells: EMF, galvanic pairing, overall reaction and its electrons, cell potential at Q. */
import { cellElectrons } from '../../src/cells/cellElectrons';
import { cellPotential } from '../../src/cells/cellPotential';
import { cellReaction } from '../../src/cells/cellReaction';
import { e0AtTemperature } from '../../src/cells/e0AtTemperature';
import { emf } from '../../src/cells/emf';
import { galvanic } from '../../src/cells/galvanic';
import type { CoupleRow } from '../../src/table/types';
import { type ArgSpec, domains, worksheet } from '../adapter';
import { couple, temperatureC } from '../args';

const coupleOrPotential = (name: string): ArgSpec => ({ name, kind: 'coupleOrPotential', domain: domains.any, unit: 'V' });

/** A couple's E° at T, or a number taken as given (V). */
const potentialAt = (x: CoupleRow | number, t: number): number => (typeof x === 'number' ? x : e0AtTemperature(x, t));

export const EMF = worksheet({
  id: 'EMF',
  description: 'Standard cell EMF E°cell = E°(cathode) − E°(anode), in V. Never reorders: a pairing that does not run by itself gives a negative value. Sign convention: positive when the reaction runs by itself (galvanic); an electrolysis as written is negative, and DECOMPOSITIONVOLTAGE gives its positive decomposition voltage.',
  args: [
    { ...coupleOrPotential('cathode'), help: 'Couple key (e.g. "Cu2+/Cu") or a potential in V vs SHE.' },
    { ...coupleOrPotential('anode'), help: 'Couple key (e.g. "Zn2+/Zn") or a potential in V vs SHE.' },
    { ...temperatureC, help: 'Temperature in °C, 0 to 100 (default 25); applies to couples, numbers are taken as given.' },
  ],
  result: 'E°cell in V.',
  helpAnchor: 'emf',
  compute: (c: CoupleRow | number, a: CoupleRow | number, t: number) => emf(potentialAt(c, t), potentialAt(a, t)),
  usesTable: true,
});

export const GALVANIC = worksheet({
  id: 'GALVANIC',
  description: 'Arranges two couples as a galvanic cell: spills 1×3 [E°cell in V (≥ 0), cathode key, anode key]. It compares standard potentials, not the potentials metals take in service: not a design driving voltage for anodes (ANODEDATA, ANODEOUTPUT) nor a galvanic series (GALVANICSERIES; passive stainless steel, for one, is noble in seawater).',
  args: [
    { ...couple('couple1'), help: 'A couple key (e.g. "Zn2+/Zn").' },
    { ...couple('couple2'), help: 'Another couple key (e.g. "Cu2+/Cu").' },
    { ...temperatureC, help: 'Temperature in °C, 0 to 100 (default 25).' },
  ],
  result: 'E°cell in V, the cathode\'s key and the anode\'s key.',
  helpAnchor: 'galvanic',
  compute: galvanic,
  rowResult: 3,
  usesTable: true,
});

export const CELLELECTRONS = worksheet({
  id: 'CELLELECTRONS',
  description: 'Electrons n of the balanced overall cell reaction: the least common multiple of the two half-reactions\' n (dimensionless).',
  args: [
    { ...couple('cathode'), help: 'Couple key of the cathode (where reduction happens).' },
    { ...couple('anode'), help: 'Couple key of the anode.' },
  ],
  result: 'n, a whole number.',
  helpAnchor: 'cellelectrons',
  compute: (c: CoupleRow, a: CoupleRow) => cellElectrons(c.parsed, a.parsed),
  usesTable: true,
});

export const CELLREACTION = worksheet({
  id: 'CELLREACTION',
  description: 'The balanced overall cell reaction as text, species common to both sides cancelled (e.g. "Cu2+ + Zn -> Cu + Zn2+").',
  args: [
    { ...couple('cathode'), help: 'Couple key of the cathode (where reduction happens).' },
    { ...couple('anode'), help: 'Couple key of the anode.' },
  ],
  result: 'The overall reaction (text).',
  helpAnchor: 'cellreaction',
  compute: (c: CoupleRow, a: CoupleRow) => cellReaction(c.parsed, a.parsed),
  usesTable: true,
});

export const CELLPOTENTIAL = worksheet({
  id: 'CELLPOTENTIAL',
  description: 'Cell potential at a reaction quotient: E = E°cell − (RT/nF)·ln Q, in V, with n from CELLELECTRONS and Q of the reaction CELLREACTION writes. Sign convention: positive when the reaction runs by itself; an electrolysis as written is negative (its decomposition voltage is −E).',
  args: [
    { ...couple('cathode'), help: 'Couple key of the cathode (where reduction happens).' },
    { ...couple('anode'), help: 'Couple key of the anode.' },
    { name: 'Q', kind: 'number', domain: domains.positive, unit: '', help: 'Reaction quotient of the overall reaction (dimensionless, > 0).' },
    { ...temperatureC, help: 'Temperature in °C, 0 to 100 (default 25).' },
  ],
  result: 'E in V.',
  helpAnchor: 'cellpotential',
  compute: cellPotential,
  usesTable: true,
});
