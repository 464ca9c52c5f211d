/**
 * Checks of an add-in manifest that stand in for a host loading it:
 *  - validation against the XSD subset of the published schema (tests/manifest/schema/, xmllint-wasm);
 *  - every resid names a resource of the kind its element needs (a URL for a source location, a short
 *    string for a label or title, a long string for a description, an image for an icon);
 *  - every URL under the build's base names a file of the build, and every icon file has the pixel size
 *    the manifest declares for it;
 *  - the rules of a shared-runtime add-in that the schema cannot state.
 * The reading below is by regular expressions, which is sound only for a manifest that has passed the
 * schema (well-formed, known elements, attributes in double quotes).
 */
import { existsSync, readFileSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { validateXML } from 'xmllint-wasm';

const SCHEMA_DIR = resolve(__dirname, 'schema');
const schemaFile = (name: string) => ({ fileName: name, contents: readFileSync(join(SCHEMA_DIR, name), 'utf8') });

/** Validates a manifest against the XSD subset; returns xmllint's messages (empty when valid). */
export async function schemaErrors(xml: string): Promise<string[]> {
  const result = await validateXML({
    xml: { fileName: 'manifest.xml', contents: xml },
    schema: schemaFile('OfficeAppManifestV1_1.xsd'),
    preload: [schemaFile('TaskPaneAppVersionOverridesV1_0.xsd'), schemaFile('OfficeAppBasicTypesV1_0.xsd')],
  });
  return result.valid ? [] : result.errors.map((e) => e.message);
}

export type ResourceKind = 'Images' | 'Urls' | 'ShortStrings' | 'LongStrings';

/** The resources of a manifest by id: kind and default value. */
export function resources(xml: string): Map<string, { kind: ResourceKind; value: string }> {
  const out = new Map<string, { kind: ResourceKind; value: string }>();
  for (const kind of ['Images', 'Urls', 'ShortStrings', 'LongStrings'] as const) {
    const section = new RegExp(`<bt:${kind}>([\\s\\S]*?)</bt:${kind}>`).exec(xml)?.[1] ?? '';
    for (const m of section.matchAll(/<bt:\w+\s+id="([^"]*)"\s+DefaultValue="([^"]*)"/g)) {
      if (out.has(m[1])) throw new Error(`resource id ${m[1]} is declared twice`);
      out.set(m[1], { kind, value: m[2] });
    }
  }
  return out;
}

/** The kind of resource an element's resid must name. */
const KIND_OF: Record<string, ResourceKind> = {
  SourceLocation: 'Urls',
  FunctionFile: 'Urls',
  LearnMoreUrl: 'Urls',
  Runtime: 'Urls',
  Title: 'ShortStrings',
  Label: 'ShortStrings',
  Namespace: 'ShortStrings',
  Description: 'LongStrings',
  Image: 'Images',
};

/** Every resid with its element, in document order. */
export function references(xml: string): Array<{ element: string; resid: string; size?: number }> {
  const out: Array<{ element: string; resid: string; size?: number }> = [];
  for (const m of xml.matchAll(/<(?:\w+:)?(\w+)\b([^>]*)\bresid="([^"]*)"([^>]*)>/g)) {
    const attrs = `${m[2]} ${m[4]}`;
    const size = /\bsize="(\d+)"/.exec(attrs)?.[1];
    out.push({ element: m[1], resid: m[3], ...(size !== undefined ? { size: Number(size) } : {}) });
  }
  return out;
}

/** Problems with resids: unknown element, no such resource, or a resource of the wrong kind. */
export function residProblems(xml: string): string[] {
  const res = resources(xml);
  const problems: string[] = [];
  for (const { element, resid } of references(xml)) {
    const want = KIND_OF[element];
    const got = res.get(resid);
    if (want === undefined) problems.push(`<${element} resid="${resid}">: no rule for this element`);
    else if (got === undefined) problems.push(`<${element} resid="${resid}">: no resource has this id`);
    else if (got.kind !== want) problems.push(`<${element} resid="${resid}">: names a resource in ${got.kind}, needs one in ${want}`);
  }
  return problems;
}

