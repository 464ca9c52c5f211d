/**
 * dist/functions.json (generated from the JSDoc by custom-functions-metadata-plugin) against the
 * published custom-functions JSON schema shipped in @microsoft/app-manifest, and the naming rule of
 * custom functions on its own: ids and names at least 3 characters, starting with a letter.
 */
import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { metadataValidator, schemaVersion } from './metadata';

const DIST = resolve(__dirname, '../../dist');
const metadata = () => JSON.parse(readFileSync(resolve(DIST, 'functions.json'), 'utf8')) as { functions: Array<{ id: string; name: string; helpUrl?: string }> };

describe(`dist/functions.json against the published custom-functions schema (@microsoft/app-manifest ${schemaVersion()})`, () => {
  const validate = metadataValidator();
  it('is valid', () => {
    const ok = validate(metadata());
    expect(validate.errors ?? []).toEqual([]);
    expect(ok).toBe(true);
    expect(metadata().functions.length).toBeGreaterThanOrEqual(40);
  });
  it('negative controls: a two-character id, a name starting with a digit, an http help URL, a non-boolean flag and an unknown dimensionality fail', () => {
    const broken = (change: (f: Record<string, unknown>) => void) => {
      const m = metadata();
      change(m.functions[0]);
      expect(validate(m)).toBe(false);
      return (validate.errors ?? []).map((e) => `${e.instancePath} ${e.message}`).join('\n');
    };
    expect(broken((f) => (f.id = 'E0'))).toMatch(/\/functions\/0\/id must NOT have fewer than 3 characters/);
    expect(broken((f) => (f.name = '0CELL'))).toMatch(/\/functions\/0\/name must match pattern/);
    expect(broken((f) => (f.helpUrl = 'http://example.org/help'))).toMatch(/\/functions\/0\/helpUrl must match pattern/);
    expect(broken((f) => (f.volatile = 'yes'))).toMatch(/\/functions\/0\/volatile must be boolean/);
    expect(broken((f) => ((f.result as Record<string, unknown>).dimensionality = 'vector'))).toMatch(/\/functions\/0\/result\/dimensionality must be equal to one of the allowed values/);
  });
});

describe('custom-function naming rule', () => {
  // Ids and names start with a letter and have at least 3 characters (the rule the published schema
  // states with minLength 3 and its patterns); ours are upper case letters and digits only.
  const rule = /^[A-Z][A-Z0-9]{2,}$/;
  it('every id and name of dist/functions.json keeps it, and ids equal names', () => {
    const bad = metadata().functions.filter((f) => !rule.test(f.id) || !rule.test(f.name) || f.id !== f.name);
    expect(bad.map((f) => f.id)).toEqual([]);
  });
  it('the rule rejects what the published schema rejects', () => {
    for (const name of ['E0', 'EC', '0CELL', '_NERNST', 'N']) expect(rule.test(name), name).toBe(false);
    for (const name of ['EMF', 'STDPOTENTIAL', 'KEQ']) expect(rule.test(name), name).toBe(true);
  });
});
