/**
 * Worksheet declarations: electrolysis and electrowinning cells (conductivity, ohmic drop, the
 * cell-voltage breakdown, decomposition voltage, efficiency, heat and gas production).
 *
 * Each declaration is JSDoc for custom-functions-metadata-plugin and a body of one call into the
 * adapter-built function of the same id in functions/families/electrolysis.ts.
 */
/* eslint-disable @typescript-eslint/no-explicit-any */
import * as F from '../families/electrolysis';

/**
 * Specific conductivity of an electrolyte from a published correlation, in S/m. KOH: Gilliam et al., Int. J. Hydrogen Energy 32 (2007) 359, 0–12 mol/L and 0–100 °C; outside its range the answer is #VALUE! with the range (never an extrapolation).
 * @customfunction CONDUCTIVITY
 * @helpurl https://localhost:3000/docs/functions.html#conductivity
 * @param electrolyte Electrolyte name: "KOH".
 * @param concentration_mol_L Concentration in mol per litre of solution (30 wt % KOH is about 6.9 mol/L at 25 °C).
 * @param [temperature_C] Temperature in °C (default 25).
 * @returns Conductivity in S/m (1 S/cm = 100 S/m).
 */
function conductivity(electrolyte: any[][], concentration_mol_L: any[][], temperature_C?: any[][]): any[][] {
  return F.CONDUCTIVITY(electrolyte, concentration_mol_L, temperature_C) as any;
}

/**
 * Effective conductivity of an electrolyte holding gas bubbles, by Bruggeman: κ·(1 − ε)^1.5, in S/m.
 * @customfunction BRUGGEMAN
 * @helpurl https://localhost:3000/docs/functions.html#bruggeman
 * @param conductivity_S_m Conductivity of the gas-free electrolyte, in S/m.
 * @param gas_fraction Volume fraction of gas in the gap, 0 up to (not including) 1 (a fraction, not a percentage).
 * @returns Effective conductivity in S/m.
 */
function bruggeman(conductivity_S_m: any[][], gas_fraction: any[][]): any[][] {
  return F.BRUGGEMAN(conductivity_S_m, gas_fraction) as any;
}

/**
 * Ohmic (IR) drop across an electrolyte gap, j·gap/κ, with κ reduced by Bruggeman for a gas fraction, in V.
 * @customfunction OHMICDROP
 * @helpurl https://localhost:3000/docs/functions.html#ohmicdrop
 * @param current_density_A_m2 Current density, in A/m² (1 A/cm² = 10,000 A/m²).
 * @param gap_mm Electrode gap (electrolyte path), in mm.
 * @param conductivity_S_m Conductivity of the gas-free electrolyte, in S/m.
 * @param [gas_fraction] Volume fraction of gas in the gap, 0 to below 1 (default 0).
 * @returns Voltage drop in V.
 */
function ohmicDrop(current_density_A_m2: any[][], gap_mm: any[][], conductivity_S_m: any[][], gas_fraction?: any[][]): any[][] {
  return F.OHMICDROP(current_density_A_m2, gap_mm, conductivity_S_m, gas_fraction) as any;
}

/**
 * Cell voltage breakdown, a row of 7 positive voltages: reversible, anode and cathode overpotentials (Butler–Volmer with equal forward and reverse coefficients, and the limiting-current factor where given), ohmic drop (Bruggeman for gas), contact drop, bus-bar drop, and their sum. A column of inputs gives one row each; header TRUE puts labels on top. Electrolysis-side convention: every part is what the cell needs, so all are positive.
 * @customfunction CELLVOLTAGE
 * @helpurl https://localhost:3000/docs/functions.html#cellvoltage
 * @param reversible_V Reversible (decomposition) voltage at the conditions, in V, positive (from DECOMPOSITIONVOLTAGE or a thermodynamic calculation).
 * @param current_density_A_m2 Current density, in A/m².
 * @param anode_i0_A_m2 Exchange current density of the anode reaction, in A/m².
 * @param anode_alpha Apparent transfer coefficient of the anode reaction (> 0; Tafel slope = 2.303·RT/(αF)).
 * @param cathode_i0_A_m2 Exchange current density of the cathode reaction, in A/m².
 * @param cathode_alpha Apparent transfer coefficient of the cathode reaction (> 0).
 * @param gap_mm Electrode gap, in mm.
 * @param conductivity_S_m Conductivity of the gas-free electrolyte, in S/m.
 * @param [gas_fraction] Gas volume fraction in the gap, 0 to below 1 (default 0).
 * @param [contact_V] Contact drop, in V (default 0).
 * @param [busbar_V] Bus-bar drop per cell, in V (default 0).
 * @param [anode_limit_A_m2] Limiting current density of the anode reaction, in A/m² (default none).
 * @param [cathode_limit_A_m2] Limiting current density of the cathode reaction, in A/m² (default none; metal deposition from a depleted liquor).
 * @param [temperature_C] Temperature in °C (default 25).
 * @param [header] TRUE: a row of labels above the values (default FALSE).
 * @returns Reversible, anode η, cathode η, ohmic, contact, bus-bar and total cell voltage, in V.
 */
