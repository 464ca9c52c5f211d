/**
 * `cellwright check` (scripts/cellwright.mjs, scripts/lib/check.mjs): the demo workbook agrees with a
 * recalculation; altered copies fail the way they should; both forms of an add-in call are recognised;
 * a native function the formula engine lacks is listed, never skipped.
 */
import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import ExcelJS from 'exceljs';
import JSZip from 'jszip';
import { beforeAll, describe, expect, it } from 'vitest';
import { isAddinFormula, typedForm } from '../../scripts/lib/check.mjs';
import { applyChange } from '../../src/store/copy';
import { recordsOf } from '../../src/store/rows';
import { readStoredText, writeStoredText } from '../../src/store/stored';
import { builtinTable } from '../../src/table/builtin';
import { TABLE_SETTING_KEY, readSetting } from '../../scripts/lib/webextension.mjs';
import { loadBundle } from '../bundle/harness';

const ROOT = resolve(__dirname, '../..');
const dir = mkdtempSync(join(tmpdir(), 'cellwright-check-'));
const DEMO = join(dir, 'demo.xlsx');

interface Report {
  ok: boolean;
  table: { origin: string; version: string; checksum: string; revision: number | null };
  counts: { formulas: number; addinFormulas: number; agreeing: number; differing: number; notEvaluable: number };
  differing: Array<{ sheet: string; address: string; formula: string; stored: unknown; recomputed: unknown }>;
  notEvaluable: Array<{ sheet: string; address: string; formula: string; reason: string }>;
}

function check(file: string, ...extra: string[]): { status: number | null; stdout: string; stderr: string; report?: Report } {
  const r = spawnSync(process.execPath, ['scripts/cellwright.mjs', 'check', file, ...extra], { cwd: ROOT, encoding: 'utf8' });
  let report: Report | undefined;
  if (extra.includes('--json') && r.stdout.trim().startsWith('{')) report = JSON.parse(r.stdout) as Report;
  return { status: r.status, stdout: r.stdout, stderr: r.stderr, report };
}

/** Rewrites one part of an .xlsx file. */
async function editPart(src: string, dst: string, part: string, edit: (xml: string) => string): Promise<void> {
  const zip = await JSZip.loadAsync(readFileSync(src));
  const xml = await zip.file(part)!.async('string');
  const next = edit(xml);
  expect(next).not.toBe(xml);
  zip.file(part, next);
  writeFileSync(dst, await zip.generateAsync({ type: 'nodebuffer', compression: 'DEFLATE' }));
}

/** The worksheet part of a sheet name. */
async function sheetPart(file: string, name: string): Promise<string> {
  const zip = await JSZip.loadAsync(readFileSync(file));
  const wbXml = await zip.file('xl/workbook.xml')!.async('string');
  const rels = await zip.file('xl/_rels/workbook.xml.rels')!.async('string');
  const rid = new RegExp(`<sheet [^>]*name="${name}"[^>]*r:id="([^"]+)"`).exec(wbXml)![1];
  const target = new RegExp(`Id="${rid}"[^>]*Target="([^"]+)"`).exec(rels)?.[1] ?? new RegExp(`Target="([^"]+)"[^>]*Id="${rid}"`).exec(rels)![1];
  return `xl/${target.replace(/^\/?xl\//, '')}`;
}

beforeAll(() => {
  const r = spawnSync(process.execPath, ['scripts/demo.mjs', '--out', DEMO, '--quiet', '--no-build'], { cwd: ROOT, encoding: 'utf8' });
  expect(r.status, r.stderr).toBe(0);
}, 120_000);

