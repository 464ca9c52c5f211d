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
function wantsHeader(raw: unknown): boolean {
  let v = raw;
  if (Array.isArray(v) && v.length === 1 && Array.isArray(v[0]) && v[0].length === 1) v = v[0][0];
  return v === true || v === 1 || (typeof v === 'string' && v.trim().toUpperCase() === 'TRUE');
}

/** A row-result function whose last argument `header` = TRUE puts a row of labels on top. */
function withHeader(fn: WorksheetFunction, labels: readonly string[], at: number): WorksheetFunction {
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
  args: [{ name: 'electrolyte', kind: 'text', unit: '' }, num('concentration_mol_L', domains.nonNegative, 'mol/L'), temperatureC],
  compute: electrolyteConductivity,
});

export const BRUGGEMAN = worksheet({
  id: 'BRUGGEMAN',
  args: [num('conductivity_S_m', domains.positive, 'S/m'), num('gas_fraction', domains.nonNegative, '')],
  compute: bruggemanConductivity,
});

export const OHMICDROP = worksheet({
  id: 'OHMICDROP',
  args: [
    currentDensity('current_density_A_m2', domains.nonNegative),
    num('gap_mm', domains.nonNegative, 'mm'),
    num('conductivity_S_m', domains.positive, 'S/m'),
    optNum('gas_fraction', 0, domains.nonNegative),
  ],
  compute: (j: number, gap: number, kappa: number, eps: number) => ohmicDrop(j, gap, bruggemanConductivity(kappa, eps)),
});

const CELLVOLTAGE_ARGS: ArgSpec[] = [
  potential('reversible_V'),
  currentDensity('current_density_A_m2'),
  currentDensity('anode_i0_A_m2'),
  num('anode_alpha', domains.positive),
  currentDensity('cathode_i0_A_m2'),
  num('cathode_alpha', domains.positive),
  num('gap_mm', domains.nonNegative, 'mm'),
  num('conductivity_S_m', domains.positive, 'S/m'),
  optNum('gas_fraction', 0, domains.nonNegative),
  drop('contact_V'),
  drop('busbar_V'),
  optNum('anode_limit_A_m2', null, domains.positive, 'A/m²'),
  optNum('cathode_limit_A_m2', null, domains.positive, 'A/m²'),
  temperatureC,
  header,
];

export const CELLVOLTAGE = withHeader(
  worksheet({
    id: 'CELLVOLTAGE',
    args: CELLVOLTAGE_ARGS,
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
  args: [coupleOrPotential('cathode'), coupleOrPotential('anode'), temperatureC],
  compute: (c: CoupleRow | number, a: CoupleRow | number, t: number) => decompositionVoltage(potentialAt(c, t), potentialAt(a, t)),
  usesTable: true,
});

export const VOLTAGEEFFICIENCY = worksheet({
  id: 'VOLTAGEEFFICIENCY',
  args: [num('cell_voltage_V', domains.positive, 'V'), { name: 'basis', kind: 'text', optional: true, default: 'HHV', unit: '' }],
  compute: voltageEfficiency,
});

export const CELLHEAT = worksheet({
  id: 'CELLHEAT',
  args: [num('cells', domains.positiveInteger), num('current_A', domains.nonNegative, 'A'), num('cell_voltage_V', domains.positive, 'V'), num('thermoneutral_V', domains.positive, 'V')],
  compute: cellHeat,
});

export const GASENERGY = worksheet({
  id: 'GASENERGY',
  args: [num('cell_voltage_V', domains.positive, 'V'), electrons, efficiency, reference],
  compute: energyPerNormalVolume,
});

export const GASFLOW = worksheet({
  id: 'GASFLOW',
  args: [num('current_A', domains.nonNegative, 'A'), electrons, efficiency, cells, reference],
  compute: normalGasFlow,
});

export const CURRENTFORGAS = worksheet({
  id: 'CURRENTFORGAS',
  args: [num('flow_Nm3_h', domains.nonNegative, 'Nm³/h'), electrons, efficiency, cells, reference],
  compute: currentForGasFlow,
});

export const CELLSFORGAS = worksheet({
  id: 'CELLSFORGAS',
  args: [num('flow_Nm3_h', domains.nonNegative, 'Nm³/h'), num('current_A', domains.positive, 'A'), electrons, efficiency, reference],
  compute: cellsForGasFlow,
});

export const GASEFFICIENCY = worksheet({
  id: 'GASEFFICIENCY',
  args: [num('flow_Nm3_h', domains.nonNegative, 'Nm³/h'), num('current_A', domains.positive, 'A'), electrons, cells, reference],
  compute: gasFlowEfficiency,
});

export const H2INAIR = worksheet({
  id: 'H2INAIR',
  args: [
    num('h2_flow', domains.nonNegative),
    num('air_flow', domains.nonNegative),
    optNum('lfl_percent', data.hydrogenLFL.volumePercent, domains.positive, 'vol %'),
  ],
  compute: hydrogenInAir,
  rowResult: 2,
});

export const WATERVAPOR = worksheet({
  id: 'WATERVAPOR',
  args: [temperatureC],
  compute: waterSaturationPressure,
});
