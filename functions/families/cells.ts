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
  args: [coupleOrPotential('cathode'), coupleOrPotential('anode'), temperatureC],
  compute: (c: CoupleRow | number, a: CoupleRow | number, t: number) => emf(potentialAt(c, t), potentialAt(a, t)),
  usesTable: true,
});

export const GALVANIC = worksheet({
  id: 'GALVANIC',
  args: [couple('couple1'), couple('couple2'), temperatureC],
  compute: galvanic,
  rowResult: 3,
  usesTable: true,
});

export const CELLELECTRONS = worksheet({
  id: 'CELLELECTRONS',
  args: [couple('cathode'), couple('anode')],
  compute: (c: CoupleRow, a: CoupleRow) => cellElectrons(c.parsed, a.parsed),
  usesTable: true,
});

export const CELLREACTION = worksheet({
  id: 'CELLREACTION',
  args: [couple('cathode'), couple('anode')],
  compute: (c: CoupleRow, a: CoupleRow) => cellReaction(c.parsed, a.parsed),
  usesTable: true,
});

export const CELLPOTENTIAL = worksheet({
  id: 'CELLPOTENTIAL',
  args: [couple('cathode'), couple('anode'), { name: 'Q', kind: 'number', domain: domains.positive, unit: '' }, temperatureC],
  compute: cellPotential,
  usesTable: true,
});
