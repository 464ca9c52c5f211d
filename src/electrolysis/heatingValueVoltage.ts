import { dataPart } from '../dataset/active';
import { FARADAY_C_PER_MOL } from '../constants';
import { NotFoundError } from '../errors';

/** J per kJ. */
const J_PER_KJ = 1000;
/** Electrons per molecule of hydrogen. */
const N_H2 = 2;

/**
 * Thermoneutral voltage of water electrolysis on a heating-value basis at 25 °C, in V:
 * HHV: −ΔfH°(H2O, l)/(2F) = 1.4812 V; LHV: −ΔfH°(H2O, g)/(2F) = 1.2532 V, with ΔfH° from the
 * CODATA Key Values for Thermodynamics (data/electrolysis.json).
 *
 * Syntax: heatingValueVoltage(basis)
 * Example: heatingValueVoltage("HHV") → 1.4812 V
 * See also: voltageEfficiency
 *
 * @param basis "HHV" (higher heating value) or "LHV" (lower heating value); case ignored
 */
export function heatingValueVoltage(basis: string): number {
  const b = basis.trim().toUpperCase();
  const hv = dataPart('electrolysis').heatingValues;
  const dfH = b === 'HHV' ? hv.dfH_H2O_liquid_kJ_mol : b === 'LHV' ? hv.dfH_H2O_gas_kJ_mol : null;
  if (dfH === null) throw new NotFoundError(`unknown basis "${basis}"; use "HHV", "LHV" or a reference voltage in V`);
  return (-dfH * J_PER_KJ) / (N_H2 * FARADAY_C_PER_MOL);
}
