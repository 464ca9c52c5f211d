// `cellwright check`: recomputes every formula of an .xlsx file outside Excel and compares each
// result with the value Excel (or the demo writer) cached in the file.
//
// - The add-in's functions run through the production bundle (dist/functions.js) with the table the
//   workbook carries in its add-in settings (web-extension part, key cellwright.potentialTable), read
//   and checked by the runtime's own reader; without one, the built-in table; or an exported CSV file.
// - Everything else (operators, native functions, references, ranges, other sheets, defined names)
//   runs through fast-formula-parser (MIT). A formula it cannot evaluate is reported, never skipped.
// - Formulas are found both as typed (CELLWRIGHT.NERNST() and in the form Excel saves a JavaScript
//   custom function (_xldudf_CELLWRIGHT_NERNST(), possibly behind a workbook or add-in prefix such
//   as [2]! left by another add-in): see DEVELOPERS.md, "cellwright check".
import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import ExcelJS from 'exceljs';
import FormulaParser from 'fast-formula-parser';
import { ROOT } from './bundle.mjs';
import { loadBundleWithTable } from './tablehost.mjs';
import { PINNED_DATA_KEY, TABLE_SETTING_KEY, manifestIdentity, readSetting } from './webextension.mjs';

const { FormulaError } = FormulaParser;
export const NAMESPACE = 'CELLWRIGHT';

/** The file cannot be read as a workbook, or its stored table cannot be read (exit 2). */
export class UnreadableError extends Error {}

/** A formula that cannot be evaluated, with the reason. */
class NotEvaluable extends Error {}

/* ------------------------------------------------------------------------------------------ */
/* Formula text                                                                                */
/* ------------------------------------------------------------------------------------------ */

/**
 * Excel saves a JavaScript custom function as _xldudf_<NAMESPACE>_<NAME> (the dot between namespace
 * and name becomes "_"); when another add-in or workbook took over the name it may be saved behind an
 * external prefix ("[2]!", "Some.xlam!"). New native functions are saved with _xlfn. / _xlws.
 * prefixes. This turns the saved form into the typed form, outside string literals.
 */
