/**
 * data/verification.json: the published check cases behind the verification sheet and `cellwright check`.
 * Every case is evaluated through the production bundle (node:vm, built-in table) the way Excel calls it.
 */
import { readFileSync, readdirSync } from 'node:fs';
import { describe, expect, it } from 'vitest';
import { isError, loadBundle, one } from '../bundle/harness';

interface Case {
  id: string;
  family: string;
  function: string;
  args: unknown[];
  expected: number | string;
  tolerance: number | null;
  unit: string;
  what: string;
  source: string;
  basis: string;
  tableRow?: boolean;
  note?: string;
}
const doc = JSON.parse(readFileSync('data/verification.json', 'utf8')) as { cases: Case[] };
const b = loadBundle();

/** Worksheet ids declared per family file (functions/families/<family>.ts). */
function idsByFamily(): Map<string, string[]> {
  const out = new Map<string, string[]>();
  for (const f of readdirSync('functions/families').filter((x) => x.endsWith('.ts'))) {
    const text = readFileSync(`functions/families/${f}`, 'utf8');
    out.set(f.replace(/\.ts$/, ''), [...text.matchAll(/id: '([A-Z0-9]+)'/g)].map((m) => m[1]));
  }
  return out;
}

describe('data/verification.json', () => {
  it('holds about 40 cases, each complete: function, inputs, expected, tolerance, source, basis', () => {
    expect(doc.cases.length).toBeGreaterThanOrEqual(40);
    const ids = new Set<string>();
    for (const c of doc.cases) {
      expect(ids.has(c.id), c.id).toBe(false);
      ids.add(c.id);
      expect(b.byId.has(c.function), `${c.id}: ${c.function} is a function of the bundle`).toBe(true);
      expect(c.args.length, c.id).toBeLessThanOrEqual(b.byId.get(c.function)!.parameters.length);
      expect(c.source.length, `${c.id} names its source`).toBeGreaterThan(20);
      expect(['read', 'from memory'].includes(c.basis) || c.basis.startsWith('computed from'), `${c.id} basis "${c.basis}"`).toBe(true);
      if (typeof c.expected === 'string') expect(c.tolerance, c.id).toBeNull();
      else {
        expect(typeof c.tolerance, c.id).toBe('number');
        expect(c.tolerance!, c.id).toBeGreaterThanOrEqual(0);
        // honest tolerances: never wider than 2 % of the expected value
        expect(c.tolerance!, c.id).toBeLessThanOrEqual(Math.abs(c.expected) * 0.02 + 1e-12);
      }
    }
  });
  it('covers every family of worksheet functions (except provenance and basis, which report facts about the table in use)', () => {
    const used = new Set(doc.cases.map((c) => c.function));
    for (const [family, ids] of idsByFamily()) {
      if (family === 'provenance' || family === 'basis') continue; // facts about the table in use, no published value
      expect(ids.some((id) => used.has(id)), `family ${family} (${ids.join(', ')})`).toBe(true);
    }
  });
});

describe('every case through the production bundle', () => {
  for (const c of doc.cases) {
    it(`${c.id} ${c.function}(${c.args.map((a) => JSON.stringify(a)).join(', ')}) = ${c.expected} ± ${c.tolerance ?? 'exact'} (${c.basis})`, async () => {
      const v = one(await b.call(c.function, ...c.args));
      expect(isError(v), `${c.id} gave ${JSON.stringify(v)}`).toBe(false);
      if (c.tolerance === null) expect(v).toBe(c.expected);
      else expect(Math.abs((v as number) - (c.expected as number)), `${c.id}: ${String(v)}`).toBeLessThanOrEqual(c.tolerance);
    });
  }
});
