import { FARADAY_C_PER_MOL, kelvin } from '../constants';
import { parseSpecies } from '../chem/formula';
import { InputError, NotFoundError } from '../errors';
import { speciesRecord } from '../species/speciesRecord';
import { thermoneutralVoltage } from './thermoneutralVoltage';

/** Heating-value bases of the thermoneutral voltage of water electrolysis. */
export type HeatingBasis = 'HHV' | 'LHV';

/**
 * Enthalpy of vaporisation of water at T from the species data, J/mol: ΔfH°(g) − ΔfH°(l) at
 * 298.15 K plus (Cp°(g) − Cp°(l))·(T − 298.15 K), both phases at 1 bar (the gas as the ideal-gas
 * standard state).
 */
function vaporisationEnthalpy(temperatureC: number): number {
  const water = parseSpecies('H2O');
  const gas = speciesRecord({ species: water, phase: 'g' });
  const liquid = speciesRecord({ species: water, phase: 'l' });
  const ok = (r: typeof gas): r is NonNullable<typeof gas> & { dfH_kJ_mol: number; Cp_J_mol_K: number } =>
    r !== undefined && typeof r.dfH_kJ_mol === 'number' && typeof r.Cp_J_mol_K === 'number';
  if (!ok(gas) || !ok(liquid)) {
    throw new NotFoundError('the species data in use have no ΔfH° and Cp° for both H2O(l) and H2O(g), which the lower-heating-value basis needs');
  }
  return (gas.dfH_kJ_mol - liquid.dfH_kJ_mol) * 1000 + (gas.Cp_J_mol_K - liquid.Cp_J_mol_K) * (kelvin(temperatureC) - 298.15);
}

/**
 * Thermoneutral voltage of water electrolysis at a temperature on a heating-value basis, positive:
 * "HHV" ΔrH°(T)/2F of H2O(l) → H2 + ½O2 (liquid water, the voltage at which a cell fed with liquid
 * water neither heats nor cools: 1.4812 V at 25 °C, 1.4721 V at 80 °C); "LHV" the same for water
 * vapour, i.e. the HHV value less the vaporisation enthalpy of water at T divided by 2F
 * (1.2531 V at 25 °C, 1.2560 V at 80 °C). All from the species data (NBS 1982), ΔrCp° constant.
 *
 * Syntax: waterThermoneutral(temperatureC, [basis])
 * Example: waterThermoneutral(80, "LHV") → 1.2560 V
 * See also: thermoneutralVoltage, voltageEfficiency
 *
 * @param temperatureC 0…100 °C
 * @param basis "HHV" (default) or "LHV"; case is ignored
 */
export function waterThermoneutral(temperatureC: number, basis: string = 'HHV'): number {
  const b = String(basis).trim().toUpperCase();
  if (b !== 'HHV' && b !== 'LHV') {
    throw new InputError(`basis must be "HHV" (liquid water) or "LHV" (water vapour); got "${String(basis).slice(0, 40)}"`);
  }
  const hhv = thermoneutralVoltage('H2O', temperatureC);
  return b === 'HHV' ? hhv : hhv - vaporisationEnthalpy(temperatureC) / (2 * FARADAY_C_PER_MOL);
}