/** Every URL the manifest holds (attribute values starting with https://). */
export function urls(xml: string): string[] {
  return [...xml.matchAll(/="(https:\/\/[^"]*)"/g)].map((m) => m[1]);
}

/** Width and height of a PNG file (from its IHDR chunk). */
export function pngSize(file: string): { width: number; height: number } {
  const b = readFileSync(file);
  if (b.length < 24 || b.readUInt32BE(0) !== 0x89504e47 || b.toString('latin1', 12, 16) !== 'IHDR') throw new Error(`${file} is not a PNG file`);
  return { width: b.readUInt32BE(16), height: b.readUInt32BE(20) };
}

/**
 * Problems with the files of a build: every URL of the manifest lies under `base` and names a file of
 * `dir` (fragment dropped), and every icon has its declared size (each bt:Image size attribute; IconUrl
 * 32 × 32 and HighResolutionIconUrl 64 × 64 as the add-in manifest reference asks).
 */
export function fileProblems(xml: string, dir: string, base: string): string[] {
  const problems: string[] = [];
  const fileOf = (url: string): string | null => {
    if (!url.startsWith(base)) {
      problems.push(`${url} is not under ${base}`);
      return null;
    }
    const file = join(dir, decodeURIComponent(url.slice(base.length).replace(/#.*$/, '')));
    if (!existsSync(file)) {
      problems.push(`${url}: ${file} does not exist`);
      return null;
    }
    return file;
  };
  for (const url of urls(xml)) fileOf(url);
  const sized = (url: string, size: number, what: string) => {
    const file = fileOf(url);
    if (file === null) return;
    const { width, height } = pngSize(file);
    if (width !== size || height !== size) problems.push(`${what} (${url}) is ${width}×${height}, declared ${size}×${size}`);
  };
  const res = resources(xml);
  for (const ref of references(xml)) {
    const r = res.get(ref.resid);
    if (ref.element === 'Image' && ref.size !== undefined && r !== undefined) sized(r.value, ref.size, `icon ${ref.resid} at size ${ref.size}`);
  }
  const icon = /<IconUrl DefaultValue="([^"]*)"/.exec(xml)?.[1];
  if (icon !== undefined) sized(icon, 32, 'IconUrl');
  const hiRes = /<HighResolutionIconUrl DefaultValue="([^"]*)"/.exec(xml)?.[1];
  if (hiRes !== undefined) sized(hiRes, 64, 'HighResolutionIconUrl');
  return problems;
}

/**
 * Rules of this add-in that the schema cannot state: one shared runtime (a long-lived Runtime, no
 * TaskpaneId on any action), the requirement sets the code needs, no AppDomain equal to the add-in's
 * own origin.
 */
export function ruleProblems(xml: string): string[] {
  const problems: string[] = [];
  if (!/<Runtime resid="[^"]*" lifetime="long"\/>/.test(xml)) problems.push('no long-lived shared Runtime');
  if (/<TaskpaneId>/.test(xml)) problems.push('a TaskpaneId under a shared runtime (there is one pane; the action must not name another)');
  const sets = new Map([...xml.matchAll(/<Set Name="([^"]*)"(?: MinVersion="([^"]*)")?\/>/g)].map((m) => [m[1], m[2] ?? '']));
  if (sets.get('SharedRuntime') !== '1.1') problems.push('SharedRuntime 1.1 is not required');
  if (sets.get('CustomFunctionsRuntime') !== '1.2') problems.push('CustomFunctionsRuntime 1.2 (CustomFunctions.Error with messages) is not required');
  const page = resources(xml).get(/<SourceLocation resid="([^"]*)"\/>\s*<\/Page>/.exec(xml)?.[1] ?? '')?.value;
  const origin = page === undefined ? null : new URL(page).origin;
  for (const m of xml.matchAll(/<AppDomain>([^<]*)<\/AppDomain>/g)) {
    if (origin !== null && new URL(m[1]).origin === origin) problems.push(`AppDomain ${m[1]} is the add-in's own origin`);
  }
  return problems;
}
