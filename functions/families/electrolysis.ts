/**
 * Electrolysis and electrowinning cells: electrolyte conductivity, ohmic drop, the cell-voltage
 * breakdown, decomposition voltage, voltage efficiency, heat, and gas production in normal m³.
 * Every voltage here reads on the electrolysis side: a positive number is what the cell needs.
 */
import { bruggemanConductivity } from '../../src/electrolysis/bruggemanConductivity';
import { cellHeat } from '../../src/electrolysis/cellHeat';
import { BREAKDOWN_LABELS, cellVoltageBreakdown } from '../../src/electrolysis/cellVoltageBreakdown';
import { cellsForGasFlow } from '../../src/electrolysis/cellsForGasFlow';
import { currentForGasFlow } from '../../src/electrolysis/currentForGasFlow';
import { decompositionVoltage } from '../../src/electrolysis/decompositionVoltage';
import { electrolyteConductivity } from '../../src/electrolysis/electrolyteConductivity';
import { energyPerNormalVolume } from '../../src/electrolysis/energyPerNormalVolume';
import { gasFlowEfficiency } from '../../src/electrolysis/gasFlowEfficiency';
import { hydrogenInAir } from '../../src/electrolysis/hydrogenInAir';
import { normalGasFlow } from '../../src/electrolysis/normalGasFlow';
import { ohmicDrop } from '../../src/electrolysis/ohmicDrop';
import { voltageEfficiency } from '../../src/electrolysis/voltageEfficiency';
import { waterSaturationPressure } from '../../src/electrolysis/waterSaturationPressure';
import { e0AtTemperature } from '../../src/cells/e0AtTemperature';
import type { CoupleRow } from '../../src/table/types';
import data from '../../data/electrolysis.json';
import { type ArgSpec, type Cell, type WorksheetFunction, type WorksheetResult, domains, invalidValue, worksheet } from '../adapter';
import { electrons, num, optNum, potential, temperatureC } from '../args';

/** Faradaic efficiency, a fraction in (0, 1], default 1. */
const efficiency: ArgSpec = optNum('efficiency', 1, domains.efficiency);
/** Cells in series, a whole number ≥ 1, default 1. */
const cells: ArgSpec = optNum('cells', 1, domains.positiveInteger);
/** Reference condition of the normal cubic metre, default 0 °C and 101.325 kPa. */
const reference: ArgSpec = { name: 'reference', kind: 'text', optional: true, default: '0C', unit: '' };
/** A current density in A/m². */
const currentDensity = (name: string, domain = domains.positive): ArgSpec => num(name, domain, 'A/m²');
/** An optional voltage drop in V, default 0. */
const drop = (name: string): ArgSpec => optNum(name, 0, domains.nonNegative, 'V');
/** An optional header switch. */
const header: ArgSpec = { name: 'header', kind: 'boolean', optional: true, default: false, unit: '' };

/** True for a header argument that asks for the header row (TRUE, 1 or "TRUE", alone or as a 1×1 range). */
export function wantsHeader(raw: unknown): boolean {
  let v = raw;
  if (Array.isArray(v) && v.length === 1 && Array.isArray(v[0]) && v[0].length === 1) v = v[0][0];
  return v === true || v === 1 || (typeof v === 'string' && v.trim().toUpperCase() === 'TRUE');
}

/** A row-result function whose last argument `header` = TRUE puts a row of labels on top. */
export function withHeader(fn: WorksheetFunction, labels: readonly string[], at: number): WorksheetFunction {
  const add = (r: Cell[][]): Cell[][] => (r.every((row) => row.length === labels.length) ? [labels.slice(), ...r] : r);
  return (...raws: unknown[]): WorksheetResult => {
    const h = raws[at];
    if (Array.isArray(h) && (h.length !== 1 || !Array.isArray(h[0]) || h[0].length !== 1)) {
      return [[invalidValue('header must be a single TRUE or FALSE, not a range')]];
    }
    const r = fn(...raws);
    if (!wantsHeader(h)) return r;
    return r instanceof Promise ? r.then(add) : add(r);
  };
}

