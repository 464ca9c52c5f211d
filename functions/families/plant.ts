/**
 * Running a tankhouse or an electrolyser plant: acid made per tonne of metal, water per unit of
 * hydrogen, degradation from a voltage log, gas purity from crossover, AC energy and power cost.
 */
import { MIN_DEGRADATION_POINTS, degradationRate } from '../../src/plant/degradationRate';
import { acidPerTonne } from '../../src/plant/acidPerTonne';
import { gasCrossover } from '../../src/plant/gasCrossover';
import { powerCost } from '../../src/plant/powerCost';
import { waterPerHydrogen } from '../../src/plant/waterPerHydrogen';
import { type ArgSpec, type Cell, type WorksheetFunction, type WorksheetResult, bounded, domains, invalidValue, isErrorValue, worksheet } from '../adapter';
import { electrons, num, optNum } from '../args';

/** A formula text ("Zn") or a molar mass in g/mol. */
const species: ArgSpec = { name: 'species', kind: 'species', domain: domains.positive, unit: 'g/mol' };
/** A fraction in [0, 1): 0 allowed, 1 not (a share of something that cannot be all of it). */
const fractionBelowOne = bounded({ lo: 0, loIncl: true, hi: 1 }, 'a fraction in [0, 1)');
/** Reference of the normal m³, as GASFLOW names it. */
const reference: ArgSpec = {
  name: 'reference',
  kind: 'text',
  optional: true,
  default: '0C',
  unit: '',
  help: 'Reference of the normal m³: "0C" = 0 °C and 101.325 kPa, "15C" or "20C" (at 101.325 kPa) (default "0C").',
};

export const ACIDPERTONNE = worksheet({
  id: 'ACIDPERTONNE',
  description:
    'Net sulfuric acid formed per tonne of metal electrowon from a sulfate liquor with oxygen-evolving anodes, in t H2SO4 per t of metal. Model: the sulfate balance of the overall reaction MSO4 + H2O → M + H2SO4 + ½O2, n/2 mol H2SO4 per mol of metal harvested (zinc 1.50 t/t, copper 1.54 t/t). The cathode efficiency does not change it when the lost charge goes to hydrogen, to redissolved metal or to an iron couple cycling between the electrodes (the acid they consume cancels the extra acid the anode makes); it enters only with MnO2 formed at the anode from Mn2+ (1 mol H2SO4 per mol MnO2): (n/2)·(1 + f/ε). Ferric iron fed in and leaving as ferrous adds acid not counted here.',
  args: [
    { ...species, name: 'metal', help: 'Metal deposited, "Zn", "Cu", "Ni", "Co" or "Mn", or its molar mass in g/mol.' },
    { ...electrons, help: 'Charge of the metal ion, electrons per atom deposited (2 for Zn2+, Cu2+, Ni2+).' },
    { ...optNum('cathode_efficiency', 1, domains.efficiency), help: 'Cathode current efficiency as a fraction, 0 to 1 (default 1); it matters only with mno2_fraction.' },
    { ...optNum('mno2_fraction', 0, fractionBelowOne), help: 'Fraction of the cell current that forms MnO2 at the anode from Mn2+, in [0, 1) (default 0); MnO2 per day is DEPOSITMASS(current, 24, "MnO2", 2, this fraction).' },
  ],
  result: 't H2SO4 per t of metal (= kg/kg).',
  helpAnchor: 'acidpertonne',
  compute: acidPerTonne,
});

export const WATERPERH2 = worksheet({
  id: 'WATERPERH2',
  description:
    'Water consumed by a water electrolyser per unit of hydrogen: the stoichiometric water of H2O → H2 + ½O2 (one mole per mole of H2; 8.94 kg per kg of H2, 0.804 kg per Nm³ at 0 °C), times (1 + extra_fraction) for a measured extra consumption (water leaving with the wet gases, purges). Water rejected by the water treatment ahead of the electrolyser is not included.',
  args: [
    { name: 'basis', kind: 'text', optional: true, default: 'kg', unit: '', help: '"kg" for kg of water per kg of H2, or "Nm3" for kg of water per normal m³ of H2 (default "kg").' },
    { ...optNum('extra_fraction', 0, fractionBelowOne), help: 'Measured extra consumption as a fraction of the stoichiometric water, in [0, 1) (default 0; 0.05 for 5 %).' },
    reference,
  ],
  result: 'kg of water per kg, or per normal m³, of hydrogen.',
  helpAnchor: 'waterperh2',
  compute: waterPerHydrogen,
});

