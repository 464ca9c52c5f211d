// npm run docs: writes the function reference, docs/functions.md and docs/functions.html.
//
//   node scripts/docs.mjs [--check] [--no-build]
//
// Also refreshes the function table of README.md (between its functions:start/end markers).
//
// Sources, and nothing typed by hand about a function's behaviour:
//   dist/functions.json           the functions, their descriptions, parameters (order, name,
//                                 description, optional) and help URLs, as Excel reads them;
//   functions/families/*.ts       the specs (through the adapter's registry): each argument's
//                                 unit, default and accepted values, and the result (which
//                                 functions.json does not carry);
//   docs/examples.json            the order, one example's arguments per function, see-also links;
//   dist/functions.js             the example values and the errors, computed by the bundle
//                                 (loaded as Excel's runtime loads it) while the reference is made.
// --check compares the generated text with the committed files (and the README's table) and
// exits 1 when they differ.
import { existsSync, readFileSync, writeFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { pathToFileURL } from 'node:url';
import { ensureBuilt, loadBundle, ROOT } from './lib/bundle.mjs';
import { loadRegistry } from './lib/registry.mjs';

const MD = resolve(ROOT, 'docs/functions.md');
const HTML = resolve(ROOT, 'docs/functions.html');
const NAMESPACE = 'CELLWRIGHT';

/* ---------------------------------------------------------------------------------------- */
/* Values                                                                                    */
/* ---------------------------------------------------------------------------------------- */

const isError = (v) => typeof v === 'object' && v !== null && !Array.isArray(v) && typeof v.code === 'string';

/** A number as the reference shows it: up to 6 significant digits. */
export function formatNumber(x) {
  if (x === 0) return '0';
  const a = Math.abs(x);
  if (Number.isInteger(x) && a < 1e15) return String(x);
  if (a < 1e-4 || a >= 1e7) {
    const [m, e] = x.toExponential(5).split('e');
    return `${String(Number(m))}E${e.startsWith('-') ? e : `+${e.replace('+', '')}`}`;
  }
  return String(Number(x.toPrecision(6)));
}

function formatValue(v) {
  if (isError(v)) return v.code;
  if (typeof v === 'string') return `"${v}"`;
  if (typeof v === 'boolean') return v ? 'TRUE' : 'FALSE';
  if (typeof v === 'number') return formatNumber(v);
  if (typeof v === 'boolean') return v ? 'TRUE' : 'FALSE';
  return String(v);
}

/** An argument as written in a formula: text quoted, a range as an array constant {a,b;c,d}. */
function formulaArg(v) {
  if (v === null) return '';
  if (Array.isArray(v)) return `{${v.map((row) => row.map(formulaArg).join(',')).join(';')}}`;
  if (typeof v === 'string') return `"${v.replace(/"/g, '""')}"`;
  if (typeof v === 'number') return formatNumber(v);
  return String(v);
}

function formulaOf(id, args) {
  let list = args.map(formulaArg);
  while (list.length && list[list.length - 1] === '') list = list.slice(0, -1);
  return `=${NAMESPACE}.${id}(${list.join(', ')})`;
}

/** Calls like Excel: a single value reaches a matrix parameter as a 1×1 array. */
async function callExcelStyle(bundle, id, args) {
  const wrapped = args.map((a) => (a === null || Array.isArray(a) ? a : [[a]]));
  return await bundle.call(id, ...wrapped);
}

/* ---------------------------------------------------------------------------------------- */
/* The model                                                                                 */
/* ---------------------------------------------------------------------------------------- */

const KIND_UNIT = {
  couple: 'couple key',
  coupleOrPotential: 'couple key, or V',
  electrode: 'electrode key',
  species: 'formula, or g/mol',
  boolean: 'TRUE or FALSE',
  text: 'text',
  textList: 'text, a range',
};

function unitOf(arg) {
  if (arg.kind === 'number') return arg.unit || '—';
  if (arg.kind === 'numberList') return `${arg.unit || 'numbers'}, a range`;
  return KIND_UNIT[arg.kind] ?? (arg.unit || '—');
}

/** An optional argument whose default is not a single value (e.g. 1 − alpha_a) says it in words. */
const DEFAULT_IN_WORDS = 'see description';

function defaultOf(arg) {
  if (!arg.optional) return 'required';
  if (arg.default === null || arg.default === undefined) return DEFAULT_IN_WORDS;
  if (typeof arg.default === 'string') return `"${arg.default}"`;
  if (typeof arg.default === 'boolean') return arg.default ? 'TRUE' : 'FALSE';
  return formatNumber(arg.default);
}

/** Values tried in each argument to find the errors a function gives (`example`: its value there). */
function probesFor(arg, example) {
  if (Array.isArray(example) && (arg.kind === 'numberList' || arg.kind === 'textList')) {
    // the example's range with its first value spoiled, and the range one value longer
    const spoiled = example.map((row) => row.slice());
    spoiled[0][0] = arg.kind === 'numberList' ? 'abc' : 'Cl-';
    const longer = [...example.map((row) => row.slice()), example[example.length - 1].slice()];
    return [spoiled, longer];
  }
  switch (arg.kind) {
    case 'number':
      return [-274, -1, 0, 0.5, 150, 'abc'];
    case 'couple':
      return ['Xx2+/Xx', 1];
    case 'coupleOrPotential':
      return ['Xx2+/Xx'];
    case 'electrode':
    case 'text':
      return ['XYZ'];
    case 'species':
      return ['Qq', 0, -1];
    case 'numberList':
      return [[['abc']], [[1], [2], [3], [4]]];
    case 'textList':
      return [[['Cl-']], [['a'], ['b'], ['c'], ['d']]];
    default:
      return [];
  }
}

async function errorsOf(bundle, id, example, args) {
  const out = [];
  for (let i = 0; i < args.length; i++) {
    const groups = new Map();
    for (const probe of probesFor(args[i], example[i])) {
      if (JSON.stringify(probe) === JSON.stringify(example[i] ?? null)) continue;
      const tried = example.slice();
      while (tried.length < args.length) tried.push(null);
      tried[i] = probe;
      const r = await callExcelStyle(bundle, id, tried);
      const first = Array.isArray(r) ? r[0][0] : r;
      if (!isError(first)) continue;
      const key = `${first.code}\u0000${first.message ?? ''}`;
      if (!groups.has(key)) groups.set(key, { code: first.code, message: first.message, values: [] });
      groups.get(key).values.push(formulaArg(probe));
    }
    if (groups.size) out.push({ param: args[i].name, groups: [...groups.values()] });
  }
  return out;
}

/** Everything the reference says, in order. */
export async function buildModel() {
  const bundle = loadBundle();
  const registry = await loadRegistry();
  const examples = JSON.parse(readFileSync(resolve(ROOT, 'docs/examples.json'), 'utf8'));
  const metaById = new Map(bundle.metadata.functions.map((f) => [f.id, f]));
  const problems = [];

  const grouped = examples.groups.flatMap((g) => g.ids);
  for (const f of bundle.metadata.functions) {
    if (!grouped.includes(f.id)) problems.push(`${f.id} is in dist/functions.json but in no group of docs/examples.json`);
    if (!examples.functions[f.id]) problems.push(`${f.id} has no example in docs/examples.json`);
    if (!registry.has(f.id)) problems.push(`${f.id} has no spec in the adapter's registry`);
  }
  for (const id of grouped) if (!metaById.has(id)) problems.push(`docs/examples.json lists ${id}, which is not in dist/functions.json`);
  if (problems.length) throw new Error(`cannot make the reference:\n  ${problems.join('\n  ')}`);

  const groups = [];
  for (const g of examples.groups) {
    const functions = [];
    for (const id of g.ids) {
      const meta = metaById.get(id);
      const spec = registry.get(id);
      const ex = examples.functions[id];
      if (spec.args.length !== meta.parameters.length || spec.args.some((a, i) => a.name !== meta.parameters[i].name)) {
        throw new Error(`${id}: the JSDoc parameters (${meta.parameters.map((p) => p.name).join(', ')}) and the adapter spec (${spec.args.map((a) => a.name).join(', ')}) disagree`);
      }
      const params = meta.parameters.map((p, i) => ({
        name: p.name,
        optional: Boolean(p.optional),
        description: p.description ?? '',
        unit: unitOf(spec.args[i]),
        default: defaultOf(spec.args[i]),
      }));
      if (ex.args.length > params.length) throw new Error(`${id}: the example has ${ex.args.length} arguments; the function takes ${params.length}`);
      const raw = await callExcelStyle(bundle, id, ex.args);
      const value = Array.isArray(raw) && raw.length === 1 && raw[0].length === 1 ? raw[0][0] : raw;
      const cells = Array.isArray(value) ? value.flat() : [value];
      const bad = cells.find(isError);
      if (bad) throw new Error(`${id}: the example ${formulaOf(id, ex.args)} gives ${bad.code}${bad.message ? ` (${bad.message})` : ''}`);
      for (const s of ex.seeAlso ?? []) if (!metaById.has(s)) throw new Error(`${id}: see-also ${s} is not a function`);
      functions.push({
        id,
        anchor: id.toLowerCase(),
        description: meta.description ?? '',
        helpUrl: meta.helpUrl,
        syntax: `=${NAMESPACE}.${id}(${params.map((p) => (p.optional ? `[${p.name}]` : p.name)).join(', ')})`,
        params,
        returns: spec.result ?? '',
        rowResult: spec.rowResult,
        example: { formula: formulaOf(id, ex.args), value, says: ex.says ?? '' },
        errors: await errorsOf(bundle, id, ex.args, spec.args),
        seeAlso: ex.seeAlso ?? [],
      });
    }
    groups.push({ title: g.title, intro: g.intro ?? '', anchor: slug(g.title), functions });
  }
  return { groups, count: bundle.metadata.functions.length };
}

function slug(text) {
  return text
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-|-$/g, '');
}

