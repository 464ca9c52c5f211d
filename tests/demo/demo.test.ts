/**
 * The demo (npm run demo): runs it, opens the workbook it writes with exceljs, and checks that
 * every formula is there with a cached value, and that each cached value is what the functions
 * bundle gives for that formula from the workbook's own inputs (the bundle loaded by the test
 * harness, independently of the demo's loader).
 */
import { spawnSync } from 'node:child_process';
import { existsSync, readFileSync, rmSync } from 'node:fs';
import { resolve } from 'node:path';
import ExcelJS from 'exceljs';
import { beforeAll, describe, expect, it } from 'vitest';
import { scenario } from '../../demo/scenario.mjs';
import { cellwrightCalls, evaluate, isErrorValue, parseAddress, parseFormula, unwrap } from '../../scripts/lib/formula.mjs';
import type { Scalar, Value } from '../../scripts/lib/formula.mjs';
import { loadBundleWithTable } from '../../scripts/lib/tablehost.mjs';
import { PINNED_DATA_KEY, TABLE_SETTING_KEY, readSetting } from '../../scripts/lib/webextension.mjs';
import { layoutSheet } from '../../scripts/lib/workbook.mjs';
import { fromSavedFormula } from '../../scripts/lib/saved-form.mjs';
import { loadBundle, type LoadedBundle } from '../bundle/harness';

const ROOT = resolve(__dirname, '../..');
const XLSX = resolve(ROOT, 'demo/cellwright-demo.xlsx');

let run: { status: number | null; stdout: string; stderr: string; ms: number };
let wb: ExcelJS.Workbook;
let bundle: LoadedBundle;
let pinnedParts: readonly string[] = [];

/** A cell's stored value as the evaluator sees it: formulas give their cached result. */
function stored(cell: ExcelJS.Cell): Scalar {
  let v = cell.value as unknown;
  // cell.result, not cell.value.result: the reader leaves a cached 0 out of cell.value (it is in the file as <v>0</v>)
  if (v !== null && typeof v === 'object' && 'formula' in (v)) v = (cell as unknown as { result?: unknown }).result ?? null;
  if (v !== null && typeof v === 'object' && 'error' in (v)) return { code: String((v).error) };
  if (v === undefined) return null;
  return v as Scalar;
}

interface FormulaCell {
  sheet: string;
  addr: string;
  formula: string;
  ref?: string;
  cached: Value;
}

/** Every formula of the workbook with its cached value (a 2-D array for array formulas). */
function formulaCells(ws: ExcelJS.Worksheet): FormulaCell[] {
  const out: FormulaCell[] = [];
  ws.eachRow((row) =>
    row.eachCell((cell) => {
      const v = cell.value as { formula?: string; shareType?: string; ref?: string } | null;
      if (!v || typeof v !== 'object' || typeof v.formula !== 'string') return;
      // the file holds the saved form (_xldudf_CELLWRIGHT_X); compare as typed (CELLWRIGHT.X)
      const formula = fromSavedFormula(v.formula);
      if (v.shareType === 'array' && v.ref) {
        const [a, b] = v.ref.split(':').map(parseAddress);
        const block: Scalar[][] = [];
        for (let r = a.r; r <= b.r; r++) {
          const line: Scalar[] = [];
          for (let c = a.c; c <= b.c; c++) line.push(stored(ws.getCell(r, c)));
          block.push(line);
        }
        out.push({ sheet: ws.name, addr: cell.address, formula, ref: v.ref, cached: block });
      } else {
        out.push({ sheet: ws.name, addr: cell.address, formula, cached: stored(cell) });
      }
    }),
  );
  return out;
}

function same(actual: Scalar, expected: Scalar): boolean {
  if (isErrorValue(expected)) return isErrorValue(actual) && actual.code === expected.code;
  if (typeof expected === 'number' && typeof actual === 'number') {
    return Math.abs(actual - expected) <= 1e-12 * Math.max(1, Math.abs(expected));
  }
  return actual === expected;
}

