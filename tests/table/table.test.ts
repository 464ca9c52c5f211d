import { describe, expect, it } from 'vitest';
import { buildTable, validateCoupleRecord, validateElectrodeRecord } from '../../src/table/table';
import type { CoupleRecord } from '../../src/table/records';

// E° values below are the CRC Handbook (92nd ed.) Electrochemical Series values, from memory.
const zinc: CoupleRecord = { key: 'Zn2+/Zn', halfReaction: 'Zn2+ + 2e- -> Zn', e0: -0.7618, dEdT_mV_K: 0.119, source: 'CRC Handbook' };
const copper: CoupleRecord = { key: 'Cu2+/Cu', halfReaction: 'Cu2+ + 2e- -> Cu', e0: 0.3419, source: 'CRC Handbook', note: 'acid sulfate plating' };

describe('validateCoupleRecord', () => {
  it('makes a row with n derived from the half-reaction', () => {
    const v = validateCoupleRecord({ key: 'MnO4-/Mn2+', halfReaction: 'MnO4- + 8H+ + 5e- -> Mn2+ + 4H2O', e0: 1.507, source: 'CRC Handbook' });
    expect(v.problems).toEqual([]);
    expect(v.row!.n).toBe(5);
    expect(v.row!.parsed.species).toHaveLength(4);
    expect(v.row!.dEdT_mV_K).toBeUndefined();
  });

  it('keeps dE/dT and note when given', () => {
    expect(validateCoupleRecord(zinc).row!.dEdT_mV_K).toBe(0.119);
    expect(validateCoupleRecord(copper).row!.note).toBe('acid sulfate plating');
  });

  it('reports an unbalanced half-reaction in plain words', () => {
    const v = validateCoupleRecord({ ...zinc, halfReaction: 'Zn2+ + e- -> Zn' });
    expect(v.row).toBeUndefined();
    expect(v.problems.join()).toMatch(/charge does not balance/);
  });

  it('wants the key\'s Ox on the left and Red on the right', () => {
    expect(validateCoupleRecord({ ...zinc, key: 'Zn/Zn2+' }).problems.join()).toMatch(/Ox "Zn" is not on the left.*Red "Zn2\+" is not on the right/);
    expect(validateCoupleRecord({ ...zinc, key: 'Cu2+/Zn' }).problems.join()).toMatch(/Ox "Cu2\+" is not on the left/);
    expect(validateCoupleRecord({ ...zinc, key: 'Zn2+' }).problems.join()).toMatch(/Ox\/Red/);
    expect(validateCoupleRecord({ ...zinc, key: 'Zn(2+)/Zn' }).problems).toEqual([]);
  });

  it('checks E° and dE/dT against plausible ranges', () => {
    expect(validateCoupleRecord({ ...zinc, e0: 7.62 }).problems.join()).toMatch(/E° 7.62 V is outside the plausible range -4…4 V/);
    expect(validateCoupleRecord({ ...zinc, e0: Number.NaN }).problems.join()).toMatch(/E° must be a number/);
    expect(validateCoupleRecord({ ...zinc, e0: '0.3' }).problems.join()).toMatch(/E° must be a number/);
    expect(validateCoupleRecord({ ...zinc, dEdT_mV_K: 119 }).problems.join()).toMatch(/dE°\/dT 119 mV\/K is outside/);
    expect(validateCoupleRecord({ ...zinc, dEdT_mV_K: 4.9 }).problems).toEqual([]);
  });

  it('wants a source', () => {
    expect(validateCoupleRecord({ ...zinc, source: '' }).problems.join()).toMatch(/source is empty/);
    const { source: _omit, ...noSource } = zinc;
    expect(validateCoupleRecord(noSource).problems.join()).toMatch(/source is missing/);
  });

  it('lists every problem at once', () => {
    const v = validateCoupleRecord({ key: 'Zn2+/Zn', halfReaction: 'Zn2+ + e- -> Zn', e0: 99, source: ' ' });
    expect(v.problems.length).toBe(3);
  });

  it('rejects what is not a record', () => {
    expect(validateCoupleRecord(null).problems.length).toBe(1);
    expect(validateCoupleRecord([1, 2]).problems.length).toBe(1);
  });
});

describe('validateElectrodeRecord', () => {
  // 0.2412 V: saturated calomel electrode at 25 °C (Bard & Faulkner, Electrochemical Methods, 2nd ed., inside cover, from memory)
  const sce = { key: 'SCE', aliases: ['Hg/Hg2Cl2/KCl(sat)'], potential: 0.2412, source: 'Bard & Faulkner' };
  it('makes a row', () => {
    expect(validateElectrodeRecord(sce).row).toEqual(sce);
    expect(validateElectrodeRecord({ ...sce, aliases: undefined }).row!.aliases).toEqual([]);
  });
  it('reports bad fields', () => {
    expect(validateElectrodeRecord({ ...sce, aliases: 'x' }).problems.join()).toMatch(/aliases/);
    expect(validateElectrodeRecord({ ...sce, potential: 12 }).problems.join()).toMatch(/outside/);
    expect(validateElectrodeRecord({ ...sce, source: '' }).problems.join()).toMatch(/source/);
  });
});