function cellVoltage(
  reversible_V: any[][],
  current_density_A_m2: any[][],
  anode_i0_A_m2: any[][],
  anode_alpha: any[][],
  cathode_i0_A_m2: any[][],
  cathode_alpha: any[][],
  gap_mm: any[][],
  conductivity_S_m: any[][],
  gas_fraction?: any[][],
  contact_V?: any[][],
  busbar_V?: any[][],
  anode_limit_A_m2?: any[][],
  cathode_limit_A_m2?: any[][],
  temperature_C?: any[][],
  header?: any[][],
): any[][] {
  return F.CELLVOLTAGE(reversible_V, current_density_A_m2, anode_i0_A_m2, anode_alpha, cathode_i0_A_m2, cathode_alpha, gap_mm, conductivity_S_m, gas_fraction, contact_V, busbar_V, anode_limit_A_m2, cathode_limit_A_m2, temperature_C, header) as any;
}

/**
 * Decomposition voltage of an electrolysis, E(anode couple) − E(cathode couple), in V: positive when the current must force the reaction (the EMF of the same pair with the sign reversed; EMF keeps the galvanic convention, where a forced reaction is negative).
 * @customfunction DECOMPOSITIONVOLTAGE
 * @helpurl https://localhost:3000/docs/functions.html#decompositionvoltage
 * @param cathode The couple reduced at the cathode, such as "Zn2+/Zn" or "H2O/H2", or its potential in V.
 * @param anode The couple oxidised at the anode, such as "O2/H2O" or "O2/OH-", or its potential in V.
 * @param [temperature_C] Temperature in °C (default 25).
 * @returns Decomposition voltage in V (standard states; for real activities use HALFCELL values as numbers).
 */
function decompositionVoltage(cathode: any[][], anode: any[][], temperature_C?: any[][]): any[][] {
  return F.DECOMPOSITIONVOLTAGE(cathode, anode, temperature_C) as any;
}

/**
 * Voltage efficiency U_ref/U_cell of an electrolysis cell: against the thermoneutral voltage of water at 25 °C on the higher (HHV, 1.4812 V) or lower (LHV, 1.2532 V) heating value, from CODATA Key Values ΔfH° of liquid and gaseous water, or against any reference voltage given as a number.
 * @customfunction VOLTAGEEFFICIENCY
 * @helpurl https://localhost:3000/docs/functions.html#voltageefficiency
 * @param cell_voltage_V Cell voltage, in V.
 * @param [basis] "HHV" (default), "LHV", or a reference voltage in V (positive), such as a thermoneutral voltage at conditions.
 * @returns Efficiency as a fraction.
 */
function voltageEfficiency(cell_voltage_V: any[][], basis?: any[][]): any[][] {
  return F.VOLTAGEEFFICIENCY(cell_voltage_V, basis) as any;
}

/**
 * Heat given off by a stack or tankhouse section, N·I·(U − U_tn), in W: positive is heat to remove, negative heat to supply.
 * @customfunction CELLHEAT
 * @helpurl https://localhost:3000/docs/functions.html#cellheat
 * @param cells Cells in series.
 * @param current_A Current through the cells, in A.
 * @param cell_voltage_V Mean cell voltage, in V.
 * @param thermoneutral_V Thermoneutral voltage of the cell reaction, in V, positive (water at 25 °C: 1.481 V on the HHV basis).
 * @returns Heat in W.
 */
function cellHeat(cells: any[][], current_A: any[][], cell_voltage_V: any[][], thermoneutral_V: any[][]): any[][] {
  return F.CELLHEAT(cells, current_A, cell_voltage_V, thermoneutral_V) as any;
}

/**
 * DC energy per normal cubic metre of gas, U·nF/(efficiency·Vm), in kWh/Nm³ (dry ideal gas at the named reference).
 * @customfunction GASENERGY
 * @helpurl https://localhost:3000/docs/functions.html#gasenergy
 * @param cell_voltage_V Cell voltage, in V.
 * @param n Electrons per gas molecule (2 for H2, 4 for O2).
 * @param [efficiency] Faradaic efficiency as a fraction, 0 to 1 (default 1).
 * @param [reference] Reference of the normal m³: "0C" = 0 °C and 101.325 kPa (default), "15C" or "20C" (at 101.325 kPa).
 * @returns kWh/Nm³.
 */
function gasEnergy(cell_voltage_V: any[][], n: any[][], efficiency?: any[][], reference?: any[][]): any[][] {
  return F.GASENERGY(cell_voltage_V, n, efficiency, reference) as any;
}

