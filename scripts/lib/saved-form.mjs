// Rewrites an .xlsx written by exceljs into the form Excel itself saves:
//  - the add-in's functions under the reserved prefix Excel uses for JavaScript custom functions
//    (`CELLWRIGHT.HALFCELL(` is saved as `_xldudf_CELLWRIGHT_HALFCELL(`), so that Excel with the
//    add-in loaded binds them on open;
//  - spilled results as dynamic arrays: the anchor cell of each array formula carries cm="1",
//    which points at the dynamic-array cell metadata (xl/metadata.xml, type XLDAPR), instead of
//    being a legacy {=…} array formula;
//  - document properties that name the demo script as the application that wrote the file.
// The sources for these forms are cited in DEVELOPERS.md ("The demo workbook's saved form").
import JSZip from 'jszip';

export const UDF_PREFIX = '_xldudf_';
export const APPLICATION = 'Cellwright demo script';

const METADATA_PATH = 'xl/metadata.xml';
const METADATA_CT = 'application/vnd.openxmlformats-officedocument.spreadsheetml.sheetMetadata+xml';
const METADATA_REL = 'http://schemas.openxmlformats.org/officeDocument/2006/relationships/sheetMetadata';
const DYNAMIC_ARRAY_EXT = '{bdbb8cdc-fa1e-496e-a857-3c3f30c029c3}';

const METADATA_XML =
  '<?xml version="1.0" encoding="UTF-8" standalone="yes"?>\n' +
  '<metadata xmlns="http://schemas.openxmlformats.org/spreadsheetml/2006/main" ' +
  'xmlns:xda="http://schemas.microsoft.com/office/spreadsheetml/2017/dynamicarray">' +
  '<metadataTypes count="1"><metadataType name="XLDAPR" minSupportedVersion="120000" copy="1" pasteAll="1" ' +
  'pasteValues="1" merge="1" splitFirst="1" rowColShift="1" clearFormats="1" clearComments="1" assign="1" ' +
  'coerce="1" cellMeta="1"/></metadataTypes>' +
  `<futureMetadata name="XLDAPR" count="1"><bk><extLst><ext uri="${DYNAMIC_ARRAY_EXT}">` +
  '<xda:dynamicArrayProperties fDynamic="1" fCollapsed="0"/></ext></extLst></bk></futureMetadata>' +
  '<cellMetadata count="1"><bk><rc t="1" v="0"/></bk></cellMetadata></metadata>';

/**
 * A formula as the user types it → as Excel saves it: every call of a namespace function gets
 * the custom-function prefix, the namespace's dot becoming an underscore. Text inside string
 * literals is left alone.
 */
export function toSavedFormula(formula, namespace = 'CELLWRIGHT') {
  const call = new RegExp(`(?<![A-Za-z0-9_.])${namespace}\\.([A-Za-z][A-Za-z0-9]*)\\(`, 'g');
  return formula
    .split(/("(?:[^"]|"")*"|&quot;(?:(?!&quot;).)*&quot;)/)
    .map((part, i) => (i % 2 ? part : part.replace(call, `${UDF_PREFIX}${namespace}_$1(`)))
    .join('');
}

/** The inverse of toSavedFormula, for readers of the saved file. */
export function fromSavedFormula(formula, namespace = 'CELLWRIGHT') {
  const call = new RegExp(`${UDF_PREFIX}${namespace}_([A-Za-z][A-Za-z0-9]*)\\(`, 'g');
  return formula
    .split(/("(?:[^"]|"")*"|&quot;(?:(?!&quot;).)*&quot;)/)
    .map((part, i) => (i % 2 ? part : part.replace(call, `${namespace}.$1(`)))
    .join('');
}

/** Rewrites the workbook bytes; returns { bytes, arrays, formulas } (how many of each were rewritten). */
export async function toSavedForm(input) {
  const zip = await JSZip.loadAsync(input);
  let arrays = 0;
  let formulas = 0;
  const sheets = Object.keys(zip.files).filter((p) => /^xl\/worksheets\/sheet\d+\.xml$/.test(p));
  for (const path of sheets) {
    let xml = await zip.file(path).async('string');
    xml = xml.replace(/<f([^>]*)>([^<]*)<\/f>/g, (_, attrs, text) => {
      formulas++;
      return `<f${attrs}>${toSavedFormula(text)}</f>`;
    });
    // the anchor of each array formula becomes a dynamic array (cell metadata record 1)
    xml = xml.replace(/<c ((?:(?!cm=)[^>])*)>(<f t="array")/g, (_, attrs, f) => {
      arrays++;
      return `<c ${attrs.trimEnd()} cm="1">${f}`;
    });
    zip.file(path, xml);
  }
  if (arrays) {
    zip.file(METADATA_PATH, METADATA_XML);
    let types = await zip.file('[Content_Types].xml').async('string');
    if (!types.includes('/xl/metadata.xml')) types = types.replace('</Types>', `<Override PartName="/${METADATA_PATH}" ContentType="${METADATA_CT}"/></Types>`);
    zip.file('[Content_Types].xml', types);
    const relsPath = 'xl/_rels/workbook.xml.rels';
    let rels = await zip.file(relsPath).async('string');
    if (!rels.includes(METADATA_REL)) {
      const ids = [...rels.matchAll(/Id="rId(\d+)"/g)].map((m) => Number(m[1]));
      const id = `rId${Math.max(0, ...ids) + 1}`;
      rels = rels.replace('</Relationships>', `<Relationship Id="${id}" Type="${METADATA_REL}" Target="metadata.xml"/></Relationships>`);
    }
    zip.file(relsPath, rels);
  }
  const appPath = 'docProps/app.xml';
  if (zip.file(appPath)) {
    let app = await zip.file(appPath).async('string');
    app = app.replace(/<Application>[^<]*<\/Application>/, `<Application>${APPLICATION}</Application>`);
    zip.file(appPath, app);
  }
  const bytes = await zip.generateAsync({ type: 'nodebuffer', compression: 'DEFLATE' });
  return { bytes, arrays, formulas };
}
