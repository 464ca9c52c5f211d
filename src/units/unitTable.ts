/**
 * The unit table of CONVERTUNIT (data/units.json): each unit's kind and its size in the SI unit of
 * that kind, with the spellings accepted for it.
 */
import { dataPart } from '../dataset/active';
import { FARADAY_C_PER_MOL, GAS_CONSTANT_J_PER_MOL_K, ZERO_CELSIUS_K } from '../constants';
import { molarMass } from '../faraday/molarMass';

export interface UnitRow {
  readonly unit: string;
  readonly kind: string;
  /** Size in the SI unit of the kind. */
  readonly factor: number;
  readonly definition: string;
  readonly source: string;
}

interface RawRow {
  unit: string;
  kind: string;
  aliases: string[];
  factor?: number;
  ideal_gas?: { T_C: number; p_kPa: number; volume_m3?: number };
  molar_mass_of?: string;
  mass_kg?: number;
  per_gas?: string;
  energy_J?: number;
  special?: string;
  definition: string;
  source: string;
}

/** A unit text as compared: µ/μ read as u, ²/³ as 2/3, the dot operator and spaces dropped, case ignored. */
export function unitKey(text: string): string {
  return text
    .replace(/[µμ]/g, 'u')
    .replace(/²/g, '2')
    .replace(/³/g, '3')
    .replace(/[·⋅*\s]/g, '')
    .toLowerCase();
}

function sizeOf(raw: RawRow, byUnit: Map<string, RawRow>): number {
  if (raw.factor !== undefined) return raw.factor;
  if (raw.ideal_gas) {
    const { T_C, p_kPa, volume_m3 = 1 } = raw.ideal_gas;
    return (p_kPa * 1000 * volume_m3) / (GAS_CONSTANT_J_PER_MOL_K * (T_C + ZERO_CELSIUS_K));
  }
  if (raw.molar_mass_of) return ((raw.mass_kg ?? 1) * 1000) / molarMass(raw.molar_mass_of);
  if (raw.per_gas && raw.energy_J !== undefined) {
    const gas = byUnit.get(raw.per_gas);
    if (gas === undefined) throw new Error(`units.json: ${raw.unit} names an unknown gas unit ${raw.per_gas}`);
    return raw.energy_J / sizeOf(gas, byUnit);
  }
  if (raw.special === 'faraday') return FARADAY_C_PER_MOL;
  throw new Error(`units.json: ${raw.unit} has no size`);
}

/** Built from the units and atomic-weights parts in use (some sizes are molar masses), rebuilt when either changes. */
let table: { rows: UnitRow[]; index: Map<string, UnitRow>; units: unknown; weights: unknown } | undefined;

/**
 * The unit table, built once: rows in file order and an index by every accepted spelling.
 *
 * Syntax: unitTable()
 * Example: unitTable().index.get(unitKey("ASF"))?.unit → "A/ft2"
 * See also: convertUnit
 */
export function unitTable(): { rows: UnitRow[]; index: Map<string, UnitRow> } {
  const data = dataPart('units');
  const weights = dataPart('atomicweights');
  if (table && table.units === data && table.weights === weights) return table;
  const raws = (data as { units: RawRow[] }).units;
  const byUnit = new Map(raws.map((r) => [r.unit, r]));
  const rows: UnitRow[] = [];
  const index = new Map<string, UnitRow>();
  for (const raw of raws) {
    const row: UnitRow = { unit: raw.unit, kind: raw.kind, factor: sizeOf(raw, byUnit), definition: raw.definition, source: raw.source };
    rows.push(row);
    for (const spelling of [raw.unit, ...raw.aliases]) {
      const k = unitKey(spelling);
      const other = index.get(k);
      if (other !== undefined && other !== row) throw new Error(`units.json: "${spelling}" names both ${other.unit} and ${row.unit}`);
      index.set(k, row);
    }
  }
  table = { rows, index, units: data, weights };
  return table;
}
