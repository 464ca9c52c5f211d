/**
 * Worksheet declarations: cathodic protection (criteria, survey, galvanic-anode design, impressed current, resistivity).
 *
 * Each declaration is JSDoc for custom-functions-metadata-plugin and a body of one call into the
 * adapter-built function of the same id in functions/families/cp.ts.
 */
/* eslint-disable @typescript-eslint/no-explicit-any */
import * as F from '../families/cp';

/**
 * The cathodic-protection criterion the standards state for the reference electrode used, in V on that electrode (a criterion, never a verdict): −0.85 V CSE (NACE/AMPP SP0169; ISO 15589-1 Table 1; EN 12954), −0.80 V Ag/AgCl/seawater (DNV-RP-B401 Sec. 5; ISO 15589-2 §5.2), +0.25 V vs zinc; "polarisation" gives the 100 mV shift; "limit" the most negative potential in seawater (−1.10 V Ag/AgCl, ISO 15589-2 §5.2). Compare a reading with the criterion stated for its own electrode, not a converted one; the clause and source are in the reference and in data/cp-criteria.json. #N/A with where to look for conditions whose value Cellwright does not hold (anaerobic/SRB, high temperature, high-strength steels).
 * @customfunction PROTECTIONCRITERION
 * @helpurl https://localhost:3000/docs/functions.html#protectioncriterion
 * @param electrode Reference electrode of the reading: "CSE", "Ag/AgCl/seawater" or "Zn/seawater".
 * @param [condition] "standard" (default), "polarisation", "limit", "anaerobic", "hightemperature" or "highstrength".
 * @returns Criterion in V on the electrode (a shift in V for "polarisation").
 */
function protectionCriterion(electrode: any[][], condition?: any[][]): any[][] {
  return F.PROTECTIONCRITERION(electrode, condition) as any;
}

/**
 * Cathodic polarisation native − instant-OFF, in V (positive when polarised cathodically), for comparison with the 100 mV criterion where the standard allows it. Both readings on the same electrode; values like −850 are refused as millivolts.
 * @customfunction POLARIZATIONSHIFT
 * @helpurl https://localhost:3000/docs/functions.html#polarizationshift
 * @param instant_off_V Instant-OFF potential, V.
 * @param native_V Native (static) potential before protection, V.
 * @returns Polarisation shift in V.
 */
function polarizationShift(instant_off_V: any[][], native_V: any[][]): any[][] {
  return F.POLARIZATIONSHIFT(instant_off_V, native_V) as any;
}

/**
 * IR drop ON − instant-OFF, in V: negative when protective current flows onto the structure; positive means current leaving the structure there (interference) or swapped readings, for the CP engineer to check. The instant-OFF reading is the estimate of the IR-free (polarised) potential; an ON reading is not IR-free.
 * @customfunction IRDROP
 * @helpurl https://localhost:3000/docs/functions.html#irdrop
 * @param on_V ON potential (current flowing), V.
 * @param instant_off_V Instant-OFF potential, V.
 * @returns IR drop in V.
 */
function irDrop(on_V: any[][], instant_off_V: any[][]): any[][] {
  return F.IRDROP(on_V, instant_off_V) as any;
}

/**
 * A reading referred to its reference electrode at 25 °C, correcting for the electrode’s own temperature: E + E_ref(T) − E_ref(25 °C), with the table’s electrode potential at temperature (#N/A where the table knows the electrode only at 25 °C).
 * @customfunction READINGAT25
 * @helpurl https://localhost:3000/docs/functions.html#readingat25
 * @param reading_V Reading against the electrode, V.
 * @param electrode Reference electrode used (e.g. "CSE").
 * @param electrode_temperature_C Temperature of the electrode itself, °C (0 to 100).
 * @returns Reading in V on the electrode at 25 °C.
 */
function readingAt25(reading_V: any[][], electrode: any[][], electrode_temperature_C: any[][]): any[][] {
  return F.READINGAT25(reading_V, electrode, electrode_temperature_C) as any;
}

