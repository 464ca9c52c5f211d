/** CONVERTUNIT through the production bundle: scalars, ranges, omitted arguments and error cells. */
import { describe, expect, it } from 'vitest';
import { bundleUnderTest, type FakeError, isError, one } from './harness';

const { bundle, run } = bundleUnderTest();

describe('CONVERTUNIT', () => {
  it('declares value, from_unit, to_unit', () => {
    const f = bundle().metadata.functions.find((x) => x.id === 'CONVERTUNIT')!;
    expect(f.parameters.map((p) => p.name)).toEqual(['value', 'from_unit', 'to_unit']);
  });
  it('scalars', async () => {
    // NIST SP 811 (2008) B.9: foot = 0.3048 m exactly → 20 A/ft² = 2.152782 A/dm²
    expect(one(await run('CONVERTUNIT', 20, 'ASF', 'A/dm2')) as number).toBeCloseTo(2.152782, 6);
    // SP 811 B.9: mil = 2.54 E-05 m (exact)
    expect(one(await run('CONVERTUNIT', 1, 'mil', 'µm')) as number).toBeCloseTo(25.4, 12);
  });
  it('a column of values against a row of units gives the full table', async () => {
    const r = (await run('CONVERTUNIT', [[1], [2]], 'oz/gal', [['g/L', 'ozt/gal']])) as number[][];
    // avoirdupois oz/gal (U.S.) = 7.489152 g/L (SP 811 B.8, from memory); troy: 28.349523125/31.1034768 oz t per oz
    expect(r[0][0]).toBeCloseTo(7.489152, 6);
    expect(r[1][0]).toBeCloseTo(14.978304, 5);
    expect(r[0][1]).toBeCloseTo(28.349523125 / 31.1034768, 9);
  });
  it('errors: unknown unit and different kinds #N/A with the accepted units; omitted unit #VALUE!; error cells pass through', async () => {
    const unknown = one(await run('CONVERTUNIT', 1, 'A/in2', 'A/dm2'));
    expect(isError(unknown, '#N/A')).toBe(true);
    expect((unknown as FakeError).message).toMatch(/units of current density: A\/m2, A\/dm2/);
    const kinds = one(await run('CONVERTUNIT', 1, 'A/dm2', 'um'));
    expect(isError(kinds, '#N/A')).toBe(true);
    expect((kinds as FakeError).message).toMatch(/cannot convert current density/);
    expect(isError(one(await run('CONVERTUNIT', 1, null, 'um')), '#VALUE!')).toBe(true);
    const CFError = (bundle().sandbox.CustomFunctions as { Error: new (c: string, m?: string) => unknown }).Error;
    expect(isError(one(await run('CONVERTUNIT', new CFError('#DIV/0!'), 'um', 'mil')), '#DIV/0!')).toBe(true);
  });
});
