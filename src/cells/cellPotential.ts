import { FARADAY_C_PER_MOL, GAS_CONSTANT_J_PER_MOL_K, kelvin } from '../constants';
import { InputError } from '../errors';
import type { CoupleRow } from '../table/types';
import { cellElectrons } from './cellElectrons';
import { e0AtTemperature } from './e0AtTemperature';
import { emf } from './emf';

/**
 * Cell potential at a reaction quotient: E = E°cell − (RT/nF)·ln Q, in V, with
 * E°cell = E°(cathode, T) − E°(anode, T) and n = cellElectrons (the overall reaction's electrons;
 * Q belongs to that reaction as written by cellReaction).
 *
 * Syntax: cellPotential(cathode, anode, q, temperatureC)
 * Example: cellPotential(copper, zinc, 0.01, 25) → 1.1037 + 0.0592 = 1.1629 V
 * See also: emf, cellElectrons, cellReaction, nernst
 *
 * @throws InputError when Q ≤ 0 or T is outside 0…100 °C
 */
export function cellPotential(cathode: CoupleRow, anode: CoupleRow, q: number, temperatureC: number): number {
  if (!(q > 0) || !Number.isFinite(q)) throw new InputError(`the reaction quotient Q must be a finite number > 0; got ${q}`);
  const n = cellElectrons(cathode.parsed, anode.parsed);
  const e = emf(e0AtTemperature(cathode, temperatureC), e0AtTemperature(anode, temperatureC));
  return e - ((GAS_CONSTANT_J_PER_MOL_K * kelvin(temperatureC)) / (n * FARADAY_C_PER_MOL)) * Math.log(q);
}