export function typedForm(formula) {
  const parts = formula.split('"');
  for (let i = 0; i < parts.length; i += 2) {
    parts[i] = parts[i]
      .replace(/(?:\[\d+\]!|'[^']*'!|[A-Za-z0-9_.]+\.xla[m]?!)?_xldudf_CELLWRIGHT_([A-Za-z0-9]+)(?=\s*\()/gi, (_, name) => `${NAMESPACE}.${name.toUpperCase()}`)
      .replace(/_xlfn\.|_xlws\./gi, '');
  }
  return parts.join('"');
}

/** True when a formula calls one of the add-in's functions (typed or saved form). */
export function isAddinFormula(formula) {
  return /\bCELLWRIGHT\.[A-Z0-9]+\s*\(|_xldudf_CELLWRIGHT_/i.test(formula);
}

/* ------------------------------------------------------------------------------------------ */
/* Values                                                                                      */
/* ------------------------------------------------------------------------------------------ */

const EXCEL_EPOCH_MS = Date.UTC(1899, 11, 30);
const ERROR_CODES = new Set(['#NULL!', '#DIV/0!', '#VALUE!', '#REF!', '#NAME?', '#NUM!', '#N/A', '#GETTING_DATA', '#SPILL!', '#CALC!', '#FIELD!', '#BLOCKED!', '#UNKNOWN!', '#BUSY!', '#CONNECT!', '#PYTHON!']);

/** A stored value as a plain value: number, text, boolean, null or { error: code }. */
function plain(v) {
  if (v === undefined || v === null) return null;
  if (v instanceof Date) return (v.getTime() - EXCEL_EPOCH_MS) / 86_400_000;
  if (typeof v !== 'object') return v;
  if ('error' in v) return { error: String(v.error) };
  if ('richText' in v) return v.richText.map((t) => t.text).join('');
  if ('text' in v && 'hyperlink' in v) return String(v.text);
  if ('formula' in v || 'sharedFormula' in v) return plain(v.result);
  return String(v);
}

/** A value as the report shows it. */
export function show(v) {
  if (v === null || v === undefined) return '(empty)';
  if (typeof v === 'object' && 'error' in v) return v.error;
  if (typeof v === 'string') return JSON.stringify(v);
  if (typeof v === 'boolean') return v ? 'TRUE' : 'FALSE';
  return String(v);
}

/** Stored and recomputed agree: numbers within the relative tolerance, everything else exactly. */
export function agrees(stored, recomputed, tolerance) {
  const a = stored === '' ? null : stored;
  const b = recomputed === '' ? null : recomputed;
  if (a === null || b === null) return a === b;
  if (typeof a === 'number' && typeof b === 'number') return a === b || Math.abs(a - b) <= tolerance * Math.max(Math.abs(a), Math.abs(b));
  if (typeof a === 'object' || typeof b === 'object') return typeof a === 'object' && typeof b === 'object' && a.error === b.error;
  return a === b;
}

/* ------------------------------------------------------------------------------------------ */
/* Addresses                                                                                   */
/* ------------------------------------------------------------------------------------------ */

function colName(c) {
  let s = '';
  for (let n = c; n > 0; n = Math.floor((n - 1) / 26)) s = String.fromCharCode(65 + ((n - 1) % 26)) + s;
  return s;
}
const addr = (r, c) => `${colName(c)}${r}`;
function parseAddr(a) {
  const m = /^\$?([A-Z]+)\$?(\d+)$/i.exec(a.trim());
  if (!m) return null;
  let c = 0;
  for (const ch of m[1].toUpperCase()) c = c * 26 + ch.charCodeAt(0) - 64;
  return { r: Number(m[2]), c };
}
const key = (sheet, r, c) => `${sheet.toLowerCase()}\u0000${r}\u0000${c}`;

/* ------------------------------------------------------------------------------------------ */
/* Array semantics                                                                             */
/* ------------------------------------------------------------------------------------------ */

const isGrid = (v) => Array.isArray(v) && Array.isArray(v[0]) && (v.length > 1 || v[0].length > 1);

/**
 * Excel's array rules for one operation over operands that may be arrays: a single value goes with
 * every element; equal shapes pair element by element; a single row or column stretches over the other
 * operand; positions outside a smaller operand give #N/A.
 */
function broadcast(operands, op) {
  const grids = operands.map((v) => (isGrid(v) ? v : null));
  let rows = 1;
  let cols = 1;
  for (const g of grids) {
    if (!g) continue;
    rows = Math.max(rows, g.length);
    cols = Math.max(cols, g[0].length);
  }
  const out = [];
  for (let r = 0; r < rows; r++) {
    const line = [];
    for (let c = 0; c < cols; c++) {
      let missing = false;
      const xs = operands.map((v, i) => {
        const g = grids[i];
        if (!g) return Array.isArray(v) ? v[0][0] : v;
        const rr = g.length === 1 ? 0 : r;
        const cc = g[0].length === 1 ? 0 : c;
        if (rr >= g.length || cc >= g[0].length) missing = true;
        return missing ? null : g[rr][cc];
      });
      line.push(missing ? new FormulaError('#N/A') : op(...xs));
    }
    out.push(line);
  }
  return out;
}

/**
 * fast-formula-parser applies operators and IF to the first element of an array; Excel (dynamic
 * arrays, and array formulas) applies them element by element. This gives one parser instance
 * Excel's behaviour: an operator with an array operand, and IF with an array condition, broadcast.
 */
function withArrays(p) {
  const u = p.utils;
  const infix = u._applyInfix.bind(u);
  const prefix = u._applyPrefix.bind(u);
  const postfix = u._applyPostfix.bind(u);
  u._applyInfix = (a, op, b) => {
    if (!isGrid(a.val) && !isGrid(b.val)) return infix(a, op, b);
    return broadcast([a.val, b.val], (x, y) => infix({ val: x, isArray: false }, op, { val: y, isArray: false }));
  };
  u._applyPrefix = (prefixes, val, isArray) => (isGrid(val) ? broadcast([val], (x) => prefix(prefixes, x, false)) : prefix(prefixes, val, isArray));
  u._applyPostfix = (val, isArray, op) => (isGrid(val) ? broadcast([val], (x) => postfix(x, false, op)) : postfix(val, isArray, op));
  const nativeIf = p.functions.IF;
  p.functions.IF = (context, ...args) => {
    const vals = args.map((a) => (a === null || a === undefined ? { val: undefined, isArray: false } : u.extractRefValue(a)));
    if (!vals.some((v) => isGrid(v.val))) return nativeIf(context, ...args);
    const pick = (cond, yes, no) => {
      if (cond instanceof FormulaError) return cond;
      let truth = cond;
      if (typeof cond === 'string') {
        const t = cond.toUpperCase();
        if (t !== 'TRUE' && t !== 'FALSE') return new FormulaError('#VALUE!');
        truth = t === 'TRUE';
      }
      const chosen = truth ? yes : no;
      if (chosen === undefined) return truth ? (args.length > 1 ? 0 : true) : false;
      return chosen === null ? 0 : chosen;
    };
    return broadcast(vals.map((v) => v.val), pick);
  };
  return p;
}

/* ------------------------------------------------------------------------------------------ */
/* The table                                                                                   */
/* ------------------------------------------------------------------------------------------ */

/**
 * The bundle with the table the check uses: --table CSV, else the workbook's stored table, else the
 * built-in table. A stored table that cannot be read is an UnreadableError (exit 2) with the reason.
 */
async function tableFor(buffer, { tableCsv, tableCsvName }) {
  if (tableCsv !== undefined && tableCsv !== null) {
    const { storedTextFromCsv } = await import('./storedtable.mjs');
    let text;
    try {
      text = await storedTextFromCsv(tableCsv);
    } catch (e) {
      throw new UnreadableError(`the table file ${tableCsvName ?? ''} cannot be used: ${e.message}`);
    }
    const { bundle, status } = await loadBundleWithTable(text);
    if (status.state !== 'workbook') throw new UnreadableError(`the table file ${tableCsvName ?? ''} cannot be used: ${status.reason}`);
    return { bundle, table: { origin: 'file', file: tableCsvName ?? null, ...tableFacts(status), note: `the table of ${tableCsvName ?? 'the given file'} (--table), not the workbook's` } };
  }
  let addinId;
  try {
    addinId = manifestIdentity(readFileSync(resolve(ROOT, 'manifest.xml'), 'utf8')).id;
  } catch {
    addinId = null;
  }
  let setting;
  let pinned;
  try {
    setting = await readSetting(buffer, TABLE_SETTING_KEY, addinId);
    if (!setting.found && addinId) setting = await readSetting(buffer, TABLE_SETTING_KEY, null);
    // The workbook's pinned data (atomic weights, species data, constants), when it carries any.
    pinned = await readSetting(buffer, PINNED_DATA_KEY, addinId);
    if (!pinned.found && addinId) pinned = await readSetting(buffer, PINNED_DATA_KEY, null);
  } catch (e) {
    throw new UnreadableError(`not an .xlsx file (${e.message})`);
  }
  const pinnedValue = pinned.found ? pinned.value : null;
  if (!setting.found) {
    const { bundle, status } = await loadBundleWithTable(null, undefined, pinnedValue);
    if (status.state === 'unreadable') throw new UnreadableError(`the workbook's pinned data (${pinned.part}) cannot be read: ${status.reason}`);
    return { bundle, table: { origin: 'built-in', ...tableFacts(status), note: "the workbook carries no potential table of its own: the add-in's built-in table was used" } };
  }
  const { bundle, status } = await loadBundleWithTable(setting.value, undefined, pinnedValue);
  if (status.state === 'unreadable') throw new UnreadableError(`the workbook's stored potential table (${setting.part}) cannot be read: ${status.reason}`);
  return { bundle, table: { origin: 'workbook', part: setting.part, ...tableFacts(status), note: `the workbook's own table (${setting.part}, setting ${TABLE_SETTING_KEY})` } };
}

function tableFacts(status) {
  return { version: status.version, revision: status.revision ?? null, checksum: status.checksum, couples: status.couples, electrodes: status.electrodes, dataset: status.dataset ?? null };
}

/* ------------------------------------------------------------------------------------------ */
/* The check                                                                                   */
/* ------------------------------------------------------------------------------------------ */

/**
 * Checks a workbook. `buffer` is the .xlsx file. Options: tolerance (relative, default 1e-9),
 * tableCsv (text of an exported table), onProgress(done, total).
 * Returns the report (see DEVELOPERS.md); throws UnreadableError when the file cannot be read.
 */
export async function checkWorkbook(buffer, { tolerance = 1e-9, tableCsv = null, tableCsvName = null, onProgress = null, collect = false } = {}) {
  const started = performance.now();
  const wb = new ExcelJS.Workbook();
  try {
    await wb.xlsx.load(buffer);
  } catch (e) {
    throw new UnreadableError(`not a readable .xlsx file (${String(e.message).split('\n')[0]})`);
  }
  const { bundle, table } = await tableFor(buffer, { tableCsv, tableCsvName });

  // Cells: constants and cached results; formulas with their text and array range.
  const values = new Map(); // key → plain value
  const formulas = []; // { sheet, r, c, address, formula, typed, ref: {r1,c1,r2,c2} | null }
  const formulaAt = new Map(); // key → formula record (anchors)
  const spillOwner = new Map(); // key → anchor record (cells of an array formula's range)
  const sheetNames = new Map(); // lower-case → name as written
  const unreadable = new Set(); // keys of formula cells whose text could not be read
  wb.eachSheet((ws) => {
    sheetNames.set(ws.name.toLowerCase(), ws.name);
    ws.eachRow({ includeEmpty: false }, (row, r) => {
      row.eachCell({ includeEmpty: false }, (cell, c) => {
        const v = cell.value;
        // a formula's cached result through cell.result: cell.value leaves out a cached 0
        values.set(key(ws.name, r, c), cell.type === ExcelJS.ValueType.Formula ? plain(cell.result) : plain(v));
        if (cell.type !== ExcelJS.ValueType.Formula) return;
        let text = cell.formula;
        if (typeof text !== 'string' || text === '') {
          // a formula cell whose text cannot be read (e.g. a shared formula the reader cannot translate):
          // listed as not evaluable, never skipped
          unreadable.add(key(ws.name, r, c));
          text = `(shared formula of ${v?.sharedFormula ?? 'an unknown cell'})`;
        }
        let ref = null;
        if (v && v.shareType === 'array' && typeof v.ref === 'string') {
          const [a, b] = v.ref.split(':').map(parseAddr);
          if (a) ref = { r1: a.r, c1: a.c, r2: (b ?? a).r, c2: (b ?? a).c };
        }
        const f = { sheet: ws.name, r, c, address: addr(r, c), formula: text, typed: typedForm(text), ref };
        formulas.push(f);
        formulaAt.set(key(ws.name, r, c), f);
      });
    });
  });
  for (const f of formulas) {
    if (!f.ref) continue;
    for (let r = f.ref.r1; r <= f.ref.r2; r++) for (let c = f.ref.c1; c <= f.ref.c2; c++) if (r !== f.r || c !== f.c) spillOwner.set(key(f.sheet, r, c), f);
  }

  // Defined names: workbook-wide ranges.
  const names = new Map();
  for (const d of wb.definedNames.model ?? []) {
    const range = (d.ranges ?? [])[0];
    if (!range) continue;
    const m = /^(?:'((?:[^']|'')+)'|([^!]+))!(\$?[A-Z]+\$?\d+)(?::(\$?[A-Z]+\$?\d+))?$/i.exec(range);
    if (!m) continue;
    const a = parseAddr(m[3]);
    const b = m[4] ? parseAddr(m[4]) : a;
    names.set(d.name.toLowerCase(), { sheet: (m[1] ?? m[2]).replace(/''/g, "'"), from: { row: a.r, col: a.c }, to: { row: b.r, col: b.c } });
  }

  // The add-in's functions, called like Excel calls them.
  const XError = bundle.sandbox.CustomFunctions.Error;
  const toAddin = (v) => {
    if (v instanceof FormulaError) return new XError(v.error, v.message);
    if (Array.isArray(v)) return v.map((row) => (Array.isArray(row) ? row.map(toAddin) : toAddin(row)));
    return v === undefined ? null : v;
  };
  const fromAddin = (v) => (v instanceof XError ? new FormulaError(v.code, v.message) : v);
  const functions = {};
  for (const meta of bundle.metadata.functions) {
    const id = meta.id;
    const count = meta.parameters.length;
    functions[`${NAMESPACE}.${id}`] = (...params) => {
      if (params.length > count) return new FormulaError('#VALUE!', `${NAMESPACE}.${id} takes ${count} arguments`);
      const args = params.map((p) => (p.omitted ? null : toAddin(p.value)));
      const out = bundle.call(id, ...args);
      if (out && typeof out.then === 'function') throw new NotEvaluable(`${NAMESPACE}.${id} answered asynchronously`);
      if (!Array.isArray(out)) return fromAddin(out);
      const grid = out.map((row) => row.map(fromAddin));
      return grid.length === 1 && grid[0].length === 1 ? grid[0][0] : grid;
    };
  }

  // Evaluation: each formula once, references to formula cells use their recomputed values.
  const results = new Map(); // anchor record → { value } | { notEvaluable: reason }
  const pending = new Set();
  const parsers = [];
  let depth = 0;
  const MAX_DEPTH = 400;

  const cellValue = (sheet, r, c) => {
    const k = key(sheet, r, c);
    const f = formulaAt.get(k);
    if (f) {
      const res = evaluate(f);
      if ('notEvaluable' in res) throw new NotEvaluable(`it depends on ${f.sheet}!${f.address}, which cannot be evaluated`);
      return Array.isArray(res.value) ? res.value[0][0] : res.value;
    }
    const owner = spillOwner.get(k);
    if (owner) {
      const res = evaluate(owner);
      if ('notEvaluable' in res) throw new NotEvaluable(`it depends on ${owner.sheet}!${owner.address}, which cannot be evaluated`);
      const v = res.value;
      if (!Array.isArray(v)) return null;
      return v[r - owner.r]?.[c - owner.c] ?? new FormulaError('#N/A');
    }
    const v = values.get(k);
    if (v === undefined) return null;
    return v !== null && typeof v === 'object' ? new FormulaError(v.error) : v;
  };
  const sheetOf = (s, here) => {
    if (!s) return here;
    const name = sheetNames.get(String(s).toLowerCase());
    if (!name) throw new NotEvaluable(`it refers to a sheet "${s}" that the workbook does not have`);
    return name;
  };
  const parser = () => {
    if (!parsers[depth]) {
      parsers[depth] = withArrays(new FormulaParser({
        functions,
        onCell: ({ sheet, row, col }) => cellValue(sheetOf(sheet, current[depth - 1]), row, col),
        onRange: (ref) => {
          const sheet = sheetOf(ref.sheet, current[depth - 1]);
          const out = [];
          for (let r = ref.from.row; r <= ref.to.row; r++) {
            const line = [];
            for (let c = ref.from.col; c <= ref.to.col; c++) line.push(cellValue(sheet, r, c));
            out.push(line);
          }
          return out;
        },
        onVariable: (name) => {
          const n = names.get(String(name).toLowerCase());
          if (!n) throw new NotEvaluable(`it uses the name "${name}", which the workbook does not define`);
          return { sheet: n.sheet, from: n.from, to: n.to };
        },
      }));
    }
    return parsers[depth];
  };
  const current = [];

  function evaluate(f) {
    const done = results.get(f);
    if (done) return done;
    if (unreadable.has(key(f.sheet, f.r, f.c))) {
      const res = { notEvaluable: 'the formula text could not be read from the file' };
      results.set(f, res);
      return res;
    }
    if (pending.has(f)) return { notEvaluable: 'circular reference' };
    if (depth >= MAX_DEPTH) return { notEvaluable: `its chain of references is deeper than ${MAX_DEPTH} formulas` };
    pending.add(f);
    current[depth] = f.sheet;
    const p = parser();
    depth++;
    let res;
    try {
      const v = p.parse(f.typed, { sheet: f.sheet, row: f.r, col: f.c }, true);
      res = { value: normalise(v) };
    } catch (e) {
      const inner = e && e.details instanceof Error ? e.details : e;
      const why = inner instanceof NotEvaluable ? inner.message : String(inner?.message ?? inner).split('\n')[0].trim() || 'the formula cannot be read';
      res = { notEvaluable: why };
    } finally {
      depth--;
      pending.delete(f);
    }
    results.set(f, res);
    return res;
  }

  function normalise(v) {
    if (v instanceof FormulaError) return { error: v.error };
    if (Array.isArray(v)) {
      const grid = Array.isArray(v[0]) ? v : [v];
      return grid.map((row) => row.map((x) => normalise(x)));
    }
    if (v === undefined) return null;
    if (typeof v === 'number' && !Number.isFinite(v)) return { error: '#NUM!' };
    return v;
  }

  // Check every formula.
  const differing = [];
  const notEvaluable = [];
  let agree = 0;
  let addinFormulas = 0;
  const total = formulas.length;
  for (let i = 0; i < total; i++) {
    const f = formulas[i];
    if (isAddinFormula(f.formula)) addinFormulas++;
    const res = evaluate(f);
    if (onProgress && (i % 500 === 0 || i === total - 1)) onProgress(i + 1, total);
    const where = { sheet: f.sheet, address: f.address, formula: `=${f.formula}` };
    if ('notEvaluable' in res) {
      notEvaluable.push({ ...where, reason: res.notEvaluable });
      continue;
    }
    const bad = [];
    if (f.ref) {
      const rows = f.ref.r2 - f.ref.r1 + 1;
      const cols = f.ref.c2 - f.ref.c1 + 1;
      const grid = Array.isArray(res.value) ? res.value : [[res.value]];
      for (let r = 0; r < rows; r++)
        for (let c = 0; c < cols; c++) {
          const stored = values.get(key(f.sheet, f.r + r, f.c + c)) ?? null;
          const got = grid[r]?.[c] ?? (grid.length === 1 && grid[0].length === 1 ? grid[0][0] : { error: '#N/A' });
          if (!agrees(stored, got, tolerance)) bad.push({ address: addr(f.r + r, f.c + c), stored, recomputed: got });
        }
      if (grid.length > rows || grid[0].length > cols) bad.push({ address: `${f.address}:${addr(f.ref.r2, f.ref.c2)}`, stored: `${rows}×${cols} cells`, recomputed: `${grid.length}×${grid[0].length} cells` });
    } else {
      const stored = values.get(key(f.sheet, f.r, f.c)) ?? null;
      const got = Array.isArray(res.value) ? res.value[0][0] : res.value;
      if (!agrees(stored, got, tolerance)) bad.push({ address: f.address, stored, recomputed: got });
    }
    if (bad.length === 0) agree++;
    else for (const b of bad) differing.push({ ...where, address: b.address, anchor: f.address, stored: b.stored, recomputed: b.recomputed });
  }
  const differingFormulas = new Set(differing.map((d) => `${d.sheet}!${d.anchor}`)).size;
  // collect: the recomputed value of every formula cell (spilled cells included), for callers that show them
  let collected;
  if (collect) {
    collected = new Map();
    for (const f of formulas) {
      const res = results.get(f);
      const v = 'value' in res ? res.value : { error: 'not evaluable' };
      if (Array.isArray(v)) v.forEach((row, i) => row.forEach((x, j) => collected.set(`${f.sheet}!${addr(f.r + i, f.c + j)}`, x)));
      else collected.set(`${f.sheet}!${f.address}`, v);
    }
  }
  const seconds = (performance.now() - started) / 1000;
  return {
    table,
    tolerance,
    counts: { formulas: total, addinFormulas, agreeing: agree, differing: differingFormulas, notEvaluable: notEvaluable.length, sheets: sheetNames.size },
    differing,
    notEvaluable,
    ...(collect ? { values: collected } : {}),
    seconds,
    ok: differing.length === 0 && notEvaluable.length === 0,
  };
}