describe('buildTable', () => {
  it('finds couples by any spelling of their key', () => {
    const { table, problems } = buildTable('t', [zinc, copper], []);
    expect(problems).toEqual([]);
    expect(table.version).toBe('t');
    for (const k of ['Zn2+/Zn', 'Zn(2+)/Zn', 'Zn^2+ / Zn', 'Zn+2/Zn']) expect(table.findCouple(k)?.e0).toBe(-0.7618);
    expect(table.findCouple('zn2+/zn')).toBeUndefined();
    expect(table.findCouple('Ni2+/Ni')).toBeUndefined();
    expect(table.findCouple(42 as unknown as string)).toBeUndefined();
  });

  it('leaves bad and repeated rows out and says which and why', () => {
    const { table, problems } = buildTable('t', [zinc, { ...copper, e0: 'high' }, { ...zinc, key: 'Zn(2+)/Zn', e0: -0.76 }], []);
    expect(table.couples.map((r) => r.key)).toEqual(['Zn2+/Zn']);
    expect(problems).toHaveLength(2);
    expect(problems[0]).toMatchObject({ kind: 'couple', index: 1, key: 'Cu2+/Cu' });
    expect(problems[1]).toMatchObject({ kind: 'couple', index: 2, key: 'Zn(2+)/Zn' });
    expect(problems[1].message).toMatch(/repeats the key of row 1/);
  });

  it('finds electrodes by key or alias, ignoring case and white space; a clashing name is a problem', () => {
    const sce = { key: 'SCE', aliases: ['Hg/Hg2Cl2/KCl(sat)'], potential: 0.2412, source: 'Bard & Faulkner' };
    const { table, problems } = buildTable('t', [], [sce, { key: 'sce ', aliases: [], potential: 0.24, source: 'x' }]);
    expect(table.findElectrode('hg/hg2cl2/kcl (SAT)')?.key).toBe('SCE');
    expect(table.findElectrode(' s c e')?.potential).toBe(0.2412);
    expect(problems).toHaveLength(1);
    expect(problems[0]).toMatchObject({ kind: 'electrode', index: 1 });
  });

  it('looks up in constant time: 10,000 rows work, and a look-up costs no more than in a 100-row table', () => {
    const records = (n: number): CoupleRecord[] => {
      const out: CoupleRecord[] = [];
      for (let i = 1; i <= n; i++) {
        out.push({ key: `C${i}Hg/C${i}Hg-`, halfReaction: `C${i}Hg + e- -> C${i}Hg-`, e0: (i % 700) / 1000, source: 'synthetic' });
      }
      return out;
    };
    // the 100 rows both tables share come last in the big one, where a scan would meet them last
    const big = buildTable('big', records(10000).reverse(), []);
    expect(big.problems).toEqual([]);
    expect(big.table.couples).toHaveLength(10000);
    for (let i = 1; i <= 10000; i++) {
      const row = big.table.findCouple(`C${i}Hg / C${i}Hg(-)`);
      if (row === undefined || row.e0 !== (i % 700) / 1000) throw new Error(`row ${i} not found`);
    }
    const small = buildTable('small', records(100), []).table;
    // the same 2,000 keys (all present in both tables); best of 7 timings each, to be robust to load
    const keys = Array.from({ length: 2000 }, (_, k) => `C${(k % 100) + 1}Hg/C${(k % 100) + 1}Hg-`);
    const best = (t: typeof small): number => {
      let min = Infinity;
      for (let rep = 0; rep < 7; rep++) {
        const start = performance.now();
        for (const k of keys) if (t.findCouple(k) === undefined) throw new Error(k);
        min = Math.min(min, performance.now() - start);
      }
      return min;
    };
    best(small); // warm up
    const ratio = best(big.table) / best(small);
    // a scan over the rows would make each look-up in the 10,000-row table about 100 times dearer
    expect(ratio).toBeLessThan(3);
  });
});

describe('row messages echo values short', () => {
  // A nested value of about 1 MB written out as JSON.
  const nested = (depth: number): unknown => (depth === 0 ? { '': '-lzC'.repeat(1000) } : { a: nested(depth - 1), b: nested(depth - 1) });
  const huge = nested(8);

  it('a record with a huge nested object value gives a message under 200 characters', () => {
    const built = buildTable('t', [{ ...zinc, e0: huge }, { ...copper, dEdT_mV_K: [huge, huge] }], [{ key: 'SCE', aliases: [], potential: huge, source: 'x' }]);
    expect(built.problems).toHaveLength(3);
    for (const p of built.problems) {
      expect(p.message.length).toBeLessThan(200);
      expect(p.message).not.toContain('lzC');
    }
    expect(built.problems[0].message).toBe('E° must be a number; got an object');
    expect(built.problems[1].message).toBe('dE°/dT must be a number; got a list');
    expect(built.problems[2].message).toBe('the potential must be a number; got an object');
  });

  it('numbers as numbers, nothing as nothing, text quoted and cut to 40 characters', () => {
    expect(validateCoupleRecord({ ...zinc, e0: Number.POSITIVE_INFINITY }).problems).toEqual(['E° must be a number; got Infinity']);
    expect(validateCoupleRecord({ ...zinc, e0: null }).problems).toEqual(['E° must be a number; got nothing']);
    const long = 'volts'.repeat(10000);
    const [m] = validateCoupleRecord({ ...zinc, e0: long }).problems;
    // The same quoting as a cell's message (src/text/quote.ts): 37 characters and "…".
    expect(m).toBe(`E° must be a number; got "${long.slice(0, 37)}…"`);
  });

  it('a huge key or half-reaction text is cut as well', () => {
    const key = `${'Zn'.repeat(50000)}/Zn`;
    for (const rec of [{ ...zinc, key }, { ...zinc, key: `Zn2+/${'Q'.repeat(100000)}` }, { ...zinc, halfReaction: 'Zn2+ + 2e- '.repeat(90) }]) {
      const built = buildTable('t', [rec], []);
      expect(built.problems).toHaveLength(1);
      expect(built.problems[0].message.length).toBeLessThan(400);
    }
  });
});
