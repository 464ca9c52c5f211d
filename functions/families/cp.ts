/**
 * Cathodic protection: criteria as the standards state them, survey helpers, galvanic-anode design
 * (DNV-RP-B401 / ISO 15589-2), impressed-current groundbeds and circuits, soil and seawater
 * resistivity. Each argument carries its name, unit, default, domain and help text.
 */
import { PLAUSIBLE, plausible } from '../../src/corrosion/plausible';
import { anodeCount } from '../../src/cp/anodeCount';
import { anodeData } from '../../src/cp/anodeData';
import { anodeLife } from '../../src/cp/anodeLife';
import { anodeMass } from '../../src/cp/anodeMass';
import { anodeOutput } from '../../src/cp/anodeOutput';
import { anodeResistance } from '../../src/cp/anodeResistance';
import { cableDrop } from '../../src/cp/cableDrop';
import { coatingBreakdown } from '../../src/cp/coatingBreakdown';
import { currentDemand } from '../../src/cp/currentDemand';
import { groundbedResistance } from '../../src/cp/groundbedResistance';
import { irDrop } from '../../src/cp/irDrop';
import { layerResistivity } from '../../src/cp/layerResistivity';
import { polarisationShift } from '../../src/cp/polarisationShift';
import { protectionCriterion } from '../../src/cp/protectionCriterion';
import { readingAt25 } from '../../src/cp/readingAt25';
import { rectifierVoltage } from '../../src/cp/rectifierVoltage';
import { seawaterResistivity } from '../../src/cp/seawaterResistivity';
import { wennerResistivity } from '../../src/cp/wennerResistivity';
import type { ElectrodeRow } from '../../src/table/types';
import { type ArgSpec, type Domain, domains, worksheet } from '../adapter';

/** An argument with its help text (the spec carries it for the generated reference). */
type Arg = ArgSpec & { readonly help: string };
const arg = (a: Arg): Arg => a;
const req = (name: string, unit: string, domain: Domain, help: string): Arg => arg({ name, kind: 'number', unit, domain, help });
const opt = (name: string, unit: string, def: number | string | null, domain: Domain, help: string): Arg =>
  arg({ name, kind: 'number', optional: true, default: def, unit, domain, help });
const text = (name: string, help: string, def?: string): Arg =>
  arg(def === undefined ? { name, kind: 'text', unit: '', help } : { name, kind: 'text', optional: true, default: def, unit: '', help });

const fraction = domains.fraction;
const volts = (name: string, help: string): Arg => req(name, 'V', domains.any, help);
const V = (name: string, x: number): number => plausible(name, x, PLAUSIBLE.volts);

export const PROTECTIONCRITERION = worksheet({
  id: 'PROTECTIONCRITERION',
  description: 'The cathodic-protection criterion the standards state for the reference electrode used, in V on that electrode (a criterion, never a verdict): −0.85 V CSE (NACE/AMPP SP0169; ISO 15589-1 Table 1; EN 12954), −0.80 V Ag/AgCl/seawater (DNV-RP-B401 Sec. 5; ISO 15589-2 §5.2; 49 CFR 192 App. D §IV.A), −0.78 V saturated calomel (49 CFR 192 App. D §IV.A), +0.25 V vs zinc; "polarisation" gives the 100 mV shift; "anaerobic" gives −0.95 V CSE where sulfate-reducing bacteria are active (ISO 15589-1, as quoted). Compare a reading with the criterion stated for its own electrode, not a converted one; the clause and source are in the reference and in data/cp-criteria.json. #N/A with where to look for values Cellwright does not hold (anaerobic seawater or sediments, high temperature, high-strength steels, the most negative potential "limit").',
  args: [
    arg({ name: 'electrode', kind: 'electrode', unit: '', help: 'Reference electrode of the reading: "CSE", "Ag/AgCl/seawater", "SCE" or "Zn/seawater".' }),
    text('condition', '"standard", "polarisation", "limit", "anaerobic", "hightemperature" or "highstrength" (default "standard").', 'standard'),
  ],
  result: 'Criterion in V on the electrode (a shift in V for "polarisation").',
  helpAnchor: 'protectioncriterion',
  compute: (row: ElectrodeRow, condition: string) => protectionCriterion(row.key, condition).value,
  usesTable: true,
});

export const POLARIZATIONSHIFT = worksheet({
  id: 'POLARIZATIONSHIFT',
  description: 'Cathodic polarisation native − instant-OFF, in V (positive when polarised cathodically), for comparison with the 100 mV criterion where the standard allows it. Both readings on the same electrode; values like −850 are refused as millivolts.',
  args: [volts('instant_off_V', 'Instant-OFF potential, V.'), volts('native_V', 'Native (static) potential before protection, V.')],
  result: 'Polarisation shift in V.',
  helpAnchor: 'polarizationshift',
  compute: (off: number, native: number) => polarisationShift(V('instant_off_V', off), V('native_V', native)),
});

