import { InputError, NotFoundError } from '../errors';
import { kelvin } from '../constants';
import { speciesE0 } from '../species/speciesE0';
import type { ElectrodeRow } from '../table/types';
import { electrodeReaction } from './electrodeReaction';
import { measuredE0 } from './measuredE0';

/** Temperatures at which reference-electrode potentials are given, °C. */
export const REF_TEMPERATURE_RANGE_C = { min: 0, max: 100 } as const;

/**
 * Potential of a reference electrode in V vs SHE (the hydrogen electrode at the same temperature),
 * with the electrode itself at that temperature. At 25 °C the stored value is returned as it is.
 * Elsewhere, the first that applies:
 *
 * 1. The row's published dE/dT: E(T) = E(25 °C) + (dE/dT)·(T − 25).
 * 2. An electrode of the second kind with a filling of fixed concentration (electrodeReaction:
 *    Ag/AgCl, Hg/Hg2Cl2, Hg/HgO, Hg/Hg2SO4 with "(3M)", "(0.1M)"… in the key): the standard potential
 *    E°(T) of its reaction with the filling's activities held at their 25 °C values,
 *    E(T) = E°(T) + (T/298.15 K)·(E(25 °C) − E°(25 °C)). E°(T) is the measured one where
 *    data/electrode-e0.json lists the reaction (measuredE0: AgCl/Ag by Bates & Bower, 0–95 °C), else
 *    the one derived from the species data. The change of the activity coefficient with temperature
 *    and the liquid junction are neglected.
 * 3. Otherwise (saturated fillings, field electrodes) NotFoundError: known at 25 °C only.
 *
 * Syntax: refPotential(row, temperatureC)
 * Example: refPotential(Ag/AgCl/KCl(1M) row, 60) → 0.2118 V
 * See also: convertPotential, electrodeReaction, measuredE0
 *
 * @param row reference electrode from the table
 * @param temperatureC temperature, °C (0…100)
 */
export function refPotential(row: ElectrodeRow, temperatureC: number): number {
  if (temperatureC === 25) return row.potential;
  if (!(temperatureC >= REF_TEMPERATURE_RANGE_C.min && temperatureC <= REF_TEMPERATURE_RANGE_C.max)) {
    throw new InputError(`temperature ${temperatureC} °C is outside the reference electrodes' range: reference potentials are given only within ${REF_TEMPERATURE_RANGE_C.min}…${REF_TEMPERATURE_RANGE_C.max} °C`);
  }
  if (row.dEdT_mV_K !== undefined) return row.potential + (row.dEdT_mV_K / 1000) * (temperatureC - 25);
  const hr = electrodeReaction([row.key, ...row.aliases]);
  if (hr !== null) {
    const e0 = (t: number): number => measuredE0(hr, t) ?? speciesE0(hr, t);
    return e0(temperatureC) + (kelvin(temperatureC) / 298.15) * (row.potential - e0(25));
  }
  throw new NotFoundError(
    `the electrode table has no dE/dT for "${row.key}" and its filling is not of fixed concentration, so its potential is known only at 25 °C`,
  );
}