/**
 * Coating breakdown factor of DNV-RP-B401 §6.4, fc = a + b·t: initial a, mean a + b·t/2, final a + b·t (capped at 1; mean 1 − (1 − a)²/(2bt) once the coating is used up, §6.4.5).
 * @customfunction COATINGBREAKDOWN
 * @helpurl https://localhost:3000/docs/functions.html#coatingbreakdown
 * @param a Initial breakdown a (0 to 1).
 * @param b Yearly breakdown b (per year, 0 to 1).
 * @param design_life_years Design life in years (0 to 200).
 * @param [phase] "initial", "mean" (default) or "final".
 * @returns Breakdown factor (0 to 1).
 */
function coatingBreakdown(a: any[][], b: any[][], design_life_years: any[][], phase?: any[][]): any[][] {
  return F.COATINGBREAKDOWN(a, b, design_life_years, phase) as any;
}

/**
 * Current demand Ic = A·ic·fc in A (DNV-RP-B401 §7.3; ISO 15589-2), for the initial, mean or final phase.
 * @customfunction CURRENTDEMAND
 * @helpurl https://localhost:3000/docs/functions.html#currentdemand
 * @param area_m2 Surface area, m².
 * @param current_density_A_m2 Design current density, A/m² (above 5 refused as mA/m²).
 * @param [breakdown_factor] Coating breakdown factor, 0 to 1 (default 1, bare).
 * @returns Current in A.
 */
function currentDemand(area_m2: any[][], current_density_A_m2: any[][], breakdown_factor?: any[][]): any[][] {
  return F.CURRENTDEMAND(area_m2, current_density_A_m2, breakdown_factor) as any;
}

/**
 * Net anode mass M = I·t·8760/(u·ε) in kg (DNV-RP-B401 §7.6.2; ISO 15589-2): divides by the utilisation and the capacity, so a less efficient anode needs more metal.
 * @customfunction ANODEMASS
 * @helpurl https://localhost:3000/docs/functions.html#anodemass
 * @param mean_current_A Mean current demand, A.
 * @param design_life_years Design life, years (0 to 200).
 * @param capacity_Ah_per_kg Electrochemical capacity, A·h/kg (100 to 3000; ANODEDATA).
 * @param utilisation Utilisation factor, (0, 1].
 * @returns Mass in kg.
 */
function anodeMass(mean_current_A: any[][], design_life_years: any[][], capacity_Ah_per_kg: any[][], utilisation: any[][]): any[][] {
  return F.ANODEMASS(mean_current_A, design_life_years, capacity_Ah_per_kg, utilisation) as any;
}

/**
 * Anode life L = m·u·ε/(I·8760) in years, the inverse of ANODEMASS (DNV-RP-B401 §7.6.2).
 * @customfunction ANODELIFE
 * @helpurl https://localhost:3000/docs/functions.html#anodelife
 * @param net_mass_kg Net anode mass, kg.
 * @param capacity_Ah_per_kg Capacity, A·h/kg.
 * @param utilisation Utilisation factor, (0, 1].
 * @param mean_current_A Mean current, A.
 * @returns Life in years.
 */
function anodeLife(net_mass_kg: any[][], capacity_Ah_per_kg: any[][], utilisation: any[][], mean_current_A: any[][]): any[][] {
  return F.ANODELIFE(net_mass_kg, capacity_Ah_per_kg, utilisation, mean_current_A) as any;
}

/**
 * Anode resistance in Ω by DNV-RP-B401 Table 10-7: long slender stand-off (L ≥ 4r) ρ/(2πL)(ln(4L/r) − 1); short slender stand-off (L < 4r); long flush-mounted (L ≥ 4 × width and thickness) ρ/(2S), S = (L + width)/2; bracelet and short flush-mounted 0.315ρ/√A. Stand-off formulas for anodes at least 0.30 m off the surface (×1.3 from 0.15 to 0.30 m). Dimensions outside a shape’s condition are refused with the shape to use.
 * @customfunction ANODERESISTANCE
 * @helpurl https://localhost:3000/docs/functions.html#anoderesistance
 * @param shape "long-standoff", "short-standoff", "long-flush" or "bracelet".
 * @param resistivity_ohm_m Electrolyte resistivity, Ω·m.
 * @param [length_m] Anode length, m.
 * @param [radius_m] Equivalent radius, m (stand-off).
 * @param [width_m] Width, m (long-flush).
 * @param [thickness_m] Thickness, m (long-flush).
 * @param [area_m2] Exposed area, m² (bracelet).
 * @param [standoff_m] Distance to the surface, m (stand-off; omitted = at least 0.30 m).
 * @returns Resistance in Ω.
 */
