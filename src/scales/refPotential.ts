import { InputError, NotFoundError } from '../errors';
import { kelvin } from '../constants';
import { speciesE0 } from '../species/speciesE0';
import type { ElectrodeRow } from '../table/types';
import { electrodeReaction } from './electrodeReaction';

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
 *    of its reaction from the species data at T, with the filling's activities held at their 25 °C
 *    values, E(T) = E°(T) + (T/298.15 K)·(E(25 °C) − E°(25 °C)). The change of the activity coefficient
 *    with temperature and the liquid junction are neglected.
 * 3. Otherwise (saturated fillings, field electrodes) NotFoundError: known at 25 °C only.
 *
 * Syntax: refPotential(row, temperatureC)
 * Example: refPotential(Ag/AgCl/KCl(3M) row, 60) → 0.1848 V
 * See also: convertPotential, electrodeReaction
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
    const e25 = speciesE0(hr, 25);
    return speciesE0(hr, temperatureC) + (kelvin(temperatureC) / 298.15) * (row.potential - e25);
  }
  throw new NotFoundError(
    `the electrode table has no dE/dT for "${row.key}" and its filling is not of fixed concentration, so its potential is known only at 25 °C`,
  );
}