/** True for an empty cell as Excel passes it (omitted, empty, or an empty text). */
const blank = (v: unknown): boolean => v === null || v === undefined || (typeof v === 'string' && v.trim() === '');
/** A whole-range argument's cells, row by row. */
const cellsOf = (raw: unknown): unknown[] => (Array.isArray(raw) ? (raw as unknown[]).flatMap((r) => (Array.isArray(r) ? (r as unknown[]) : [r])) : [raw]);

/**
 * The log's two ranges are read pair by pair: a reading with no voltage or no hours is left out
 * with its partner (a logger that missed a reading), unless the partner is an error value, which
 * is passed on; ranges of different sizes are refused (their cells could not be paired). An error
 * for the whole call fills the result row, as the error of one element does.
 */
function pairedLog(fn: WorksheetFunction, width: number): WorksheetFunction {
  // an error for the whole call fills the row, as an error of one element does
  const widen = (r: Cell[][]): Cell[][] => (r.length === 1 && r[0].length === 1 && isErrorValue(r[0][0]) ? [new Array<Cell>(width).fill(r[0][0])] : r);
  return (...raws: unknown[]): WorksheetResult => {
    const u = cellsOf(raws[0]);
    const t = cellsOf(raws[1]);
    if (u.length !== t.length) {
      return widen([[invalidValue(`voltages_V and hours_h must be ranges of the same size, one hours value per voltage; got ${u.length} and ${t.length} cells`)]]);
    }
    const uKept: unknown[][] = [];
    const tKept: unknown[][] = [];
    for (let i = 0; i < u.length; i++) {
      const bu = blank(u[i]);
      const bt = blank(t[i]);
      if (bu || bt) {
        // an error value beside an empty cell is passed on (as both of the pair), not dropped
        const err = bu ? t[i] : u[i];
        if (!isErrorValue(err)) continue;
        uKept.push([err]);
        tKept.push([err]);
        continue;
      }
      uKept.push([u[i]]);
      tKept.push([t[i]]);
    }
    const r = fn(uKept.length > 0 ? uKept : null, tKept.length > 0 ? tKept : null, ...raws.slice(2));
    return r instanceof Promise ? r.then(widen) : widen(r);
  };
}

/** Rate, its standard error, readings. */
const DEGRADATION_COLUMNS = 3;

export const DEGRADATIONRATE = pairedLog(
  worksheet({
    id: 'DEGRADATIONRATE',
    description:
      'Degradation rate of a cell or stack from a voltage log: the least-squares slope of the voltage against operating hours, in µV/h (SLOPE(voltages, hours) × 10⁶), with its standard error and the number of points. Positive is a rising voltage. A reading with an empty voltage or hours cell is left out with its partner; ranges of different sizes are #VALUE!. Compare rates only at the same current density, temperature and pressure, which the log itself does not show.',
    args: [
      { name: 'voltages_V', kind: 'numberList', domain: domains.any, unit: 'V', help: 'Logged cell or stack voltages, in V, a range.' },
      { name: 'hours_h', kind: 'numberList', domain: domains.nonNegative, unit: 'h', help: 'Operating hours of the same readings, in h, a range of the same size (hours, not Excel dates: subtract the start and multiply by 24).' },
      { ...optNum('min_points', MIN_DEGRADATION_POINTS, bounded({ lo: MIN_DEGRADATION_POINTS, loIncl: true, hi: 1e6, hiIncl: true, whole: true }, `a whole number ≥ ${MIN_DEGRADATION_POINTS}`)), help: `Fewest readings accepted, a whole number ≥ ${MIN_DEGRADATION_POINTS} (default ${MIN_DEGRADATION_POINTS}).` },
    ],
    result: 'A row: degradation rate in µV/h, its standard error in µV/h, and the number of readings used.',
    helpAnchor: 'degradationrate',
    compute: degradationRate,
    rowResult: DEGRADATION_COLUMNS,
  }),
  DEGRADATION_COLUMNS,
);

