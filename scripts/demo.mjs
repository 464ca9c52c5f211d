// npm run demo: the scenario of demo/scenario.mjs, evaluated through the production functions
// bundle the way Excel's runtime runs it, printed sheet by sheet, and written to
// demo/cellwright-demo.xlsx with live CELLWRIGHT formulas and their computed values cached.
//
//   node scripts/demo.mjs [--out <file.xlsx>] [--no-build] [--quiet]
//
// Builds dist/ first when it is missing or older than the sources (unless --no-build).
// Exits 1 when a formula gives an error the scenario does not expect.
import { mkdirSync, readFileSync, statSync, writeFileSync } from 'node:fs';
import { register } from 'node:module';
import { pathToFileURL } from 'node:url';
import { dirname, relative, resolve } from 'node:path';
import ExcelJS from 'exceljs';
import { ensureBuilt, ROOT } from './lib/bundle.mjs';
import { isErrorValue, parseAddress, address } from './lib/formula.mjs';
import { errorsOf, evaluateSheet, layoutSheet } from './lib/workbook.mjs';
import { pinnedTableWorkbook } from './lib/demotable.mjs';
import { APPLICATION, toSavedForm } from './lib/saved-form.mjs';
import { scenario } from '../demo/scenario.mjs';

const started = process.hrtime.bigint();
const argv = process.argv.slice(2);
const opt = (name) => {
  const i = argv.indexOf(name);
  return i >= 0 ? argv[i + 1] : undefined;
};
const OUT = resolve(process.cwd(), opt('--out') ?? resolve(ROOT, 'demo/cellwright-demo.xlsx'));
const QUIET = argv.includes('--quiet');
const tty = process.stdout.isTTY && !process.env.NO_COLOR;
const bold = (s) => (tty ? `\x1b[1m${s}\x1b[22m` : s);
const dim = (s) => (tty ? `\x1b[2m${s}\x1b[22m` : s);
const out = (s = '') => {
  if (!QUIET) process.stdout.write(`${s}\n`);
};

/* ---------------------------------------------------------------------------------------- */
/* Formatting                                                                                */
/* ---------------------------------------------------------------------------------------- */

/** A value as the terminal shows it. */
export function formatValue(v, digits) {
  if (v === null || v === undefined) return '';
  if (isErrorValue(v)) return v.code;
  if (typeof v === 'boolean') return v ? 'TRUE' : 'FALSE';
  if (typeof v === 'string') return v;
  if (v === 0) return digits !== undefined ? (0).toFixed(digits) : '0';
  const a = Math.abs(v);
  if (digits !== undefined && a >= 10 ** -digits && a < 1e9) return v.toFixed(digits);
  if (a < 1e-3 || a >= 1e7) return v.toExponential(3).replace('e', 'E');
  return String(Number(v.toPrecision(5)));
}

/** The Excel number format matching formatValue. */
function numFmt(v, digits) {
  if (typeof v !== 'number' || v === 0) return digits !== undefined ? (digits ? `0.${'0'.repeat(digits)}` : '0') : undefined;
  const a = Math.abs(v);
  if (digits !== undefined && a >= 10 ** -digits && a < 1e9) return digits ? `0.${'0'.repeat(digits)}` : '0';
  if (a < 1e-3 || a >= 1e7) return '0.000E+00';
  return undefined;
}

const width = (s) => [...s].length;
const pad = (s, n) => s + ' '.repeat(Math.max(0, n - width(s)));
const padLeft = (s, n) => ' '.repeat(Math.max(0, n - width(s))) + s;

/* ---------------------------------------------------------------------------------------- */
/* Terminal                                                                                  */
/* ---------------------------------------------------------------------------------------- */

