import { DomainError, InputError, finite } from '../errors';
import { heatingValueVoltage } from './heatingValueVoltage';

/** Text that is a plain number. */
const NUMBER = /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/;

/**
 * Voltage efficiency of an electrolysis cell, U_ref/U_cell (a fraction), against the
 * thermoneutral voltage of water splitting on the higher ("HHV", 1.4812 V) or lower ("LHV",
 * 1.2532 V) heating-value basis at 25 °C, or against any reference voltage given as a number
 * (a thermoneutral or reversible voltage at conditions, for electrowinning or for water at
 * another temperature).
 *
 * Syntax: voltageEfficiency(cellVoltageV, basis)
 * Example: voltageEfficiency(1.9, "HHV") → 0.7796
 * See also: heatingValueVoltage, cellHeat
 *
 * @param cellVoltageV cell voltage, V (> 0)
 * @param basis "HHV", "LHV" or a reference voltage in V (> 0), as text or number
 */
export function voltageEfficiency(cellVoltageV: number, basis: string | number): number {
  let ref: number;
  if (typeof basis === 'number') ref = basis;
  else if (NUMBER.test(basis.trim())) ref = Number(basis.trim());
  else ref = heatingValueVoltage(basis);
  if (!Number.isFinite(ref)) throw new DomainError('the reference voltage is outside the range of double-precision numbers');
  if (!(ref > 0)) throw new InputError(`the reference voltage must be > 0 V (a decomposition voltage is positive); got ${ref}`);
  return finite(ref / cellVoltageV, 'the efficiency');
}
