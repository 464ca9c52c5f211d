/**
 * The production bundle, loaded as Excel's runtime loads it (a CustomFunctions global): registration,
 * self-containment (data.js and functions.js evaluated alone in node:vm), and the adapter's rules on
 * the thermodynamics and Nernst families.
 */
import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import vm from 'node:vm';
import { beforeAll, describe, expect, it } from 'vitest';
import { FUNCTION_SCRIPTS } from '../../scripts/lib/bundle.mjs';
import { DIST, type LoadedBundle, isError, loadBundle, one } from './harness';

let b: LoadedBundle;
beforeAll(() => {
  b = loadBundle();
});

describe('registration', () => {
  it('registers exactly the functions declared in functions.json, one to one', () => {
    const ids = b.metadata.functions.map((f) => f.id).sort();
    expect([...b.registered.keys()].sort()).toEqual(ids);
    expect(new Set(ids).size).toBe(ids.length);
  });
  it('declares every argument as a matrix of any and every result as a matrix', () => {
    for (const f of b.metadata.functions) {
      expect(f.result.dimensionality, f.id).toBe('matrix');
      for (const p of f.parameters) expect(p.dimensionality, `${f.id}.${p.name}`).toBe('matrix');
      expect(f.helpUrl, f.id).toBe(`https://localhost:3000/docs/functions.html#${f.id.toLowerCase()}`);
    }
  });
  it('needs nothing but CustomFunctions: evaluated alone in a node:vm context it registers every function and answers', () => {
    const alone = loadBundle({}, DIST, { isolated: true });
    expect(alone.sandbox.Office).toBeUndefined();
    expect(alone.sandbox.window).toBeUndefined();
    expect([...alone.registered.keys()].sort()).toEqual([...b.registered.keys()].sort());
    const args = [[[0.3419]], [[2]], [[0.01], [1], [100]], null] as const;
    expect(alone.call('NERNST', ...args)).toEqual(b.call('NERNST', ...args));
    expect(one(alone.call('STDPOTENTIAL', 'Cu2+/Cu', null))).toBe(one(b.call('STDPOTENTIAL', 'Cu2+/Cu', null)));
  });
  it('the page loads the reference data before the functions, and the loader does the same', () => {
    const html = readFileSync(resolve(DIST, 'taskpane.html'), 'utf8');
    const pageScripts = [...html.matchAll(/<script\b[^>]*\bsrc="?([^"\s>]+)/g)].map((m) => m[1]).filter((src) => !src.includes('office-js') && !src.includes('office.js'));
    expect(pageScripts).toEqual([...FUNCTION_SCRIPTS, 'taskpane.js']);
  });
  it('functions.js without data.js registers nothing: it waits for its data, it never answers without it', () => {
    const registered: string[] = [];
    const sandbox = { CustomFunctions: { Error: class {}, ErrorCode: {}, associate: (id: string) => registered.push(id) } };
    vm.createContext(sandbox);
    vm.runInContext(readFileSync(resolve(DIST, 'functions.js'), 'utf8'), sandbox);
    expect(registered).toEqual([]);
    vm.runInContext(readFileSync(resolve(DIST, 'data.js'), 'utf8'), sandbox); // the data arriving late starts it
    expect(registered.length).toBe(b.metadata.functions.length);
  });
});

describe('scalars and omitted arguments', () => {
  it('NERNST with temperature omitted (null) uses 25 °C', () => {
    expect(one(b.call('NERNST', [[0.3419]], [[2]], [[100]]))).toBeCloseTo(0.28274, 5); // Cu2+/Cu, CRC E°
  });
  it('accepts bare scalars as well as 1×1 ranges, and numeric text', () => {
    expect(one(b.call('NERNSTSLOPE', 1, null))).toBeCloseTo(0.0591593, 7); // CODATA 2018
    expect(one(b.call('NERNSTSLOPE', [['1']], [['37']]))).toBeCloseTo(0.0615404, 7); // CODATA 2018
  });
  it('an empty string in an optional argument means the default', () => {
    expect(one(b.call('NERNSTSLOPE', 1, ''))).toBeCloseTo(0.0591593, 7);
  });
  it('DELTAG of the Daniell cell is −212.27 kJ/mol', () => {
    expect(one(b.call('DELTAG', 1.1, 2))).toBeCloseTo(-212.268, 3); // textbook Daniell cell, CODATA F
  });
});

