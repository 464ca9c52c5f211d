/**
 * The unknown-couple message suggests a key that exists in the table in use: after a workbook deletes
 * a built-in couple, that couple is no longer offered as an example; a near match of what was typed
 * (other case, spaces, charge brackets) is offered first.
 */
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { applyChange } from '../../src/store/copy';
import { writeStoredText } from '../../src/store/stored';
import { builtinTable } from '../../src/table/builtin';
import { suggestKey } from '../../src/table/suggestKey';
import { builtin } from '../store/fixtures';
import { FakeCfError, customFunctionsGlobal } from '../taskpane/mockExcel';

const B = builtin();
const g = globalThis as Record<string, unknown>;
let STDPOTENTIAL: (...a: unknown[]) => unknown;
let REFPOTENTIAL: (...a: unknown[]) => unknown;
let useStoredValue: (v: unknown) => unknown;

beforeAll(async () => {
  g.CustomFunctions = customFunctionsGlobal;
  STDPOTENTIAL = (await import('../../functions/families/table')).STDPOTENTIAL as never;
  REFPOTENTIAL = (await import('../../functions/families/scales')).REFPOTENTIAL as never;
  useStoredValue = (await import('../../functions/workbookHost')).useStoredValue;
});
afterAll(() => void useStoredValue(null));

const message = (v: unknown) => {
  const e = (v as unknown[][])[0][0] as FakeCfError;
  expect(e).toBeInstanceOf(FakeCfError);
  expect(e.code).toBe('#N/A');
  return e.message!;
};

describe('the key suggested for an unknown key', () => {
  it('built-in table: the usual example, or a near match of what was typed', () => {
    expect(suggestKey(builtinTable(), 'couple', 'Xx/Yy')).toEqual({ example: 'Cu2+/Cu' });
    expect(suggestKey(builtinTable(), 'couple', 'zn2+/ZN')).toEqual({ near: 'Zn2+/Zn' });
    expect(suggestKey(builtinTable(), 'couple', 'Fe(3+) / Fe(2+)')).toEqual({ near: 'Fe3+/Fe2+' });
    expect(message(STDPOTENTIAL([['Xx/Yy']], null))).toBe('unknown couple "Xx/Yy"; use a key of the potential table such as "Cu2+/Cu"');
    expect(message(STDPOTENTIAL([['cu2+/cu']], null))).toBe('unknown couple "cu2+/cu"; did you mean "Cu2+/Cu"?');
  });

  it('a workbook table without Cu2+/Cu (and without SCE): the message offers keys that exist', () => {
    let copy = applyChange(null, B, { kind: 'delete', rowKind: 'couple', key: 'Cu2+/Cu' });
    copy = applyChange(copy, B, { kind: 'delete', rowKind: 'electrode', key: 'SCE' });
    useStoredValue(writeStoredText({ ...copy, revision: 1, changedAt: '2026-01-01T00:00:00.000Z' }));
    const m = message(STDPOTENTIAL([['Xx/Yy']], null));
    expect(m).not.toContain('"Cu2+/Cu"');
    const offered = /such as "([^"]+)"$/.exec(m)![1];
    expect(typeof (STDPOTENTIAL([[offered]], null) as unknown[][])[0][0]).toBe('number');
    // the deleted couple itself, typed: not suggested back
    expect(message(STDPOTENTIAL([['Cu2+/Cu']], null))).not.toMatch(/"Cu2\+\/Cu"\?|such as "Cu2\+\/Cu"/);
    const e = message(REFPOTENTIAL([['XYZ']], null));
    expect(e).not.toContain('"SCE"');
    const electrode = /such as "([^"]+)"$/.exec(e)![1];
    expect(typeof (REFPOTENTIAL([[electrode]], null) as unknown[][])[0][0]).toBe('number');
  });
});
