/**
 * Canonical JSON: one text per value, so that equal content always gives the same checksum.
 *
 * Rules: object keys sorted by UTF-16 code units; properties whose value is undefined left out;
 * arrays keep their order; numbers as JavaScript writes them (the shortest text that reads back to
 * the same double, so 0.1 stays "0.1"); −0 written as 0; strings JSON-escaped; no white space.
 * NaN, ±Infinity, functions, symbols, bigints and other non-JSON values are refused.
 */

/**
 * The canonical JSON text of a value.
 *
 * Syntax: canonicalJson(value)
 * Example: canonicalJson({ b: 1, a: [true, "x"] }) → '{"a":[true,"x"],"b":1}'
 */
export function canonicalJson(value: unknown): string {
  if (value === null) return 'null';
  switch (typeof value) {
    case 'boolean':
      return value ? 'true' : 'false';
    case 'string':
      return JSON.stringify(value);
    case 'number':
      if (!Number.isFinite(value)) throw new TypeError(`canonical JSON cannot hold the number ${String(value)}`);
      return Object.is(value, -0) ? '0' : JSON.stringify(value);
    case 'object': {
      if (Array.isArray(value)) return `[${value.map((v) => canonicalJson(v === undefined ? null : v)).join(',')}]`;
      const proto: unknown = Object.getPrototypeOf(value);
      if (proto !== Object.prototype && proto !== null) throw new TypeError('canonical JSON holds only plain objects');
      const obj = value as Record<string, unknown>;
      const keys = Object.keys(obj)
        .filter((k) => obj[k] !== undefined)
        .sort((x, y) => (x < y ? -1 : x > y ? 1 : 0));
      return `{${keys.map((k) => `${JSON.stringify(k)}:${canonicalJson(obj[k])}`).join(',')}}`;
    }
    default:
      throw new TypeError(`canonical JSON cannot hold a ${typeof value}`);
  }
}
