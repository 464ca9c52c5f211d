import { LN10, thermalVoltage } from '../constants';
import { InputError } from '../errors';
import { refPotential } from './refPotential';
import type { Scale } from './resolveScale';

/** Potential of a scale's zero in V vs SHE at the temperature (and pH for RHE). */
function zeroVsShe(scale: Scale, pH: number | null, temperatureC: number): number {
  switch (scale.kind) {
    case 'SHE':
      return 0;
    case 'RHE':
      if (pH === null) throw new InputError('the RHE scale needs pH: give the pH of the solution the RHE refers to');
      // E_SHE = E_RHE − (RT ln10/F)·pH: the RHE sits (RT ln10/F)·pH below the SHE
      return -thermalVoltage(temperatureC) * LN10 * pH;
    case 'electrode':
      return refPotential(scale.row, temperatureC);
  }
}

function sameScale(a: Scale, b: Scale): boolean {
  if (a.kind !== b.kind) return false;
  return a.kind !== 'electrode' || b.kind !== 'electrode' || a.row === b.row || a.row.key === b.row.key;
}

/**
 * The same potential on another scale: E_to = E_from + E0(from) − E0(to), where E0 is each scale's
 * zero in V vs SHE: 0 for SHE, −(RT ln10/F)·pH for RHE (E_SHE = E_RHE − (RT ln10/F)·pH), and the
 * electrode's potential at the temperature for a reference electrode (see refPotential).
 * Converting a scale to itself returns the potential unchanged. RHE without pH throws InputError.
 *
 * Syntax: convertPotential(potentialV, from, to, pH, temperatureC)
 * Example: convertPotential(−0.85, CSE, SHE, null, 25) → −0.534 V
 * See also: refPotential, resolveScale
 *
 * @param potentialV the potential on the `from` scale, V
 * @param pH pH for the RHE scale (null when not given)
 * @param temperatureC temperature, °C
 */
export function convertPotential(potentialV: number, from: Scale, to: Scale, pH: number | null, temperatureC: number): number {
  if (sameScale(from, to)) return potentialV;
  return potentialV + zeroVsShe(from, pH, temperatureC) - zeroVsShe(to, pH, temperatureC);
}