export const GASCROSSOVER = worksheet({
  id: 'GASCROSSOVER',
  description:
    'Foreign gas in the product gas of a water electrolyser from gas crossing the separator, by Faraday\'s law: H2 in O2 = 2·i_x/(2·i_x + j), O2 in H2 = i_x/(i_x + 2·j), with i_x the crossover current density (a flux N is i_x = 2F·N for H2, 4F·N for O2). Dry ideal gases, no recombination, all the cell current to the product gas. Also its share of the flammability limit (1 = at the limit; default for H2 in O2 4.0 vol %, hydrogen\'s lower limit in air, Zabetakis 1965). A screening figure: gas-purity monitoring, alarm and shutdown limits follow the applicable standards (for example ISO 22734) and codes; limits change with pressure and temperature.',
  args: [
    { ...num('current_density_A_m2', domains.positive, 'A/m²'), help: 'Operating current density, in A/m² (1 A/cm² = 10,000 A/m²).' },
    { ...num('crossover', domains.nonNegative, 'A/m² or mol/(m²·s)'), help: 'Crossover of the crossing gas: a current density in A/m², or a flux in mol/(m²·s) with crossover_unit "mol/m2/s".' },
    { name: 'gas', kind: 'text', optional: true, default: 'H2', unit: '', help: '"H2": hydrogen crossing into the oxygen; "O2": oxygen crossing into the hydrogen (default "H2").' },
    { name: 'crossover_unit', kind: 'text', optional: true, default: 'A/m2', unit: '', help: '"A/m2" or "mol/m2/s" (default "A/m2").' },
    { ...optNum('limit_percent', null, domains.positive, 'vol %'), help: 'Flammability limit of the foreign gas in the product gas, in vol % (default 4.0 for H2 in O2; for O2 in H2 there is no default: give the limit from the applicable standard or measured data).' },
  ],
  result: 'A row: volume fraction of the foreign gas in the dry product gas, and that fraction as a share of the limit.',
  helpAnchor: 'gascrossover',
  compute: gasCrossover,
  rowResult: 2,
});

export const POWERCOST = worksheet({
  id: 'POWERCOST',
  description:
    'DC and AC energy and the power cost per tonne of product: DC U·nF/(efficiency·M) as SPECIFICENERGY (per tonne), AC = DC/rectifier efficiency (transformer and rectifier, AC→DC), cost = AC × price per kWh. Auxiliary loads (pumps, cooling) are not included. For hydrogen give "H2" and 2; per normal m³, GASENERGY/rectifier efficiency.',
  args: [
    { ...num('cell_voltage_V', domains.positive, 'V'), help: 'Cell voltage, in V.' },
    { ...species, help: 'Product formula such as "Zn", "Cu" or "H2", or a molar mass in g/mol.' },
    { ...electrons, help: 'Electrons per formula unit (a whole number ≥ 1).' },
    { ...num('rectifier_efficiency', domains.efficiency), help: 'AC→DC efficiency of the transformer and rectifier, a fraction in (0, 1].' },
    { ...num('price_per_kWh', domains.nonNegative, 'currency/kWh'), help: 'Price of one kWh of AC energy, in any currency (the cost comes out in the same).' },
    { ...optNum('efficiency', 1, domains.efficiency), help: 'Current efficiency as a fraction, 0 to 1 (default 1).' },
  ],
  result: 'A row: DC energy in kWh/t, AC energy in kWh/t, and the power cost per tonne in the currency of the price.',
  helpAnchor: 'powercost',
  compute: powerCost,
  rowResult: 3,
});
