import { describe, expect, it } from 'vitest';
import { buildTable } from '../../src/table/table';
import { prebuildTable, tableFromPrebuilt } from '../../src/table/prebuilt';
import couples from '../../data/couples.json';
import electrodes from '../../data/electrodes.json';

// The built-in table checked at build time (src/table/prebuilt.ts) must be the table buildTable makes:
// the expected values are buildTable's own rows, problems and look-ups on the same records.
const throughJson = (x: unknown): unknown => JSON.parse(JSON.stringify(x));

function sameTable(records: { couples: unknown[]; electrodes: unknown[] }): void {
  const built = buildTable('2026.1', records.couples, records.electrodes);
  const back = tableFromPrebuilt(throughJson(prebuildTable(built)) as ReturnType<typeof prebuildTable>);
  expect(back.problems).toStrictEqual(built.problems);
  expect(back.table.version).toBe(built.table.version);
  expect(back.table.couples).toStrictEqual(built.table.couples);
  expect(back.table.electrodes).toStrictEqual(built.table.electrodes);
  expect(Object.isFrozen(back.table.couples)).toBe(true);
  expect(Object.isFrozen(back.table.electrodes)).toBe(true);
  // every spelling a look-up accepts finds the same row
  built.table.couples.forEach((row, i) => {
    for (const k of [row.key, row.key.replace(/(\d)([+-])/g, '($1$2)'), ` ${row.key} `]) {
      const a = built.table.findCouple(k);
      const b = back.table.findCouple(k);
      expect(b === undefined ? undefined : back.table.couples.indexOf(b)).toBe(a === undefined ? undefined : built.table.couples.indexOf(a));
    }
    expect(back.table.findCouple(row.key)).toBe(back.table.couples[i]);
  });
  built.table.electrodes.forEach((row, i) => {
    for (const name of [row.key, ...row.aliases, row.key.toLowerCase()]) expect(back.table.findElectrode(name)).toBe(back.table.electrodes[i]);
  });
  for (const k of ['Qq2+/Qq', 'Fe9+/Fe', '', 'Cu2+', 'SCE/Cu']) expect(back.table.findCouple(k)).toBe(built.table.findCouple(k));
  expect(back.table.findElectrode('no such electrode')).toBeUndefined();
}

describe('prebuildTable / tableFromPrebuilt', () => {
  it('give back the built-in table exactly: rows, parsed half-reactions, n, look-ups, problems', () => {
    sameTable({ couples: couples.couples, electrodes: electrodes.electrodes });
  });

  it('give back the problems of rows left out, and the look-ups of the rows kept', () => {
    sameTable({
      couples: [
        { key: 'Cu2+/Cu', halfReaction: 'Cu2+ + 2e- -> Cu', e0: 0.3419, source: 'test row' },
        { key: 'Cu(2+)/Cu', halfReaction: 'Cu2+ + 2e- -> Cu', e0: 0.34, source: 'repeats the key' },
        { key: 'Zn2+/Zn', halfReaction: 'Zn2+ + e- -> Zn', e0: -0.76, source: 'does not balance' },
        { key: 'O2/H2O', halfReaction: '1/2 O2(g) + 2H+ + 2e- -> H2O(l)', e0: 1.229, dEdT_mV_K: -0.846, source: 'test row', note: 'acid' },
      ],
      electrodes: [
        { key: 'SCE', aliases: ['Hg/Hg2Cl2/KCl(sat)'], potential: 0.2412, source: 'test row' },
        { key: 'sce', aliases: [], potential: 0.2, source: 'repeats a name' },
      ],
    });
  });

  it('shares one species object between rows, as the species reader does', () => {
    const built = buildTable('2026.1', couples.couples, electrodes.electrodes);
    const back = tableFromPrebuilt(throughJson(prebuildTable(built)) as ReturnType<typeof prebuildTable>);
    const hPlus = back.table.couples.flatMap((r) => r.parsed.species).filter((t) => t.species.key === 'H+');
    expect(hPlus.length).toBeGreaterThan(5);
    expect(new Set(hPlus.map((t) => t.species)).size).toBe(1);
  });

  it('refuses what is not a prebuilt table', () => {
    expect(() => tableFromPrebuilt({ format: 'other' } as unknown as ReturnType<typeof prebuildTable>)).toThrow(/not a prebuilt table/);
  });
});
