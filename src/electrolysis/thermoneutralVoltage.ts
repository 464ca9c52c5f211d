import { FARADAY_C_PER_MOL, kelvin } from '../constants';
import { electrolysisReaction } from './electrolysisCouples';
import { overallProperties } from './overallProperties';

/**
 * Thermoneutral voltage of an electrolysis at a temperature: U_tn = ΔrH°(T)/(nF), positive, with
 * ΔrH°(T) = ΔrH°(298.15 K) + ΔrCp°·(T − 298.15 K) from the species data (ΔrCp° = 0 where Cp° is not
 * published for every species: the copper and nickel electrowinning reactions). Water splitting at
 * 80 °C gives 1.4721 V, 9 mV below −ΔfH°(H2O, l)/2F = 1.4812 V. Liquid water (higher heating value);
 * ideal gases, so no pressure dependence; the dilution enthalpy of the electrolyte is not included.
 *
 * Syntax: thermoneutralVoltage(process, temperatureC)
 * Example: thermoneutralVoltage("H2O", 80) → 1.4721 V
 * See also: standardDecompositionVoltage, thermoneutral
 */
export function thermoneutralVoltage(process: string, temperatureC: number): number {
  const r = electrolysisReaction(process, temperatureC);
  const p = overallProperties(r);
  return ((p.dH as number) + (p.dCp ?? 0) * (kelvin(temperatureC) - 298.15)) / (r.n * FARADAY_C_PER_MOL);
}