/**
 * Gas production of cells in series, in normal m³ per hour (dry ideal gas at the named reference).
 * @customfunction GASFLOW
 * @helpurl https://localhost:3000/docs/functions.html#gasflow
 * @param current_A Current through each cell, in A.
 * @param n Electrons per gas molecule (2 for H2 and Cl2, 4 for O2).
 * @param [efficiency] Faradaic efficiency as a fraction, 0 to 1 (default 1).
 * @param [cells] Cells in series (default 1).
 * @param [reference] Reference of the normal m³: "0C" = 0 °C and 101.325 kPa (default), "15C" or "20C" (at 101.325 kPa).
 * @returns Nm³/h.
 */
function gasFlow(current_A: any[][], n: any[][], efficiency?: any[][], cells?: any[][], reference?: any[][]): any[][] {
  return F.GASFLOW(current_A, n, efficiency, cells, reference) as any;
}

/**
 * Current each cell must carry for a target gas flow in normal m³/h (the inverse of GASFLOW), in A.
 * @customfunction CURRENTFORGAS
 * @helpurl https://localhost:3000/docs/functions.html#currentforgas
 * @param flow_Nm3_h Target flow, in normal m³/h.
 * @param n Electrons per gas molecule (2 for H2 and Cl2, 4 for O2).
 * @param [efficiency] Faradaic efficiency as a fraction, 0 to 1 (default 1).
 * @param [cells] Cells in series (default 1).
 * @param [reference] Reference of the normal m³: "0C" (default), "15C" or "20C".
 * @returns Current in A.
 */
function currentForGas(flow_Nm3_h: any[][], n: any[][], efficiency?: any[][], cells?: any[][], reference?: any[][]): any[][] {
  return F.CURRENTFORGAS(flow_Nm3_h, n, efficiency, cells, reference) as any;
}

/**
 * Whole number of cells in series needed for a target gas flow at a given current (rounded up).
 * @customfunction CELLSFORGAS
 * @helpurl https://localhost:3000/docs/functions.html#cellsforgas
 * @param flow_Nm3_h Target flow, in normal m³/h.
 * @param current_A Current through the cells, in A.
 * @param n Electrons per gas molecule (2 for H2 and Cl2, 4 for O2).
 * @param [efficiency] Faradaic efficiency as a fraction, 0 to 1 (default 1).
 * @param [reference] Reference of the normal m³: "0C" (default), "15C" or "20C".
 * @returns Number of cells.
 */
function cellsForGas(flow_Nm3_h: any[][], current_A: any[][], n: any[][], efficiency?: any[][], reference?: any[][]): any[][] {
  return F.CELLSFORGAS(flow_Nm3_h, current_A, n, efficiency, reference) as any;
}

/**
 * Faradaic efficiency from a metered dry gas flow: measured normal m³/h over what the current makes at 100 %. Above 105 % the answer is #VALUE! asking to check the meter's reference conditions, dryness, the current and the cell count.
 * @customfunction GASEFFICIENCY
 * @helpurl https://localhost:3000/docs/functions.html#gasefficiency
 * @param flow_Nm3_h Metered dry flow, in normal m³/h at the same reference.
 * @param current_A Current through the cells, in A.
 * @param n Electrons per gas molecule (2 for H2 and Cl2, 4 for O2).
 * @param [cells] Cells in series (default 1).
 * @param [reference] Reference of the normal m³: "0C" (default), "15C" or "20C".
 * @returns Efficiency as a fraction.
 */
function gasEfficiency(flow_Nm3_h: any[][], current_A: any[][], n: any[][], cells?: any[][], reference?: any[][]): any[][] {
  return F.GASEFFICIENCY(flow_Nm3_h, current_A, n, cells, reference) as any;
}

/**
 * Hydrogen in an air sweep (cell hood, vent): its volume fraction in the mixture and that fraction as a share of the lower flammability limit (4.0 vol % in air, Zabetakis, US Bureau of Mines Bulletin 627, 1965). A screening figure: ventilation design follows the applicable standards and codes.
 * @customfunction H2INAIR
 * @helpurl https://localhost:3000/docs/functions.html#h2inair
 * @param h2_flow Hydrogen flow into the sweep (any flow unit).
 * @param air_flow Air flow, in the same unit and at the same reference conditions.
 * @param [lfl_percent] Lower flammability limit in vol % (default 4.0).
 * @returns Hydrogen volume fraction, and the fraction of the LFL (1 = at the LFL).
 */
function h2InAir(h2_flow: any[][], air_flow: any[][], lfl_percent?: any[][]): any[][] {
  return F.H2INAIR(h2_flow, air_flow, lfl_percent) as any;
}

/**
 * Saturation (vapour) pressure of pure water, IAPWS-IF97 saturation equation (0 to 373.946 °C), in bar.
 * @customfunction WATERVAPOR
 * @helpurl https://localhost:3000/docs/functions.html#watervapor
 * @param [temperature_C] Temperature in °C (default 25).
 * @returns Pressure in bar.
 */
function waterVapor(temperature_C?: any[][]): any[][] {
  return F.WATERVAPOR(temperature_C) as any;
}