export const IRDROP = worksheet({
  id: 'IRDROP',
  description: 'IR drop ON − instant-OFF, in V: negative when protective current flows onto the structure; positive means current leaving the structure there (interference) or swapped readings, for the CP engineer to check. The instant-OFF reading is the estimate of the IR-free (polarised) potential; an ON reading is not IR-free.',
  args: [volts('on_V', 'ON potential (current flowing), V.'), volts('instant_off_V', 'Instant-OFF potential, V.')],
  result: 'IR drop in V.',
  helpAnchor: 'irdrop',
  compute: (on: number, off: number) => irDrop(V('on_V', on), V('instant_off_V', off)),
});

export const READINGAT25 = worksheet({
  id: 'READINGAT25',
  description: 'A reading referred to its reference electrode at 25 °C, correcting for the electrode’s own temperature: E + E_ref(T) − E_ref(25 °C), with the table’s electrode potential at temperature (#N/A where the table knows the electrode only at 25 °C).',
  args: [
    volts('reading_V', 'Reading against the electrode, V.'),
    arg({ name: 'electrode', kind: 'electrode', unit: '', help: 'Reference electrode used (e.g. "CSE").' }),
    req('electrode_temperature_C', '°C', domains.temperature, 'Temperature of the electrode itself, °C (0 to 100).'),
  ],
  result: 'Reading in V on the electrode at 25 °C.',
  helpAnchor: 'readingat25',
  compute: (e: number, row: ElectrodeRow, t: number) => readingAt25(V('reading_V', e), row, t),
  usesTable: true,
});

export const COATINGBREAKDOWN = worksheet({
  id: 'COATINGBREAKDOWN',
  description: 'Coating breakdown factor of DNV-RP-B401 §6.4, fc = a + b·t: initial a, mean a + b·t/2, final a + b·t (capped at 1; mean 1 − (1 − a)²/(2bt) once the coating is used up, §6.4.5).',
  args: [
    req('a', '', fraction, 'Initial breakdown a (0 to 1).'),
    req('b', '1/year', fraction, 'Yearly breakdown b (per year, 0 to 1).'),
    req('design_life_years', 'years', domains.nonNegative, 'Design life in years (0 to 200).'),
    text('phase', '"initial", "mean" or "final" (default "mean").', 'mean'),
  ],
  result: 'Breakdown factor (0 to 1).',
  helpAnchor: 'coatingbreakdown',
  compute: (a: number, b: number, t: number, phase: string) => coatingBreakdown(a, b, plausible('design_life_years', t, PLAUSIBLE.years), phase),
});

export const CURRENTDEMAND = worksheet({
  id: 'CURRENTDEMAND',
  description: 'Current demand Ic = A·ic·fc in A (DNV-RP-B401 §7.3; ISO 15589-2), for the initial, mean or final phase.',
  args: [
    req('area_m2', 'm²', domains.nonNegative, 'Surface area, m².'),
    req('current_density_A_m2', 'A/m²', domains.nonNegative, 'Design current density, A/m² (above 5 refused as mA/m²).'),
    opt('breakdown_factor', '', 1, fraction, 'Coating breakdown factor, 0 to 1 (default 1, bare).'),
  ],
  result: 'Current in A.',
  helpAnchor: 'currentdemand',
  compute: currentDemand,
});

export const ANODEMASS = worksheet({
  id: 'ANODEMASS',
  description: 'Net anode mass M = I·t·8760/(u·ε) in kg (DNV-RP-B401 §7.6.2; ISO 15589-2): divides by the utilisation and the capacity, so a less efficient anode needs more metal.',
  args: [
    req('mean_current_A', 'A', domains.nonNegative, 'Mean current demand, A.'),
    req('design_life_years', 'years', domains.nonNegative, 'Design life, years (0 to 200).'),
    req('capacity_Ah_per_kg', 'A·h/kg', domains.positive, 'Electrochemical capacity, A·h/kg (100 to 3000; ANODEDATA).'),
    req('utilisation', '', domains.efficiency, 'Utilisation factor, (0, 1].'),
  ],
  result: 'Mass in kg.',
  helpAnchor: 'anodemass',
  compute: anodeMass,
});