function printSheet(laid, ev) {
  const { sheet, cells } = laid;
  const value = (a) => {
    const { r, c } = parseAddress(a);
    const cell = cells.get(a);
    if (cell && cell.formula) {
      const v = ev.results.get(a);
      return Array.isArray(v) ? v[0][0] : v;
    }
    if (cell) return cell.value;
    const o = ev.owner.get(a);
    return o ? ev.results.get(o.addr)[r - o.r][c - o.c] : null;
  };
  out();
  out(bold(`━━ ${sheet.name} ━━ ${sheet.title}`));
  for (const line of sheet.intro ?? []) out(dim(`   ${line}`));
  const LABEL = 58;
  for (const b of laid.placed) {
    if (b.kind === 'section') {
      out();
      out(bold(`   ${b.section}`));
      if (b.text) out(`   ${b.text}`);
      out(dim(`   ${pad('cell', 5)}${pad('quantity', LABEL)} ${padLeft('value', 12)}  ${pad('unit', 10)}formula, or input`));
    } else if (b.kind === 'text') {
      out(dim(`   ${b.text}`));
    } else if (b.kind === 'quantity') {
      const a = address(b.row, 2);
      const cell = cells.get(a);
      const v = value(a);
      const shown = padLeft(formatValue(v, cell.digits), 12);
      const unit = pad(b.unit ?? '', 10);
      const label = width(b.label) > LABEL ? `${b.label}\n${' '.repeat(LABEL + 9)}` : pad(b.label, LABEL);
      const how = cell.formula ? `=${cell.formula}` : `input${b.note ? ` · ${b.note}` : ''}`;
      out(`   ${pad(a, 5)}${label} ${shown}  ${unit}${dim(how)}`);
      if (isErrorValue(v) && v.message) out(dim(`${' '.repeat(LABEL + 9)}${v.code}: ${v.message}${cell.expect ? ' (expected here)' : ''}`));
      if (b.note && cell.formula) out(dim(`${' '.repeat(LABEL + 9)}${b.note}`));
    } else if (b.kind === 'table' || b.kind === 'grid') {
      printGrid(laid, ev, b, value);
    }
  }
}

function printGrid(laid, ev, b, value) {
  const first = b.headerRow;
  const ncols = b.kind === 'grid' ? b.cols + 1 : b.columns.length;
  const nrows = b.rows;
  out();
  if (b.caption) out(bold(`   ${b.caption}`));
  const rows = [];
  for (let r = first; r <= first + nrows; r++) {
    const line = [];
    for (let c = 1; c <= ncols; c++) {
      const a = address(r, c);
      const cell = laid.cells.get(a);
      let digits = cell?.digits;
      if (digits === undefined) {
        // a spilled value takes the digits of its anchor
        const o = ev.owner.get(a);
        digits = o?.digits;
      }
      line.push(formatValue(value(a), digits));
    }
    rows.push(line);
  }
  const widths = [];
  for (let c = 0; c < ncols; c++) widths.push(Math.min(40, Math.max(...rows.map((l) => width(l[c])))));
  rows.forEach((l, i) => {
    const text = l
      .map((s, c) => {
        const t = width(s) > 40 ? `${[...s].slice(0, 39).join('')}…` : s;
        const numeric = i > 0 && /^[-+]?[\d.]+(E[-+]?\d+)?$/.test(t);
        return numeric ? padLeft(t, widths[c]) : pad(t, widths[c]);
      })
      .join('  ');
    out(`   ${i === 0 ? bold(text) : text}`);
  });
  // the formulas of this block, with the range each one filled
  for (const f of ev.formulas) {
    if (f.r < first || f.r > first + nrows || f.c > ncols) continue;
    const sp = ev.spills.get(f.addr);
    const range = sp ? `${f.addr}:${address(f.r + sp.rows - 1, f.c + sp.cols - 1)}` : f.addr;
    const note = sp ? ` (one formula, spilled ${sp.rows}×${sp.cols})` : '';
    out(dim(`   ${range} =${f.formula}${note}`));
    const v = ev.results.get(f.addr);
    const bad = (Array.isArray(v) ? v.flat() : [v]).find(isErrorValue);
    if (bad) out(dim(`     ${bad.code}${bad.message ? `: ${bad.message}` : ''}`));
  }
}

