import { NotFoundError } from '../errors';
import { halfReactionProperties } from '../species/halfReactionProperties';
import type { E0Source } from './e0AtTemperature';

/**
 * Which basis gives a couple's E° away from 25 °C (the precedence of e0AtTemperature), as text:
 * "species (with ΔrCp)", "species (ΔrCp = 0)", "dE/dT", or "25 °C only".
 *
 * Syntax: e0Basis(row)
 * Example: e0Basis(table.findCouple("O2/H2O")) → "species (with ΔrCp)"
 * See also: e0AtTemperature, speciesE0
 */
export function e0Basis(row: E0Source): string {
  if (row.parsed !== undefined) {
    try {
      const p = halfReactionProperties(row.parsed);
      if (p.dS !== undefined) return p.dCp !== undefined ? 'species (with ΔrCp)' : 'species (ΔrCp = 0)';
    } catch (e) {
      if (!(e instanceof NotFoundError)) throw e;
    }
  }
  return row.dEdT_mV_K !== undefined ? 'dE/dT' : '25 °C only';
}