export const CONDUCTIVITY = worksheet({
  id: 'CONDUCTIVITY',
  description: 'Specific conductivity of an electrolyte from a published correlation, in S/m. KOH: Gilliam et al., Int. J. Hydrogen Energy 32 (2007) 359, 0–12 mol/L and 0–100 °C. H2SO4: Gu, Wang & Liaw, J. Electrochem. Soc. 144 (1997) 2053, 1–6 mol/L at 25 °C only (a battery-model fit with no temperature term). Outside a range the answer is #VALUE! with the range (never an extrapolation). Other electrolytes (NaOH, copper, zinc or nickel sulfate liquors) have no built-in correlation yet and answer #N/A: enter a measured conductivity in OHMICDROP or CELLVOLTAGE.',
  args: [{ name: 'electrolyte', kind: 'text', unit: '', help: 'Electrolyte name: "KOH" or "H2SO4".' }, { ...num('concentration_mol_L', domains.nonNegative, 'mol/L'), help: 'Concentration in mol per litre of solution (30 wt % KOH is about 6.9 mol/L at 25 °C; 180 g/L H2SO4 is 1.84 mol/L).' }, temperatureC],
  result: 'Conductivity in S/m (1 S/cm = 100 S/m).',
  helpAnchor: 'conductivity',
  compute: electrolyteConductivity,
});

export const BRUGGEMAN = worksheet({
  id: 'BRUGGEMAN',
  description: 'Effective conductivity of an electrolyte holding gas bubbles, by Bruggeman: κ·(1 − ε)^1.5, in S/m.',
  args: [{ ...num('conductivity_S_m', domains.positive, 'S/m'), help: 'Conductivity of the gas-free electrolyte, in S/m.' }, { ...num('gas_fraction', domains.nonNegative, ''), help: 'Volume fraction of gas in the gap, 0 up to (not including) 1 (a fraction, not a percentage).' }],
  result: 'Effective conductivity in S/m.',
  helpAnchor: 'bruggeman',
  compute: bruggemanConductivity,
});

export const OHMICDROP = worksheet({
  id: 'OHMICDROP',
  description: 'Ohmic (IR) drop across an electrolyte gap, j·gap/κ, with κ reduced by Bruggeman for a gas fraction, in V.',
  args: [
    { ...currentDensity('current_density_A_m2', domains.nonNegative), help: 'Current density, in A/m² (1 A/cm² = 10,000 A/m²).' },
    { ...num('gap_mm', domains.nonNegative, 'mm'), help: 'Electrode gap (electrolyte path), in mm.' },
    { ...num('conductivity_S_m', domains.positive, 'S/m'), help: 'Conductivity of the gas-free electrolyte, in S/m.' },
    { ...optNum('gas_fraction', 0, domains.nonNegative), help: 'Volume fraction of gas in the gap, 0 to below 1 (default 0).' },
  ],
  result: 'Voltage drop in V.',
  helpAnchor: 'ohmicdrop',
  compute: (j: number, gap: number, kappa: number, eps: number) => ohmicDrop(j, gap, bruggemanConductivity(kappa, eps)),
});

