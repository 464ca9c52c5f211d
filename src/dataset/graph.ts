/**
 * A JSON form of a tree of plain values that gives back exactly what it was given: the same objects
 * with the same keys in the same order (a key whose value is undefined included), the same arrays,
 * and one object where the original shared one object between several places (a species used by
 * many rows). JSON.stringify alone would drop undefined keys and copy shared objects. Used to carry
 * values computed at build time into the bundles (src/dataset/buildTime.ts).
 *
 * Form: strings, finite numbers, booleans and null stand for themselves; every other value is an
 * array whose first item says what it is: ["a", item…] an array, ["o", key, value, key, value…] an
 * object, ["u"] undefined, ["d", id, form] the first place of an object used in several places,
 * ["r", id] each later place. Text stays text, so the form compresses like the JSON it came from.
 */

/** The JSON form of a value tree. */
export type EncodedGraph = unknown;

/**
 * Encodes a value made of plain objects, arrays, strings, finite numbers, booleans, null and
 * undefined. Throws on anything else (a function, a class instance, NaN, ±Infinity, −0, a cycle),
 * so that nothing is changed silently on the way.
 *
 * Syntax: encodeGraph(value)
 * Example: decodeGraph(encodeGraph({ a: undefined, b: [1, 1] })) → { a: undefined, b: [1, 1] }
 * See also: decodeGraph
 */
export function encodeGraph(value: unknown): EncodedGraph {
  // First pass: how often each object is reached (shared ones get an id).
  const uses = new Map<object, number>();
  const open = new Set<object>();
  const count = (x: unknown): void => {
    if (typeof x !== 'object' || x === null) return;
    if (open.has(x)) throw new Error('a value that contains itself has no JSON form here');
    const n = uses.get(x) ?? 0;
    uses.set(x, n + 1);
    if (n > 0) return;
    open.add(x);
    for (const v of Array.isArray(x) ? (x as unknown[]) : Object.values(x)) count(v);
    open.delete(x);
  };
  count(value);
  const ids = new Map<object, number>();
  const form = (x: unknown): unknown => {
    if (x === undefined) return ['u'];
    if (x === null || typeof x === 'string' || typeof x === 'boolean') return x;
    if (typeof x === 'number') {
      if (!Number.isFinite(x) || Object.is(x, -0)) throw new Error(`the number ${String(x)} has no JSON form`);
      return x;
    }
    if (typeof x !== 'object') throw new Error(`a value of type ${typeof x} has no JSON form`);
    const known = ids.get(x);
    if (known !== undefined) return ['r', known];
    let body: unknown[];
    if (Array.isArray(x)) {
      body = ['a', ...(x as unknown[]).map(form)];
    } else {
      const proto = Object.getPrototypeOf(x) as unknown;
      if (proto !== Object.prototype && proto !== null) throw new Error('only plain objects and arrays have a JSON form');
      body = ['o'];
      for (const [k, v] of Object.entries(x)) {
        if (k === '__proto__') throw new Error('an object with a "__proto__" key has no JSON form here');
        body.push(k, form(v));
      }
    }
    if ((uses.get(x) ?? 0) < 2) return body;
    const id = ids.size;
    ids.set(x, id);
    return ['d', id, body];
  };
  return form(value);
}

/**
 * The value an EncodedGraph holds (see encodeGraph). Throws on a malformed form.
 *
 * Syntax: decodeGraph(graph)
 * See also: encodeGraph
 */
export function decodeGraph(graph: EncodedGraph): unknown {
  const defined = new Map<number, unknown>();
  const value = (f: unknown): unknown => {
    if (!Array.isArray(f)) return f;
    const tag = f[0] as unknown;
    if (tag === 'u') return undefined;
    if (tag === 'r') {
      if (!defined.has(f[1] as number)) throw new Error(`the form refers to ${String(f[1])} before it is defined`);
      return defined.get(f[1] as number);
    }
    if (tag === 'd') {
      const made = value(f[2]);
      defined.set(f[1] as number, made);
      return made;
    }
    if (tag === 'a') {
      const out: unknown[] = [];
      for (let k = 1; k < f.length; k++) out.push(value(f[k]));
      return out;
    }
    if (tag === 'o') {
      const out: Record<string, unknown> = {};
      for (let k = 1; k < f.length; k += 2) {
        const key = f[k] as unknown;
        if (typeof key !== 'string' || key === '__proto__') throw new Error('the form has an object key that is not a usable text');
        out[key] = value(f[k + 1]);
      }
      return out;
    }
    throw new Error(`the form has a part of no known kind (${JSON.stringify(tag)})`);
  };
  return value(graph);
}
