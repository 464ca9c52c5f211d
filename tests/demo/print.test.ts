/**
 * The demo workbook as a file and on paper: writes it to a temporary folder, reads its XML back
 * (saved form of the add-in's formulas, dynamic-array metadata, print settings, document
 * properties), then converts it to PDF with LibreOffice (headless) and counts the printed pages
 * of each sheet from the page headers.
 */
import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, rmSync, writeFileSync, mkdirSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { pathToFileURL } from 'node:url';
import JSZip from 'jszip';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { scenario } from '../../demo/scenario.mjs';
import { layoutSheet } from '../../scripts/lib/workbook.mjs';

const ROOT = resolve(__dirname, '../..');
const have = (cmd: string) => spawnSync('sh', ['-c', `command -v ${cmd}`]).status === 0;
const OFFICE = have('libreoffice') && have('pdftotext') && have('pdfinfo');
if (!OFFICE) {
  console.warn('SKIPPED the PDF checks of the demo workbook: libreoffice and poppler-utils are not installed (.ci/run installs them with apt-get: libreoffice-calc poppler-utils).');
}

const SHEETS = ['Cover', ...scenario.sheets.map((s) => s.name)];
let dir: string;
let zip: JSZip;
let sheetXml: string[];
const text = async (p: string) => await zip.file(p)!.async('string');

beforeAll(async () => {
  dir = mkdtempSync(join(tmpdir(), 'cellwright-print-'));
  const out = join(dir, 'demo.xlsx');
  const r = spawnSync(process.execPath, ['scripts/demo.mjs', '--no-build', '--quiet', '--out', out], { cwd: ROOT, encoding: 'utf8' });
  if (r.status !== 0) throw new Error(`npm run demo failed: ${r.stderr}${r.stdout}`);
  zip = await JSZip.loadAsync(readFileSync(out));
  sheetXml = [];
  for (let i = 1; i <= SHEETS.length; i++) sheetXml.push(await text(`xl/worksheets/sheet${i}.xml`));
}, 120000);

afterAll(() => {
  if (dir) rmSync(dir, { recursive: true, force: true });
});

