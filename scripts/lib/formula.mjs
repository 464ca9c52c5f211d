// A small formula evaluator for the demo workbook (scripts/lib/workbook.mjs checks each stored
// value against it) and the demo test.
//
// It understands only the forms the demo uses, and says so when it meets
// anything else (an error, never a guess):
//   numbers, "text" (with "" for a quote), TRUE/FALSE, array constants {1,2;3,4},
//   cell references (A1, $A$1) and ranges (A1:B3) on the same sheet,
//   + - * / ^ & = <> < <= > >= with Excel's precedence (unary minus binds tightest),
//   element-by-element over arrays with Excel's broadcasting (a single row or column is
//   repeated; cells outside the smaller shape become #N/A),
//   CELLWRIGHT.<ID>(…) calls (empty arguments are omitted ones), and IF, ABS, MIN, MAX.
// Values are scalars (number, string, boolean, null for an empty cell, an error value) or 2-D
// arrays of them. An error value is any object whose `code` is a string starting with "#".

/** The evaluator's own error values (the bundle's are recognised by their code). */
export class FormulaError {
  constructor(code, message) {
    this.code = code;
    this.message = message;
  }
}

export function isErrorValue(v) {
  return typeof v === 'object' && v !== null && !Array.isArray(v) && typeof v.code === 'string' && v.code.startsWith('#');
}

/* ---------------------------------------------------------------------------------------- */
/* Addresses                                                                                 */
/* ---------------------------------------------------------------------------------------- */

/** Column letters of a 1-based column number (1 → A, 27 → AA). */
export function colName(c) {
  let s = '';
  for (let n = c; n > 0; n = Math.floor((n - 1) / 26)) s = String.fromCharCode(65 + ((n - 1) % 26)) + s;
  return s;
}

/** "B7" from 1-based row and column. */
export function address(r, c) {
  return `${colName(c)}${r}`;
}

/** { r, c } (1-based) of an address such as "B7" or "$B$7". */
export function parseAddress(a) {
  const m = /^\$?([A-Z]{1,3})\$?(\d+)$/.exec(a.toUpperCase());
  if (!m) throw new Error(`not a cell address: ${a}`);
  let c = 0;
  for (const ch of m[1]) c = c * 26 + (ch.charCodeAt(0) - 64);
  return { r: Number(m[2]), c };
}

/* ---------------------------------------------------------------------------------------- */
/* Tokens and parsing                                                                        */
/* ---------------------------------------------------------------------------------------- */

const TOKEN = new RegExp(
  [
    '(?<ws>\\s+)',
    '(?<str>"(?:[^"]|"")*")',
    '(?<range>\\$?[A-Z]{1,3}\\$?\\d+:\\$?[A-Z]{1,3}\\$?\\d+)',
    '(?<name>[A-Za-z_][A-Za-z0-9_.]*)(?=\\s*\\()',
    '(?<ref>\\$?[A-Z]{1,3}\\$?\\d+)(?![A-Za-z0-9_.(])',
    '(?<bool>TRUE|FALSE)(?![A-Za-z0-9_.(])',
    '(?<num>(?:\\d+\\.?\\d*|\\.\\d+)(?:[eE][+-]?\\d+)?)',
    '(?<op><>|<=|>=|[-+*/^&=<>(),;{}])',
  ].join('|'),
  'y',
);

function tokenize(text) {
  const tokens = [];
  TOKEN.lastIndex = 0;
  let pos = 0;
  while (pos < text.length) {
    TOKEN.lastIndex = pos;
    const m = TOKEN.exec(text);
    if (!m) throw new SyntaxError(`cannot read the formula at "${text.slice(pos, pos + 12)}"`);
    pos = TOKEN.lastIndex;
    const g = m.groups;
    if (g.ws) continue;
    if (g.str) tokens.push({ t: 'str', v: g.str.slice(1, -1).replace(/""/g, '"') });
    else if (g.range) tokens.push({ t: 'range', v: g.range.toUpperCase() });
    else if (g.name) tokens.push({ t: 'name', v: g.name.toUpperCase() });
    else if (g.ref) tokens.push({ t: 'ref', v: g.ref.toUpperCase() });
    else if (g.bool) tokens.push({ t: 'bool', v: g.bool === 'TRUE' });
    else if (g.num) tokens.push({ t: 'num', v: Number(g.num) });
    else tokens.push({ t: 'op', v: g.op });
  }
  return tokens;
}

