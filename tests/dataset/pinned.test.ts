import { describe, expect, it } from 'vitest';
import { builtinPartChecksums, dataSetChecksum, partChecksum } from '../../src/dataset/checksum';
import { compareDataParts, comparePart, describeDataSet } from '../../src/dataset/describe';
import { BUILTIN_PARTS, DATASET_VERSION, DATA_PARTS, type DataParts } from '../../src/dataset/parts';
import { forgetLastPinnedRead, partsWithPinned, readPinnedText, storedPartsWithPinned, writePinnedText } from '../../src/dataset/pinned';
import { sha256Hex } from '../../src/store/sha256';

const AT = '2026-01-05T10:00:00.000Z';
const clone = <T>(x: T): T => JSON.parse(JSON.stringify(x)) as T;

/**
 * A text pinned from data with nickel's atomic weight changed, every checksum made to fit (as an older add-in
 * would have written it). The tests use 58.6934 g/mol, an earlier IUPAC value (from memory), or a damaged one.
 */
function pinnedWithNickel(w: number, version = '2025.1'): string {
  const aw = clone(BUILTIN_PARTS.atomicweights);
  aw.elements.find((e) => e.symbol === 'Ni')!.atomicWeight = w;
  return writePinnedText({ version, pinnedAt: AT, parts: { ...BUILTIN_PARTS, atomicweights: aw } });
}

