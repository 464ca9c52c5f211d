/**
 * Electrolysis at conditions: reversible (decomposition) and thermoneutral voltages of water
 * splitting and of zinc, copper and nickel electrowinning, from the species data. Results are
 * positive: the voltage the cell needs.
 */
import { electrowinVoltage } from '../../src/electrolysis/electrowinVoltage';
import { thermoneutralVoltage } from '../../src/electrolysis/thermoneutralVoltage';
import { waterSplitVoltage } from '../../src/electrolysis/waterSplitVoltage';
import { NotFoundError } from '../../src/errors';
import { type ArgSpec, domains, worksheet } from '../adapter';
import { activity, optNum, temperatureC } from '../args';

const metal: ArgSpec = { name: 'metal', kind: 'text' };

export const WATERSPLITVOLTAGE = worksheet({
  id: 'WATERSPLITVOLTAGE',
  args: [temperatureC, optNum('pressure_bar', 1, domains.positive, 'bar'), activity('water_activity')],
  compute: (t: number, p: number, aw: number) => waterSplitVoltage(t, p, aw),
});

export const WATERTHERMONEUTRAL = worksheet({
  id: 'WATERTHERMONEUTRAL',
  args: [temperatureC],
  compute: (t: number) => thermoneutralVoltage('H2O', t),
});

export const ELECTROWINVOLTAGE = worksheet({
  id: 'ELECTROWINVOLTAGE',
  args: [metal, temperatureC, activity('metal_activity'), activity('acid_activity'), optNum('oxygen_bar', 1, domains.positive, 'bar'), activity('water_activity')],
  compute: (m: string, t: number, aM: number, aH: number, pO2: number, aw: number) => electrowinVoltage(m, t, aM, aH, pO2, aw),
});

export const ELECTROWINTHERMONEUTRAL = worksheet({
  id: 'ELECTROWINTHERMONEUTRAL',
  args: [metal, temperatureC],
  compute: (m: string, t: number) => {
    if (/^\s*(h2o|water)\s*$/i.test(m)) {
      throw new NotFoundError('for water electrolysis use WATERTHERMONEUTRAL; ELECTROWINTHERMONEUTRAL takes Zn, Cu or Ni');
    }
    return thermoneutralVoltage(m, t);
  },
});
