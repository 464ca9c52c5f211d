import { FARADAY_C_PER_MOL } from '../constants';
import { dataPart } from '../dataset/active';
import { InputError, NotFoundError } from '../errors';

/** Which gas crosses the separator, and the gas it ends up in. */
const GASES = {
  H2: { z: 2, productZ: 4, into: 'O2' },
  O2: { z: 4, productZ: 2, into: 'H2' },
} as const;

/**
 * Foreign gas in the product gas of a water electrolyser from a crossover through the separator
 * (membrane or diaphragm), by Faraday's law: the crossing gas arrives at N_x = i_x/(z_x·F) per unit
 * area (i_x its crossover current density, the current its flux would carry; z_x = 2 for H2, 4 for
 * O2), the product gas is made at N_p = j/(z_p·F), so its volume (mole) fraction in the dry product
 * gas is x = N_x/(N_x + N_p): H2 in O2 = 2·i_x/(2·i_x + j), O2 in H2 = i_x/(i_x + 2·j). The model
 * assumes the whole cell current goes to the product gas, no recombination of the crossing gas
 * (a platinum catalyst recombines part of the oxygen reaching the cathode) and ideal dry gases.
 * A crossover flux in mol/(m²·s) is converted by i_x = z_x·F·N_x. Returns x and x as a share of the
 * flammability limit (1 = at the limit): for hydrogen by default the data set's lower flammability
 * limit of hydrogen in air (4.0 vol %, Zabetakis 1965); for oxygen in hydrogen there is no default.
 *
 * Syntax: gasCrossover(currentDensityA_m2, crossover, gas, crossoverUnit, limitPercent)
 * Example: gasCrossover(5000, 50, "H2", "A/m2", 4) → [0.019608, 0.4902]
 * See also: hydrogenInAir, normalGasFlow
 *
 * @param currentDensityA_m2 operating current density, A/m² (> 0)
 * @param crossover crossover current density in A/m², or flux in mol/(m²·s) (≥ 0)
 * @param gas the crossing gas, "H2" (H2 in O2) or "O2" (O2 in H2)
 * @param crossoverUnit "A/m2" or "mol/m2/s"
 * @param limitPercent flammability limit of the foreign gas in the product gas, vol % (> 0), or null for the default
 */
export function gasCrossover(currentDensityA_m2: number, crossover: number, gas: string, crossoverUnit: string, limitPercent: number | null): [number, number] {
  const key = gas.trim().toUpperCase();
  if (key !== 'H2' && key !== 'O2') throw new NotFoundError(`unknown crossing gas "${gas}"; use "H2" (hydrogen in the oxygen) or "O2" (oxygen in the hydrogen)`);
  const g = GASES[key];
  const unit = crossoverUnit.replace(/[\s()·*]/g, '').replace('²', '2').toLowerCase();
  let ix: number;
  if (unit === 'a/m2') ix = crossover;
  else if (unit === 'mol/m2/s' || unit === 'mol/m2s' || unit === 'mol/s/m2') ix = crossover * g.z * FARADAY_C_PER_MOL;
  else throw new NotFoundError(`unknown crossover unit "${crossoverUnit}"; use "A/m2" (a crossover current density) or "mol/m2/s" (a flux)`);
  let limit = limitPercent;
  if (limit === null) {
    if (key === 'O2') {
      throw new InputError(
        'give limit_percent for oxygen in hydrogen: the oxygen content at which the hydrogen becomes flammable at your pressure and temperature, from the applicable standard or measured data (no default is built in)',
      );
    }
    limit = dataPart('electrolysis').hydrogenLFL.volumePercent;
  }
  if (!(limit > 0 && limit < 100)) throw new InputError(`limit_percent must be a volume percentage in (0, 100); got ${limit}`);
  const nx = ix / g.z;
  const np = currentDensityA_m2 / g.productZ;
  const x = nx / (nx + np);
  return [x, x / (limit / 100)];
}