beforeAll(async () => {
  rmSync(XLSX, { force: true });
  const t0 = Date.now();
  const r = spawnSync(process.execPath, ['scripts/demo.mjs', '--no-build'], { cwd: ROOT, encoding: 'utf8', env: { ...process.env, NO_COLOR: '1' } });
  run = { status: r.status, stdout: r.stdout, stderr: r.stderr, ms: Date.now() - t0 };
  wb = new ExcelJS.Workbook();
  if (existsSync(XLSX)) await wb.xlsx.readFile(XLSX);
  // the functions with the table the workbook carries in its add-in settings (the pinned built-in table)
  const setting = existsSync(XLSX) ? await readSetting(readFileSync(XLSX), TABLE_SETTING_KEY) : { found: false as const };
  const pinned = existsSync(XLSX) ? await readSetting(readFileSync(XLSX), PINNED_DATA_KEY) : { found: false as const };
  if (setting.found) {
    const loaded = await loadBundleWithTable(setting.value, undefined, pinned.found ? pinned.value : null);
    bundle = loaded.bundle;
    pinnedParts = loaded.status.dataset?.pinned ?? [];
  } else bundle = loadBundle();
}, 60_000);

describe('npm run demo', () => {
  it('writes a workbook that carries its whole data set pinned (the table and the reference data)', () => {
    expect(pinnedParts).toEqual(['table', 'atomicweights', 'species', 'debyehuckel', 'water', 'electrolysis', 'units', 'anodes', 'cpcriteria', 'galvanicseries']);
  });

  it('runs in seconds without an unexpected error and prints every sheet', () => {
    expect(run.stderr).toBe('');
    expect(run.status, run.stdout.split('\n').slice(-30).join('\n')).toBe(0);
    expect(run.ms).toBeLessThan(20000);
    for (const s of scenario.sheets) expect(run.stdout).toContain(`━━ ${s.name} ━━ ${s.title}`);
    expect(run.stdout).toContain('No formula gave an unexpected error.');
    expect(run.stdout).toMatch(/wrote demo\/cellwright-demo\.xlsx/);
  });

  it('prints inputs, formulas and results with units', () => {
    // one quantity line: address, label, value, unit, formula
    expect(run.stdout).toMatch(/B\d+\s+Plating time to the specified thickness\s+\d+\.\d\s+min\s+=CELLWRIGHT\.PLATETIME\(/);
    expect(run.stdout).toMatch(/B\d+\s+Soil temperature at pipe depth\s+10\s+°C\s+input/);
    // the CP sheet takes its criteria per electrode as stated, beside the readings
    expect(run.stdout).toMatch(/=CELLWRIGHT\.PROTECTIONCRITERION\(C\d+:C\d+\) \(one formula, spilled 8×1\)/);
    // a spilled table with the formula and the range it filled
    expect(run.stdout).toMatch(/B\d+:F\d+ =CELLWRIGHT\.HALFCELL\(.*\) \(one formula, spilled 8×5\)/);
  });

  it('uses every function in the bundle', () => {
    const used = new Set<string>();
    for (const s of scenario.sheets) for (const cell of layoutSheet(s).cells.values()) if (cell.tree) cellwrightCalls(cell.tree, used);
    const ids = bundle.metadata.functions.map((f) => f.id);
    expect(ids.filter((id) => !used.has(id))).toEqual([]);
    expect([...used].filter((id) => !ids.includes(id))).toEqual([]);
  });
});

describe('demo/cellwright-demo.xlsx', () => {
  it('holds a cover and the sheets of the scenario, in order', () => {
    expect(wb.worksheets.map((w) => w.name)).toEqual(['Cover', ...scenario.sheets.map((s) => s.name)]);
  });

  it('has the scenario, how to use it and the cautions on the cover', () => {
    const text = wb
      .getWorksheet('Cover')!
      .getColumn(1)
      .values.filter((v): v is string => typeof v === 'string')
      .join('\n');
    for (const p of [...scenario.summary, ...scenario.howToUse, ...scenario.cautions]) expect(text).toContain(p);
    expect(text).toMatch(/invented/);
  });

  it('holds every formula of the scenario, in the cell the layout gives it', () => {
    for (const s of scenario.sheets) {
      const ws = wb.getWorksheet(s.name)!;
      const laid = layoutSheet(s);
      const written = new Map(formulaCells(ws).map((f) => [f.addr, f.formula]));
      const planned = [...laid.cells.values()].filter((c) => c.formula);
      expect(planned.length).toBeGreaterThan(0);
      for (const c of planned) expect(written.get(c.addr), `${s.name}!${c.addr}`).toBe(c.formula);
      expect(written.size).toBe(planned.length);
    }
  });

  it('writes spilled results as array formulas over the range they fill, with every value cached', () => {
    let arrays = 0;
    for (const ws of wb.worksheets) {
      for (const f of formulaCells(ws)) {
        if (!f.ref) continue;
        arrays++;
        for (const v of (f.cached as Scalar[][]).flat()) expect(v, `${f.sheet}!${f.ref}`).not.toBeNull();
      }
    }
    expect(arrays).toBeGreaterThanOrEqual(8);
    // the what-if table is one formula spilled over concentration × temperature
    const whatIf = formulaCells(wb.getWorksheet('What-if')!).find((f) => f.formula.startsWith('CELLWRIGHT.HALFCELL('));
    expect(whatIf?.ref).toMatch(/^B\d+:F\d+$/);
  });

  it('caches, for every formula, the value the bundle gives from the workbook’s own inputs', async () => {
    let checked = 0;
    for (const ws of wb.worksheets) {
      for (const f of formulaCells(ws)) {
        const ctx = {
          cell: (r: number, c: number) => stored(ws.getCell(r, c)),
          known: (id: string) => bundle.registered.has(id),
          dimensionality: (id: string, i: number) => bundle.metadata.functions.find((m) => m.id === id)?.parameters[i]?.dimensionality,
          call: (id: string, args: unknown[]) => bundle.call(id, ...args),
        };
        const fresh = unwrap(await evaluate(parseFormula(f.formula), ctx)) as Value;
        const where = `${f.sheet}!${f.addr} =${f.formula}`;
        if (f.ref) {
          expect(Array.isArray(fresh), where).toBe(true);
          const got = fresh as Scalar[][];
          const want = f.cached as Scalar[][];
          expect([got.length, got[0].length], where).toEqual([want.length, want[0].length]);
          want.forEach((line, i) => line.forEach((w, j) => expect(same(got[i][j], w), `${where} [${i},${j}]: ${JSON.stringify(got[i][j])} vs ${JSON.stringify(w)}`).toBe(true)));
        } else {
          expect(Array.isArray(fresh), where).toBe(false);
          expect(same(fresh as Scalar, f.cached as Scalar), `${where}: ${JSON.stringify(fresh)} vs ${JSON.stringify(f.cached)}`).toBe(true);
        }
        checked++;
      }
    }
    expect(checked).toBeGreaterThan(60);
  });

  it('shows no error value except the worked error the scenario means to show', () => {
    const expected = new Set<string>();
    for (const s of scenario.sheets) for (const c of layoutSheet(s).cells.values()) if (c.expect) expected.add(`${s.name}!${c.addr}`);
    const errors: string[] = [];
    for (const ws of wb.worksheets) {
      for (const f of formulaCells(ws)) {
        const cells = Array.isArray(f.cached) ? (f.cached as Scalar[][]).flat() : [f.cached];
        if (cells.some((v) => isErrorValue(v)) && !expected.has(`${f.sheet}!${f.addr}`)) errors.push(`${f.sheet}!${f.addr} =${f.formula}`);
      }
    }
    expect(errors).toEqual([]);
    expect(expected.size).toBeGreaterThanOrEqual(1);
  });

  it('holds the key results of the scenario (spot checks against direct calls)', () => {
    const ws = wb.getWorksheet('CP survey')!;
    const crit = formulaCells(ws).find((f) => f.formula.startsWith('CELLWRIGHT.CONVERTPOTENTIAL(0,"CSE","SCE")'))!;
    expect(same(crit.cached as Scalar, unwrap(bundle.call('CONVERTPOTENTIAL', [[0]], [['CSE']], [['SCE']])) as Scalar)).toBe(true);
    const plating = wb.getWorksheet('Plating')!;
    const eq = formulaCells(plating).find((f) => f.formula.startsWith('CELLWRIGHT.ECEQUIV("Ni",'))!;
    expect(same(eq.cached as Scalar, unwrap(bundle.call('ECEQUIV', 'Ni', 2)) as Scalar)).toBe(true);
  });
});
