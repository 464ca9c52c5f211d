// The add-in's settings inside an .xlsx file: the web-extension part (Office Open XML extension
// [MS-OWEXML], namespace http://schemas.microsoft.com/office/webextensions/webextension/2010/11).
//
// Excel saves an add-in's workbook settings (context.workbook.settings) as the add-in instance's
// properties: xl/webextensions/webextension<N>.xml holds one <we:webextension> whose
// <we:reference id="…"> is the add-in's manifest <Id> and whose <we:properties> hold one
// <we:property name="<setting key>" value="<the value as JSON text>"/> per setting. A task-pane
// instance is listed in xl/webextensions/taskpanes.xml (<wetp:taskpanes>, reached from the
// package's _rels/.rels), which links to the web-extension part through its own relationships.
//
// writeWebExtension(buffer, { addinId, version, properties }) → a new .xlsx buffer with the parts
// added (replacing any earlier part of this add-in); readWebExtensions(buffer) → every
// web-extension part of the file with its reference and properties.
import JSZip from 'jszip';

export const NS_WE = 'http://schemas.microsoft.com/office/webextensions/webextension/2010/11';
export const NS_WETP = 'http://schemas.microsoft.com/office/webextensions/taskpanes/2010/11';
const NS_R = 'http://schemas.openxmlformats.org/officeDocument/2006/relationships';
const NS_PKG_REL = 'http://schemas.openxmlformats.org/package/2006/relationships';
const REL_TASKPANES = 'http://schemas.microsoft.com/office/2011/relationships/webextensiontaskpanes';
const REL_WEBEXTENSION = 'http://schemas.microsoft.com/office/2011/relationships/webextension';
const CT_WEBEXTENSION = 'application/vnd.ms-office.webextension+xml';
const CT_TASKPANES = 'application/vnd.ms-office.webextensiontaskpanes+xml';

/** The add-in's settings key of the stored potential table (workbook/store.ts). */
export const TABLE_SETTING_KEY = 'cellwright.potentialTable';
/** The add-in's settings key of the pinned data, the data set's parts besides the table (workbook/pinnedData.ts). */
export const PINNED_DATA_KEY = 'cellwright.pinnedData';

const esc = (s) => String(s).replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;');
const unesc = (s) =>
  s.replace(/&(#x[0-9a-f]+|#\d+|lt|gt|quot|apos|amp);/gi, (_, e) => {
    const k = e.toLowerCase();
    if (k === 'lt') return '<';
    if (k === 'gt') return '>';
    if (k === 'quot') return '"';
    if (k === 'apos') return "'";
    if (k === 'amp') return '&';
    return String.fromCodePoint(k.startsWith('#x') ? parseInt(k.slice(2), 16) : parseInt(k.slice(1), 10));
  });