const CELLVOLTAGE_ARGS: ArgSpec[] = [
  { ...potential('reversible_V'), help: 'Reversible (decomposition) voltage at the conditions, in V, positive (from DECOMPOSITIONVOLTAGE or a thermodynamic calculation).' },
  { ...currentDensity('current_density_A_m2'), help: 'Current density, in A/m².' },
  { ...currentDensity('anode_i0_A_m2'), help: 'Exchange current density of the anode reaction, in A/m².' },
  { ...num('anode_alpha', domains.positive), help: 'Apparent transfer coefficient of the anode reaction (> 0; Tafel slope = 2.303·RT/(αF)).' },
  { ...currentDensity('cathode_i0_A_m2'), help: 'Exchange current density of the cathode reaction, in A/m².' },
  { ...num('cathode_alpha', domains.positive), help: 'Apparent transfer coefficient of the cathode reaction (> 0).' },
  { ...num('gap_mm', domains.nonNegative, 'mm'), help: 'Electrode gap, in mm.' },
  { ...num('conductivity_S_m', domains.positive, 'S/m'), help: 'Conductivity of the gas-free electrolyte, in S/m.' },
  { ...optNum('gas_fraction', 0, domains.nonNegative), help: 'Gas volume fraction in the gap, 0 to below 1 (default 0).' },
  { ...drop('contact_V'), help: 'Contact drop, in V (default 0).' },
  { ...drop('busbar_V'), help: 'Bus-bar drop per cell, in V (default 0).' },
  { ...optNum('anode_limit_A_m2', null, domains.positive, 'A/m²'), help: 'Limiting current density of the anode reaction, in A/m² (default none).' },
  { ...optNum('cathode_limit_A_m2', null, domains.positive, 'A/m²'), help: 'Limiting current density of the cathode reaction, in A/m² (default none; metal deposition from a depleted liquor).' },
  temperatureC,
  { ...header, help: 'TRUE: a row of labels above the values (default FALSE).' },
];

export const CELLVOLTAGE = withHeader(
  worksheet({
    id: 'CELLVOLTAGE',
    description: 'Cell voltage breakdown, a row of 7 positive voltages: reversible, anode and cathode overpotentials (Butler–Volmer with equal forward and reverse coefficients, and the limiting-current factor where given), ohmic drop (Bruggeman for gas), contact drop, bus-bar drop, and their sum. A column of inputs gives one row each; header TRUE puts labels on top. Electrolysis-side convention: every part is what the cell needs, so all are positive.',
    args: CELLVOLTAGE_ARGS,
    result: 'Reversible, anode η, cathode η, ohmic, contact, bus-bar and total cell voltage, in V.',
    helpAnchor: 'cellvoltage',
    compute: (
      reversibleV: number,
      j: number,
      i0a: number,
      alphaA: number,
      i0c: number,
      alphaC: number,
      gapMm: number,
      kappa: number,
      eps: number,
      contact: number,
      busbar: number,
      limA: number | null,
      limC: number | null,
      t: number,
    ) =>
      cellVoltageBreakdown({
        reversibleV,
        currentDensityA_m2: j,
        anodeI0A_m2: i0a,
        anodeAlpha: alphaA,
        cathodeI0A_m2: i0c,
        cathodeAlpha: alphaC,
        gapMm,
        conductivityS_m: kappa,
        gasFraction: eps,
        contactDropV: contact,
        busbarDropV: busbar,
        anodeLimitA_m2: limA,
        cathodeLimitA_m2: limC,
        temperatureC: t,
      }),
    rowResult: BREAKDOWN_LABELS.length,
  }),
  BREAKDOWN_LABELS,
  CELLVOLTAGE_ARGS.length - 1,
);

/** A couple's E° at T, or a number taken as given (V). */
const potentialAt = (x: CoupleRow | number, t: number): number => (typeof x === 'number' ? x : e0AtTemperature(x, t));
const coupleOrPotential = (name: string): ArgSpec => ({ name, kind: 'coupleOrPotential', domain: domains.any, unit: 'V' });

export const DECOMPOSITIONVOLTAGE = worksheet({
  id: 'DECOMPOSITIONVOLTAGE',
  description: 'Decomposition voltage of an electrolysis, E(anode couple) − E(cathode couple), in V: positive when the current must force the reaction (the EMF of the same pair with the sign reversed; EMF keeps the galvanic convention, where a forced reaction is negative).',
  args: [{ ...coupleOrPotential('cathode'), help: 'The couple reduced at the cathode, such as "Zn2+/Zn" or "H2O/H2", or its potential in V.' }, { ...coupleOrPotential('anode'), help: 'The couple oxidised at the anode, such as "O2/H2O" or "O2/OH-", or its potential in V.' }, temperatureC],
  result: 'Decomposition voltage in V (standard states; for real activities use HALFCELL values as numbers).',
  helpAnchor: 'decompositionvoltage',
  compute: (c: CoupleRow | number, a: CoupleRow | number, t: number) => decompositionVoltage(potentialAt(c, t), potentialAt(a, t)),
  usesTable: true,
});