export const ANODELIFE = worksheet({
  id: 'ANODELIFE',
  description: 'Anode life L = m·u·ε/(I·8760) in years, the inverse of ANODEMASS (DNV-RP-B401 §7.6.2).',
  args: [
    req('net_mass_kg', 'kg', domains.nonNegative, 'Net anode mass, kg.'),
    req('capacity_Ah_per_kg', 'A·h/kg', domains.positive, 'Capacity, A·h/kg.'),
    req('utilisation', '', domains.efficiency, 'Utilisation factor, (0, 1].'),
    req('mean_current_A', 'A', domains.positive, 'Mean current, A.'),
  ],
  result: 'Life in years.',
  helpAnchor: 'anodelife',
  compute: anodeLife,
});

const len = (name: string, help: string): Arg => opt(name, 'm', null, domains.positive, help);
export const ANODERESISTANCE = worksheet({
  id: 'ANODERESISTANCE',
  description: 'Anode resistance in Ω by DNV-RP-B401 Table 10-7: long slender stand-off (L ≥ 4r) ρ/(2πL)(ln(4L/r) − 1); short slender stand-off (L < 4r); long flush-mounted (L ≥ 4 × width and thickness) ρ/(2S), S = (L + width)/2; bracelet and short flush-mounted 0.315ρ/√A. Stand-off formulas for anodes at least 0.30 m off the surface (×1.3 from 0.15 to 0.30 m). Dimensions outside a shape’s condition are refused with the shape to use.',
  args: [
    text('shape', '"long-standoff", "short-standoff", "long-flush" or "bracelet".'),
    req('resistivity_ohm_m', 'Ω·m', domains.positive, 'Electrolyte resistivity, Ω·m.'),
    len('length_m', 'Anode length, m.'),
    len('radius_m', 'Equivalent radius, m (stand-off).'),
    len('width_m', 'Width, m (long-flush).'),
    len('thickness_m', 'Thickness, m (long-flush).'),
    opt('area_m2', 'm²', null, domains.positive, 'Exposed area, m² (bracelet).'),
    opt('standoff_m', 'm', null, domains.nonNegative, 'Distance to the surface, m (stand-off; omitted = at least 0.30 m).'),
  ],
  result: 'Resistance in Ω.',
  helpAnchor: 'anoderesistance',
  compute: (shape: string, rho: number, L: number | null, r: number | null, w: number | null, t: number | null, A: number | null, so: number | null) =>
    anodeResistance(shape, rho, { lengthM: L, radiusM: r, widthM: w, thicknessM: t, areaM2: A, standoffM: so }),
});

export const ANODEOUTPUT = worksheet({
  id: 'ANODEOUTPUT',
  description: 'Current output of one anode (Ec − Ea)/Ra in A (DNV-RP-B401 §7.7): the design driving voltage between the protective potential and the anode’s closed-circuit potential, over its resistance.',
  args: [
    volts('protection_V', 'Design protective potential, V (e.g. −0.80 Ag/AgCl/seawater).'),
    volts('anode_potential_V', 'Anode closed-circuit potential on the same electrode, V.'),
    req('resistance_ohm', 'Ω', domains.positive, 'Anode resistance, Ω.'),
  ],
  result: 'Current in A.',
  helpAnchor: 'anodeoutput',
  compute: anodeOutput,
});

export const ANODECOUNT = worksheet({
  id: 'ANODECOUNT',
  description: 'Number of anodes (DNV-RP-B401 §7.8): demand/output rounded up, or the mass requirement when masses are given, whichever is larger. Check both the initial and the final demand.',
  args: [
    req('current_demand_A', 'A', domains.nonNegative, 'Current demand, A.'),
    req('output_per_anode_A', 'A', domains.positive, 'Output of one anode, A.'),
    opt('total_mass_kg', 'kg', null, domains.nonNegative, 'Total net mass needed, kg.'),
    opt('net_mass_per_anode_kg', 'kg', null, domains.positive, 'Net mass of one anode, kg.'),
  ],
  result: 'A whole number of anodes.',
  helpAnchor: 'anodecount',
  compute: anodeCount,
});

export const ANODEDATA = worksheet({
  id: 'ANODEDATA',
  description: 'Data of a galvanic-anode material from data/anodes.json (zinc in seawater and magnesium, from handbooks): capacity in A·h/kg, closed-circuit potential in V, its reference electrode, or the source. Al-Zn-In and anodes in sediment answer #N/A: take their design values from DNV-RP-B401 Table 10-6, ISO 15589-2 or the supplier\'s qualified data. The supplier\'s data for the alloy bought take precedence.',
  args: [
    text('anode', '"Zn/seawater", "Mg/standard" or "Mg/high-potential" ("Al-Zn-In/…" and "…/sediment" answer #N/A naming the standard).'),
    text('property', '"capacity", "potential", "scale" or "source" (default "capacity").', 'capacity'),
  ],
  result: 'A number or text.',
  helpAnchor: 'anodedata',
  compute: anodeData,
});