/* ---------------------------------------------------------------------------------------- */
/* Shared text                                                                               */
/* ---------------------------------------------------------------------------------------- */

const INTRO = [
  'Every worksheet function of the Cellwright add-in (namespace CELLWRIGHT): syntax, arguments with units and defaults, the result, a worked example, the errors it gives, and related functions.',
  'This file is generated by `npm run docs` from `dist/functions.json` (what Excel reads), the argument specs of `functions/adapter.ts`, and `docs/examples.json`. Example values and errors were computed by the production functions bundle when the file was generated; do not edit it by hand.',
];

const CONVENTIONS = [
  'Potentials are in volts (V) vs SHE unless a function names another scale. One sign convention throughout: a reaction as written runs by itself when its potential is positive (ΔG = −nFE).',
  'Temperatures are in °C; an omitted temperature means 25 °C. ΔG and ΔH are in kJ/mol, ΔS in J/(mol·K).',
  'Activities are dimensionless and greater than 0; a gas\'s activity is its partial pressure in bar. Solids, liquid water and electrons have activity 1.',
  'A couple is a key of the potential table written Ox/Red, such as "Cu2+/Cu" or "MnO4-/Mn2+"; white space and the charge spellings "Cu(2+)", "Cu^2+", "Cu+2" are accepted, element symbols are case-sensitive. Where an argument says "couple key, or V", a number is read as a potential in V.',
  'Every argument also takes a range. Results broadcast the way Excel does (a single value with a range; equal shapes element by element; a single row against a single column gives the full table) and spill. A bad element gives an error in that element only.',
  'An omitted optional argument (or an empty cell) takes its default.',
  'Errors: an unknown couple, electrode, species, model or element gives #N/A with a message naming it; text that cannot be read as the expected type, or a number the function does not accept (outside its domain, or outside a model\'s or the data\'s stated range), gives #VALUE! with a message naming the argument and the accepted range; only a result outside the range of numbers gives #NUM! (which Excel shows without a message). In every function an error value in an input cell is passed through to that element, and ranges whose shapes cannot be combined give #VALUE!. No function returns NaN or an infinity.',
];