describe('demo workbook, saved form', () => {
  it('stores the add-in functions with the custom-function prefix, never as CELLWRIGHT.X', () => {
    const formulas = sheetXml.flatMap((x) => [...x.matchAll(/<f[^>]*>([^<]*)<\/f>/g)].map((m) => m[1]));
    expect(formulas.length).toBeGreaterThan(60);
    expect(formulas.filter((f) => /CELLWRIGHT\./.test(f))).toEqual([]);
    // every formula but the few plain arithmetic ones calls the add-in
    expect(formulas.filter((f) => /_xldudf_CELLWRIGHT_[A-Z][A-Z0-9]*\(/.test(f)).length).toBeGreaterThan(60);
  });

  it('marks every spilled formula as a dynamic array through the XLDAPR cell metadata', async () => {
    const anchors = sheetXml.flatMap((x) => [...x.matchAll(/<c ([^>]*)><f t="array" ref="([A-Z]+\d+:[A-Z]+\d+)"/g)]);
    // one anchor per spill that the layout planned (grid and table formulas that spill)
    let planned = 0;
    for (const s of scenario.sheets) planned += [...layoutSheet(s).cells.values()].filter((c) => c.formula).length;
    expect(anchors.length).toBeGreaterThanOrEqual(8);
    expect(anchors.length).toBeLessThan(planned);
    for (const a of anchors) expect(a[1], a[0]).toMatch(/\bcm="1"/);
    // no other cell points at the metadata
    const cm = sheetXml.reduce((n, x) => n + (x.match(/\bcm="/g)?.length ?? 0), 0);
    expect(cm).toBe(anchors.length);

    const meta = await text('xl/metadata.xml');
    expect(meta).toMatch(/<metadataType name="XLDAPR"[^>]*cellMeta="1"/);
    expect(meta).toMatch(/<futureMetadata name="XLDAPR" count="1">.*<xda:dynamicArrayProperties fDynamic="1" fCollapsed="0"\/>/);
    expect(meta).toMatch(/<cellMetadata count="1"><bk><rc t="1" v="0"\/><\/bk><\/cellMetadata>/);
    expect(await text('[Content_Types].xml')).toContain('<Override PartName="/xl/metadata.xml" ContentType="application/vnd.openxmlformats-officedocument.spreadsheetml.sheetMetadata+xml"/>');
    expect(await text('xl/_rels/workbook.xml.rels')).toMatch(/Type="http:\/\/schemas\.openxmlformats\.org\/officeDocument\/2006\/relationships\/sheetMetadata" Target="metadata\.xml"/);
  });

  it('says the demo script wrote it, not a spreadsheet application', async () => {
    const app = await text('docProps/app.xml');
    expect(app).toContain('<Application>Cellwright demo script</Application>');
    expect(app).not.toMatch(/Excel/);
    expect(await text('docProps/core.xml')).toContain('<dc:creator>Cellwright demo script</dc:creator>');
  });

  it('caches no #NAME? and no Err: value', () => {
    for (const x of sheetXml) {
      const errors = [...x.matchAll(/<c [^>]*t="e"[^>]*>(?:<f[^>]*>[^<]*<\/f>)?<v>([^<]*)<\/v>/g)].map((m) => m[1]);
      expect(errors.filter((e) => e === '#NAME?' || e.startsWith('Err:'))).toEqual([]);
    }
  });

  it('prints each sheet fitted to its page width, with titles, header and footer', async () => {
    const wb = await text('xl/workbook.xml');
    sheetXml.forEach((x, i) => {
      const name = SHEETS[i];
      expect(x, name).toContain('<pageSetUpPr fitToPage="1"/>');
      expect(x, name).toMatch(/<pageSetup paperSize="9" orientation="(landscape|portrait)" fitToWidth="1" fitToHeight="2"/);
      expect(x, name).toMatch(/<oddHeader>&amp;L&amp;B&amp;9.*\(invented scenario\)&amp;R&amp;9&amp;A<\/oddHeader>/);
      expect(x, name).toMatch(/<oddFooter>.*checksum sha256:[0-9a-f]{64}.*Page &amp;P of &amp;N<\/oddFooter>/);
      if (i > 0) expect(wb, name).toContain(`<definedName name="_xlnm.Print_Titles" localSheetId="${i}">&apos;${name}&apos;!$1:$1</definedName>`);
    });
  });
});

describe.skipIf(!OFFICE)('demo workbook, printed by LibreOffice', () => {
  let pages: string[] = [];
  beforeAll(() => {
    // A fresh profile that shows the stored values instead of recalculating (LibreOffice has no
    // add-in to compute the CELLWRIGHT functions with).
    const profile = join(dir, 'profile');
    mkdirSync(join(profile, 'user'), { recursive: true });
    writeFileSync(
      join(profile, 'user', 'registrymodifications.xcu'),
      '<?xml version="1.0" encoding="UTF-8"?>\n<oor:items xmlns:oor="http://openoffice.org/2001/registry" xmlns:xs="http://www.w3.org/2001/XMLSchema" xmlns:xsi="http://www.w3.org/2001/XMLSchema-instance">' +
        '<item oor:path="/org.openoffice.Office.Calc/Formula/Load"><prop oor:name="OOXMLRecalcMode" oor:op="fuse"><value>1</value></prop></item></oor:items>\n',
    );
    const r = spawnSync('libreoffice', [`-env:UserInstallation=${pathToFileURL(profile).href}`, '--headless', '--convert-to', 'pdf', '--outdir', dir, join(dir, 'demo.xlsx')], { encoding: 'utf8', timeout: 170000 });
    if (r.status !== 0) throw new Error(`libreoffice failed: ${r.stderr}`);
    const pdf = join(dir, 'demo.pdf');
    const n = Number(/Pages:\s+(\d+)/.exec(spawnSync('pdfinfo', [pdf], { encoding: 'utf8' }).stdout)![1]);
    pages = [];
    for (let p = 1; p <= n; p++) pages.push(spawnSync('pdftotext', ['-f', String(p), '-l', String(p), '-layout', pdf, '-'], { encoding: 'utf8' }).stdout);
  }, 180000);

  it('prints every sheet on at most two pages, each page headed by the scenario and its sheet', () => {
    const count = new Map<string, number>();
    for (const page of pages) {
      // the header: the scenario at the left, the sheet's name at the right (on the same line,
      // or on the next one where the page is narrow)
      const [first, second] = page.split('\n').filter((l) => l.trim());
      expect(first).toContain(scenario.title);
      const rest = first.slice(first.indexOf(scenario.title) + scenario.title.length).trim();
      const sheet = rest || second.trim();
      expect(SHEETS).toContain(sheet);
      count.set(sheet, (count.get(sheet) ?? 0) + 1);
    }
    console.info(`printed pages per sheet: ${SHEETS.map((s) => `${s} ${count.get(s)}`).join(', ')}; ${pages.length} in all`);
    for (const s of SHEETS) {
      expect(count.get(s), s).toBeGreaterThanOrEqual(1);
      expect(count.get(s), s).toBeLessThanOrEqual(2);
    }
  });

  it('prints the footer with the table checksum and page numbers', () => {
    pages.forEach((page, i) => expect(page, `page ${i + 1}`).toMatch(/checksum sha256:[0-9a-f]{64}[\s\S]*Page \d+ of \d+/));
  });

  it('shows no Err: code and keeps units beside values', () => {
    const all = pages.join('\n');
    expect(all).not.toMatch(/Err:\d+/);
    // a quantity line: label, value and unit on one printed line
    expect(all).toMatch(/Plating time to the specified thickness\s+\d+\.\d\s+min/);
    expect(all).toMatch(/Polarisation criterion \(a separate condition\)\s+-?0\.1\d*\s+V shift/);
  });
});
