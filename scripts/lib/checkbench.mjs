// The `cellwright check` part of `npm run bench`: writes a workbook of N add-in formulas (default
// 100,000: four columns of CELLWRIGHT formulas over N/4 rows of inputs, each with its cached value),
// then times checkWorkbook on it (reading the file included) and prints formulas per second.
//   node scripts/lib/checkbench.mjs [N]   → one line of JSON
import { mkdtempSync, readFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import ExcelJS from 'exceljs';
import { loadBundle } from './bundle.mjs';
import { checkWorkbook } from './check.mjs';

const N = Number(process.argv[2] ?? 100_000);
const rows = Math.ceil(N / 4);
const b = loadBundle();
const col = (f) => Array.from({ length: rows }, (_, i) => [f(i)]);
const a = col((i) => 1e-4 * (1 + (i % 997)));
const mv = col((i) => -0.5 - (i % 500) / 1000);
const nernst = b.call('NERNST', 0.3419, 2, a);
const half = b.call('HALFCELL', 'Cu2+/Cu', a);
const conv = b.call('CONVERTPOTENTIAL', mv, 'CSE', 'SHE');
const slope = b.call('NERNSTSLOPE', 2, col((i) => i % 90));

const wb = new ExcelJS.Workbook();
const ws = wb.addWorksheet('Bench');
for (let i = 0; i < rows; i++) {
  const r = i + 1;
  const row = ws.getRow(r);
  row.values = [
    a[i][0],
    mv[i][0],
    i % 90,
    { formula: `CELLWRIGHT.NERNST(0.3419,2,A${r})`, result: nernst[i][0] },
    { formula: `CELLWRIGHT.HALFCELL("Cu2+/Cu",A${r})`, result: half[i][0] },
    { formula: `_xldudf_CELLWRIGHT_CONVERTPOTENTIAL(B${r},"CSE","SHE")`, result: conv[i][0] },
    { formula: `CELLWRIGHT.NERNSTSLOPE(2,C${r})`, result: slope[i][0] },
  ];
}
const dir = mkdtempSync(join(tmpdir(), 'cellwright-bench-'));
const file = join(dir, 'bench.xlsx');
await wb.xlsx.writeFile(file);
const t0 = performance.now();
const report = await checkWorkbook(readFileSync(file));
const seconds = (performance.now() - t0) / 1000;
rmSync(dir, { recursive: true, force: true });
console.log(
  JSON.stringify({
    formulas: report.counts.formulas,
    addinFormulas: report.counts.addinFormulas,
    agreeing: report.counts.agreeing,
    seconds,
    formulasPerSecond: report.counts.formulas / seconds,
    ok: report.ok,
  }),
);
