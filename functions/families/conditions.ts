/**
 * Electrolysis at conditions: reversible (decomposition) and thermoneutral voltages of water
 * splitting and of zinc, copper and nickel electrowinning, from the species data. Results are
 * positive: the voltage the cell needs.
 */
import { electrowinVoltage } from '../../src/electrolysis/electrowinVoltage';
import { thermoneutralVoltage } from '../../src/electrolysis/thermoneutralVoltage';
import { waterThermoneutral } from '../../src/electrolysis/waterThermoneutral';
import { waterSplitVoltage } from '../../src/electrolysis/waterSplitVoltage';
import { NotFoundError } from '../../src/errors';
import { type ArgSpec, domains, worksheet } from '../adapter';
import { activity, optNum, temperatureC } from '../args';

const metal: ArgSpec = { name: 'metal', kind: 'text' };

export const WATERSPLITVOLTAGE = worksheet({
  id: 'WATERSPLITVOLTAGE',
  description: 'Reversible voltage of water electrolysis H2O(l) → H2 + ½O2, positive (the voltage the cell needs): U°(T) + (RT/2F)·ln(p^1.5/a_w), with ΔH(T) and ΔS(T) from the species data (NBS 1982). 0–100 °C; outside, #VALUE!.',
  args: [{ ...temperatureC, help: 'Temperature in °C, 0 to 100 (default 25).' }, { ...optNum('pressure_bar', 1, domains.positive, 'bar'), help: 'Partial pressure of the dry H2 and of the dry O2, each, in bar (default 1; ideal gases).' }, { ...activity('water_activity'), help: 'Water activity of the electrolyte, in (0, 1] (default 1; lower in concentrated KOH).' }],
  result: 'Reversible voltage in V (positive).',
  helpAnchor: 'watersplitvoltage',
  compute: (t: number, p: number, aw: number) => waterSplitVoltage(t, p, aw),
});

export const WATERTHERMONEUTRAL = worksheet({
  id: 'WATERTHERMONEUTRAL',
  description: 'Thermoneutral voltage of water electrolysis ΔH(T)/2F, positive, with ΔH(T) = ΔH(25 °C) + ΔCp·(T − 25) from the species data (NBS 1982). basis "HHV" (default, liquid water): 1.4812 V at 25 °C, 1.4721 V at 80 °C; "LHV" (water vapour, the HHV value less the vaporisation enthalpy at T over 2F): 1.2531 V at 25 °C, 1.2560 V at 80 °C. 0–100 °C.',
  args: [
    { ...temperatureC, help: 'Temperature in °C, 0 to 100 (default 25).' },
    { name: 'basis', kind: 'text', optional: true, default: 'HHV', unit: '', help: '"HHV" (higher heating value, liquid water) or "LHV" (lower heating value, water vapour); default "HHV".' },
  ],
  result: 'Thermoneutral voltage in V (positive).',
  helpAnchor: 'waterthermoneutral',
  compute: (t: number, basis: string) => waterThermoneutral(t, basis),
});

export const ELECTROWINVOLTAGE = worksheet({
  id: 'ELECTROWINVOLTAGE',
  description: 'Reversible decomposition voltage of electrowinning from sulfate, M2+ + H2O → M + 2H+ + ½O2 (M = Zn, Cu, Ni), positive: U°(T) + (RT/2F)·ln(p_O2^½·a_H+²/(a_M·a_w)), from the species data. 0–100 °C.',
  args: [{ ...metal, help: '"Zn", "Cu" or "Ni" (or zinc, copper, nickel).' }, { ...temperatureC, help: 'Temperature in °C, 0 to 100 (default 25).' }, { ...activity('metal_activity'), help: 'Activity of the metal ion (default 1).' }, { ...activity('acid_activity'), help: 'Activity of H+ in the electrolyte (default 1).' }, { ...optNum('oxygen_bar', 1, domains.positive, 'bar'), help: 'Partial pressure of O2 at the anode, in bar (default 1).' }, { ...activity('water_activity'), help: 'Water activity of the electrolyte, in (0, 1] (default 1).' }],
  result: 'Decomposition voltage in V (positive).',
  helpAnchor: 'electrowinvoltage',
  compute: (m: string, t: number, aM: number, aH: number, pO2: number, aw: number) => electrowinVoltage(m, t, aM, aH, pO2, aw),
});

export const ELECTROWINTHERMONEUTRAL = worksheet({
  id: 'ELECTROWINTHERMONEUTRAL',
  description: 'Thermoneutral voltage of electrowinning from sulfate (Zn, Cu, Ni), ΔH(T)/2F, positive, from the species data (ΔCp = 0 for Cu and Ni, whose ion Cp° is not published in the NBS tables). 0–100 °C.',
  args: [{ ...metal, help: '"Zn", "Cu" or "Ni" (or zinc, copper, nickel).' }, { ...temperatureC, help: 'Temperature in °C, 0 to 100 (default 25).' }],
  result: 'Thermoneutral voltage in V (positive).',
  helpAnchor: 'electrowinthermoneutral',
  compute: (m: string, t: number) => {
    if (/^\s*(h2o|water)\s*$/i.test(m)) {
      throw new NotFoundError('for water electrolysis use WATERTHERMONEUTRAL; ELECTROWINTHERMONEUTRAL takes Zn, Cu or Ni');
    }
    return thermoneutralVoltage(m, t);
  },
});