/* ---------------------------------------------------------------------------------------- */
/* Workbook                                                                                  */
/* ---------------------------------------------------------------------------------------- */

const FILL = {
  input: { type: 'pattern', pattern: 'solid', fgColor: { argb: 'FFFFF4CC' } },
  result: { type: 'pattern', pattern: 'solid', fgColor: { argb: 'FFE3F1E3' } },
  section: { type: 'pattern', pattern: 'solid', fgColor: { argb: 'FFDCE6F0' } },
};

function cached(v) {
  if (isErrorValue(v)) return { error: v.code };
  return v;
}

const WIDTHS = [58, 16, 16, 30, 18, 20, 16];
const LINE_PT = 15;

/** Lines a wrapped text takes in a column of the given width (Excel character units). */
function linesFor(text, width) {
  let n = 0;
  for (const para of String(text).split('\n')) n += Math.max(1, Math.ceil((para.length * 1.1) / Math.max(1, width - 1)));
  return n;
}

/** Page layout shared by every sheet: its own page width, print titles, header and footer. */
function setupPrint(ws, { landscape, titleRows, header, footer }) {
  ws.pageSetup = {
    paperSize: 9, // A4
    orientation: landscape ? 'landscape' : 'portrait',
    fitToPage: true, // the flag that makes fitToWidth / fitToHeight apply
    fitToWidth: 1,
    fitToHeight: 2, // shrinks a long sheet to two pages at most; a short one stays at one
    horizontalCentered: false,
    margins: { left: 0.5, right: 0.5, top: 0.75, bottom: 0.75, header: 0.3, footer: 0.3 },
    printTitlesRow: titleRows,
  };
  ws.headerFooter = { oddHeader: header, oddFooter: footer };
}

function writeSheet(wb, laid, ev, print) {
  const ws = wb.addWorksheet(laid.sheet.name, { views: [{ showGridLines: true }] });
  let lastCol = 4;
  for (const cell of laid.cells.values()) lastCol = Math.max(lastCol, cell.c);
  for (const [a, sp] of ev.spills) lastCol = Math.max(lastCol, parseAddress(a).c + sp.cols - 1);
  ws.columns = WIDTHS.map((width) => ({ width }));
  const used = WIDTHS.slice(0, lastCol).reduce((x, y) => x + y, 0);
  setupPrint(ws, { landscape: used > 110, titleRows: '1:1', ...print });
  const heights = new Map(); // row → lines
  const need = (r, lines) => heights.set(r, Math.max(heights.get(r) ?? 1, lines));
  for (const cell of laid.cells.values()) {
    const x = ws.getCell(cell.addr);
    if (cell.formula) {
      const v = ev.results.get(cell.addr);
      const sp = ev.spills.get(cell.addr);
      if (sp) {
        const ref = `${cell.addr}:${address(cell.r + sp.rows - 1, cell.c + sp.cols - 1)}`;
        x.value = { formula: cell.formula, result: cached(v[0][0]), shareType: 'array', ref };
        for (let i = 0; i < sp.rows; i++)
          for (let j = 0; j < sp.cols; j++) {
            const y = ws.getCell(cell.r + i, cell.c + j);
            if (i || j) y.value = cached(v[i][j]);
            y.fill = FILL.result;
            const f = numFmt(v[i][j], cell.digits);
            if (f) y.numFmt = f;
          }
      } else {
        x.value = { formula: cell.formula, result: cached(v) };
        x.fill = FILL.result;
        const f = numFmt(v, cell.digits);
        if (f) x.numFmt = f;
      }
      continue;
    }
    x.value = cell.value;
    switch (cell.role) {
      case 'title':
        x.font = { bold: true, size: 14 };
        break;
      case 'intro':
      case 'text': {
        x.font = { italic: true, color: { argb: 'FF444444' } };
        // a line of explanation spans the printed width and wraps there
        ws.mergeCells(cell.r, 1, cell.r, lastCol);
        x.alignment = { wrapText: true, vertical: 'top' };
        need(cell.r, linesFor(cell.value, used));
        break;
      }
      case 'label':
        x.alignment = { wrapText: true, vertical: 'top' };
        need(cell.r, linesFor(cell.value, WIDTHS[0]));
        break;
      case 'section':
        x.font = { bold: true };
        x.fill = FILL.section;
        x.alignment = { wrapText: true, vertical: 'top' };
        need(cell.r, linesFor(cell.value, laid.cells.has(address(cell.r, 2)) ? WIDTHS[0] : used));
        break;
      case 'header':
        x.font = { bold: true };
        x.border = { bottom: { style: 'thin' } };
        break;
      case 'input': {
        x.fill = FILL.input;
        if (cell.header) x.font = { bold: true };
        const f = numFmt(cell.value, cell.digits);
        if (f) x.numFmt = f;
        break;
      }
      case 'note':
        x.font = { color: { argb: 'FF555555' } };
        x.alignment = { wrapText: true, vertical: 'top' };
        need(cell.r, linesFor(cell.value, WIDTHS[cell.c - 1]));
        break;
      default:
    }
    if (cell.role === 'header') {
      x.alignment = { wrapText: true, vertical: 'bottom' };
      need(cell.r, linesFor(cell.value, WIDTHS[cell.c - 1] ?? 16));
    }
  }
  for (const [r, lines] of heights) {
    if (lines <= 1) continue;
    const row = ws.getRow(r);
    row.height = lines * LINE_PT;
    // label, value, unit and note of a tall row start on the same printed line
    row.eachCell((c) => {
      c.alignment = { ...(c.alignment ?? {}), vertical: 'top' };
    });
  }
  return ws;
}

