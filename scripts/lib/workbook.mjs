// Lays out the demo scenario's sheets on a grid of cells and evaluates their formulas through the
// functions bundle (spilled results included).
//
// A sheet of the scenario (demo/scenario.mjs) is a title, intro lines and a list of blocks:
//   { section, text? }                         a heading row (columns: value, unit, note)
//   { key?, label, value | formula, unit?, note?, digits?, expect? }
//                                              (a formula is written with its leading "=", and
//                                              stored without it, as in the file format)
//                                              one quantity: label in A, value in B, unit in C,
//                                              note in D; `expect` names an error code the
//                                              formula is meant to show (a worked error)
//   { text }                                   a line of explanation
//   { table, columns: [...], caption? }        a table: a header row, then one row per value;
//        a column is { key, header, unit?, values } (inputs), { key, header, unit?, formula,
//        digits? } (one formula at the top of the column that spills down or right), or
//        { header, unit?, spill: true } (filled by the spill of the column to its left)
//   { grid, corner, rows: {values, unit?}, cols: {values, unit?}, formula, unit?, digits? }
//                                              a what-if table: one formula at the first data
//                                              cell, spilling over rows × columns
// Formulas are written with placeholders that the layout turns into cell addresses:
//   {key} → the value cell of a quantity; {table.col} → that column's data range;
//   {table.col#3} → its third cell; {grid.rows} / {grid.cols} → the row / column headers.
import { address, evaluate, FormulaError, isErrorValue, parseFormula, unwrap } from './formula.mjs';

export const COLS = { label: 1, value: 2, unit: 3, note: 4 };

