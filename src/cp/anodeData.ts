import { dataPart } from '../dataset/active';
import { InputError, NotFoundError } from '../errors';

const norm = (s: string): string => s.toLowerCase().replace(/\s+/g, '');

/**
 * A design property of a galvanic-anode material (data/anodes.json): "capacity" (A·h/kg),
 * "potential" (closed-circuit potential, V on the row's reference electrode), "scale" (that
 * electrode's key) or "source". Materials whose design values were not read in a source
 * (Al-Zn-In, anodes in sediment) throw NotFoundError naming the standard to take them from.
 *
 * Syntax: anodeData(anode, property)
 * Example: anodeData("Zn/seawater", "capacity") → 780
 * See also: anodeMass, anodeOutput
 */
export function anodeData(anode: string, property: string): number | string {
  const data = dataPart('anodes');
  const k = norm(anode);
  const row = data.anodes.find((r) => norm(r.key) === k || r.aliases.some((a) => norm(a) === k));
  if (!row) {
    const missing = data.notRead.find((r) => r.keys.some((a) => norm(a) === k));
    if (missing) throw new NotFoundError(missing.message);
    throw new NotFoundError(`unknown anode "${anode}"; use ${data.anodes.map((r) => `"${r.key}"`).join(', ')}`);
  }
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