function writeCover(wb, bundleInfo, print) {
  const ws = wb.addWorksheet('Cover');
  const COVER = 80;
  ws.columns = [{ width: COVER }];
  setupPrint(ws, { landscape: false, titleRows: undefined, ...print });
  let r = 1;
  const line = (text, style = {}) => {
    const row = r++;
    const c = ws.getCell(row, 1);
    c.value = text;
    c.alignment = { wrapText: true, vertical: 'top' };
    Object.assign(c, style);
    const size = style.font?.size ?? 11;
    ws.getRow(row).height = linesFor(text, (COVER * 11) / size) * Math.max(LINE_PT, size * 1.35);
  };
  const heading = (text) => {
    r++;
    line(text, { font: { bold: true, size: 12 } });
  };
  line(scenario.title, { font: { bold: true, size: 16 } });
  line('Every company, site, line and stack named in this workbook is invented.', { font: { italic: true } });
  heading('The scenario');
  for (const p of scenario.summary) line(p);
  heading('Sheets');
  for (const s of scenario.sheets) line(`${s.name}: ${s.title}`);
  heading('How to use this workbook');
  for (const p of scenario.howToUse) line(p);
  heading('Cautions');
  for (const p of scenario.cautions) line(p, { font: { bold: true, color: { argb: 'FF7A1010' } } });
  heading('Provenance');
  line(`Values computed by the Cellwright ${bundleInfo.version} functions bundle (${bundleInfo.count} worksheet functions) with the built-in potential table, by "npm run demo".`);
  return ws;
}

/* ---------------------------------------------------------------------------------------- */
/* Main                                                                                      */
/* ---------------------------------------------------------------------------------------- */

/** The checksum of the built-in potential table, as the pane and TABLEINFO report it. */
async function builtinTableChecksum() {
  register('./lib/ts-hooks.mjs', import.meta.url);
  const src = (p) => import(pathToFileURL(resolve(ROOT, p)).href);
  const [{ builtinChecksum }, { builtinTable }, { recordsOf }] = await Promise.all([src('src/store/stored.ts'), src('src/table/builtin.ts'), src('src/store/rows.ts')]);
  return builtinChecksum(recordsOf(builtinTable()));
}

