import { asciiFormula } from '../chem/asciiFormula';
import { NotFoundError } from '../errors';
import type { ElectrodeRow } from '../table/types';

/** A potential scale: the standard hydrogen electrode, the reversible hydrogen electrode, or a reference electrode. */
export type Scale = { readonly kind: 'SHE' } | { readonly kind: 'RHE' } | { readonly kind: 'electrode'; readonly row: ElectrodeRow };

/**
 * Reads a scale name: "SHE" (also "NHE", the normal hydrogen electrode, read as the same scale) and
 * "RHE" (any case, white space ignored), otherwise a key or alias of the electrode table found by
 * `findElectrode`. Unknown names throw NotFoundError naming them, with what `hint` says about the
 * name (see electrodeKeyHint).
 *
 * Syntax: resolveScale(name, findElectrode)
 * Example: resolveScale(" rhe ", table.findElectrode) → { kind: "RHE" }
 * See also: convertPotential
 */
export function resolveScale(name: string, findElectrode: (key: string) => ElectrodeRow | undefined, hint?: (key: string) => string): Scale {
  const bare = asciiFormula(name).replace(/\s+/g, '').toUpperCase();
  if (bare === 'SHE' || bare === 'NHE') return { kind: 'SHE' };
  if (bare === 'RHE') return { kind: 'RHE' };
  const row = findElectrode(name);
  if (row === undefined) {
    const shown = name.length > 40 ? `${name.slice(0, 37)}…` : name;
    const why = hint?.(name) ?? '';
    throw new NotFoundError(`unknown scale "${shown}"; ${why ? `${why}; ` : ''}use "SHE" (or "NHE"), "RHE" or a reference electrode of the table such as "SCE" or "CSE"`);
  }
  return { kind: 'electrode', row };
}
