/**
 * The verification sheet's content (taskpane/verification.ts), recalculated by the same engine as
 * `cellwright check`: every case PASS with the built-in table, the header's TABLEINFO formulas and total.
 */
import ExcelJS from 'exceljs';
import { describe, expect, it } from 'vitest';
import { checkWorkbook } from '../../scripts/lib/check.mjs';
import { VERIFICATION_CASES, caseFormula, formulaArg, freeVerificationName, verificationSheet } from '../../taskpane/verification';

describe('verification sheet content', () => {
  it('writes arguments as Excel reads them', () => {
    expect(formulaArg('Cu2+/Cu')).toBe('"Cu2+/Cu"');
    expect(formulaArg('say "x"')).toBe('"say ""x"""');
    expect(formulaArg(5e-7)).toBe('5E-7');
    expect(formulaArg(null)).toBe('');
    expect(formulaArg([[0.771], [-0.447]])).toBe('{0.771;-0.447}');
    expect(caseFormula({ ...VERIFICATION_CASES[0], function: 'HALFCELL', args: ['H+/H2', null, null, 7] })).toBe('=CELLWRIGHT.HALFCELL("H+/H2",,,7)');
    expect(caseFormula({ ...VERIFICATION_CASES[0], function: 'MEANACTIVITYCOEF', args: [1, -1, 0.001, 'DHLL', null] })).toBe('=CELLWRIGHT.MEANACTIVITYCOEF(1,-1,0.001,"DHLL")');
    expect(freeVerificationName(['Sheet1', 'verification'])).toBe('Verification (2)');
  });

  it('one row per case; recalculated, every case passes and the total says so', async () => {
    const sheet = verificationSheet(VERIFICATION_CASES, new Date('2026-12-02T10:00:00Z'), new Map([['NERNST', ['E0_V', 'n', 'Q', 'temperature_C']]]));
    expect(sheet.lastCaseRow - sheet.firstCaseRow + 1).toBe(VERIFICATION_CASES.length);
    const wb = new ExcelJS.Workbook();
    const ws = wb.addWorksheet('Verification');
    sheet.values.forEach((row, i) =>
      row.forEach((v, j) => {
        if (v === '') return;
        ws.getCell(i + 1, j + 1).value = typeof v === 'string' && v.startsWith('=') && sheet.formats[i][j] !== '@' ? ({ formula: v.slice(1) }) : v;
      }),
    );
    const report = await checkWorkbook(Buffer.from(await wb.xlsx.writeBuffer()), { collect: true });
    expect(report.notEvaluable).toEqual([]);
    const at = (a: string) => report.values!.get(`Verification!${a}`);
    for (let r = sheet.firstCaseRow; r <= sheet.lastCaseRow; r++) expect(at(`H${r}`), `${String(sheet.values[r - 1][0])} gave ${JSON.stringify(at(`D${r}`))}`).toBe('PASS');
    const row = (label: string) => sheet.values.findIndex((x) => x[1] === label) + 1;
    expect(at(`C${row('Result')}`)).toBe(`PASS: all ${VERIFICATION_CASES.length} cases`);
    expect(at(`C${row('Potential table')}`)).toBe('built-in');
    expect(sheet.values[row('Sheet written') - 1][2]).toBe('2026-12-02');
    const nernstRow = sheet.values.find((x) => x[1] === 'CELLWRIGHT.NERNST')!;
    expect(nernstRow[2]).toMatch(/^E0_V = 0\.3419; n = 2; Q = 100$/);
  });

  it('a wrong result fails its case and the total counts it', async () => {
    const broken = VERIFICATION_CASES.map((c) => (c.id === 'V15' ? { ...c, expected: 0.0592 } : c)); // 59.2 mV is not the CODATA slope
    const sheet = verificationSheet(broken, new Date());
    const wb = new ExcelJS.Workbook();
    const ws = wb.addWorksheet('Verification');
    sheet.values.forEach((row, i) =>
      row.forEach((v, j) => {
        if (v === '') return;
        ws.getCell(i + 1, j + 1).value = typeof v === 'string' && v.startsWith('=') && sheet.formats[i][j] !== '@' ? ({ formula: v.slice(1) }) : v;
      }),
    );
    const report = await checkWorkbook(Buffer.from(await wb.xlsx.writeBuffer()), { collect: true });
    const r = sheet.firstCaseRow + broken.findIndex((c) => c.id === 'V15');
    expect(report.values!.get(`Verification!H${r}`)).toBe('FAIL');
    const total = sheet.values.findIndex((x) => x[1] === 'Result') + 1;
    expect(report.values!.get(`Verification!C${total}`)).toBe(`FAIL: 1 of ${broken.length} cases do not pass`);
  });
});