async function main() {
  const buildNote = argv.includes('--no-build') ? 'dist/ was used as it is (--no-build).' : ensureBuilt({ quiet: QUIET });
  const afterBuild = process.hrtime.bigint();
  const buildSeconds = Number(afterBuild - started) / 1e9;
  // The workbook carries the built-in table pinned in its add-in settings, as Excel stores it; the
  // functions evaluate with that table in use, read the way the runtime reads it.
  const pinned = await pinnedTableWorkbook();
  const bundle = pinned.bundle;
  const version = JSON.parse(readFileSync(resolve(ROOT, 'package.json'), 'utf8')).version;
  out(bold(scenario.title));
  out(dim(`Functions bundle: dist/functions.js, ${bundle.metadata.functions.length} functions, loaded with only a CustomFunctions global. ${buildNote}`));
  out(dim('Every name in this scenario is invented; inputs are invented, results come from the bundle.'));

  const wb = new ExcelJS.Workbook();
  wb.creator = APPLICATION;
  wb.lastModifiedBy = APPLICATION;
  const checksum = await builtinTableChecksum();
  const amp = (s) => s.replace(/&/g, '&&');
  const print = {
    header: `&L&B&9${amp(scenario.title)}&R&9&A`,
    footer: `&L&7Potential table: built-in, checksum ${checksum}&R&8Page &P of &N`,
  };
  writeCover(wb, { version, count: bundle.metadata.functions.length }, print);

  let formulas = 0;
  let spilled = 0;
  const unexpected = [];
  const used = new Set();
  for (const sheet of scenario.sheets) {
    const laid = layoutSheet(sheet);
    const ev = await evaluateSheet(laid, bundle);
    formulas += ev.formulas.length;
    spilled += ev.spills.size;
    for (const f of ev.formulas) for (const m of f.formula.matchAll(/CELLWRIGHT\.([A-Z0-9]+)\(/g)) used.add(m[1]);
    for (const e of errorsOf(laid, ev)) if (!e.expected) unexpected.push({ sheet: sheet.name, ...e });
    printSheet(laid, ev);
    writeSheet(wb, laid, ev, print);
  }

  mkdirSync(dirname(OUT), { recursive: true });
  // exceljs writes legacy array formulas and plain namespace names; rewrite to the saved form,
  // then add the web-extension part that carries the pinned table
  const saved = await toSavedForm(await wb.xlsx.writeBuffer());
  writeFileSync(OUT, await pinned.attach(saved.bytes));
  const seconds = Number(process.hrtime.bigint() - afterBuild) / 1e9;
  const ids = bundle.metadata.functions.map((f) => f.id);
  const unused = ids.filter((id) => !used.has(id));
  const absent = [...used].filter((id) => !bundle.byId.has(id));
  out();
  out(bold('Summary'));
  out(`   ${scenario.sheets.length} sheets, ${formulas} formulas (${spilled} spilled), using ${ids.length - unused.length} of the bundle's ${ids.length} CELLWRIGHT functions.`);
  if (unused.length) out(`   Not used by the scenario: ${unused.join(', ')}.`);
  if (absent.length) out(`   Used by the scenario but not in this bundle: ${absent.join(', ')}.`);
  const build = buildSeconds >= 1 ? ` (plus ${buildSeconds.toFixed(0)} s to build the bundle)` : '';
  out(`   Evaluated and wrote ${relative(process.cwd(), OUT) || OUT} (${Math.round(statSync(OUT).size / 1024)} kB) in ${seconds.toFixed(1)} s${build}.`);
  if (unexpected.length) {
    out(bold(`   ${unexpected.length} formula(s) gave an error the scenario does not expect:`));
    for (const e of unexpected) out(`     ${e.sheet}!${e.addr} ${e.code}${e.message ? ` (${e.message})` : ''}: =${e.formula}`);
    process.exitCode = 1;
  } else {
    out('   No formula gave an unexpected error.');
  }
}

await main();
