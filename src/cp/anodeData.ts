import { dataPart } from '../dataset/active';
import { InputError, NotFoundError } from '../errors';

const norm = (s: string): string => s.toLowerCase().replace(/\s+/g, '');

/**
 * A design property of a galvanic-anode material (data/anodes.json): "capacity" (A·h/kg),
 * "potential" (closed-circuit potential, V on the row's reference electrode), "scale" (that
 * electrode's key) or "source".
 *
 * Syntax: anodeData(anode, property)
 * Example: anodeData("Al-Zn-In/seawater", "capacity") → 2000
 * See also: anodeMass, anodeOutput
 */
export function anodeData(anode: string, property: string): number | string {
  const data = dataPart('anodes');
  const k = norm(anode);
  const row = data.anodes.find((r) => norm(r.key) === k || r.aliases.some((a) => norm(a) === k));
  if (!row) throw new NotFoundError(`unknown anode "${anode}"; use ${data.anodes.map((r) => `"${r.key}"`).join(', ')}`);
  switch (property.trim().toLowerCase()) {
    case 'capacity':
      return row.capacity_Ah_kg;
    case 'potential':
      return row.potential_V;
    case 'scale':
      return row.scale;
    case 'source':
      return row.source;
    default:
      throw new InputError(`property must be "capacity", "potential", "scale" or "source"; got "${property}"`);
  }
}