export const VOLTAGEEFFICIENCY = worksheet({
  id: 'VOLTAGEEFFICIENCY',
  description: 'Voltage efficiency U_ref/U_cell of an electrolysis cell: against the thermoneutral voltage of water at 25 °C on the higher (HHV, 1.4812 V) or lower (LHV, 1.2532 V) heating value, from CODATA Key Values ΔfH° of liquid and gaseous water, or against any reference voltage given as a number.',
  args: [{ ...num('cell_voltage_V', domains.positive, 'V'), help: 'Cell voltage, in V.' }, { name: 'basis', kind: 'text', optional: true, default: 'HHV', unit: '', help: '"HHV", "LHV", or a reference voltage in V (positive), such as a thermoneutral voltage at conditions (default "HHV").' }],
  result: 'Efficiency as a fraction.',
  helpAnchor: 'voltageefficiency',
  compute: voltageEfficiency,
});

export const CELLHEAT = worksheet({
  id: 'CELLHEAT',
  description: 'Heat given off by a stack or tankhouse section, N·I·(U − U_tn), in W: positive is heat to remove, negative heat to supply.',
  args: [{ ...num('cells', domains.positiveInteger), help: 'Cells in series.' }, { ...num('current_A', domains.nonNegative, 'A'), help: 'Current through the cells, in A.' }, { ...num('cell_voltage_V', domains.positive, 'V'), help: 'Mean cell voltage, in V.' }, { ...num('thermoneutral_V', domains.positive, 'V'), help: 'Thermoneutral voltage of the cell reaction, in V, positive (water at 25 °C: 1.481 V on the HHV basis).' }],
  result: 'Heat in W.',
  helpAnchor: 'cellheat',
  compute: cellHeat,
});

export const GASENERGY = worksheet({
  id: 'GASENERGY',
  description: 'DC energy per normal cubic metre of gas, U·nF/(efficiency·Vm), in kWh/Nm³ (dry ideal gas at the named reference).',
  args: [{ ...num('cell_voltage_V', domains.positive, 'V'), help: 'Cell voltage, in V.' }, { ...electrons, help: 'Electrons per gas molecule (2 for H2, 4 for O2).' }, { ...efficiency, help: 'Faradaic efficiency as a fraction, 0 to 1 (default 1).' }, { ...reference, help: 'Reference of the normal m³: "0C" = 0 °C and 101.325 kPa, "15C" or "20C" (at 101.325 kPa) (default "0C").' }],
  result: 'kWh/Nm³.',
  helpAnchor: 'gasenergy',
  compute: energyPerNormalVolume,
});

export const GASFLOW = worksheet({
  id: 'GASFLOW',
  description: 'Gas production of cells in series, in normal m³ per hour (dry ideal gas at the named reference).',
  args: [{ ...num('current_A', domains.nonNegative, 'A'), help: 'Current through each cell, in A.' }, { ...electrons, help: 'Electrons per gas molecule (2 for H2 and Cl2, 4 for O2).' }, { ...efficiency, help: 'Faradaic efficiency as a fraction, 0 to 1 (default 1).' }, { ...cells, help: 'Cells in series (default 1).' }, { ...reference, help: 'Reference of the normal m³: "0C" = 0 °C and 101.325 kPa, "15C" or "20C" (at 101.325 kPa) (default "0C").' }],
  result: 'Nm³/h.',
  helpAnchor: 'gasflow',
  compute: normalGasFlow,
});

