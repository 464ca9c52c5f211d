import { describe, expect, it } from 'vitest';
import { decodeGraph, encodeGraph } from '../../src/dataset/graph';

// The JSON form of value trees that carries build-time values into the bundles (src/dataset/graph.ts).
// Expected values: the inputs themselves (a round trip through JSON text must give them back exactly).
const roundTrip = (x: unknown): unknown => decodeGraph(JSON.parse(JSON.stringify(encodeGraph(x))));

describe('encodeGraph / decodeGraph', () => {
  it('gives back objects, arrays and primitives exactly, undefined keys and key order included', () => {
    const value = { z: 1, a: undefined, list: [1, 'two', null, true, false, undefined, [], {}], nested: { phase: undefined, n: -2.5e-300, text: '' } };
    const back = roundTrip(value);
    expect(back).toStrictEqual(value);
    expect(Object.keys(back as object)).toEqual(['z', 'a', 'list', 'nested']);
    expect('phase' in (back as { nested: object }).nested).toBe(true);
    expect(roundTrip(undefined)).toBeUndefined();
    expect(roundTrip('["a",1]')).toBe('["a",1]'); // a text that looks like a form stays text
    expect(roundTrip(['u'])).toEqual(['u']);
  });

  it('keeps one object where the original shared one, and copies nothing else', () => {
    const shared = { key: 'H+', elements: { H: 1 } };
    const value = { rows: [{ s: shared }, { s: shared }, { s: { key: 'H+', elements: { H: 1 } } }] };
    const back = roundTrip(value) as typeof value;
    expect(back).toStrictEqual(value);
    expect(back.rows[0].s).toBe(back.rows[1].s);
    expect(back.rows[2].s).not.toBe(back.rows[0].s);
  });

  it('refuses what it could not give back', () => {
    expect(() => encodeGraph({ x: Number.NaN })).toThrow(/NaN/);
    expect(() => encodeGraph([Number.POSITIVE_INFINITY])).toThrow(/Infinity/);
    expect(() => encodeGraph({ x: -0 })).toThrow(/JSON form/);
    expect(() => encodeGraph({ f: () => 1 })).toThrow(/function/);
    expect(() => encodeGraph({ d: new Date(0) })).toThrow(/plain objects/);
    expect(() => encodeGraph(JSON.parse('{"__proto__":1}'))).toThrow(/__proto__/);
    const loop: Record<string, unknown> = {};
    loop.self = { loop };
    expect(() => encodeGraph(loop)).toThrow(/contains itself/);
  });

  it('refuses a malformed form', () => {
    expect(() => decodeGraph(['x'])).toThrow(/no known kind/);
    expect(() => decodeGraph(['r', 0])).toThrow(/before it is defined/);
    expect(() => decodeGraph(['o', 1, 2])).toThrow(/key/);
    expect(() => decodeGraph(['o', '__proto__', 2])).toThrow(/key/);
  });
});
