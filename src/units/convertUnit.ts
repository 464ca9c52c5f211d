import { NotFoundError, finite } from '../errors';
import { type UnitRow, unitKey, unitTable } from './unitTable';

/**
 * Converts a value between two units of the same kind from the unit table (data/units.json):
 * current density, thickness, penetration rate, mass concentration, charge, gas amount (mol, normal
 * and standard cubic metres at named reference conditions, kg of H2 or O2), volume, specific energy
 * and energy per gas amount. Spellings ignore case, spaces and the dot operator; µ may be written u.
 * An unknown unit, or two units of different kinds, throws NotFoundError listing the accepted
 * spellings of the kind (or all kinds).
 *
 * Syntax: convertUnit(value, from_unit, to_unit)
 * Example: convertUnit(20, "ASF", "A/dm2") → 2.1528 ; convertUnit(1, "mil", "um") → 25.4
 * See also: unitTable
 */
export function convertUnit(value: number, fromUnit: string, toUnit: string): number {
  const from = findUnit(fromUnit, toUnit);
  const to = findUnit(toUnit, fromUnit);
  if (from.kind !== to.kind) {
    throw new NotFoundError(
      `cannot convert ${from.kind} ("${from.unit}") to ${to.kind} ("${to.unit}"); units of ${from.kind}: ${spellings(from.kind)}`,
    );
  }
  if (from === to) return value;
  return finite((value * from.factor) / to.factor, 'the converted value');
}

/** The row of a unit text; unknown → NotFoundError listing the units of the other unit's kind (or the kinds). */
function findUnit(text: string, other: string): UnitRow {
  const row = unitTable().index.get(unitKey(text));
  if (row !== undefined) return row;
  const shown = text.length > 30 ? `${text.slice(0, 27)}…` : text;
  const partner = unitTable().index.get(unitKey(other));
  if (partner !== undefined) throw new NotFoundError(`unknown unit "${shown}"; units of ${partner.kind}: ${spellings(partner.kind)}`);
  const kinds = [...new Set(unitTable().rows.map((r) => r.kind))];
  throw new NotFoundError(`unknown unit "${shown}"; kinds accepted (see the help for every unit): ${kinds.map((k) => `${k} (${unitTable().rows.find((r) => r.kind === k)!.unit}…)`).join(', ')}`);
}

function spellings(kind: string): string {
  return unitTable()
    .rows.filter((r) => r.kind === kind)
    .map((r) => r.unit)
    .join(', ');
}
