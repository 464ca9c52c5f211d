/**
 * The function reference (docs/functions.md and docs/functions.html, written by npm run docs):
 * fails when the committed files differ from what the generator makes now from dist/functions.json,
 * the adapter's specs and docs/examples.json, and checks that every function is covered and every
 * @helpurl lands on its section.
 */
import { spawnSync } from 'node:child_process';
import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { describe, expect, it } from 'vitest';

const ROOT = resolve(__dirname, '../..');
const md = readFileSync(resolve(ROOT, 'docs/functions.md'), 'utf8');
const html = readFileSync(resolve(ROOT, 'docs/functions.html'), 'utf8');
const metadata = JSON.parse(readFileSync(resolve(ROOT, 'dist/functions.json'), 'utf8')) as {
  functions: Array<{ id: string; helpUrl?: string; parameters: Array<{ name: string; optional?: boolean }> }>;
};
const examples = JSON.parse(readFileSync(resolve(ROOT, 'docs/examples.json'), 'utf8')) as {
  groups: Array<{ ids: string[] }>;
  functions: Record<string, { args: unknown[]; seeAlso?: string[] }>;
};

/** The markdown section of one function, from its heading to the next. */
function section(id: string): string {
  const start = md.indexOf(`\n### ${id}\n`);
  if (start < 0) return '';
  const next = md.slice(start + 1).search(/\n##+ /);
  return next < 0 ? md.slice(start) : md.slice(start, start + 1 + next);
}

describe('docs/functions.md and docs/functions.html', () => {
  it('are what npm run docs generates now (regenerate and commit when this fails)', () => {
    const r = spawnSync(process.execPath, ['scripts/docs.mjs', '--check', '--no-build'], { cwd: ROOT, encoding: 'utf8' });
    expect(r.stderr + r.stdout, 'run "npm run docs" and commit docs/functions.md and docs/functions.html').toMatch(/are up to date/);
    expect(r.status).toBe(0);
  }, 60000);

  it('cover every function of dist/functions.json, once, with syntax, arguments, result, example and see-also', () => {
    const ids = metadata.functions.map((f) => f.id);
    expect(ids.length).toBeGreaterThan(0);
    const headings = [...md.matchAll(/^### (\S+)$/gm)].map((m) => m[1]);
    expect([...headings].sort()).toEqual([...ids].sort());
    for (const f of metadata.functions) {
      const s = section(f.id);
      const optional = f.parameters.map((p) => (p.optional ? `[${p.name}]` : p.name)).join(', ');
      expect(s, f.id).toContain(`**Syntax** \`=CELLWRIGHT.${f.id}(${optional})\``);
      for (const p of f.parameters) expect(s, `${f.id} ${p.name}`).toMatch(new RegExp(`\\| \`${p.name}\` \\| [^|]+ \\| (required|[^|]+) \\|`));
      expect(s, f.id).toMatch(/\*\*Result\*\* \S/);
      expect(s, f.id).toMatch(/\*\*Example\*\* `=CELLWRIGHT\./);
      expect(s, f.id).toMatch(/\*\*See also\*\* \[/);
    }
  });

  it('list exactly the functions of the bundle in docs/examples.json', () => {
    const ids = metadata.functions.map((f) => f.id).sort();
    expect(Object.keys(examples.functions).sort()).toEqual(ids);
    expect(examples.groups.flatMap((g) => g.ids).sort()).toEqual(ids);
  });

  it('give examples whose values the bundle computed, never an error', () => {
    for (const f of metadata.functions) {
      const example = /\*\*Example\*\*[^\n]*/.exec(section(f.id))?.[0] ?? '';
      expect(example, f.id).not.toMatch(/#(N\/A|VALUE!|NUM!|DIV\/0!|NAME\?|REF!|NULL!)/);
    }
    // a spot check that the value is the bundle's: the Daniell cell
    // 0.3372 − (−0.7628) = 1.1000 V from data/couples.json (Thermoddem V1.10 / MINTEQA2 v4)
    expect(section('EMF')).toMatch(/returns \*\*1\.1\*\*/);
  });

  it('resolve every @helpurl to its section of functions.html (anchor = lowercase id)', () => {
    const anchors = new Set([...html.matchAll(/ id="([^"]+)"/g)].map((m) => m[1]));
    for (const f of metadata.functions) {
      expect(f.helpUrl, f.id).toBe(`https://localhost:3000/docs/functions.html#${f.id.toLowerCase()}`);
      expect(anchors.has(f.id.toLowerCase()), f.id).toBe(true);
    }
    // every internal link of both files lands somewhere
    for (const m of html.matchAll(/href="#([^"]+)"/g)) expect(anchors.has(m[1]), m[1]).toBe(true);
    for (const m of md.matchAll(/\]\(#([^)]+)\)/g)) expect(anchors.has(m[1]), m[1]).toBe(true);
  });

  it('functions.html nests its tags properly (no table inside a paragraph)', () => {
    const stack: string[] = [];
    const problems: string[] = [];
    for (const m of html.matchAll(/<(\/?)([a-z0-9]+)[^>]*>/g)) {
      const [, close, tag] = m;
      if (['meta', 'br', 'img', 'link', 'html', 'head', 'body'].includes(tag)) continue;
      if (!close) {
        if (tag === 'table' && stack.includes('p')) problems.push(`a table inside a paragraph at ${m.index}`);
        stack.push(tag);
      } else if (stack.pop() !== tag) problems.push(`</${tag}> does not close the open tag at ${m.index}`);
    }
    expect(problems.slice(0, 5)).toEqual([]);
    expect(stack).toEqual([]);
  });

  it('functions.html is a plain static page with no external resources', () => {
    expect(html).toMatch(/^<!doctype html>/);
    expect(html).not.toMatch(/<script|<link|<img|<iframe|@import|url\(/i);
    expect(html).not.toMatch(/(src|href)="(https?:)?\/\//i);
  });
});