export const GROUNDBEDRESISTANCE = worksheet({
  id: 'GROUNDBEDRESISTANCE',
  description: 'Impressed-current groundbed resistance in Ω: one vertical anode (Dwight 1936, ρ/(2πL)(ln(8L/d) − 1), the shape function K of MIL-HDBK-1004/10 §6.2.1.4a), one horizontal anode at depth (Dwight), or N vertical anodes in a line, Rv/N + ρ/(πN²S)·Σ(N − k)/k (the paralleling factor of MIL-HDBK-1004/10 §6.2.1.4b; Sunde’s ln(0.656N) is its large-N form). Spacing at least one anode length.',
  args: [
    text('layout', '"vertical", "horizontal" or "parallel".'),
    req('resistivity_ohm_m', 'Ω·m', domains.positive, 'Soil resistivity, Ω·m.'),
    req('length_m', 'm', domains.positive, 'Anode length, m.'),
    req('diameter_m', 'm', domains.positive, 'Anode diameter, m.'),
    opt('count', '', 1, domains.positiveInteger, 'Number of anodes (parallel: 2 to 1000; default 1).'),
    opt('spacing_m', 'm', null, domains.positive, 'Centre-to-centre spacing, m (parallel; at least the anode length).'),
    opt('depth_m', 'm', null, domains.positive, 'Depth, m (horizontal).'),
  ],
  result: 'Resistance in Ω.',
  helpAnchor: 'groundbedresistance',
  compute: groundbedResistance,
});

export const RECTIFIERVOLTAGE = worksheet({
  id: 'RECTIFIERVOLTAGE',
  description: 'Rectifier voltage I·R + back EMF in V for an impressed-current circuit.',
  args: [
    req('current_A', 'A', domains.nonNegative, 'Current, A.'),
    req('circuit_resistance_ohm', 'Ω', domains.nonNegative, 'Circuit resistance (groundbed + cables + structure), Ω.'),
    opt('back_emf_V', 'V', 2, domains.nonNegative, 'Back EMF, V (default 2).'),
  ],
  result: 'Voltage in V.',
  helpAnchor: 'rectifiervoltage',
  compute: rectifierVoltage,
});

export const CABLEDROP = worksheet({
  id: 'CABLEDROP',
  description: 'Voltage drop I·R′·ℓ in a DC cable, in V.',
  args: [
    req('current_A', 'A', domains.nonNegative, 'Current, A.'),
    req('length_m', 'm', domains.nonNegative, 'Conductor length, m.'),
    req('resistance_ohm_per_km', 'Ω/km', domains.positive, 'Conductor resistance, Ω/km.'),
  ],
  result: 'Voltage drop in V.',
  helpAnchor: 'cabledrop',
  compute: cableDrop,
});

export const WENNERRESISTIVITY = worksheet({
  id: 'WENNERRESISTIVITY',
  description: 'Apparent soil resistivity by the Wenner four-pin method, 2π·a·R, in Ω·m (ASTM G57).',
  args: [req('spacing_m', 'm', domains.positive, 'Pin spacing a, m.'), req('resistance_ohm', 'Ω', domains.nonNegative, 'Measured resistance, Ω.')],
  result: 'Resistivity in Ω·m.',
  helpAnchor: 'wennerresistivity',
  compute: wennerResistivity,
});

export const LAYERRESISTIVITY = worksheet({
  id: 'LAYERRESISTIVITY',
  description: 'Resistivity of the layer between two Wenner spacings (Barnes layer method), 2π(a2 − a1)/(1/R2 − 1/R1), in Ω·m.',
  args: [
    req('spacing1_m', 'm', domains.positive, 'Smaller spacing a1, m.'),
    req('resistance1_ohm', 'Ω', domains.positive, 'Resistance at a1, Ω.'),
    req('spacing2_m', 'm', domains.positive, 'Larger spacing a2, m.'),
    req('resistance2_ohm', 'Ω', domains.positive, 'Resistance at a2, Ω.'),
  ],
  result: 'Resistivity in Ω·m.',
  helpAnchor: 'layerresistivity',
  compute: layerResistivity,
});

export const SEAWATERRESISTIVITY = worksheet({
  id: 'SEAWATERRESISTIVITY',
  description: 'Seawater resistivity in Ω·m from practical salinity and temperature at atmospheric pressure, by PSS-78 (UNESCO 1983; C(35, 15 °C) = 42.914 mS/cm). Salinity 2 to 42, −2 to 35 °C.',
  args: [
    req('salinity', '', domains.positive, 'Practical salinity (open sea about 35).'),
    req('temperature_C', '°C', domains.temperature, 'Temperature, °C.'),
  ],
  result: 'Resistivity in Ω·m.',
  helpAnchor: 'seawaterresistivity',
  compute: seawaterResistivity,
});