/**
 * Parses a formula ("=…" or without the "=") into a tree of nodes:
 * num, str, bool, ref {r,c}, range {r1,c1,r2,c2}, array {rows}, neg, bin {op,a,b},
 * call {name, args (null for an omitted argument)}.
 */
export function parseFormula(text) {
  const src = text.startsWith('=') ? text.slice(1) : text;
  const tk = tokenize(src);
  let i = 0;
  const peek = () => tk[i];
  const isOp = (v) => tk[i] && tk[i].t === 'op' && tk[i].v === v;
  const expect = (v) => {
    if (!isOp(v)) throw new SyntaxError(`expected "${v}" in ${text}`);
    i++;
  };

  const LEVELS = [['=', '<>', '<', '<=', '>', '>='], ['&'], ['+', '-'], ['*', '/'], ['^']];
  const binary = (level) => {
    if (level === LEVELS.length) return unary();
    let a = binary(level + 1);
    while (tk[i] && tk[i].t === 'op' && LEVELS[level].includes(tk[i].v)) {
      const op = tk[i++].v;
      a = { k: 'bin', op, a, b: binary(level + 1) };
    }
    return a;
  };
  const unary = () => {
    if (isOp('-')) {
      i++;
      return { k: 'neg', a: unary() };
    }
    if (isOp('+')) {
      i++;
      return unary();
    }
    return primary();
  };
  const constant = () => {
    let sign = 1;
    if (isOp('-')) {
      i++;
      sign = -1;
    }
    const t = tk[i++];
    if (!t) throw new SyntaxError(`unfinished array constant in ${text}`);
    if (t.t === 'num') return sign * t.v;
    if (sign === 1 && t.t === 'str') return t.v;
    if (sign === 1 && t.t === 'bool') return t.v;
    throw new SyntaxError(`an array constant holds numbers, text or TRUE/FALSE (in ${text})`);
  };
  const primary = () => {
    const t = peek();
    if (!t) throw new SyntaxError(`unexpected end of ${text}`);
    i++;
    switch (t.t) {
      case 'num':
        return { k: 'num', v: t.v };
      case 'str':
        return { k: 'str', v: t.v };
      case 'bool':
        return { k: 'bool', v: t.v };
      case 'ref':
        return { k: 'ref', ...parseAddress(t.v) };
      case 'range': {
        const [p, q] = t.v.split(':').map(parseAddress);
        return { k: 'range', r1: Math.min(p.r, q.r), c1: Math.min(p.c, q.c), r2: Math.max(p.r, q.r), c2: Math.max(p.c, q.c) };
      }
      case 'name': {
        expect('(');
        const args = [];
        if (isOp(')')) {
          i++;
          return { k: 'call', name: t.v, args };
        }
        for (;;) {
          if (isOp(',') || isOp(')')) args.push(null);
          else args.push(binary(0));
          if (isOp(',')) {
            i++;
            continue;
          }
          expect(')');
          return { k: 'call', name: t.v, args };
        }
      }
      case 'op':
        if (t.v === '(') {
          const e = binary(0);
          expect(')');
          return e;
        }
        if (t.v === '{') {
          const rows = [[]];
          for (;;) {
            rows[rows.length - 1].push(constant());
            if (isOp(',')) i++;
            else if (isOp(';')) {
              i++;
              rows.push([]);
            } else {
              expect('}');
              break;
            }
          }
          if (rows.some((r) => r.length !== rows[0].length)) throw new SyntaxError(`array constant rows of different lengths in ${text}`);
          return { k: 'array', rows };
        }
        throw new SyntaxError(`unexpected "${t.v}" in ${text}`);
      default:
        throw new SyntaxError(`unexpected token in ${text}`);
    }
  };

  const tree = binary(0);
  if (i !== tk.length) throw new SyntaxError(`unexpected "${tk[i].v}" in ${text}`);
  return tree;
}

