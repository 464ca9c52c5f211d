/**
 * The shape of a data part, learnt from the add-in's built-in part, and the check that a pinned part
 * has it: the same kinds of values (finite numbers, texts within a length limit, booleans, nulls,
 * lists, records) at the same places, every field the built-in part always has present, no field the
 * built-in part never has. A pinned part that passes can be read by the code of this add-in version
 * exactly as the built-in part is read.
 */

export type Shape =
  | { readonly kind: 'number' | 'string' | 'boolean' | 'null' }
  | { readonly kind: 'array'; readonly of: Shape | null }
  | { readonly kind: 'object'; readonly fields: ReadonlyMap<string, { readonly shape: Shape; readonly required: boolean }> }
  | { readonly kind: 'union'; readonly options: readonly Shape[] };

/** Longest text a pinned part may hold in one field. */
export const MAX_PART_TEXT = 4000;
/** Longest list a pinned part may hold. */
export const MAX_PART_LIST = 10_000;
/** Deepest nesting a pinned part may hold. */
const MAX_DEPTH = 12;

function kindOf(v: unknown): Shape['kind'] {
  if (v === null) return 'null';
  if (Array.isArray(v)) return 'array';
  const t = typeof v;
  if (t === 'number' || t === 'string' || t === 'boolean') return t;
  if (t === 'object') return 'object';
  throw new TypeError(`a data part cannot hold a ${t}`);
}

function merge(a: Shape | null, b: Shape): Shape {
  if (a === null) return b;
  if (a.kind === 'union') {
    const same = a.options.findIndex((o) => o.kind === b.kind);
    if (same < 0) return { kind: 'union', options: [...a.options, b] };
    return { kind: 'union', options: a.options.map((o, i) => (i === same ? merge(o, b) : o)) };
  }
  if (a.kind !== b.kind) return { kind: 'union', options: [a, b] };
  if (a.kind === 'array' && b.kind === 'array') return { kind: 'array', of: b.of === null ? a.of : merge(a.of, b.of) };
  if (a.kind === 'object' && b.kind === 'object') {
    const fields = new Map<string, { shape: Shape; required: boolean }>();
    for (const [k, fa] of a.fields) {
      const fb = b.fields.get(k);
      fields.set(k, fb === undefined ? { shape: fa.shape, required: false } : { shape: merge(fa.shape, fb.shape), required: fa.required && fb.required });
    }
    for (const [k, fb] of b.fields) if (!a.fields.has(k)) fields.set(k, { shape: fb.shape, required: false });
    return { kind: 'object', fields };
  }
  return a;
}

/**
 * The shape of a value (a list's elements merged into one shape; a field missing in some elements is
 * optional).
 *
 * Syntax: shapeOf(value)
 * Example: shapeOf({ a: [1, 2] }) → object { a: array of number }
 */
export function shapeOf(v: unknown): Shape {
  const kind = kindOf(v);
  if (kind === 'array') {
    let of: Shape | null = null;
    for (const x of v as unknown[]) of = merge(of, shapeOf(x));
    return { kind: 'array', of };
  }
  if (kind === 'object') {
    const fields = new Map<string, { shape: Shape; required: boolean }>();
    for (const [k, x] of Object.entries(v as Record<string, unknown>)) fields.set(k, { shape: shapeOf(x), required: true });
    return { kind: 'object', fields };
  }
  return { kind } as Shape;
}

const name = (k: string): string => JSON.stringify(k.length > 40 ? `${k.slice(0, 39)}…` : k);

function matches(v: unknown, s: Shape, path: string, depth: number, problems: string[]): void {
  if (problems.length >= 20) return;
  if (depth > MAX_DEPTH) {
    problems.push(`${path} is nested too deeply`);
    return;
  }
  if (s.kind === 'union') {
    const k = v === null ? 'null' : Array.isArray(v) ? 'array' : typeof v;
    const option = s.options.find((o) => o.kind === k);
    if (option === undefined) problems.push(`${path} is not ${s.options.map((o) => o.kind).join(' or ')}`);
    else matches(v, option, path, depth, problems);
    return;
  }
  switch (s.kind) {
    case 'number':
      if (typeof v !== 'number' || !Number.isFinite(v)) problems.push(`${path} is not a finite number`);
      return;
    case 'string':
      if (typeof v !== 'string' || v.length > MAX_PART_TEXT) problems.push(`${path} is not a text of at most ${MAX_PART_TEXT} characters`);
      return;
    case 'boolean':
      if (typeof v !== 'boolean') problems.push(`${path} is not true or false`);
      return;
    case 'null':
      if (v !== null) problems.push(`${path} is not null`);
      return;
    case 'array':
      if (!Array.isArray(v) || v.length > MAX_PART_LIST) problems.push(`${path} is not a list of at most ${MAX_PART_LIST} entries`);
      else if (s.of === null) {
        if (v.length > 0) problems.push(`${path} should be empty`);
      } else for (let i = 0; i < v.length && problems.length < 20; i++) matches(v[i], s.of, `${path}[${i}]`, depth + 1, problems);
      return;
    case 'object': {
      if (typeof v !== 'object' || v === null || Array.isArray(v)) {
        problems.push(`${path} is not a record`);
        return;
      }
      const o = v as Record<string, unknown>;
      const extra = Object.keys(o).filter((k) => !s.fields.has(k));
      if (extra.length > 0) problems.push(`${path} has fields Cellwright does not write: ${extra.slice(0, 5).map(name).join(', ')}`);
      for (const [k, f] of s.fields) {
        if (!Object.prototype.hasOwnProperty.call(o, k)) {
          if (f.required) problems.push(`${path} has no ${name(k)}`);
        } else matches(o[k], f.shape, `${path}.${k}`, depth + 1, problems);
      }
    }
  }
}

/**
 * What keeps `value` from having shape `s` (empty when it has it; at most 20 lines). Never throws.
 *
 * Syntax: shapeProblems(value, shape, path)
 * Example: shapeProblems({ a: "x" }, shapeOf({ a: 1 }), "part") → ['part.a is not a finite number']
 */
export function shapeProblems(value: unknown, s: Shape, path: string): string[] {
  const problems: string[] = [];
  matches(value, s, path, 0, problems);
  return problems;
}
