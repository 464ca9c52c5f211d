/**
 * The functions bundle carries what the functions run on and not the texts written for the generated
 * metadata and reference (scripts/lib/stripHelpText.cjs): no function's description, result or
 * argument help from functions.json is in dist/functions.js, while functions.json keeps them all and
 * the whole bundle suite runs on the bundle built this way. The reference data is in dist/data.js,
 * loaded once by the page for both bundles.
 */
import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import zlib from 'node:zlib';
import { describe, expect, it } from 'vitest';
import { DIST } from './harness';

interface Meta {
  functions: Array<{ id: string; description: string; result: { description?: string }; parameters: Array<{ name: string; description?: string }> }>;
}
const meta = JSON.parse(readFileSync(resolve(DIST, 'functions.json'), 'utf8')) as Meta;
const bundle = readFileSync(resolve(DIST, 'functions.js'), 'utf8');
/** True when the whole text is in the bundle, as written or with its quotes and backslashes escaped. (A
 * part of a help text, such as a list of accepted values, may rightly be in an error message too.) */
const inBundle = (text: string): boolean => [text, JSON.stringify(text).slice(1, -1)].some((p) => bundle.includes(p));

describe('dist/functions.js leaves the help texts to functions.json', () => {
  it('functions.json has a description for every function and help for every argument', () => {
    for (const f of meta.functions) {
      expect(f.description.length, f.id).toBeGreaterThan(20);
      for (const p of f.parameters) expect((p.description ?? '').length, `${f.id}.${p.name}`).toBeGreaterThan(3);
    }
  });
  it('no function description, result or argument help of functions.json is in the bundle', () => {
    const found: string[] = [];
    for (const f of meta.functions) {
      if (inBundle(f.description)) found.push(`${f.id}: description`);
      if (f.result.description !== undefined && f.result.description.length >= 20 && inBundle(f.result.description)) found.push(`${f.id}: result`);
      for (const p of f.parameters) if ((p.description ?? '').length >= 20 && inBundle(p.description ?? '')) found.push(`${f.id}.${p.name}: help`);
    }
    expect(found).toEqual([]);
  });
  it('the detector finds a text that is there', () => {
    // a message the bundle does carry, as a control for the probe; and a help text put back into a copy
    expect(inBundle('the curve needs at least two points')).toBe(true);
    const help = meta.functions.find((f) => f.id === 'MASSLOSSRATE')?.parameters.find((p) => p.name === 'unit')?.description ?? '';
    expect(help).toContain('(default "mm/y")');
    expect(inBundle(help)).toBe(false);
    expect([help, JSON.stringify(help).slice(1, -1)].some((p) => `${bundle}x=${JSON.stringify(help)}`.includes(p))).toBe(true);
  });
  it('each bundle is within its size target: functions.js < 60 KB and taskpane.js < 120 KB gzipped; data.js holds the reference data', () => {
    const gz = (f: string): number => zlib.gzipSync(readFileSync(resolve(DIST, f)), { level: 9 }).length / 1024;
    expect(gz('functions.js')).toBeLessThan(60);
    expect(gz('taskpane.js')).toBeLessThan(120);
    const data = readFileSync(resolve(DIST, 'data.js'), 'utf8');
    expect(data).toContain('Standard atomic weights');
    expect(bundle).not.toContain('Standard atomic weights');
  });
});