const ERRORS_NOTE = 'Found by trying values in each argument of the example while this reference was generated. Every function also passes an error in an input cell through, and gives #VALUE! for ranges whose shapes cannot be combined.';

/* ---------------------------------------------------------------------------------------- */
/* Markdown                                                                                  */
/* ---------------------------------------------------------------------------------------- */

const mdCell = (s) => String(s).replace(/\|/g, '\\|').replace(/\n/g, ' ');
const code = (s) => (String(s).includes('`') ? `\`\` ${s} \`\`` : `\`${s}\``);

function mdValue(v) {
  if (!Array.isArray(v)) return `**${mdCell(formatValue(v))}**`;
  const rows = v.map((r) => `| ${r.map((x) => mdCell(formatValue(x))).join(' | ')} |`);
  return `a ${v.length}×${v[0].length} spill:\n\n| ${v[0].map(() => ' ').join(' | ')} |\n|${v[0].map(() => '---').join('|')}|\n${rows.join('\n')}`;
}

export function renderMarkdown(model) {
  const L = [];
  L.push('# Cellwright function reference', '');
  for (const p of INTRO) L.push(p, '');
  L.push('## Conventions', '');
  for (const p of CONVENTIONS) L.push(`- ${p}`);
  L.push('');
  L.push(`## All ${model.count} functions`, '');
  for (const g of model.groups) {
    L.push(`**${g.title}**`, '');
    L.push('| Function | What it gives |', '|---|---|');
    for (const f of g.functions) L.push(`| [${f.id}](#${f.anchor}) | ${mdCell(f.description)} |`);
    L.push('');
  }
  for (const g of model.groups) {
    L.push(`## ${g.title}`, '');
    if (g.intro) L.push(g.intro, '');
    for (const f of g.functions) {
      L.push(`### ${f.id}`, '');
      L.push(f.description, '');
      L.push(`**Syntax** ${code(f.syntax)}`, '');
      L.push('| Argument | Unit | Default | Description |', '|---|---|---|---|');
      for (const p of f.params) L.push(`| ${code(p.name)} | ${mdCell(p.unit)} | ${mdCell(p.default)} | ${mdCell(p.description)} |`);
      L.push('');
      const spill = f.rowResult ? ` Each element gives a row of ${f.rowResult} values, so one call spills 1×${f.rowResult}.` : '';
      L.push(`**Result** ${f.returns}${spill}`, '');
      const says = f.example.says ? ` — ${f.example.says}` : '';
      if (Array.isArray(f.example.value)) L.push(`**Example** ${code(f.example.formula)}${says} It returns ${mdValue(f.example.value)}`, '');
      else L.push(`**Example** ${code(f.example.formula)} returns ${mdValue(f.example.value)}${says}`, '');
      if (f.errors.length) {
        L.push('**Errors**', '');
        for (const e of f.errors) {
          for (const g2 of e.groups) {
            L.push(`- ${code(e.param)} = ${g2.values.map(code).join(', ')} → ${g2.code}${g2.message ? `: ${g2.message}` : ''}`);
          }
        }
        L.push('', `<sub>${ERRORS_NOTE}</sub>`, '');
      }
      if (f.seeAlso.length) L.push(`**See also** ${f.seeAlso.map((s) => `[${s}](#${s.toLowerCase()})`).join(', ')}`, '');
    }
  }
  return `${L.join('\n').replace(/\n{3,}/g, '\n\n').trimEnd()}\n`;
}

/* ---------------------------------------------------------------------------------------- */
/* The README's function table                                                               */
/* ---------------------------------------------------------------------------------------- */

const README = resolve(ROOT, 'README.md');
const README_START = /<!-- functions:start[^>]*-->\n/;
const README_END = '<!-- functions:end -->';

function readmeArg(p) {
  const unit = p.unit === '—' || p.unit.split(/[ ,]/)[0] === p.name ? '' : ` (${p.unit})`;
  if (!p.optional) return `${p.name}${unit}`;
  return p.default === DEFAULT_IN_WORDS ? `[${p.name}${unit}]` : `[${p.name}${unit} = ${p.default}]`;
}

/** The table of every function with its arguments' units and its result, grouped as in the reference. */
export function renderReadmeTable(model) {
  const L = [];
  for (const g of model.groups) {
    L.push(`**${g.title}**`, '', '| Function | Arguments | Result |', '|---|---|---|');
    for (const f of g.functions) L.push(`| [\`${f.id}\`](docs/functions.md#${f.anchor}) | ${mdCell(f.params.map(readmeArg).join(', '))} | ${mdCell(f.returns)} |`);
    L.push('');
  }
  return L.join('\n');
}

/** The count in the README's opening paragraph ("N functions in the `CELLWRIGHT` namespace"), kept true. */
const README_COUNT = /\b\d+ functions in the `CELLWRIGHT` namespace/;

/** README.md with its generated block replaced (the text between the two markers) and its function count set. */
function withReadmeTable(readme, table, count) {
  if (!README_COUNT.test(readme)) throw new Error('README.md no longer says "N functions in the `CELLWRIGHT` namespace"');
  readme = readme.replace(README_COUNT, `${count} functions in the \`CELLWRIGHT\` namespace`);
  const start = README_START.exec(readme);
  const end = readme.indexOf(README_END);
  if (!start || end < start.index) throw new Error('README.md has no <!-- functions:start --> … <!-- functions:end --> block');
  return `${readme.slice(0, start.index + start[0].length)}${table}${readme.slice(end)}`;
}

/* ---------------------------------------------------------------------------------------- */
/* HTML                                                                                      */
/* ---------------------------------------------------------------------------------------- */

const esc = (s) => String(s).replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;');
/** Markdown `code` spans inside a sentence, as <code>. */
const inline = (s) => esc(s).replace(/`([^`]+)`/g, '<code>$1</code>');

const CSS = `
body{font:15px/1.5 system-ui,-apple-system,"Segoe UI",Roboto,sans-serif;color:#1b1f23;max-width:60rem;margin:0 auto;padding:1rem 1.25rem 4rem}
h1{font-size:1.6rem}h2{margin-top:2.2rem;border-bottom:1px solid #d0d7de;padding-bottom:.2rem}h3{margin-top:2rem;font-family:ui-monospace,Consolas,monospace}
code{font-family:ui-monospace,Consolas,monospace;background:#f3f4f6;padding:0 .25rem;border-radius:3px}
table{border-collapse:collapse;margin:.5rem 0 1rem;font-size:.92rem}th,td{border:1px solid #d0d7de;padding:.25rem .5rem;text-align:left;vertical-align:top}th{background:#f6f8fa}
section.fn{border-top:1px solid #eaeef2}section.fn:target{background:#fffbe6}
.note{color:#57606a;font-size:.85rem}
`;

function htmlValue(v) {
  if (!Array.isArray(v)) return `<strong>${esc(formatValue(v))}</strong>`;
  return `a ${v.length}×${v[0].length} spill:</p>\n<table>${v.map((r) => `<tr>${r.map((x) => `<td>${esc(formatValue(x))}</td>`).join('')}</tr>`).join('')}</table>`;
}

export function renderHtml(model) {
  const H = [];
  H.push('<!doctype html>', '<html lang="en">', '<head>', '<meta charset="utf-8">', '<meta name="viewport" content="width=device-width, initial-scale=1">');
  H.push('<title>Cellwright function reference</title>', `<style>${CSS.trim()}</style>`, '</head>', '<body>');
  H.push('<h1>Cellwright function reference</h1>');
  for (const p of INTRO) H.push(`<p>${inline(p)}</p>`);
  H.push('<h2 id="conventions">Conventions</h2>', '<ul>');
  for (const p of CONVENTIONS) H.push(`<li>${inline(p)}</li>`);
  H.push('</ul>');
  H.push(`<h2 id="all-functions">All ${model.count} functions</h2>`);
  for (const g of model.groups) {
    H.push(`<p><strong><a href="#${g.anchor}">${esc(g.title)}</a></strong></p>`, '<table><tr><th>Function</th><th>What it gives</th></tr>');
    for (const f of g.functions) H.push(`<tr><td><a href="#${f.anchor}"><code>${f.id}</code></a></td><td>${esc(f.description)}</td></tr>`);
    H.push('</table>');
  }
  for (const g of model.groups) {
    H.push(`<h2 id="${g.anchor}">${esc(g.title)}</h2>`);
    if (g.intro) H.push(`<p>${inline(g.intro)}</p>`);
    for (const f of g.functions) {
      H.push(`<section class="fn" id="${f.anchor}">`, `<h3>${f.id}</h3>`, `<p>${esc(f.description)}</p>`);
      H.push(`<p><strong>Syntax</strong> <code>${esc(f.syntax)}</code></p>`);
      H.push('<table><tr><th>Argument</th><th>Unit</th><th>Default</th><th>Description</th></tr>');
      for (const p of f.params) H.push(`<tr><td><code>${esc(p.name)}</code></td><td>${esc(p.unit)}</td><td>${esc(p.default)}</td><td>${esc(p.description)}</td></tr>`);
      H.push('</table>');
      const spill = f.rowResult ? ` Each element gives a row of ${f.rowResult} values, so one call spills 1×${f.rowResult}.` : '';
      H.push(`<p><strong>Result</strong> ${esc(f.returns)}${spill}</p>`);
      const says = f.example.says ? ` — ${esc(f.example.says)}` : '';
      // (a spilled value closes the paragraph itself: a table cannot sit inside a <p>)
      if (Array.isArray(f.example.value)) H.push(`<p><strong>Example</strong> <code>${esc(f.example.formula)}</code>${says} It returns ${htmlValue(f.example.value)}`);
      else H.push(`<p><strong>Example</strong> <code>${esc(f.example.formula)}</code> returns ${htmlValue(f.example.value)}${says}</p>`);
      if (f.errors.length) {
        H.push('<p><strong>Errors</strong></p>', '<ul>');
        for (const e of f.errors) for (const g2 of e.groups) H.push(`<li><code>${esc(e.param)}</code> = ${g2.values.map((v) => `<code>${esc(v)}</code>`).join(', ')} → ${esc(g2.code)}${g2.message ? `: ${esc(g2.message)}` : ''}</li>`);
        H.push('</ul>', `<p class="note">${esc(ERRORS_NOTE)}</p>`);
      }
      if (f.seeAlso.length) H.push(`<p><strong>See also</strong> ${f.seeAlso.map((s) => `<a href="#${s.toLowerCase()}"><code>${s}</code></a>`).join(', ')}</p>`);
      H.push('</section>');
    }
  }
  H.push('</body>', '</html>');
  return `${H.join('\n')}\n`;
}

/* ---------------------------------------------------------------------------------------- */
/* Main                                                                                      */
/* ---------------------------------------------------------------------------------------- */

export async function generateDocs() {
  const model = await buildModel();
  const readme = withReadmeTable(readFileSync(README, 'utf8'), renderReadmeTable(model), model.count);
  return { model, md: renderMarkdown(model), html: renderHtml(model), readme };
}

function firstDifference(a, b) {
  const x = a.split('\n');
  const y = b.split('\n');
  for (let i = 0; i < Math.max(x.length, y.length); i++) {
    if (x[i] !== y[i]) return `line ${i + 1}:\n  committed: ${x[i] ?? '(end of file)'}\n  generated: ${y[i] ?? '(end of file)'}`;
  }
  return '';
}

async function main() {
  const args = process.argv.slice(2);
  if (!args.includes('--no-build')) {
    const note = ensureBuilt();
    process.stderr.write(`${note}\n`);
  }
  const { md, html, readme, model } = await generateDocs();
  if (args.includes('--check')) {
    const stale = [];
    for (const [file, text] of [
      [MD, md],
      [HTML, html],
      [README, readme],
    ]) {
      const old = existsSync(file) ? readFileSync(file, 'utf8') : '';
      if (old !== text) stale.push(`${file.slice(ROOT.length + 1)} is out of date (${firstDifference(old, text)})`);
    }
    if (stale.length) {
      process.stderr.write(`${stale.join('\n')}\nRun "npm run docs" and commit the result.\n`);
      process.exit(1);
    }
    process.stdout.write(`docs/functions.md, docs/functions.html and the README's function table are up to date (${model.count} functions).\n`);
    return;
  }
  writeFileSync(MD, md);
  writeFileSync(HTML, html);
  writeFileSync(README, readme);
  process.stdout.write(`Wrote docs/functions.md, docs/functions.html and the README's function table (${model.count} functions).\n`);
}

if (process.argv[1] && import.meta.url === pathToFileURL(resolve(process.argv[1])).href) await main();