/** Lays out one sheet: returns { sheet, cells: Map(address → cell), placed: [blocks with rows] }. */
export function layoutSheet(sheet) {
  const cells = new Map();
  const names = new Map(); // placeholder → address or range
  const placed = [];
  const put = (r, c, cell) => {
    const a = address(r, c);
    if (cells.has(a)) throw new Error(`${sheet.name}!${a} is laid out twice`);
    cells.set(a, { r, c, addr: a, ...cell });
    return a;
  };
  let r = 1;
  put(r++, 1, { value: sheet.title, role: 'title' });
  for (const line of sheet.intro ?? []) put(r++, 1, { value: line, role: 'intro' });
  const pending = []; // formulas whose placeholders are resolved after the layout

  for (const block of sheet.blocks) {
    if (block.section !== undefined) {
      r++;
      put(r, 1, { value: block.section, role: 'section' });
      put(r, 2, { value: 'Value', role: 'header' });
      put(r, 3, { value: 'Unit', role: 'header' });
      put(r, 4, { value: 'Note', role: 'header' });
      placed.push({ ...block, kind: 'section', row: r });
      r++;
      if (block.text) {
        put(r, 1, { value: block.text, role: 'text' });
        r++;
      }
    } else if (block.text !== undefined) {
      put(r, 1, { value: block.text, role: 'text' });
      placed.push({ ...block, kind: 'text', row: r });
      r++;
    } else if (block.table !== undefined) {
      r++;
      if (block.caption) {
        put(r, 1, { value: block.caption, role: 'section' });
        r++;
      }
      const headerRow = r;
      const n = Math.max(...block.columns.map((c) => (c.values ? c.values.length : 0)));
      block.columns.forEach((col, j) => {
        put(headerRow, j + 1, { value: col.unit ? `${col.header} (${col.unit})` : col.header, role: 'header' });
        if (col.key) {
          names.set(`${block.table}.${col.key}`, `${address(headerRow + 1, j + 1)}:${address(headerRow + n, j + 1)}`);
          for (let i = 1; i <= n; i++) names.set(`${block.table}.${col.key}#${i}`, address(headerRow + i, j + 1));
        }
        if (col.values) col.values.forEach((v, i) => put(headerRow + 1 + i, j + 1, { value: v, role: 'input', digits: col.digits }));
        if (col.formula) pending.push({ r: headerRow + 1, c: j + 1, formula: col.formula, digits: col.digits, unit: col.unit, label: col.header, expect: col.expect });
      });
      placed.push({ ...block, kind: 'table', headerRow, rows: n });
      r = headerRow + n + 1;
    } else if (block.grid !== undefined) {
      r++;
      const headerRow = r;
      const nr = block.rows.values.length;
      const nc = block.cols.values.length;
      put(headerRow, 1, { value: block.corner, role: 'header' });
      block.cols.values.forEach((v, j) => put(headerRow, 2 + j, { value: v, role: 'input', header: true, digits: block.cols.digits }));
      block.rows.values.forEach((v, i) => put(headerRow + 1 + i, 1, { value: v, role: 'input', digits: block.rows.digits }));
      names.set(`${block.grid}.rows`, `${address(headerRow + 1, 1)}:${address(headerRow + nr, 1)}`);
      names.set(`${block.grid}.cols`, `${address(headerRow, 2)}:${address(headerRow, 1 + nc)}`);
      pending.push({ r: headerRow + 1, c: 2, formula: block.formula, digits: block.digits, unit: block.unit, label: block.corner });
      placed.push({ ...block, kind: 'grid', headerRow, rows: nr, cols: nc });
      r = headerRow + nr + 1;
    } else {
      // a quantity
      if (block.key) names.set(block.key, address(r, COLS.value));
      put(r, COLS.label, { value: block.label, role: 'label' });
      if (block.formula !== undefined) {
        pending.push({ r, c: COLS.value, formula: block.formula, digits: block.digits, unit: block.unit, label: block.label, expect: block.expect });
      } else {
        put(r, COLS.value, { value: block.value, role: 'input', digits: block.digits });
      }
      if (block.unit) put(r, COLS.unit, { value: block.unit, role: 'unit' });
      if (block.note) put(r, COLS.note, { value: block.note, role: 'note' });
      placed.push({ ...block, kind: 'quantity', row: r });
      r++;
    }
  }

  for (const p of pending) {
    const text = p.formula.replace(/^=/, '').replace(/\{([A-Za-z0-9_.#]+)\}/g, (_, name) => {
      const a = names.get(name);
      if (!a) throw new Error(`${sheet.name}: formula ${p.formula} names {${name}}, which is not laid out`);
      return a;
    });
    put(p.r, p.c, { formula: text, tree: parseFormula(text), role: 'result', digits: p.digits, unit: p.unit, label: p.label, expect: p.expect });
  }
  return { sheet, cells, placed, lastRow: r };
}

/**
 * Evaluates every formula of a laid-out sheet. `bundle` is a loaded bundle ({ call, byId }).
 * Returns { results: Map(anchor address → value or 2-D array), spills: Map(anchor → {rows, cols}),
 * valueAt(r, c) }.
 */
export async function evaluateSheet(laid, bundle) {
  const formulas = [...laid.cells.values()].filter((c) => c.formula).sort((a, b) => a.r - b.r || a.c - b.c);
  const state = new Map();
  const results = new Map();
  const spills = new Map();
  const owner = new Map(); // address inside a spill (not the anchor) → anchor cell

  const ctx = {
    known: (id) => bundle.byId.has(id),
    dimensionality: (id, i) => bundle.byId.get(id)?.parameters[i]?.dimensionality,
    call: (id, args) => bundle.call(id, ...args),
    cell: (r, c) => valueAt(r, c),
  };

  async function run(cell) {
    const s = state.get(cell.addr);
    if (s === 'done') return;
    if (s === 'pending') throw new CircularError(cell.addr);
    state.set(cell.addr, 'pending');
    let v;
    try {
      v = unwrap(await evaluate(cell.tree, ctx));
    } catch (e) {
      if (e instanceof CircularError) v = new FormulaError('#REF!', `circular reference through ${e.at}`);
      else if (e instanceof SyntaxError) v = new FormulaError('#NAME?', e.message);
      else throw e;
    }
    if (Array.isArray(v)) {
      const rows = v.length;
      const cols = v[0].length;
      const blocked = [];
      for (let i = 0; i < rows; i++)
        for (let j = 0; j < cols; j++) {
          if (i === 0 && j === 0) continue;
          const a = address(cell.r + i, cell.c + j);
          if (laid.cells.has(a) || owner.has(a)) blocked.push(a);
        }
      if (blocked.length) v = new FormulaError('#SPILL!', `the result (${rows}×${cols}) would cover ${blocked.join(', ')}`);
      else {
        spills.set(cell.addr, { rows, cols });
        for (let i = 0; i < rows; i++)
          for (let j = 0; j < cols; j++) if (i || j) owner.set(address(cell.r + i, cell.c + j), cell);
      }
    }
    results.set(cell.addr, v);
    state.set(cell.addr, 'done');
  }

  async function valueAt(r, c) {
    const a = address(r, c);
    const cell = laid.cells.get(a);
    if (cell && cell.formula) {
      await run(cell);
      const v = results.get(a);
      return Array.isArray(v) ? v[0][0] : v;
    }
    if (cell) return cell.value ?? null;
    if (!owner.has(a)) {
      // it may lie in the spill of a formula above or to the left that has not run yet
      for (const f of formulas) if (f.r <= r && f.c <= c && !state.has(f.addr)) await run(f);
    }
    const o = owner.get(a);
    if (!o) return null;
    return results.get(o.addr)[r - o.r][c - o.c];
  }

  for (const f of formulas) await run(f);
  return { results, spills, owner, valueAt, formulas };
}

class CircularError extends Error {
  constructor(at) {
    super(`circular reference through ${at}`);
    this.at = at;
  }
}

/** Every error value in an evaluated sheet, as { addr, formula, code, message, expected }. */
export function errorsOf(laid, evaluated) {
  const out = [];
  for (const f of evaluated.formulas) {
    const v = evaluated.results.get(f.addr);
    const cells = Array.isArray(v) ? v.flat() : [v];
    const bad = cells.filter(isErrorValue);
    if (bad.length) out.push({ addr: f.addr, formula: f.formula, code: bad[0].code, message: bad[0].message, count: bad.length, expected: f.expect === bad[0].code });
  }
  return out;
}

