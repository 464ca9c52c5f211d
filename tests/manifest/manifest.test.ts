/**
 * The manifest as a validating host reads it: manifest.xml and the built dist/manifest.xml against the
 * XSD subset of the published schema (tests/manifest/schema/, [MS-OWEMXML] sections 5.2, 5.6, 5.7), every
 * resid resolved to a resource of the right kind, every URL to a file of dist/ and every icon at its
 * declared size, and the shared-runtime rules. Negative controls prove each check can fail.
 */
import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { fileProblems, references, residProblems, resources, ruleProblems, schemaErrors } from './check';

const ROOT = resolve(__dirname, '../..');
const DIST = resolve(ROOT, 'dist');
const DEV_BASE = 'https://localhost:3000/';
const source = readFileSync(resolve(ROOT, 'manifest.xml'), 'utf8');
const built = () => readFileSync(resolve(DIST, 'manifest.xml'), 'utf8');

/** Replaces exactly one occurrence (so a control cannot silently change nothing). */
function once(xml: string, from: string | RegExp, to: string): string {
  const n = typeof from === 'string' ? xml.split(from).length - 1 : (xml.match(new RegExp(from.source, 'g')) ?? []).length;
  if (n < 1) throw new Error(`control not applied: ${String(from)} not found`);
  return xml.replace(from, to);
}

describe('manifest.xml and dist/manifest.xml', () => {
  it('manifest.xml passes the schema subset', async () => {
    expect(await schemaErrors(source)).toEqual([]);
  });
  it('dist/manifest.xml (npm test builds it first) passes the schema subset', async () => {
    expect(await schemaErrors(built())).toEqual([]);
  });
  it('every resid names a resource of the kind its element needs', () => {
    expect(references(source).length).toBeGreaterThan(15);
    expect(residProblems(source)).toEqual([]);
    expect(residProblems(built())).toEqual([]);
  });
  it('every resource id is 1-32 characters and used', () => {
    const used = new Set(references(source).map((r) => r.resid));
    for (const id of resources(source).keys()) {
      expect(id.length, id).toBeGreaterThanOrEqual(1);
      expect(id.length, id).toBeLessThanOrEqual(32);
      expect(used.has(id), `${id} is never used`).toBe(true);
    }
  });
  it('every URL names a file of dist/ and every icon has its declared pixel size', () => {
    expect(fileProblems(built(), DIST, DEV_BASE)).toEqual([]);
  });
  it('one shared runtime without TaskpaneId, the requirement sets the code needs, no AppDomain for its own origin', () => {
    expect(ruleProblems(source)).toEqual([]);
    expect(ruleProblems(built())).toEqual([]);
  });
});