function anodeResistance(shape: any[][], resistivity_ohm_m: any[][], length_m?: any[][], radius_m?: any[][], width_m?: any[][], thickness_m?: any[][], area_m2?: any[][], standoff_m?: any[][]): any[][] {
  return F.ANODERESISTANCE(shape, resistivity_ohm_m, length_m, radius_m, width_m, thickness_m, area_m2, standoff_m) as any;
}

/**
 * Current output of one anode (Ec − Ea)/Ra in A (DNV-RP-B401 §7.7): the design driving voltage between the protective potential and the anode’s closed-circuit potential, over its resistance.
 * @customfunction ANODEOUTPUT
 * @helpurl https://localhost:3000/docs/functions.html#anodeoutput
 * @param protection_V Design protective potential, V (e.g. −0.80 Ag/AgCl/seawater).
 * @param anode_potential_V Anode closed-circuit potential on the same electrode, V.
 * @param resistance_ohm Anode resistance, Ω.
 * @returns Current in A.
 */
function anodeOutput(protection_V: any[][], anode_potential_V: any[][], resistance_ohm: any[][]): any[][] {
  return F.ANODEOUTPUT(protection_V, anode_potential_V, resistance_ohm) as any;
}

/**
 * Number of anodes (DNV-RP-B401 §7.8): demand/output rounded up, or the mass requirement when masses are given, whichever is larger. Check both the initial and the final demand.
 * @customfunction ANODECOUNT
 * @helpurl https://localhost:3000/docs/functions.html#anodecount
 * @param current_demand_A Current demand, A.
 * @param output_per_anode_A Output of one anode, A.
 * @param [total_mass_kg] Total net mass needed, kg.
 * @param [net_mass_per_anode_kg] Net mass of one anode, kg.
 * @returns A whole number of anodes.
 */
function anodeCount(current_demand_A: any[][], output_per_anode_A: any[][], total_mass_kg?: any[][], net_mass_per_anode_kg?: any[][]): any[][] {
  return F.ANODECOUNT(current_demand_A, output_per_anode_A, total_mass_kg, net_mass_per_anode_kg) as any;
}

/**
 * Design data of a galvanic-anode material from data/anodes.json (DNV-RP-B401 Table 10-6 for Al-Zn-In and Zn; a handbook for Mg): capacity in A·h/kg, closed-circuit potential in V, its reference electrode, or the source.
 * @customfunction ANODEDATA
 * @helpurl https://localhost:3000/docs/functions.html#anodedata
 * @param anode "Al-Zn-In/seawater", "Al-Zn-In/sediment", "Zn/seawater", "Zn/sediment", "Mg/standard" or "Mg/high-potential".
 * @param [property] "capacity" (default), "potential", "scale" or "source".
 * @returns A number or text.
 */
function anodeData(anode: any[][], property?: any[][]): any[][] {
  return F.ANODEDATA(anode, property) as any;
}

/**
 * Impressed-current groundbed resistance in Ω: one vertical anode (Dwight 1936, ρ/(2πL)(ln(8L/d) − 1)), one horizontal anode at depth (Dwight), or N vertical anodes in a line (parallel-anode formula after Sunde).
 * @customfunction GROUNDBEDRESISTANCE
 * @helpurl https://localhost:3000/docs/functions.html#groundbedresistance
 * @param layout "vertical", "horizontal" or "parallel".
 * @param resistivity_ohm_m Soil resistivity, Ω·m.
 * @param length_m Anode length, m.
 * @param diameter_m Anode diameter, m.
 * @param [count] Number of anodes (parallel).
 * @param [spacing_m] Spacing, m (parallel).
 * @param [depth_m] Depth, m (horizontal).
 * @returns Resistance in Ω.
 */