/** Attributes of one start tag as a Map (values unescaped). */
function attrs(tag) {
  const out = new Map();
  for (const m of tag.matchAll(/([\w:.-]+)\s*=\s*("([^"]*)"|'([^']*)')/g)) out.set(m[1], unesc(m[3] ?? m[4]));
  return out;
}

/** The XML of one web-extension part: the add-in's reference and its properties (values already JSON text). */
export function webExtensionXml({ instanceId, addinId, version, properties }) {
  const props = Object.entries(properties)
    .map(([name, value]) => `<we:property name="${esc(name)}" value="${esc(value)}"/>`)
    .join('');
  return (
    '<?xml version="1.0" encoding="UTF-8" standalone="yes"?>\r\n' +
    `<we:webextension xmlns:we="${NS_WE}" id="${esc(instanceId)}">` +
    `<we:reference id="${esc(addinId)}" version="${esc(version)}" store="developer" storeType="Registry"/>` +
    '<we:alternateReferences/>' +
    `<we:properties>${props}</we:properties>` +
    '<we:bindings/>' +
    `<we:snapshot xmlns:r="${NS_R}"/>` +
    '</we:webextension>'
  );
}

function taskpanesXml(rid) {
  return (
    '<?xml version="1.0" encoding="UTF-8" standalone="yes"?>\r\n' +
    `<wetp:taskpanes xmlns:wetp="${NS_WETP}">` +
    `<wetp:taskpane dockstate="right" visibility="0" width="350" row="0">` +
    `<wetp:webextensionref xmlns:r="${NS_R}" r:id="${rid}"/>` +
    '</wetp:taskpane></wetp:taskpanes>'
  );
}

function addRelationship(relsXml, { id, type, target }) {
  const base = relsXml ?? `<?xml version="1.0" encoding="UTF-8" standalone="yes"?>\r\n<Relationships xmlns="${NS_PKG_REL}"></Relationships>`;
  return base.replace('</Relationships>', `<Relationship Id="${id}" Type="${type}" Target="${target}"/></Relationships>`);
}

function addOverride(ctXml, partName, contentType) {
  if (ctXml.includes(`PartName="${partName}"`)) return ctXml;
  return ctXml.replace('</Types>', `<Override PartName="${partName}" ContentType="${contentType}"/></Types>`);
}

function freeRid(relsXml) {
  const used = new Set([...(relsXml ?? '').matchAll(/Id="([^"]+)"/g)].map((m) => m[1]));
  let i = 1;
  while (used.has(`rId${i}`)) i++;
  return `rId${i}`;
}

/** A deterministic instance id ({GUID} form) for the add-in's instance in one file. */
function instanceGuid(addinId) {
  const hex = addinId.replace(/[^0-9a-f]/gi, '').toUpperCase().padEnd(32, '0').slice(0, 32);
  return `{${hex.slice(0, 8)}-${hex.slice(8, 12)}-${hex.slice(12, 16)}-${hex.slice(16, 20)}-${hex.slice(20)}}`;
}

/**
 * Adds the add-in's web-extension part (with its task-pane entry, relationships and content types) to an
 * .xlsx buffer. `settings` maps setting keys to values; each is stored as its JSON text, as the
 * settings API stores values. Returns the new buffer.
 */
export async function writeWebExtension(buffer, { addinId, version, settings }) {
  const zip = await JSZip.loadAsync(buffer);
  const existing = (await readWebExtensionsFromZip(zip)).filter((w) => w.addinId.toLowerCase() === addinId.toLowerCase());
  if (existing.length) throw new Error(`the file already holds a web-extension part of add-in ${addinId} (${existing[0].part})`);
  let n = 1;
  while (zip.file(`xl/webextensions/webextension${n}.xml`)) n++;
  const part = `xl/webextensions/webextension${n}.xml`;
  const properties = Object.fromEntries(Object.entries(settings).map(([k, v]) => [k, JSON.stringify(v)]));
  zip.file(part, webExtensionXml({ instanceId: instanceGuid(addinId), addinId, version, properties }));

  const tpRelsPath = 'xl/webextensions/_rels/taskpanes.xml.rels';
  const tpRels = zip.file(tpRelsPath) ? await zip.file(tpRelsPath).async('string') : null;
  const rid = freeRid(tpRels);
  zip.file(tpRelsPath, addRelationship(tpRels, { id: rid, type: REL_WEBEXTENSION, target: `webextension${n}.xml` }));
  const tpPath = 'xl/webextensions/taskpanes.xml';
  if (zip.file(tpPath)) {
    const tp = await zip.file(tpPath).async('string');
    const entry = `<wetp:taskpane dockstate="right" visibility="0" width="350" row="0"><wetp:webextensionref xmlns:r="${NS_R}" r:id="${rid}"/></wetp:taskpane>`;
    zip.file(tpPath, tp.replace('</wetp:taskpanes>', `${entry}</wetp:taskpanes>`));
  } else {
    zip.file(tpPath, taskpanesXml(rid));
    const rootRels = await zip.file('_rels/.rels').async('string');
    zip.file('_rels/.rels', addRelationship(rootRels, { id: freeRid(rootRels), type: REL_TASKPANES, target: tpPath }));
  }
  let ct = await zip.file('[Content_Types].xml').async('string');
  ct = addOverride(ct, `/${part}`, CT_WEBEXTENSION);
  ct = addOverride(ct, `/${tpPath}`, CT_TASKPANES);
  zip.file('[Content_Types].xml', ct);
  return zip.generateAsync({ type: 'nodebuffer', compression: 'DEFLATE' });
}

async function readWebExtensionsFromZip(zip) {
  const out = [];
  const parts = Object.keys(zip.files).filter((p) => /^xl\/webextensions\/webextension[^/]*\.xml$/i.test(p)).sort();
  for (const part of parts) {
    const xml = await zip.file(part).async('string');
    // attribute values may hold ">" (XML does not require it escaped): match quoted values as a whole
    const ref = xml.match(/<(?:\w+:)?reference\b(?:[^>"']|"[^"]*"|'[^']*')*>/);
    const r = ref ? attrs(ref[0]) : new Map();
    const properties = new Map();
    for (const m of xml.matchAll(/<(?:\w+:)?property\b(?:[^>"']|"[^"]*"|'[^']*')*>/g)) {
      const a = attrs(m[0]);
      if (a.has('name')) properties.set(a.get('name'), a.get('value') ?? '');
    }
    out.push({ part, addinId: r.get('id') ?? '', version: r.get('version') ?? '', properties });
  }
  return out;
}

/** Every web-extension part of an .xlsx buffer: { part, addinId, version, properties: Map(name → raw value text) }. */
export async function readWebExtensions(buffer) {
  return readWebExtensionsFromZip(await JSZip.loadAsync(buffer));
}

/**
 * A setting's value from its stored text: the settings API stores JSON text; a value that is not JSON is
 * returned as it stands (a reader then says what is wrong with it).
 */
export function settingValue(raw) {
  try {
    const v = JSON.parse(raw);
    return typeof v === 'string' ? v : raw;
  } catch {
    return raw;
  }
}

/**
 * The add-in's setting `key` in an .xlsx buffer: { found: false } when no web-extension part of
 * the add-in (any add-in when addinId is null) holds it, else { found: true, value, part, addinId }.
 */
export async function readSetting(buffer, key, addinId = null) {
  for (const w of await readWebExtensions(buffer)) {
    if (addinId && w.addinId.toLowerCase() !== addinId.toLowerCase()) continue;
    if (w.properties.has(key)) return { found: true, value: settingValue(w.properties.get(key)), part: w.part, addinId: w.addinId };
  }
  return { found: false };
}

/** The add-in's id and version from manifest.xml text. */
export function manifestIdentity(manifestXml) {
  const id = manifestXml.match(/<Id>\s*([^<\s]+)\s*<\/Id>/)?.[1];
  const version = manifestXml.match(/<Version>\s*([^<\s]+)\s*<\/Version>/)?.[1];
  if (!id || !version) throw new Error('manifest.xml has no <Id> or <Version>');
  return { id, version };
}
