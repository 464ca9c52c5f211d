/**
 * The pane's consistency view (taskpane/consistency.ts): the report lines of the table in use that
 * differ by more than 5 mV, each with the explanation on file while its rows are the built-in ones.
 */
import { describe, expect, it } from 'vitest';
import consistency from '../../data/consistency.json';
import { FARADAY_C_PER_MOL } from '../../src/constants';
import { recordsOf } from '../../src/store/rows';
import { builtinTable } from '../../src/table/builtin';
import { consistencyReport } from '../../src/table/consistencyReport';
import { buildTable } from '../../src/table/table';
import { applicableNotes, consistencyView } from '../../taskpane/consistency';

const builtin = builtinTable();
const edited = (key: string, e0: number) => {
  const r = recordsOf(builtin);
  return buildTable(r.version, r.couples.map((c) => (c.key === key ? { ...c, e0 } : c)), r.electrodes).table;
};

describe('consistencyView of the built-in table', () => {
  const view = consistencyView(builtin, builtin);
  const report = consistencyReport(builtin, consistency.notes);

  it('lists exactly the report lines outside ±5 mV, each explained, largest first', () => {
    const outside = report.filter((l) => Math.abs(l.differenceMV) > 5);
    expect(view.checked).toBe(report.length);
    expect(view.items.length).toBe(outside.length);
    expect(view.items.length).toBe(Object.keys(consistency.notes).length);
    for (const i of view.items) expect(i.note, i.what).not.toBeNull();
    const sizes = view.items.map((i) => Math.abs(parseFloat(i.difference.replace('−', '-'))));
    expect([...sizes].sort((a, b) => b - a)).toEqual(sizes);
  });

  it('shows a row with its signed difference, both potentials and the note on file', () => {
    const li = report.find((l) => l.kind === 'species' && l.keys[0] === 'Li+/Li')!;
    const item = view.items.find((i) => i.what === 'Li+/Li against its species-derived E°')!;
    expect(item.difference).toBe(`+${li.differenceMV.toFixed(1)} mV`);
    expect(item.values).toBe(`table \u2212${(-li.tableV).toFixed(4)} V, derived \u2212${(-li.derivedV).toFixed(4)} V`);
    expect(item.note).toBe(consistency.notes['Li+/Li']);
  });
});

describe('consistencyView of a workbook’s edited table', () => {
  it('reports an edited row without an explanation, with the difference from its species data', () => {
    const t = edited('Cu2+/Cu', 0.4);
    const item = consistencyView(t, builtin).items.find((i) => i.what === 'Cu2+/Cu against its species-derived E°')!;
    // NBS 1982: ΔfG°(Cu2+) = 65.49 kJ/mol, so E° = 65490/(2F) = 0.3394 V; 0.4 V is +60.6 mV above it
    expect(item.difference).toBe(`+${((0.4 - 65490 / (2 * FARADAY_C_PER_MOL)) * 1000).toFixed(1)} mV`);
    expect(item.note).toBeNull();
  });

  it('drops the explanation of a row once it no longer holds the built-in E°', () => {
    expect(applicableNotes(builtin, builtin)['Li+/Li']).toBe(consistency.notes['Li+/Li']);
    const t = edited('Li+/Li', -3.0);
    expect(applicableNotes(t, builtin)['Li+/Li']).toBeUndefined();
    expect(applicableNotes(t, builtin)['K+/K']).toBe(consistency.notes['K+/K']);
    const item = consistencyView(t, builtin).items.find((i) => i.what === 'Li+/Li against its species-derived E°')!;
    expect(item.note).toBeNull();
  });
});

describe('consistencyView of a large table', () => {
  it('checks the built-in rows plus 2,000 rows that share no species with them in seconds, with the same findings', () => {
    // the pane's 2,000-row size test uses rows like these; comparing every pair of rows took about 30 s here
    const r = recordsOf(builtin);
    const extra = Array.from({ length: 2000 }, (_, j) => ({
      key: `C${j + 1}H${2 * j + 2}O/C${j + 1}H${2 * j + 4}O`,
      halfReaction: `C${j + 1}H${2 * j + 2}O + 2H+ + 2e- -> C${j + 1}H${2 * j + 4}O`,
      e0: 0.1,
      source: 'synthetic row for the size test',
    }));
    const big = buildTable(r.version, [...r.couples, ...extra], r.electrodes);
    expect(big.problems).toEqual([]);
    const t0 = performance.now();
    const view = consistencyView(big.table, builtin);
    expect(performance.now() - t0).toBeLessThan(10_000);
    expect(view).toEqual(consistencyView(builtin, builtin));
  });
});