function groundbedResistance(layout: any[][], resistivity_ohm_m: any[][], length_m: any[][], diameter_m: any[][], count?: any[][], spacing_m?: any[][], depth_m?: any[][]): any[][] {
  return F.GROUNDBEDRESISTANCE(layout, resistivity_ohm_m, length_m, diameter_m, count, spacing_m, depth_m) as any;
}

/**
 * Rectifier voltage I·R + back EMF in V for an impressed-current circuit.
 * @customfunction RECTIFIERVOLTAGE
 * @helpurl https://localhost:3000/docs/functions.html#rectifiervoltage
 * @param current_A Current, A.
 * @param circuit_resistance_ohm Circuit resistance (groundbed + cables + structure), Ω.
 * @param [back_emf_V] Back EMF, V (default 2).
 * @returns Voltage in V.
 */
function rectifierVoltage(current_A: any[][], circuit_resistance_ohm: any[][], back_emf_V?: any[][]): any[][] {
  return F.RECTIFIERVOLTAGE(current_A, circuit_resistance_ohm, back_emf_V) as any;
}

/**
 * Voltage drop I·R′·ℓ in a DC cable, in V.
 * @customfunction CABLEDROP
 * @helpurl https://localhost:3000/docs/functions.html#cabledrop
 * @param current_A Current, A.
 * @param length_m Conductor length, m.
 * @param resistance_ohm_per_km Conductor resistance, Ω/km.
 * @returns Voltage drop in V.
 */
function cableDrop(current_A: any[][], length_m: any[][], resistance_ohm_per_km: any[][]): any[][] {
  return F.CABLEDROP(current_A, length_m, resistance_ohm_per_km) as any;
}

/**
 * Apparent soil resistivity by the Wenner four-pin method, 2π·a·R, in Ω·m (ASTM G57).
 * @customfunction WENNERRESISTIVITY
 * @helpurl https://localhost:3000/docs/functions.html#wennerresistivity
 * @param spacing_m Pin spacing a, m.
 * @param resistance_ohm Measured resistance, Ω.
 * @returns Resistivity in Ω·m.
 */
function wennerResistivity(spacing_m: any[][], resistance_ohm: any[][]): any[][] {
  return F.WENNERRESISTIVITY(spacing_m, resistance_ohm) as any;
}

/**
 * Resistivity of the layer between two Wenner spacings (Barnes layer method), 2π(a2 − a1)/(1/R2 − 1/R1), in Ω·m.
 * @customfunction LAYERRESISTIVITY
 * @helpurl https://localhost:3000/docs/functions.html#layerresistivity
 * @param spacing1_m Smaller spacing a1, m.
 * @param resistance1_ohm Resistance at a1, Ω.
 * @param spacing2_m Larger spacing a2, m.
 * @param resistance2_ohm Resistance at a2, Ω.
 * @returns Resistivity in Ω·m.
 */
function layerResistivity(spacing1_m: any[][], resistance1_ohm: any[][], spacing2_m: any[][], resistance2_ohm: any[][]): any[][] {
  return F.LAYERRESISTIVITY(spacing1_m, resistance1_ohm, spacing2_m, resistance2_ohm) as any;
}

/**
 * Seawater resistivity in Ω·m from practical salinity and temperature at atmospheric pressure, by PSS-78 (UNESCO 1983; C(35, 15 °C) = 42.914 mS/cm). Salinity 2 to 42, −2 to 35 °C.
 * @customfunction SEAWATERRESISTIVITY
 * @helpurl https://localhost:3000/docs/functions.html#seawaterresistivity
 * @param salinity Practical salinity (open sea about 35).
 * @param temperature_C Temperature, °C.
 * @returns Resistivity in Ω·m.
 */
function seawaterResistivity(salinity: any[][], temperature_C: any[][]): any[][] {
  return F.SEAWATERRESISTIVITY(salinity, temperature_C) as any;
}