export const CURRENTFORGAS = worksheet({
  id: 'CURRENTFORGAS',
  description: 'Current each cell must carry for a target gas flow in normal m³/h (the inverse of GASFLOW), in A.',
  args: [{ ...num('flow_Nm3_h', domains.nonNegative, 'Nm³/h'), help: 'Target flow, in normal m³/h.' }, { ...electrons, help: 'Electrons per gas molecule (2 for H2 and Cl2, 4 for O2).' }, { ...efficiency, help: 'Faradaic efficiency as a fraction, 0 to 1 (default 1).' }, { ...cells, help: 'Cells in series (default 1).' }, { ...reference, help: 'Reference of the normal m³: "0C", "15C" or "20C" (default "0C").' }],
  result: 'Current in A.',
  helpAnchor: 'currentforgas',
  compute: currentForGasFlow,
});

export const CELLSFORGAS = worksheet({
  id: 'CELLSFORGAS',
  description: 'Whole number of cells in series needed for a target gas flow at a given current (rounded up).',
  args: [{ ...num('flow_Nm3_h', domains.nonNegative, 'Nm³/h'), help: 'Target flow, in normal m³/h.' }, { ...num('current_A', domains.positive, 'A'), help: 'Current through the cells, in A.' }, { ...electrons, help: 'Electrons per gas molecule (2 for H2 and Cl2, 4 for O2).' }, { ...efficiency, help: 'Faradaic efficiency as a fraction, 0 to 1 (default 1).' }, { ...reference, help: 'Reference of the normal m³: "0C", "15C" or "20C" (default "0C").' }],
  result: 'Number of cells.',
  helpAnchor: 'cellsforgas',
  compute: cellsForGasFlow,
});

export const GASEFFICIENCY = worksheet({
  id: 'GASEFFICIENCY',
  description: 'Faradaic efficiency from a metered dry gas flow: measured normal m³/h over what the current makes at 100 %. Above 105 % the answer is #VALUE! asking to check the meter\'s reference conditions, dryness, the current and the cell count.',
  args: [{ ...num('flow_Nm3_h', domains.nonNegative, 'Nm³/h'), help: 'Metered dry flow, in normal m³/h at the same reference.' }, { ...num('current_A', domains.positive, 'A'), help: 'Current through the cells, in A.' }, { ...electrons, help: 'Electrons per gas molecule (2 for H2 and Cl2, 4 for O2).' }, { ...cells, help: 'Cells in series (default 1).' }, { ...reference, help: 'Reference of the normal m³: "0C", "15C" or "20C" (default "0C").' }],
  result: 'Efficiency as a fraction.',
  helpAnchor: 'gasefficiency',
  compute: gasFlowEfficiency,
});

export const H2INAIR = worksheet({
  id: 'H2INAIR',
  description: 'Hydrogen in an air sweep (cell hood, vent): its volume fraction in the mixture and that fraction as a share of the lower flammability limit (4.0 vol % in air, Zabetakis, US Bureau of Mines Bulletin 627, 1965). A screening figure: ventilation design follows the applicable standards and codes.',
  args: [
    { ...num('h2_flow', domains.nonNegative), help: 'Hydrogen flow into the sweep (any flow unit).' },
    { ...num('air_flow', domains.nonNegative), help: 'Air flow, in the same unit and at the same reference conditions.' },
    { ...optNum('lfl_percent', data.hydrogenLFL.volumePercent, domains.positive, 'vol %'), help: 'Lower flammability limit in vol % (default 4.0).' },
  ],
  result: 'Hydrogen volume fraction, and the fraction of the LFL (1 = at the LFL).',
  helpAnchor: 'h2inair',
  compute: hydrogenInAir,
  rowResult: 2,
});

export const WATERVAPOR = worksheet({
  id: 'WATERVAPOR',
  description: 'Saturation (vapour) pressure of pure water, IAPWS-IF97 saturation equation (0 to 373.946 °C), in bar.',
  args: [temperatureC],
  result: 'Pressure in bar.',
  helpAnchor: 'watervapor',
  compute: waterSaturationPressure,
});