/** The report as lines of text. */
export function reportLines(report, file) {
  const t = report.table;
  const L = [];
  L.push(`cellwright check ${file}`);
  L.push(`Potential table: ${t.origin}${t.version ? `, version ${t.version}` : ''}${t.revision ? `, revision ${t.revision}` : ''}, checksum ${t.checksum}`);
  L.push(`  (${t.note})`);
  if (t.dataset) L.push(`Data set: version ${t.dataset.version}, checksum ${t.dataset.checksum}; pinned in the workbook: ${t.dataset.pinned.length === 0 ? 'none' : t.dataset.pinned.join(', ')}`);
  const c = report.counts;
  L.push(`Formulas: ${c.formulas} on ${c.sheets} sheet(s), ${c.addinFormulas} calling ${NAMESPACE} functions.`);
  L.push(`Agreeing: ${c.agreeing}. Differing: ${c.differing}. Not evaluable: ${c.notEvaluable}. (numbers within a relative ${report.tolerance}; texts and error codes exactly)`);
  if (report.differing.length) {
    L.push('');
    L.push('Differing cells:');
    for (const d of report.differing) L.push(`  ${d.sheet}!${d.address}  ${d.formula}\n      stored ${show(d.stored)}, recomputed ${show(d.recomputed)}`);
  }
  if (report.notEvaluable.length) {
    L.push('');
    L.push('Not evaluable:');
    for (const d of report.notEvaluable) L.push(`  ${d.sheet}!${d.address}  ${d.formula}\n      ${d.reason}`);
  }
  L.push('');
  L.push(report.ok ? `Everything agrees (${report.seconds.toFixed(1)} s).` : `The workbook does NOT agree with a recalculation (${report.seconds.toFixed(1)} s).`);
  return L;
}

export { ERROR_CODES };