describe('ranges and broadcasting', () => {
  it('a column of Q spills a column', () => {
    const r = b.call('NERNST', 0, 1, [[1], [10], [100]]) as number[][];
    expect(r).toHaveLength(3);
    expect(r[0][0]).toBe(0);
    expect(r[1][0]).toBeCloseTo(-0.0591593, 7);
    expect(r[2][0]).toBeCloseTo(-0.1183187, 7);
  });
  it('a row against a column gives the full table', () => {
    const r = b.call('NERNSTSLOPE', [[1], [2]], [[0, 25, 37]]) as number[][];
    expect(r.map((row) => row.length)).toEqual([3, 3]);
    expect(r[1][1]).toBeCloseTo(0.0591593 / 2, 7);
    expect(r[0][2]).toBeCloseTo(0.0615404, 7);
  });
  it('equal shapes go element by element', () => {
    const r = b.call('DELTAG', [[1, 2], [3, 4]], [[1, 1], [2, 2]]) as number[][];
    expect(r[1][1]).toBeCloseTo((-2 * 96485.33212 * 4) / 1000, 6);
  });
  it('shapes that cannot be broadcast give one #VALUE! with a message', () => {
    const r = one(b.call('DELTAG', [[1, 2, 3], [4, 5, 6]], [[1, 1], [1, 1], [1, 1]]));
    expect(isError(r, '#VALUE!')).toBe(true);
    expect((r as { message: string }).message).toMatch(/2×3.*3×2|different shapes/);
  });
  it('a bad element gives an error in that element only', () => {
    const r = b.call('NERNST', 0.5, 1, [[1, -1, 'abc', null, 10]]) as unknown[][];
    expect(r[0][0]).toBe(0.5);
    expect(isError(r[0][1], '#VALUE!')).toBe(true); // Q ≤ 0
    expect(isError(r[0][2], '#VALUE!')).toBe(true);
    expect(isError(r[0][3], '#VALUE!')).toBe(true); // required Q from an empty cell
    expect(r[0][4]).toBeCloseTo(0.5 - 0.0591593, 7);
  });
  it('an error value in an input cell is passed through in that element', () => {
    const r = b.call('NERNST', 0.5, 1, [[new (b.sandbox.CustomFunctions as { Error: new (c: string, m?: string) => unknown }).Error('#DIV/0!'), 1]]) as unknown[][];
    expect(isError(r[0][0], '#DIV/0!')).toBe(true);
    expect(r[0][1]).toBe(0.5);
  });
});

describe('domain and type errors', () => {
  it('n must be a whole number ≥ 1 (#VALUE!)', () => {
    expect(isError(one(b.call('NERNSTSLOPE', 1.5)), '#VALUE!')).toBe(true);
    expect(isError(one(b.call('NERNSTSLOPE', 0)), '#VALUE!')).toBe(true);
  });
  it('temperatures at or below absolute zero are #VALUE!', () => {
    expect(isError(one(b.call('NERNSTSLOPE', 1, -273.15)), '#VALUE!')).toBe(true);
  });
  it('a number the user must change is #VALUE! with a message naming the argument, the accepted range and the value', () => {
    const msg = (r: unknown): string => {
      expect(isError(r, '#VALUE!')).toBe(true);
      return (r as { message: string }).message;
    };
    // 95 typed for 95 %: PLATETIME(25 µm, 2 A/dm², Ni, 2, 8.9 g/cm³, 95)
    expect(msg(one(b.call('PLATETIME', 25, 2, 'Ni', 2, 8.9, 95)))).toBe('efficiency must be a fraction in (0, 1]; got 95; a percentage? write 95 % as 0.95');
    // n = 2.5
    expect(msg(one(b.call('NERNSTSLOPE', 2.5)))).toBe('n must be a whole number ≥ 1; got 2.5');
    // a current density of 0 where it divides (time = ∞)
    expect(msg(one(b.call('PLATETIME', 25, 0, 'Ni', 2, 8.9)))).toBe('current_density_A_dm2 must be > 0; got 0');
    // 120 °C where the temperature rules cover 0–100 °C
    expect(msg(one(b.call('STDPOTENTIAL', 'Cu2+/Cu', 120)))).toMatch(/120 °C is outside .*0…100 °C/);
    // below absolute zero
    expect(msg(one(b.call('NERNSTSLOPE', 1, -300)))).toBe('temperature_C must be > −273.15 °C; got -300');
    // a number too large to be a double, typed as text
    expect(msg(one(b.call('NERNSTSLOPE', '1e999')))).toMatch(/^n must be a whole number ≥ 1; got "1e999"/);
  });
  it('text where a number belongs is #VALUE! with a message naming the argument', () => {
    const r = one(b.call('DELTAG', 'volts', 2)) as { code: string; message: string };
    expect(r.code).toBe('#VALUE!');
    expect(r.message).toMatch(/potential_V must be a number; got "volts"/);
  });
  it('booleans are not numbers', () => {
    expect(isError(one(b.call('DELTAG', true, 2)), '#VALUE!')).toBe(true);
  });
  it('KEQ beyond double range is #NUM! while LOGK answers', () => {
    expect(isError(one(b.call('KEQ', 20, 2)), '#NUM!')).toBe(true);
    expect(one(b.call('LOGK', 20, 2))).toBeCloseTo(676.1, 1);
  });
  it('COMBINE reads whole ranges and checks their sizes', () => {
    expect(one(b.call('COMBINE', [[0.771], [-0.447]], [[1], [2]]))).toBeCloseTo(-0.041, 3); // Fe3+/Fe from CRC E° values
    expect(isError(one(b.call('COMBINE', [[0.771], [-0.447]], [[1]])), '#VALUE!')).toBe(true);
  });
  it('never returns −0', () => {
    expect(Object.is(one(b.call('DELTAG', -0, 1)), 0)).toBe(true);
  });
});

describe('paired whole-range arguments', () => {
  it('a position blank in both lists is skipped', () => {
    // Fe3+/Fe from CRC E° values, with an empty row between the steps
    expect(one(b.call('COMBINE', [[0.771], [null], [-0.447]], [[1], [null], [2]]))).toBeCloseTo(-0.041, 3);
  });
  it('a position blank in only one list is #VALUE! naming it, never a silent re-pairing', () => {
    const r = one(b.call('COMBINE', [[0.771], [null], [-0.447]], [[1], [2], [null]])) as { code: string; message: string };
    expect(r.code).toBe('#VALUE!');
    expect(r.message).toMatch(/value 2 of electrons has no partner: that cell of potentials is empty/);
    expect(isError(one(b.call('IONICSTRENGTH', [[0.1], [null], [0.2]], [[1], [-1], [null]])), '#VALUE!')).toBe(true);
  });
});