describe('the saved form of a custom function', () => {
  it('turns _xldudf_CELLWRIGHT_NAME( (with or without an external prefix) into CELLWRIGHT.NAME(, never inside text', () => {
    expect(typedForm('_xldudf_CELLWRIGHT_NERNST(0.34,2,100)')).toBe('CELLWRIGHT.NERNST(0.34,2,100)');
    expect(typedForm('[2]!_xldudf_CELLWRIGHT_NERNST(A1,2,B1)*1000')).toBe('CELLWRIGHT.NERNST(A1,2,B1)*1000');
    expect(typedForm('Other.xlam!_xldudf_cellwright_emf(A1,A2)')).toBe('CELLWRIGHT.EMF(A1,A2)');
    expect(typedForm('_xlfn.XLOOKUP(1,A1:A3,B1:B3)')).toBe('XLOOKUP(1,A1:A3,B1:B3)');
    expect(typedForm('"_xldudf_CELLWRIGHT_NERNST(" & A1')).toBe('"_xldudf_CELLWRIGHT_NERNST(" & A1');
    expect(isAddinFormula('_xldudf_CELLWRIGHT_NERNST(1,2,3)')).toBe(true);
    expect(isAddinFormula('CELLWRIGHT.NERNST(1,2,3)')).toBe(true);
    expect(isAddinFormula('SUM(A1:A3)')).toBe(false);
  });
});

