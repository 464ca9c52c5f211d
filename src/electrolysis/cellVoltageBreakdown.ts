import { bruggemanConductivity } from './bruggemanConductivity';
import { electrodeOverpotential } from './electrodeOverpotential';
import { ohmicDrop } from './ohmicDrop';

/** Labels of the breakdown's columns, in order. */
export const BREAKDOWN_LABELS = [
  'Reversible voltage (V)',
  'Anode overpotential (V)',
  'Cathode overpotential (V)',
  'Ohmic drop (V)',
  'Contact drop (V)',
  'Bus-bar drop (V)',
  'Cell voltage (V)',
] as const;

/** Inputs of one cell type. Current densities share one unit (A/m²). */
export interface BreakdownInputs {
  reversibleV: number;
  currentDensityA_m2: number;
  anodeI0A_m2: number;
  anodeAlpha: number;
  cathodeI0A_m2: number;
  cathodeAlpha: number;
  gapMm: number;
  conductivityS_m: number;
  gasFraction: number;
  contactDropV: number;
  busbarDropV: number;
  anodeLimitA_m2: number | null;
  cathodeLimitA_m2: number | null;
  temperatureC: number;
}

/**
 * Cell voltage as the sum of its parts, each a positive voltage on the electrolysis side:
 * U = U_rev + η_anode + η_cathode + j·d/κ_eff + U_contact + U_bus-bar, with the overpotentials
 * from electrodeOverpotential (Butler–Volmer, optional limiting current) and κ_eff from the
 * Bruggeman relation for the gas fraction in the gap. Returns the seven values in the order of
 * BREAKDOWN_LABELS; the last is the sum.
 *
 * Syntax: cellVoltageBreakdown(inputs)
 * Example: U_rev 1.18 V, 3000 A/m², anode i0 1e-3 A/m² α 1.5, cathode i0 1 A/m² α 0.5, gap 2 mm,
 *   κ 100 S/m, no gas, no contact or bus-bar drop, 80 °C → [1.18, 0.3026, 0.4873, 0.06, 0, 0, 2.0299]
 * See also: electrodeOverpotential, ohmicDrop, bruggemanConductivity
 */
export function cellVoltageBreakdown(p: BreakdownInputs): number[] {
  const etaA = electrodeOverpotential(p.currentDensityA_m2, p.anodeI0A_m2, p.anodeAlpha, p.anodeLimitA_m2, p.temperatureC);
  const etaC = electrodeOverpotential(p.currentDensityA_m2, p.cathodeI0A_m2, p.cathodeAlpha, p.cathodeLimitA_m2, p.temperatureC);
  const ohmic = ohmicDrop(p.currentDensityA_m2, p.gapMm, bruggemanConductivity(p.conductivityS_m, p.gasFraction));
  const total = p.reversibleV + etaA + etaC + ohmic + p.contactDropV + p.busbarDropV;
  return [p.reversibleV, etaA, etaC, ohmic, p.contactDropV, p.busbarDropV, total];
}
