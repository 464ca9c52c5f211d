import { describe, expect, it } from 'vitest';
import { ChangeError, applyChange, isPristine, pinnedCopy } from '../../src/store/copy';
import { diffTables } from '../../src/store/diff';
import { builtin, newerBuiltin } from './fixtures';

const B = builtin();
const cu = () => B.couples.find((c) => c.key === 'Cu2+/Cu')!;

describe('workbook copy: changes', () => {
  it('pins the built-in table unchanged', () => {
    const p = pinnedCopy(B);
    expect(isPristine(p, B)).toBe(true);
    expect(diffTables(B, p)).toEqual([]);
  });

  it('edits a row, marks it as set here, and reverting makes the copy pristine again', () => {
    const edited = applyChange(null, B, { kind: 'put', rowKind: 'couple', originalKey: 'Cu2+/Cu', record: { ...cu(), e0: 0.35, source: 'lab' } });
    expect(edited.own.couples).toEqual(['Cu2+/Cu']);
    expect(diffTables(B, edited).map((d) => [d.key, d.status, d.fields])).toEqual([['Cu2+/Cu', 'changed', ['e0', 'source']]]);
    // Same position as in the built-in table.
    expect(edited.couples.findIndex((c) => c.key === 'Cu2+/Cu')).toBe(B.couples.findIndex((c) => c.key === 'Cu2+/Cu'));
    const back = applyChange(edited, B, { kind: 'revert', rowKind: 'couple', key: 'Cu(2+)/Cu' });
    expect(isPristine(back, B)).toBe(true);
    expect(back.own.couples).toEqual([]);
  });

  it('an edit that ends equal to the built-in row is not counted as set here', () => {
    const same = applyChange(null, B, { kind: 'put', rowKind: 'couple', originalKey: 'Cu2+/Cu', record: { ...cu() } });
    expect(same.own.couples).toEqual([]);
  });

  it('adds rows at the end, refuses a key already used, and renames', () => {
    const tl = { key: 'Tl+/Tl', halfReaction: 'Tl+ + e- -> Tl', e0: -0.336, source: 'lab' };
    const added = applyChange(null, B, { kind: 'put', rowKind: 'couple', originalKey: null, record: tl });
    expect(added.couples.at(-1)!.key).toBe('Tl+/Tl');
    expect(() => applyChange(added, B, { kind: 'put', rowKind: 'couple', originalKey: null, record: { ...tl, key: 'Tl(+)/Tl' } })).toThrow(ChangeError);
    expect(() => applyChange(added, B, { kind: 'put', rowKind: 'couple', originalKey: 'Cu2+/Cu', record: { ...tl } })).toThrow(/already in the table/);
    // Renaming a built-in row: the old key counts as deleted here.
    const renamed = applyChange(null, B, {
      kind: 'put', rowKind: 'couple', originalKey: 'Cu2+/Cu',
      record: { ...cu(), key: 'Cu2+/Cu(s)', halfReaction: 'Cu2+ + 2e- -> Cu(s)' },
    });
    expect(renamed.removed.couples).toEqual([]); // "Cu2+/Cu(s)" looks up as "Cu2+/Cu": same row, phase marks are ignored
    const renamed2 = applyChange(added, B, { kind: 'put', rowKind: 'couple', originalKey: 'Tl+/Tl', record: { ...tl, key: 'Tl+/Tl2', halfReaction: 'Tl+ + e- -> 1/2 Tl2', source: 'lab' } });
    expect(renamed2.couples.some((c) => c.key === 'Tl+/Tl')).toBe(false);
  });

  it('refuses a row the table would not accept, with the reason', () => {
    expect(() => applyChange(null, B, { kind: 'put', rowKind: 'couple', originalKey: null, record: { key: 'X/Y', halfReaction: 'Cu2+ + e- -> Cu', e0: 0.1, source: 'x' } })).toThrow(ChangeError);
    expect(() => applyChange(null, B, { kind: 'delete', rowKind: 'couple', key: 'Nope/None' })).toThrow(/no couple/);
    expect(() => applyChange(null, B, { kind: 'revert', rowKind: 'couple', key: 'Tl+/Tl' })).toThrow(/not in the built-in table/);
  });

  it('deletes a built-in row (remembered as deleted here) and reverting brings it back', () => {
    const del = applyChange(null, B, { kind: 'delete', rowKind: 'couple', key: 'Zn2+/Zn' });
    expect(del.removed.couples).toEqual(['Zn2+/Zn']);
    expect(diffTables(B, del).map((d) => d.status)).toEqual(['removed']);
    const back = applyChange(del, B, { kind: 'revert', rowKind: 'couple', key: 'Zn2+/Zn' });
    expect(isPristine(back, B)).toBe(true);
  });

  it('imports: merge replaces same keys and keeps others; replace makes the table exactly the file', () => {
    const tl = { key: 'Tl+/Tl', halfReaction: 'Tl+ + e- -> Tl', e0: -0.336, source: 'lab' };
    const merged = applyChange(null, B, { kind: 'import', mode: 'merge', couples: [{ ...cu(), e0: 0.3 }, tl], electrodes: [] });
    expect(merged.couples.length).toBe(B.couples.length + 1);
    expect(merged.couples.find((c) => c.key === 'Cu2+/Cu')!.e0).toBe(0.3);
    const replaced = applyChange(merged, B, { kind: 'import', mode: 'replace', couples: [tl], electrodes: [] });
    expect(replaced.couples.map((c) => c.key)).toEqual(['Tl+/Tl']);
    expect(replaced.electrodes).toEqual([]);
    expect(replaced.removed.couples.length).toBe(B.couples.length);
  });
});

describe('workbook copy: bringing it up to a newer built-in table', () => {
  it('keeps rows set or deleted here, takes every other row from the newer table', () => {
    const N = newerBuiltin(B);
    let copy = applyChange(null, B, { kind: 'put', rowKind: 'couple', originalKey: 'Ag+/Ag', record: { ...B.couples.find((c) => c.key === 'Ag+/Ag')!, e0: 0.8, source: 'lab' } });
    copy = applyChange(copy, B, { kind: 'delete', rowKind: 'couple', key: 'Zn2+/Zn' });
    const up = applyChange(copy, N, { kind: 'update-to-builtin' });
    expect(up.basedOn).toBe('2099.1');
    expect(up.couples.find((c) => c.key === 'Ag+/Ag')!.e0).toBe(0.8); // ours, kept
    expect(up.couples.find((c) => c.key === 'Cu2+/Cu')!.e0).toBe(0.3521); // newer built-in value
    expect(up.couples.some((c) => c.key === 'Zn2+/Zn')).toBe(false); // deleted here, stays deleted
    expect(up.couples.some((c) => c.key === 'Tl+/Tl')).toBe(true); // new in the built-in table
    expect(up.couples.some((c) => c.key === 'Au+/Au')).toBe(false); // dropped from the built-in table
    expect(diffTables(copy, up).map((d) => `${d.key}:${d.status}`).sort()).toEqual(['Au+/Au:removed', 'Cu2+/Cu:changed', 'Tl+/Tl:added']);
  });
});
