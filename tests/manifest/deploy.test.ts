/**
 * A deployable build: CELLWRIGHT_BASE_URL=<a made-up https base> npm run build, written to a temporary
 * directory (dist/ of the normal build is left alone). Nothing in it points at localhost, every URL is
 * under the base, the manifest passes the schema subset and the file checks, functions.json passes the
 * published schema with every help link under the base, and the page loads office.js from the Office
 * CDN with a Content-Security-Policy that allows scripts from exactly that origin besides its own.
 * The development build (dist/) keeps the local office.js copy.
 */
import { execFile } from 'node:child_process';
import { mkdtempSync, readFileSync, readdirSync, rmSync, statSync } from 'node:fs';
import { createRequire } from 'node:module';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { promisify } from 'node:util';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { fileProblems, residProblems, ruleProblems, schemaErrors, urls } from './check';
import { metadataValidator } from './metadata';

const require = createRequire(import.meta.url);
const { DEV_BASE, OFFICE_JS_CDN, deployBase } = require('../../scripts/lib/deployBase.cjs') as {
  DEV_BASE: string;
  OFFICE_JS_CDN: string;
  deployBase: (value: string | undefined) => string;
};
const ROOT = resolve(__dirname, '../..');
const BASE = 'https://addins.quorvane.example/tools/cellwright/';

function filesUnder(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const p = join(dir, name);
    return statSync(p).isDirectory() ? filesUnder(p) : [p];
  });
}
function csp(html: string): Map<string, string[]> {
  const content = /http-equiv="?Content-Security-Policy"?\s+content="([^"]*)"/.exec(html)?.[1];
  if (content === undefined) throw new Error('no Content-Security-Policy');
  return new Map(content.split(';').map((d) => d.trim().split(/\s+/)).filter((d) => d[0] !== '').map(([k, ...v]) => [k, v]));
}

describe('deployBase (CELLWRIGHT_BASE_URL)', () => {
  it('unset or empty: the development base', () => {
    expect(deployBase(undefined)).toBe(DEV_BASE);
    expect(deployBase('  ')).toBe(DEV_BASE);
  });
  it('an https base gets its trailing slash; anything Office cannot load from is refused', () => {
    expect(deployBase('https://addins.quorvane.example/cw')).toBe('https://addins.quorvane.example/cw/');
    expect(deployBase('https://addins.quorvane.example')).toBe('https://addins.quorvane.example/');
    expect(() => deployBase('http://addins.quorvane.example/')).toThrow(/must use https/);
    expect(() => deployBase('addins.quorvane.example/cw/')).toThrow(/absolute https URL/);
    expect(() => deployBase('https://addins.quorvane.example/cw/?v=2')).toThrow(/query or fragment/);
  });
});

describe(`npm run build with CELLWRIGHT_BASE_URL=${BASE}`, () => {
  let out = '';
  let buildMs = 0;
  beforeAll(async () => {
    out = mkdtempSync(join(tmpdir(), 'cellwright-deploy-'));
    const t0 = Date.now();
    await promisify(execFile)(process.execPath, [require.resolve('webpack-cli/bin/cli.js'), '--mode', 'production', '--output-path', out], {
      cwd: ROOT,
      env: { ...process.env, CELLWRIGHT_BASE_URL: BASE },
      maxBuffer: 32 * 1024 * 1024,
    });
    buildMs = Date.now() - t0;
    console.log(`deploy build: ${(buildMs / 1000).toFixed(1)} s`);
  }, 300_000);
  afterAll(() => {
    if (out !== '') rmSync(out, { recursive: true, force: true });
  });

  it('has no "localhost" in any file', () => {
    const files = filesUnder(out);
    expect(files.map((f) => f.slice(out.length + 1)).sort()).toEqual(
      expect.arrayContaining(['manifest.xml', 'data.js', 'functions.js', 'functions.json', 'taskpane.html', 'taskpane.js', 'docs/functions.html', 'icon-16.png']),
    );
    const offending = files.filter((f) => readFileSync(f).toString('latin1').includes('localhost'));
    expect(offending).toEqual([]);
  });
  it('its manifest passes the schema subset, resolves every resid, and every URL is a file of the build under the base', async () => {
    const xml = readFileSync(join(out, 'manifest.xml'), 'utf8');
    expect(await schemaErrors(xml)).toEqual([]);
    expect(residProblems(xml)).toEqual([]);
    expect(ruleProblems(xml)).toEqual([]);
    expect(fileProblems(xml, out, BASE)).toEqual([]);
    const all = urls(xml);
    expect(all.length).toBeGreaterThanOrEqual(9); // page, script, metadata, help, support, five icons
    for (const u of all) expect(u.startsWith(BASE), u).toBe(true);
    expect(xml).toContain(`<SupportUrl DefaultValue="${BASE}docs/functions.html"/>`);
  });
  it('its functions.json passes the published schema and every help link is under the base', () => {
    const meta = JSON.parse(readFileSync(join(out, 'functions.json'), 'utf8')) as { functions: Array<{ id: string; helpUrl?: string }> };
    const validate = metadataValidator();
    expect(validate(meta), JSON.stringify(validate.errors)).toBe(true);
    for (const f of meta.functions) expect(f.helpUrl).toBe(`${BASE}docs/functions.html#${f.id.toLowerCase()}`);
  });
  it('its page loads office.js from the Office CDN, and the CSP allows scripts from exactly that origin besides its own', () => {
    const html = readFileSync(join(out, 'taskpane.html'), 'utf8');
    expect(html).toMatch(new RegExp(`<script src="?${OFFICE_JS_CDN.replace(/[.?/]/g, '\\$&')}"?></script>`));
    expect(html).not.toMatch(/office-js\/office\.js/);
    const policy = csp(html);
    expect(policy.get('script-src')).toEqual(["'self'", 'https://appsforoffice.microsoft.com']);
    for (const [directive, sources] of policy) if (directive !== 'script-src') expect(sources.join(' '), directive).not.toMatch(/https?:/);
  });
});

describe('the development build (dist/)', () => {
  it('loads the local office.js copy and allows scripts from its own origin only', () => {
    const html = readFileSync(resolve(ROOT, 'dist/taskpane.html'), 'utf8');
    expect(html).toMatch(/<script src="?office-js\/office\.js"?><\/script>/);
    expect(html).not.toContain('appsforoffice');
    expect(csp(html).get('script-src')).toEqual(["'self'"]);
  });
});