describe('cellwright check on the demo workbook', () => {
  it('reads the pinned table from the web-extension part and finds every formula agreeing: exit 0', () => {
    const r = check(DEMO, '--json');
    expect(r.status, r.stdout + r.stderr).toBe(0);
    const rep = r.report!;
    expect(rep.ok).toBe(true);
    expect(rep.table.origin).toBe('workbook');
    expect(rep.table.checksum).toMatch(/^sha256:[0-9a-f]{64}$/);
    expect(rep.counts.formulas).toBeGreaterThan(50);
    expect(rep.counts.addinFormulas).toBeGreaterThan(40);
    expect(rep.counts.agreeing).toBe(rep.counts.formulas);
    expect(rep.differing).toEqual([]);
    expect(rep.notEvaluable).toEqual([]);
  });
  it('prints a report for people with the table and the counts', () => {
    const r = check(DEMO);
    expect(r.status).toBe(0);
    expect(r.stdout).toMatch(/Potential table: workbook, version \d{4}\.\d+, revision 1, checksum sha256:/);
    expect(r.stdout).toMatch(/Agreeing: \d+\. Differing: 0\. Not evaluable: 0\./);
    expect(r.stdout).toMatch(/Everything agrees/);
  });

  it('a copy with one cached value altered fails naming that cell: exit 1', async () => {
    const bad = join(dir, 'altered.xlsx');
    const part = await sheetPart(DEMO, 'Bath chemistry');
    // B13: =CELLWRIGHT.ACTIVITYCOEF(2,B12), cached 0.3834…; the copy stores 0.5 instead
    await editPart(DEMO, bad, part, (xml) => xml.replace(/(<c r="B13"[^>]*>\s*<f>[^<]*<\/f>\s*<v>)[^<]*(<\/v>)/, '$10.5$2'));
    const r = check(bad, '--json');
    expect(r.status).toBe(1);
    const rep = r.report!;
    expect(rep.differing).toHaveLength(1);
    // the demo stores the add-in's calls in Excel's saved form (_xldudf_CELLWRIGHT_ACTIVITYCOEF)
    expect(rep.differing[0]).toMatchObject({ sheet: 'Bath chemistry', address: 'B13', stored: 0.5 });
    expect(rep.differing[0].formula).toMatch(/ACTIVITYCOEF\(2,B12\)$/);
    expect(rep.differing[0].recomputed as number).toBeCloseTo(0.3834, 3);
    const text = check(bad);
    expect(text.stdout).toMatch(/Bath chemistry!B13 {2}=\S*ACTIVITYCOEF\(2,B12\)\n\s+stored 0\.5, recomputed 0\.38/);
  });

  it('a copy whose stored table was edited (checksum recomputed) fails on the cells that depend on the edited couple', async () => {
    const edited = join(dir, 'edited-table.xlsx');
    const stored = await readSetting(readFileSync(DEMO), TABLE_SETTING_KEY);
    expect(stored.found).toBe(true);
    const text = (stored as { value: string }).value;
    // the edit the pane would make, written with the add-in's own store (checksum recomputed)
    const records = recordsOf(builtinTable());
    const read = readStoredText(text, records);
    if (!read.ok) throw new Error(read.problem.message);
    const copy = applyChange(read.copy, records, {
      kind: 'put',
      rowKind: 'couple',
      originalKey: 'Ni2+/Ni',
      record: { key: 'Ni2+/Ni', halfReaction: 'Ni2+ + 2e- -> Ni', e0: -0.2, source: 'test edit: a value changed to see which cells depend on it' },
    });
    const next = writeStoredText({ ...copy, revision: read.copy.revision + 1, changedAt: '2026-06-01T00:00:00Z' });
    await editPart(DEMO, edited, 'xl/webextensions/webextension1.xml', (xml) =>
      xml.replace(/(<we:property name="cellwright\.potentialTable" value=")[^"]*(")/, (_, a: string, b: string) => `${a}${JSON.stringify(next).replace(/&/g, '&amp;').replace(/"/g, '&quot;').replace(/</g, '&lt;')}${b}`),
    );
    const r = check(edited, '--json');
    expect(r.status, r.stderr).toBe(1);
    const rep = r.report!;
    expect(rep.table.origin).toBe('workbook');
    expect(rep.table.revision).toBe(2);
    expect(rep.notEvaluable).toEqual([]);
    // Cells that depend on Ni2+/Ni: formulas naming it, results in the row of a key cell holding it
    // (the spilled QA table and the galvanic-pair table), and the table's provenance (TABLEINFO).
    const wb = new ExcelJS.Workbook();
    await wb.xlsx.readFile(DEMO);
    const dependent = new Set<string>();
    const direct = new Set<string>();
    wb.eachSheet((ws) =>
      ws.eachRow((row, r) =>
        row.eachCell((cell) => {
          const v = cell.value as { formula?: string } | string | null;
          if (typeof v === 'string' && v === 'Ni2+/Ni') row.eachCell((other) => dependent.add(`${ws.name}!${other.address}`));
          if (v && typeof v === 'object' && typeof v.formula === 'string' && /Ni2\+\/Ni|TABLEINFO/.test(v.formula)) {
            dependent.add(`${ws.name}!${cell.address}`);
            direct.add(`${ws.name}!${cell.address}`);
          }
          void r;
        }),
      ),
    );
    const differing = rep.differing.map((d) => `${d.sheet}!${d.address}`);
    for (const d of differing) expect(dependent.has(d), `${d} differs but does not depend on Ni2+/Ni`).toBe(true);
    for (const d of direct) expect(differing, `${d} names the edited couple`).toContain(d);
    expect(differing.length).toBeGreaterThan(direct.size); // the spilled rows of the QA and galvanic tables too
  });

  it('a damaged stored table: exit 2 with the reason on one line', async () => {
    const damaged = join(dir, 'damaged-table.xlsx');
    await editPart(DEMO, damaged, 'xl/webextensions/webextension1.xml', (xml) => xml.replace(/(value="&quot;\{)/, '$1broken '));
    const r = check(damaged);
    expect(r.status).toBe(2);
    expect(r.stdout).toBe('');
    const lines = r.stderr.trim().split('\n').filter((l) => !/^Building/.test(l));
    expect(lines).toHaveLength(1);
    expect(lines[0]).toMatch(/stored potential table .* cannot be read: the stored table is not valid JSON/);
  });

  it('a file that is not a workbook: exit 2 with one line', () => {
    const junk = join(dir, 'junk.xlsx');
    writeFileSync(junk, 'not a zip file');
    const r = check(junk);
    expect(r.status).toBe(2);
    expect(r.stderr.trim().split('\n').pop()).toMatch(/junk\.xlsx: not a readable \.xlsx file/);
    expect(check(join(dir, 'missing.xlsx')).status).toBe(2);
  });
});

describe('cellwright check on a workbook written for the test', () => {
  it('recognises both forms of add-in calls, other sheets, defined names and native functions; lists the function the engine lacks', async () => {
    const b = loadBundle();
    const nernst = (b.call('NERNST', 0.3419, 2, 100) as number[][])[0][0];
    const wb = new ExcelJS.Workbook();
    const inputs = wb.addWorksheet('Inputs');
    inputs.getCell('A1').value = 0.3419;
    inputs.getCell('A2').value = 100;
    inputs.getCell('B1').value = 1;
    inputs.getCell('B2').value = 2;
    inputs.getCell('B3').value = 3;
    wb.definedNames.add("'Inputs'!$B$1:$B$3", 'steps');
    const calc = wb.addWorksheet('Calc');
    calc.getCell('A1').value = { formula: 'CELLWRIGHT.NERNST(Inputs!A1,2,Inputs!A2)', result: nernst };
    calc.getCell('A2').value = { formula: '_xldudf_CELLWRIGHT_NERNST(Inputs!A1,2,Inputs!A2)', result: nernst };
    calc.getCell('A3').value = { formula: 'ROUND(A1*1000,1)&" mV"', result: `${Math.round(nernst * 10000) / 10} mV` };
    calc.getCell('A4').value = { formula: 'SUM(steps)', result: 6 };
    calc.getCell('A5').value = { formula: 'IFERROR(CELLWRIGHT.STDPOTENTIAL("Xx9/Yy"),"none")', result: 'none' };
    calc.getCell('A6').value = { formula: '_xlfn.XLOOKUP(2,Inputs!B1:B3,Inputs!B1:B3)', result: 2 };
    calc.getCell('A7').value = { formula: 'A6*2', result: 4 };
    const file = join(dir, 'forms.xlsx');
    writeFileSync(file, Buffer.from(await wb.xlsx.writeBuffer()));

    const r = check(file, '--json');
    expect(r.status, r.stderr).toBe(1);
    const rep = r.report!;
    expect(rep.table.origin).toBe('built-in');
    expect(rep.counts).toMatchObject({ formulas: 7, addinFormulas: 3, agreeing: 5, differing: 0, notEvaluable: 2 });
    expect(rep.notEvaluable.map((n) => n.address)).toEqual(['A6', 'A7']);
    expect(rep.notEvaluable[0].reason).toMatch(/XLOOKUP/);
    expect(rep.notEvaluable[1].reason).toMatch(/depends on Calc!A6/);
    const text = check(file);
    expect(text.stdout).toMatch(/the workbook carries no potential table of its own: the add-in's built-in table was used/);
    expect(text.stdout).toMatch(/Not evaluable:\n {2}Calc!A6 {2}=_xlfn\.XLOOKUP/);
  });

  it('--table uses an exported table instead; --tolerance is relative', async () => {
    const { exportCsv } = await import('../../src/store/csv');
    const rec = recordsOf(builtinTable());
    const couples = rec.couples.map((c) => (c.key === 'Ni2+/Ni' ? { ...c, e0: -0.2 } : c));
    const csv = join(dir, 'table.csv');
    writeFileSync(csv, exportCsv({ couples, electrodes: rec.electrodes }, 'test export'));
    const r = check(DEMO, '--table', csv, '--json');
    expect(r.status).toBe(1);
    expect(r.report!.table.origin).toBe('file');
    expect(r.report!.differing.some((d) => /Ni2\+\/Ni/.test(d.formula))).toBe(true);
    // the same file checked against the workbook's own table, with a generous tolerance, still agrees
    expect(check(DEMO, '--tolerance', '1e-6').status).toBe(0);
    expect(check(DEMO, '--tolerance', 'abc').status).toBe(2);
  });
});