describe('pinned data: stored form', () => {
  it('round-trips every part exactly, with a checksum per part', () => {
    forgetLastPinnedRead();
    const text = writePinnedText({ version: DATASET_VERSION, pinnedAt: AT });
    const r = readPinnedText(text);
    expect(r.ok).toBe(true);
    if (!r.ok) return;
    for (const p of DATA_PARTS) {
      expect(r.pinned.parts[p]).toEqual(BUILTIN_PARTS[p]);
      expect(r.pinned.checksums[p]).toBe(builtinPartChecksums()[p]);
    }
    expect(r.pinned.version).toBe(DATASET_VERSION);
    expect(r.pinned.pinnedAt).toBe(AT);
    // The part checksum is SHA-256 of the canonical JSON (keys sorted, no white space).
    expect(partChecksum({ b: 1, a: [true, 'x'] })).toBe(`sha256:${sha256Hex('{"a":[true,"x"],"b":1}')}`);
  });

  it('each part has its own checksum and a changed part changes only its own and the overall one', () => {
    const a = readPinnedText(writePinnedText({ version: DATASET_VERSION, pinnedAt: AT }));
    const b = readPinnedText(pinnedWithNickel(58.6934));
    if (!a.ok || !b.ok) throw new Error('unreadable');
    const differing = DATA_PARTS.filter((p) => a.pinned.checksums[p] !== b.pinned.checksums[p]);
    expect(differing).toEqual(['atomicweights']);
    expect(a.pinned.checksum).not.toBe(b.pinned.checksum);
    expect(new Set(Object.values(builtinPartChecksums())).size).toBe(DATA_PARTS.length);
  });

  it('holds a subset of the parts; the others follow the built-in data', () => {
    const text = writePinnedText({ version: DATASET_VERSION, pinnedAt: AT, parts: { atomicweights: BUILTIN_PARTS.atomicweights } });
    const r = readPinnedText(text);
    if (!r.ok) throw new Error(r.problem.message);
    expect(Object.keys(r.pinned.parts)).toEqual(['atomicweights']);
    expect(partsWithPinned(r.pinned).species).toBe(BUILTIN_PARTS.species);
  });

  /** The parsed stored text, untyped on purpose: the damage is done to plain JSON. */
  type Doc = ReturnType<typeof JSON.parse>;
  const damaged: [string, (doc: Doc) => void, RegExp][] = [
    ['a changed value', (d) => { d.parts.atomicweights.content.elements[27].atomicWeight = 58.7; }, /checksum of the pinned part "Atomic weights" does not match/],
    ['a removed part', (d) => { delete d.parts.species; }, /checksum of the pinned data does not match its parts/],
    ['a wrong type', (d) => { d.parts.water.content.ionProduct.n = 'six'; }, /"Water.*water\.ionProduct\.n is not a finite number/],
    ['an unknown field', (d) => { d.parts.units.content.units[0].extra = 1; }, /units\.units\[0\] has fields Cellwright does not write: "extra"/],
    ['a missing field', (d) => { delete d.parts.anodes.content.anodes[0].capacity_Ah_kg; }, /has no "capacity_Ah_kg"/],
    ['an unknown part', (d) => { d.parts.lasers = { checksum: d.checksum, content: {} }; }, /parts this add-in does not know: "lasers"/],
    ['a newer schema', (d) => { d.schema = 2; }, /newer version of Cellwright/],
    ['a bad time', (d) => { d.pinnedAt = 'yesterday'; }, /"pinnedAt" is not a time/],
  ];
  for (const [what, change, message] of damaged) {
    it(`refuses ${what} with the reason, and uses nothing of it`, () => {
      const doc = JSON.parse(writePinnedText({ version: DATASET_VERSION, pinnedAt: AT }));
      change(doc);
      const r = readPinnedText(JSON.stringify(doc));
      expect(r.ok).toBe(false);
      if (!r.ok) expect(r.problem.message).toMatch(message);
    });
  }

  it('reads data pinned by an earlier add-in version that predates a field: that field from the built-in part, the rest as pinned', () => {
    // An earlier version had no sulfuric-acid conductivity and an older nickel weight; its checksums fit its own content.
    const el = clone(BUILTIN_PARTS.electrolysis) as unknown as { conductivity: Record<string, unknown> };
    delete el.conductivity.H2SO4;
    const aw = clone(BUILTIN_PARTS.atomicweights);
    aw.elements.find((e) => e.symbol === 'Ni')!.atomicWeight = 58.6934;
    const older = { electrolysis: el as unknown as DataParts['electrolysis'], atomicweights: aw };
    const r = readPinnedText(writePinnedText({ version: '2025.1', pinnedAt: AT, parts: older }));
    if (!r.ok) throw new Error(r.problem.message);
    expect(r.pinned.fromBuiltin).toEqual({ electrolysis: ['electrolysis.conductivity.H2SO4'] });
    // stored as pinned: the checksum covers what was pinned, and an update would add the field
    expect(r.pinned.parts.electrolysis).toEqual(el);
    expect(r.pinned.checksums.electrolysis).toBe(partChecksum(el));
    // what the functions read has its own checksum (the computed-with record); parts read as pinned keep theirs
    expect(r.pinned.inUseChecksums.electrolysis).toBe(partChecksum(BUILTIN_PARTS.electrolysis));
    expect(r.pinned.inUseChecksums.atomicweights).toBe(r.pinned.checksums.atomicweights);
    // in use: the pinned values, plus the field they predate
    const inUse = partsWithPinned(r.pinned);
    expect(inUse.electrolysis.conductivity.H2SO4).toEqual(BUILTIN_PARTS.electrolysis.conductivity.H2SO4);
    expect(inUse.electrolysis.conductivity.KOH).toEqual(BUILTIN_PARTS.electrolysis.conductivity.KOH);
    expect(inUse.atomicweights.elements.find((e) => e.symbol === 'Ni')!.atomicWeight).toBe(58.6934);
    const change = compareDataParts(storedPartsWithPinned(r.pinned), BUILTIN_PARTS).find((c) => c.name === 'electrolysis');
    expect(change?.changed.some((c) => c.where.startsWith('conductivity.H2SO4') && c.before === undefined)).toBe(true);
    const described = describeDataSet({ pinned: false, version: DATASET_VERSION, checksum: 'sha256:x', rows: 1, source: 's' }, r.pinned);
    expect(described.parts.find((p) => p.name === 'electrolysis')?.fromBuiltin).toEqual(['electrolysis.conductivity.H2SO4']);
    expect(described.parts.find((p) => p.name === 'atomicweights')?.fromBuiltin).toBeUndefined();
  });

  it('refuses a resealed part that breaks the part\'s own rules', () => {
    const r = readPinnedText(pinnedWithNickel(-1));
    expect(r.ok).toBe(false);
    if (!r.ok) expect(r.problem.message).toMatch(/Ni has the weight -1/);
  });

  it('never throws on what is not a pinned text', () => {
    for (const v of [null, 42, '', '{', '[]', '{"format":"x"}', JSON.stringify({ format: 'cellwright.pinned-data', schema: 1 })]) {
      expect(readPinnedText(v).ok).toBe(false);
    }
  });
});

describe('the data set\'s description and comparison', () => {
  const table = { pinned: false, version: DATASET_VERSION, checksum: `sha256:${'0'.repeat(64)}`, rows: 90, source: 'x' };

  it('lists the table and every part, built-in when nothing is pinned', () => {
    const d = describeDataSet(table, null);
    expect(d.parts.map((p) => p.name)).toEqual(['table', ...DATA_PARTS]);
    expect(d.parts.every((p) => !p.pinned)).toBe(true);
    expect(d.version).toBe(DATASET_VERSION);
    expect(d.checksum).toBe(dataSetChecksum({ table: table.checksum, ...builtinPartChecksums() }));
    expect(d.parts.find((p) => p.name === 'atomicweights')?.rows).toBe(BUILTIN_PARTS.atomicweights.elements.length);
  });

  it('a pinned copy of the built-in data has the built-in data set\'s checksum', () => {
    const r = readPinnedText(writePinnedText({ version: DATASET_VERSION, pinnedAt: AT }));
    if (!r.ok) throw new Error('unreadable');
    const pinned = describeDataSet({ ...table, pinned: true }, r.pinned);
    expect(pinned.checksum).toBe(describeDataSet(table, null).checksum);
    expect(pinned.parts.every((p) => p.pinned)).toBe(true);
  });

  it('says what a newer built-in data set would change, part by part', () => {
    const r = readPinnedText(pinnedWithNickel(58.6934));
    if (!r.ok) throw new Error('unreadable');
    const changes = compareDataParts(partsWithPinned(r.pinned), BUILTIN_PARTS);
    expect(changes.map((c) => c.name)).toEqual(['atomicweights']);
    expect(changes[0].changed).toEqual([{ where: 'Ni: atomicWeight', before: 58.6934, after: 58.693 }]);
    const species: DataParts['species'] = clone(BUILTIN_PARTS.species);
    species.species.pop();
    const removed = comparePart('species', BUILTIN_PARTS.species, species);
    expect(removed.removed).toHaveLength(1);
    expect(comparePart('species', species, BUILTIN_PARTS.species).added).toEqual(removed.removed);
  });
});
