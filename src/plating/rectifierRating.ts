import { finite } from '../errors';

/** Labels of the rating row, for a header. */
export const RECTIFIER_LABELS = ['current_A', 'voltage_V', 'power_kW'] as const;

/**
 * DC rating of a plating rectifier: the current the load needs, area × current density, raised by a
 * design margin; the voltage, tank voltage plus the drop in bus bars, leads and contacts, raised by a
 * design margin; and the DC power of that current at that voltage. The margins are the designer's
 * choice (headroom for larger loads, a higher current density, tank voltage creeping up as anodes
 * polarise and contacts age), not data: give 0 for none.
 *
 * I = A·j·(1 + m_I); U = (U_tank + U_drop)·(1 + m_U); P = I·U/1000 in kW.
 *
 * Syntax: rectifierRating(areaDm2, currentDensityA_dm2, tankV, dropV, currentMargin, voltageMargin)
 * Example: rectifierRating(120, 4, 5.5, 0.5, 0.2, 0.1) → [576, 6.6, 3.8016]
 * See also: platingCurrent
 *
 * @param areaDm2 plated area of the largest load, dm²
 * @param currentDensityA_dm2 highest current density planned, A/dm²
 * @param tankV tank (anode-to-cathode) voltage at that current density, V
 * @param dropV drop in bus bars, flexible leads and contacts at that current, V
 * @param currentMargin design margin on the current, a fraction (0.2 for 20 %)
 * @param voltageMargin design margin on the voltage, a fraction
 */
export function rectifierRating(
  areaDm2: number,
  currentDensityA_dm2: number,
  tankV: number,
  dropV: number,
  currentMargin: number,
  voltageMargin: number,
): [number, number, number] {
  const current = finite(areaDm2 * currentDensityA_dm2 * (1 + currentMargin), 'the current');
  const voltage = finite((tankV + dropV) * (1 + voltageMargin), 'the voltage');
  return [current, voltage, finite((current * voltage) / 1000, 'the power')];
}
