/**
 * Whole-range arguments (kinds numberList and textList): read whole, not broadcast, e.g.
 * COMBINE's potentials and electrons, IONICSTRENGTH's molalities and charges.
 */
import { isBlank, numberFrom, textFrom } from './convert';
import { invalidValue, isErrorValue } from './excelErrors';
import type { ArgSpec } from './spec';

/** Most values in one list. */
const MAX_LIST = 100000;

/** Flattens a whole range row by row, blanks kept in place (so that paired lists stay paired). */
function flattenList(raw: unknown, spec: ArgSpec): unknown[] | CustomFunctions.Error {
  const flat: unknown[] = [];
  if (Array.isArray(raw)) {
    for (const row of raw as unknown[]) {
      if (Array.isArray(row)) {
        for (const v of row as unknown[]) {
          if (Array.isArray(v)) return invalidValue(`${spec.name} is not a range of single values`);
          flat.push(v);
        }
      } else flat.push(row);
      if (flat.length > MAX_LIST) return invalidValue(`${spec.name} has more than ${MAX_LIST} values; at most ${MAX_LIST}`);
    }
  } else flat.push(raw);
  return flat;
}

/** Converts the non-blank cells of one list. */
function convertList(cells: readonly unknown[], spec: ArgSpec): number[] | string[] | CustomFunctions.Error {
  if (cells.length === 0) {
    if (spec.optional || spec.default !== undefined) return [];
    return invalidValue(`${spec.name} is required; the range is empty`);
  }
  if (spec.kind === 'numberList') {
    const out: number[] = [];
    for (const v of cells) {
      const x = numberFrom(v, spec);
      if (typeof x !== 'number') return x;
      out.push(x);
    }
    return out;
  }
  const out: string[] = [];
  for (const v of cells) {
    const t = textFrom(v, spec);
    if (typeof t !== 'string') return t;
    out.push(t);
  }
  return out;
}

/**
 * Reads the whole-range arguments of a call. Blank cells are skipped, but lists of the same
 * length are read as pairs by position: a position blank in every list is skipped, a position
 * blank in only some of them is a #VALUE! naming it (skipping it in one list alone would pair the
 * others' values with the wrong partners).
 */
export function readLists(raws: readonly unknown[], specs: readonly ArgSpec[]): Array<number[] | string[]> | CustomFunctions.Error {
  const flats: unknown[][] = [];
  for (let k = 0; k < specs.length; k++) {
    const f = flattenList(raws[k], specs[k]);
    if (isErrorValue(f)) return f;
    flats.push(f);
  }
  const paired = flats.length > 1 && flats.every((f) => f.length === flats[0].length);
  const kept: unknown[][] = flats.map(() => []);
  if (paired) {
    for (let j = 0; j < flats[0].length; j++) {
      const blank = flats.map((f) => isBlank(f[j]));
      if (blank.every(Boolean)) continue;
      if (blank.some(Boolean)) {
        const empty = specs.filter((_, k) => blank[k]).map((a) => a.name).join(' and ');
        const full = specs.filter((_, k) => !blank[k]).map((a) => a.name).join(' and ');
        return invalidValue(`value ${j + 1} of ${full} has no partner: that cell of ${empty} is empty`);
      }
      for (let k = 0; k < flats.length; k++) kept[k].push(flats[k][j]);
    }
  } else {
    for (let k = 0; k < flats.length; k++) for (const v of flats[k]) if (!isBlank(v)) kept[k].push(v);
  }
  const out: Array<number[] | string[]> = [];
  for (let k = 0; k < specs.length; k++) {
    const list = convertList(kept[k], specs[k]);
    if (isErrorValue(list)) return list;
    out.push(list);
  }
  return out;
}