describe('negative controls: each check fails on a broken manifest', () => {
  it('a resource id of 33 characters fails the schema (ids are 1-32 characters)', async () => {
    const id = 'Cellwright.Functions.Metadata.Ur'; // 32: still valid
    expect(id.length).toBe(32);
    const ok = source.split('"Cellwright.Functions.Metadata"').join(`"${id}"`);
    expect(await schemaErrors(ok)).toEqual([]);
    const long = source.split('"Cellwright.Functions.Metadata"').join(`"${id}l"`);
    const errors = await schemaErrors(long);
    expect(errors.length).toBeGreaterThan(0);
    expect(errors.join('\n')).toMatch(/maxLength.*'32'/);
  });
  it('elements out of order fail the schema (SupportUrl before IconUrl)', async () => {
    const support = /\s*<SupportUrl [^>]*\/>/.exec(source)![0];
    const moved = once(once(source, support, ''), '  <IconUrl ', `${support.trim()}\n  <IconUrl `);
    const errors = await schemaErrors(moved);
    expect(errors.join('\n')).toMatch(/IconUrl.*not expected/);
  });
  it('elements out of order inside VersionOverrides fail the schema (Resources before Hosts)', async () => {
    const res = /<Resources>[\s\S]*<\/Resources>/.exec(source)![0];
    const moved = once(once(source, res, ''), '    <Hosts>\n      <Host xsi:type="Workbook">', `${res}\n    <Hosts>\n      <Host xsi:type="Workbook">`);
    expect((await schemaErrors(moved)).join('\n')).toMatch(/Resources': This element is not expected/);
  });
  it('a short string over 125 characters and a URL over 2048 characters fail the schema', async () => {
    const longLabel = once(source, 'DefaultValue="Potential table"', `DefaultValue="${'x'.repeat(126)}"`);
    expect((await schemaErrors(longLabel)).join('\n')).toMatch(/maxLength.*'125'/);
    const longUrl = once(source, 'DefaultValue="https://localhost:3000/functions.json"', `DefaultValue="https://localhost:3000/${'a'.repeat(2030)}.json"`);
    expect((await schemaErrors(longUrl)).join('\n')).toMatch(/maxLength.*'2048'/);
  });
  it('a dangling resid fails the resid check (and the schema alone would not see it)', async () => {
    const dangling = once(source, '<Namespace resid="Cellwright.Namespace"/>', '<Namespace resid="Cellwright.NoSuchString"/>');
    expect(await schemaErrors(dangling)).toEqual([]);
    expect(residProblems(dangling)).toEqual(['<Namespace resid="Cellwright.NoSuchString">: no resource has this id']);
  });
  it('a resid naming a resource of the wrong kind fails the resid check', () => {
    const wrongKind = once(source, '<Label resid="Cellwright.Group.Label"/>', '<Label resid="Cellwright.Page"/>');
    expect(residProblems(wrongKind)).toEqual(['<Label resid="Cellwright.Page">: names a resource in Urls, needs one in ShortStrings']);
  });
  it('an icon of the wrong size and a URL with no file fail the file check', () => {
    const wrongIcon = once(built(), `id="Cellwright.Icon.16" DefaultValue="${DEV_BASE}icon-16.png"`, `id="Cellwright.Icon.16" DefaultValue="${DEV_BASE}icon-32.png"`);
    expect(fileProblems(wrongIcon, DIST, DEV_BASE)).toEqual([
      `icon Cellwright.Icon.16 at size 16 (${DEV_BASE}icon-32.png) is 32×32, declared 16×16`,
      `icon Cellwright.Icon.16 at size 16 (${DEV_BASE}icon-32.png) is 32×32, declared 16×16`,
    ]);
    const missing = once(built(), `${DEV_BASE}functions.json`, `${DEV_BASE}function.json`);
    expect(fileProblems(missing, DIST, DEV_BASE).join('\n')).toMatch(/function\.json: .* does not exist/);
  });
  it('the defects of the first manifest are each found', async () => {
    // The manifest as it stood before these checks: ids of 33 characters, a TaskpaneId under the shared
    // runtime, no CustomFunctionsRuntime requirement, an AppDomain equal to its own origin.
    const old = once(
      once(
        once(
          once(source.split('"Cellwright.Functions.Metadata"').join('"Cellwright.Functions.Metadata.Url"'), '<Set Name="CustomFunctionsRuntime" MinVersion="1.2"/>', ''),
          '<SourceLocation resid="Cellwright.Page"/>\n                  </Action>',
          '<TaskpaneId>Cellwright.Pane</TaskpaneId>\n                    <SourceLocation resid="Cellwright.Page"/>\n                  </Action>',
        ),
        '  <Hosts>\n    <Host Name="Workbook"/>',
        '  <AppDomains>\n    <AppDomain>https://localhost:3000</AppDomain>\n  </AppDomains>\n  <Hosts>\n    <Host Name="Workbook"/>',
      ),
      '<Id>',
      '<Id>',
    );
    expect((await schemaErrors(old)).join('\n')).toMatch(/Cellwright\.Functions\.Metadata\.Url' has a length of '33'/);
    expect(ruleProblems(old)).toEqual([
      'a TaskpaneId under a shared runtime (there is one pane; the action must not name another)',
      'CustomFunctionsRuntime 1.2 (CustomFunctions.Error with messages) is not required',
      "AppDomain https://localhost:3000 is the add-in's own origin",
    ]);
  });
});