/** Every CELLWRIGHT function id a formula calls (for coverage checks). */
export function cellwrightCalls(tree, out = new Set()) {
  if (tree === null || typeof tree !== 'object') return out;
  if (tree.k === 'call' && tree.name.startsWith('CELLWRIGHT.')) out.add(tree.name.slice('CELLWRIGHT.'.length));
  for (const key of ['a', 'b']) if (tree[key]) cellwrightCalls(tree[key], out);
  if (tree.args) for (const a of tree.args) cellwrightCalls(a, out);
  return out;
}

/* ---------------------------------------------------------------------------------------- */
/* Evaluation                                                                                */
/* ---------------------------------------------------------------------------------------- */

const isArray = Array.isArray;

/** A 1×1 array becomes its value; anything else is returned as it is. */
export function unwrap(v) {
  return isArray(v) && v.length === 1 && isArray(v[0]) && v[0].length === 1 ? v[0][0] : v;
}

function asNumber(v) {
  if (isErrorValue(v)) return v;
  if (v === null || v === undefined) return 0;
  if (typeof v === 'number') return v;
  if (typeof v === 'boolean') return v ? 1 : 0;
  if (typeof v === 'string' && /^\s*[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?\s*$/.test(v)) return Number(v);
  return new FormulaError('#VALUE!', `${JSON.stringify(v)} is not a number`);
}

function numeric(f) {
  return (x, y) => {
    const a = asNumber(x);
    if (isErrorValue(a)) return a;
    const b = asNumber(y);
    if (isErrorValue(b)) return b;
    const r = f(a, b);
    if (r === null) return new FormulaError('#DIV/0!', 'division by zero');
    return Number.isFinite(r) ? r : new FormulaError('#NUM!', 'a result outside the range of numbers');
  };
}

function compare(f) {
  return (x, y) => {
    if (isErrorValue(x)) return x;
    if (isErrorValue(y)) return y;
    const a = x ?? 0;
    const b = y ?? 0;
    if (typeof a === 'number' && typeof b === 'number') return f(a === b ? 0 : a < b ? -1 : 1);
    if (typeof a === 'string' && typeof b === 'string') {
      const p = a.toLowerCase();
      const q = b.toLowerCase();
      return f(p === q ? 0 : p < q ? -1 : 1);
    }
    if (typeof a === 'boolean' && typeof b === 'boolean') return f(a === b ? 0 : a ? 1 : -1);
    return new FormulaError('#VALUE!', 'comparison of a number with text');
  };
}

const BINARY = {
  '+': numeric((a, b) => a + b),
  '-': numeric((a, b) => a - b),
  '*': numeric((a, b) => a * b),
  '/': numeric((a, b) => (b === 0 ? null : a / b)),
  '^': numeric((a, b) => a ** b),
  '&': (x, y) => (isErrorValue(x) ? x : isErrorValue(y) ? y : `${show(x)}${show(y)}`),
  '=': compare((s) => s === 0),
  '<>': compare((s) => s !== 0),
  '<': compare((s) => s < 0),
  '<=': compare((s) => s <= 0),
  '>': compare((s) => s > 0),
  '>=': compare((s) => s >= 0),
};

function show(v) {
  if (v === null || v === undefined) return '';
  if (typeof v === 'boolean') return v ? 'TRUE' : 'FALSE';
  return String(v);
}

/** Applies f element by element over any number of scalar-or-array values (Excel broadcasting). */
export function broadcast(values, f) {
  if (!values.some(isArray)) return f(...values);
  const dims = values.map((v) => (isArray(v) ? [v.length, v[0].length] : [1, 1]));
  const rows = Math.max(...dims.map((d) => d[0]));
  const cols = Math.max(...dims.map((d) => d[1]));
  const out = [];
  for (let r = 0; r < rows; r++) {
    const line = [];
    for (let c = 0; c < cols; c++) {
      let missing = false;
      const args = values.map((v, k) => {
        if (!isArray(v)) return v;
        const [vr, vc] = dims[k];
        const rr = vr === 1 ? 0 : r;
        const cc = vc === 1 ? 0 : c;
        if (rr >= vr || cc >= vc) missing = true;
        return missing ? null : v[rr][cc];
      });
      line.push(missing ? new FormulaError('#N/A', 'outside the smaller of two arrays') : f(...args));
    }
    out.push(line);
  }
  return out;
}

function truthy(v) {
  if (isErrorValue(v)) return v;
  if (typeof v === 'boolean') return v;
  if (typeof v === 'number') return v !== 0;
  if (v === null || v === undefined) return false;
  return new FormulaError('#VALUE!', `${JSON.stringify(v)} is not TRUE or FALSE`);
}

function flatNumbers(values) {
  const out = [];
  for (const v of values) {
    const cells = isArray(v) ? v.flat() : [v];
    for (const x of cells) {
      if (isErrorValue(x)) return x;
      if (typeof x === 'number') out.push(x);
    }
  }
  return out;
}

const BUILTIN = {
  IF: (args) => {
    if (args.length < 2 || args.length > 3) return new FormulaError('#VALUE!', 'IF takes 2 or 3 arguments');
    const [c, a, b] = args;
    return broadcast([c, a ?? false, args.length === 3 ? (b ?? 0) : false], (cc, aa, bb) => {
      const t = truthy(cc);
      return isErrorValue(t) ? t : t ? aa : bb;
    });
  },
  ABS: (args) => broadcast([args[0]], (x) => {
    const a = asNumber(x);
    return isErrorValue(a) ? a : Math.abs(a);
  }),
  MIN: (args) => {
    const xs = flatNumbers(args);
    return isErrorValue(xs) ? xs : xs.length ? Math.min(...xs) : 0;
  },
  MAX: (args) => {
    const xs = flatNumbers(args);
    return isErrorValue(xs) ? xs : xs.length ? Math.max(...xs) : 0;
  },
};

/**
 * Evaluates a parsed formula.
 *  ctx.cell(r, c)             → Promise of the value in that cell (null when empty)
 *  ctx.call(id, args)         → the CELLWRIGHT function's raw result (2-D array or a promise of one);
 *                               args are already shaped the way Excel passes them
 *  ctx.known(id)              → true when the bundle has the function
 *  ctx.dimensionality(id, i)  → "matrix" or "scalar" for parameter i of the function
 */
export async function evaluate(tree, ctx) {
  switch (tree.k) {
    case 'num':
    case 'str':
    case 'bool':
      return tree.v;
    case 'array':
      return tree.rows.map((r) => r.slice());
    case 'ref':
      return ctx.cell(tree.r, tree.c);
    case 'range': {
      const out = [];
      for (let r = tree.r1; r <= tree.r2; r++) {
        const line = [];
        for (let c = tree.c1; c <= tree.c2; c++) line.push(await ctx.cell(r, c));
        out.push(line);
      }
      return out;
    }
    case 'neg':
      return broadcast([await evaluate(tree.a, ctx)], (x) => {
        const a = asNumber(x);
        return isErrorValue(a) ? a : a === 0 ? 0 : -a;
      });
    case 'bin': {
      const a = await evaluate(tree.a, ctx);
      const b = await evaluate(tree.b, ctx);
      return broadcast([a, b], BINARY[tree.op]);
    }
    case 'call': {
      if (tree.name.startsWith('CELLWRIGHT.')) return callCellwright(tree, ctx);
      const f = BUILTIN[tree.name];
      if (!f) return new FormulaError('#NAME?', `${tree.name} is not a function this evaluator knows`);
      const args = [];
      for (const a of tree.args) args.push(a === null ? null : await evaluate(a, ctx));
      return f(args);
    }
    default:
      throw new Error(`unknown node ${tree.k}`);
  }
}

async function callCellwright(tree, ctx) {
  const id = tree.name.slice('CELLWRIGHT.'.length);
  if (!ctx.known(id)) {
    return new FormulaError('#NAME?', `CELLWRIGHT.${id} is not in the functions bundle`);
  }
  const args = [];
  for (let i = 0; i < tree.args.length; i++) {
    const node = tree.args[i];
    if (node === null) {
      args.push(null); // an omitted argument, as Excel passes it
      continue;
    }
    let v = await evaluate(node, ctx);
    if (ctx.dimensionality(id, i) === 'matrix') {
      if (!isArray(v)) v = [[v]]; // Excel hands a matrix parameter a 2-D array even for one value
    } else {
      v = unwrap(v);
    }
    args.push(v);
  }
  let result;
  try {
    result = await ctx.call(id, args);
  } catch (e) {
    // The bundle's functions never throw; the loader does for an unknown id or too many arguments.
    return new FormulaError('#VALUE!', e instanceof Error ? e.message : String(e));
  }
  return unwrap(result);
}
