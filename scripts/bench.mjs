#!/usr/bin/env node
/**
 * Benchmark of the worksheet functions: `npm run bench`.
 *
 * Loads the production bundle (dist/data.js, then dist/functions.js) exactly like the test suite does
 * (scripts/lib/bundle.mjs, with a CustomFunctions global) and, for each case, times the call through the worksheet
 * entry point (the function the bundle registered, called with the arguments Excel passes: 2-D
 * arrays for every parameter, null for omitted ones, an invocation object last) against the same
 * arithmetic written as a bare loop over the same input in the same process, and prints the
 * ratio bare / entry (1.0 = no overhead). Each figure is the median of several runs after a
 * warm-up, entry and bare runs interleaved.
 *
 * Also: 100,000 separate scalar NERNST calls, a look-up in a 10,000-row table against the built-in
 * one, cold start in fresh processes, and the gzipped sizes of the page's scripts.
 *
 * Options: --only name[,name]   run only these cases (names as printed)
 *          --runs N             timed runs per case (default 7)
 *          --json               print the figures as JSON as well
 *          --no-core            leave out the core loops (for profiling the entry points)
 *          --cpu                time by this process's CPU time instead of the wall clock
 *          --min                report the fastest run instead of the median (for A/B comparisons
 *                               of code on a busy machine: the fastest run is the least disturbed)
 * Environment: CELLWRIGHT_DIST  another build directory (default dist/)
 *              CELLWRIGHT_BENCH_LOG_ENTRIES  revision-log entries of the cold-store table (default 500;
 *                               0 measures the same table without a log)
 *
 * A function that does not exist in the bundle yet is reported as "not yet available".
 */
import { spawnSync } from 'node:child_process';
import { existsSync, readFileSync, readdirSync } from 'node:fs';
import { createRequire } from 'node:module';
import { dirname, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import v8 from 'node:v8';
import vm from 'node:vm';
import zlib from 'node:zlib';
import { ensureBuilt, loadBundle as loadHarnessBundle } from './lib/bundle.mjs';

// A full garbage collection before each timed run, so that no run pays for garbage left by the one
// before it (the entry, core and bare runs allocate the same result arrays).
v8.setFlagsFromString('--expose-gc');
const fullGc = vm.runInNewContext('gc');
const pause = new Int32Array(new SharedArrayBuffer(4));
/**
 * A full collection, then a short sleep so that V8's background threads finish sweeping: else the
 * next timed run (whichever it is) pays for freeing what the previous one left.
 */
function collect() {
  fullGc();
  Atomics.wait(pause, 0, 0, 25);
}

const ROOT = resolve(dirname(fileURLToPath(import.meta.url)), '..');
const DIST = process.env.CELLWRIGHT_DIST ? resolve(process.env.CELLWRIGHT_DIST) : resolve(ROOT, 'dist');
const args = process.argv.slice(2);
const opt = (name) => {
  const i = args.indexOf(name);
  return i >= 0 ? args[i + 1] : undefined;
};
const ONLY = opt('--only')?.split(',');
const RUNS = Number(opt('--runs') ?? 7);
const JSON_OUT = args.includes('--json');
const NO_CORE = args.includes('--no-core');
/** Set in the child process that runs one case (each case runs in a fresh process of its own). */
const ISOLATED = args.includes('--isolated');
/** In a child: the one part of the case to time (entry, core or bare). */
const PART = opt('--part');
/** Processes per part of a case (their medians' median is reported). */
const REPS = Number(opt('--reps') ?? 3);
/** The cases that run in processes of their own, in this order. */
const CASES = ['nernst-range', 'emf-range', 'unknown-keys', 'halfcell-range', 'depositmass-range', 'activitycoef-range', 'nernst-scalar', 'table-lookup'];

/* ------------------------------------------------------------------------------------------ */
/* Loading the bundle as the test harness does, and the TypeScript core for the core loops    */
/* ------------------------------------------------------------------------------------------ */

/**
 * The bundle, evaluated by the one loader the test suite, the demo and the docs use
 * (scripts/lib/bundle.mjs: data.js then functions.js, with a CustomFunctions global). Returns the registered
 * functions by id, with the sandbox attached.
 */
function loadBundle(extraGlobals = {}) {
  const b = loadHarnessBundle(extraGlobals, DIST);
  const fns = b.registered;
  fns.sandbox = b.sandbox;
  return fns;
}

/**
 * Lets the TypeScript compiler go once the core modules are loaded: it holds some 100 MB of heap,
 * and a heap that size makes every garbage collection during the timed runs slower (the entry
 * points allocate more than the bare loops, so they would pay most of it).
 */
function releaseTs() {
  const require = createRequire(import.meta.url);
  delete require.extensions['.ts'];
  for (const k of Object.keys(require.cache)) if (k.includes(`${'/node_modules/typescript/'}`)) delete require.cache[k];
}

/** Requires a TypeScript module of src/ (transpiled on the fly; no build step, no extra dependency). */
function requireTs(path) {
  const require = createRequire(import.meta.url);
  if (!require.extensions['.ts']) {
    const ts = require('typescript');
    require.extensions['.ts'] = (module, filename) => {
      const out = ts.transpileModule(readFileSync(filename, 'utf8'), {
        compilerOptions: { module: ts.ModuleKind.CommonJS, target: ts.ScriptTarget.ES2020, esModuleInterop: true, resolveJsonModule: true },
        fileName: filename,
      });
      module._compile(out.outputText, filename);
    };
  }
  return require(resolve(ROOT, path));
}

/* ------------------------------------------------------------------------------------------ */
/* Timing                                                                                      */
/* ------------------------------------------------------------------------------------------ */

const MIN = process.argv.includes('--min');
const median = (xs) => {
  if (MIN) return Math.min(...xs);
  const s = [...xs].sort((a, b) => a - b);
  const m = s.length >> 1;
  return s.length % 2 ? s[m] : (s[m - 1] + s[m]) / 2;
};
const now = () => performance.now();
/**
 * The clock of the timed runs: wall time by default; --cpu uses this process's CPU time (user +
 * system, which also counts V8's parallel GC threads). The machine the figures come from is
 * shared, so each ratio is the median of per-round ratios: the entry and bare runs of one round
 * are measured back to back, under the same load.
 */
const CPU = process.argv.includes('--cpu');
const clock = CPU
  ? () => {
      const u = process.cpuUsage();
      return (u.user + u.system) / 1000;
    }
  : now;
let sink = 0; // results are consumed so that no loop can be optimised away
function consume(x) {
  if (Array.isArray(x)) {
    const last = x[x.length - 1];
    sink += Array.isArray(last) ? (typeof last[last.length - 1] === 'number' ? 1 : 2) : 3;
  } else sink += typeof x === 'number' ? x : 1;
}

/**
 * Times `entry`, `core` (optional) and `bare` in turn: 2 warm-up rounds, then RUNS timed rounds;
 * medians in ms.
 */
function race(entry, bare, core) {
  if (PART !== undefined) {
    // a child timing one part: 2 warm-up runs, then RUNS timed runs, each after a full collection
    const thunk = { entry, bare, core }[PART];
    if (thunk === undefined) return {};
    consume(thunk());
    consume(thunk());
    const ts = [];
    for (let i = 0; i < RUNS; i++) {
      collect();
      const t = clock();
      consume(thunk());
      ts.push(clock() - t);
    }
    return { [`${PART}Ms`]: median(ts) };
  }
  for (let i = 0; i < 2; i++) {
    consume(entry());
    if (core) consume(core());
    consume(bare());
  }
  const te = [];
  const tc = [];
  const tb = [];
  for (let i = 0; i < RUNS; i++) {
    collect();
    let t = clock();
    consume(entry());
    te.push(clock() - t);
    if (core) {
      collect();
      t = clock();
      consume(core());
      tc.push(clock() - t);
    }
    collect();
    t = clock();
    consume(bare());
    tb.push(clock() - t);
  }
  return {
    entryMs: median(te),
    bareMs: median(tb),
    ratio: median(tb.map((b, i) => b / te[i])),
    ...(core ? { coreMs: median(tc), coreRatio: median(tc.map((c, i) => te[i] / c)) } : {}),
  };
}

/* ------------------------------------------------------------------------------------------ */
/* Arithmetic written bare (same constants as src/constants.ts: CODATA 2018 exact values)      */
/* ------------------------------------------------------------------------------------------ */

const F = 1.602176634e-19 * 6.02214076e23;
const R = 6.02214076e23 * 1.380649e-23;
const T0 = 273.15;
const LN10 = Math.LN10;

const INVOCATION = { functionName: 'BENCH', address: 'Sheet1!A1', setResult() {}, onCanceled: null };
const cell = (x) => [[x]];

function grid(rows, cols, f) {
  const out = new Array(rows);
  for (let r = 0; r < rows; r++) {
    const row = new Array(cols);
    for (let c = 0; c < cols; c++) row[c] = f(r * cols + c, r, c);
    out[r] = row;
  }
  return out;
}

/** An element-wise map producing the same 2-D shape as the input (for the core loops). */
function mapGrid(input, f) {
  const rows = input.length;
  const out = new Array(rows);
  for (let r = 0; r < rows; r++) {
    const src = input[r];
    const cols = src.length;
    const row = new Array(cols);
    for (let c = 0; c < cols; c++) row[c] = f(src[c]);
    out[r] = row;
  }
  return out;
}

/* ------------------------------------------------------------------------------------------ */
/* Cases                                                                                       */
/* ------------------------------------------------------------------------------------------ */

const couplesData = JSON.parse(readFileSync(resolve(ROOT, 'data/couples.json'), 'utf8'));
const coupleRecords = couplesData.couples ?? [];

const results = [];
/** Records a case's figures, and prints them unless this process times one part for a parent. */
function report(name, what, r, target) {
  const entry = { name, what, ...r, target };
  results.push(entry);
  if (PART === undefined) printCase(entry);
}

/** The line of one case. */
function printCase(r) {
  const { name, what, target } = r;
  if (r.unavailable) {
    console.log(`${name.padEnd(18)} ${what}: not yet available (${r.unavailable})`);
    return;
  }
  if (name === 'nernst-scalar') {
    const perCallUs = (r.entryMs * 1000) / r.calls;
    r.perCallUs = perCallUs;
    console.log(
      `${name.padEnd(18)} ${what}: ${r.entryMs.toFixed(2)} ms = ${perCallUs.toFixed(3)} µs/call (bare ${r.bareMs.toFixed(2)} ms)  target < 1 µs: ${perCallUs < 1 ? 'met' : 'MISSED'}`,
    );
    return;
  }
  if (name === 'table-lookup') {
    const nsBig = (r.entryMs * 1e6) / r.lookups;
    const nsBuiltin = (r.bareMs * 1e6) / r.lookups;
    Object.assign(r, { nsBig, nsBuiltin });
    console.log(
      `${name.padEnd(18)} findCouple: ${r.rows}-row table ${nsBig.toFixed(0)} ns, built-in (${r.builtinRows} rows) ${nsBuiltin.toFixed(0)} ns per look-up; ratio ${r.ratio.toFixed(2)} (1.0 = cost does not grow with size)`,
    );
    return;
  }
  if (name === 'unknown-keys') {
    const alone = r.coreMs === undefined ? '' : `, the error values alone ${r.coreMs.toFixed(0)} ms (${(r.coreMs / r.bareMs).toFixed(2)} × known)`;
    console.log(
      `${name.padEnd(18)} STDPOTENTIAL over 1,000,000 cells: distinct unknown keys ${r.entryMs.toFixed(0)} ms, known keys ${r.bareMs.toFixed(0)} ms, unknown/known ${(r.entryMs / r.bareMs).toFixed(2)}${alone}  target ≤ 5: ${r.entryMs / r.bareMs <= 5 ? 'met' : 'MISSED'}`,
    );
    return;
  }
  const met = target === undefined ? '' : r.ratio >= target ? `  target ≥ ${target}: met` : `  target ≥ ${target}: MISSED`;
  const core = r.coreMs === undefined ? '' : `, core loop ${r.coreMs.toFixed(2)} ms (entry/core ${r.coreRatio.toFixed(2)})`;
  console.log(`${name.padEnd(18)} ${what}: entry ${r.entryMs.toFixed(2)} ms, bare ${r.bareMs.toFixed(2)} ms${core}, ratio ${r.ratio.toFixed(2)}${met}`);
}

/**
 * Runs one case in separate processes, one per part (entry, core loop, bare loop), REPS times in
 * turn, and reports the median of each part's medians. Timing the parts in processes of their own
 * keeps them from bending each other's figures: in one process the JIT state and the heap one
 * part leaves behind (feedback, optimized helpers, tenured arrays) made the same loop run 2 to 5
 * times slower or faster depending on what ran before it.
 */
function runCase(name, pass) {
  const parts = NO_CORE ? ['entry', 'bare'] : ['entry', 'core', 'bare'];
  const got = { entry: [], core: [], bare: [] };
  let info = null;
  for (let rep = 0; rep < REPS; rep++) {
    for (const part of parts) {
      const r = spawnSync(process.execPath, [fileURLToPath(import.meta.url), '--isolated', '--only', name, '--part', part, ...pass], {
        cwd: ROOT,
        encoding: 'utf8',
        env: process.env,
      });
      const line = r.stdout.split('\n').find((l) => l.startsWith('RESULT '));
      if (r.status !== 0 || line === undefined) {
        console.log(`${name.padEnd(18)} failed: ${r.stderr.split('\n').find((l) => l.trim() !== '') ?? r.status}`);
        return;
      }
      const [res] = JSON.parse(line.slice(7));
      if (res.unavailable) {
        printCase(res);
        results.push(res);
        return;
      }
      const ms = res[`${part}Ms`];
      if (ms !== undefined) got[part].push(ms);
      info = { ...res, ...info };
    }
  }
  const { entryMs, coreMs, bareMs, ...rest } = info;
  void entryMs;
  void coreMs;
  void bareMs;
  const r = { ...rest, entryMs: median(got.entry), bareMs: median(got.bare) };
  r.ratio = r.bareMs / r.entryMs;
  if (got.core.length > 0) {
    r.coreMs = median(got.core);
    r.coreRatio = r.entryMs / r.coreMs;
  }
  results.push(r);
  printCase(r);
}

function caseRange(name, what, fn, target, entry, bare, core) {
  if (ONLY && !ONLY.includes(name)) return;
  if (!fn) return report(name, what, { unavailable: `no ${name.split('-')[0].toUpperCase()} in the bundle` }, target);
  const coreLoop = core && !NO_CORE && (PART === undefined || PART === 'core') ? loadCore(core) : undefined;
  releaseTs();
  report(name, what, race(entry, bare, coreLoop), target);
}

/**
 * The "core loop": the same core function the worksheet function calls (src/, transpiled on the
 * fly, run outside node:vm), called per element in a bare loop over the same input. entry/core is
 * the adapter's own overhead; core/bare is what the core does beyond the bare arithmetic.
 * Returns undefined when the core module cannot be loaded.
 */
function loadCore(make) {
  try {
    return make();
  } catch {
    return undefined;
  }
}

function main() {
  if (!ISOLATED) {
    if (process.env.CELLWRIGHT_DIST) {
      if (!existsSync(resolve(DIST, 'functions.js'))) throw new Error(`no functions.js in ${DIST}`);
    } else console.log(ensureBuilt()); // builds dist/ when it is missing or older than the sources
  }
  const cpu = (readFileSync('/proc/cpuinfo', 'utf8').match(/model name\s*:\s*(.*)/) ?? [])[1] ?? 'unknown CPU';
  const cores = (readFileSync('/proc/cpuinfo', 'utf8').match(/^processor\s*:/gm) ?? []).length;
  if (!ISOLATED) {
    // Each case in a fresh process: the JIT state one case leaves behind (feedback, deoptimized
    // helpers, a heap full of old results) must not bend the figures of the next.
    const load = () => readFileSync('/proc/loadavg', 'utf8').split(' ').slice(0, 3).join(' ');
    console.log(`Cellwright benchmark — ${new Date().toISOString().slice(0, 10)}, Node ${process.version}, ${cores} cores, ${cpu}, load average ${load()}`);
    process.on('exit', () => console.log(`\nload average at the end: ${load()} (other work on the machine disturbs the figures; compare ratios, not times)`));
    console.log(
      `each part (entry point, core loop, bare loop) timed in ${REPS} fresh processes: median of ${RUNS} runs after 2 warm-up runs, ${CPU ? 'CPU' : 'wall-clock'} time, median over the processes; ratio = bare loop / entry point (1.0 = no overhead)\n`,
    );
    const pass = args.filter((a, i) => a !== '--only' && args[i - 1] !== '--only' && a !== '--json');
    for (const name of CASES.filter((c) => !ONLY || ONLY.includes(c))) runCase(name, pass);
    if (!ONLY || ONLY.includes('cold-start')) coldStart();
    sizes();
    if (!ONLY || ONLY.includes('check')) checkSpeed();
    if (JSON_OUT) console.log(JSON.stringify({ date: new Date().toISOString(), node: process.version, cpu, cores, results }, null, 1));
    return;
  }

  const fns = loadBundle();
  const get = (id) => fns.get(id);

  // NERNST over a 1,000 × 1,000 range of Q, one call.
  {
    const fn = get('NERNST');
    const Q = grid(1000, 1000, (i) => 10 ** ((i % 1200) / 100 - 6));
    const e0 = 0.3419;
    const n = 2;
    caseRange(
      'nernst-range',
      'NERNST(0.3419, 2, Q[1000×1000])',
      fn,
      0.5,
      () => fn(cell(e0), cell(n), Q, null, INVOCATION),
      () => {
        const k = (R * (25 + T0)) / (n * F);
        const out = new Array(Q.length);
        for (let r = 0; r < Q.length; r++) {
          const src = Q[r];
          const row = new Array(src.length);
          for (let c = 0; c < src.length; c++) row[c] = e0 - k * Math.log(src[c]);
          out[r] = row;
        }
        return out;
      },
      () => {
        const { nernst } = requireTs('src/nernst/nernst.ts');
        return () => mapGrid(Q, (q) => nernst(e0, n, q, 25));
      },
    );
  }

  // EMF over a 316 × 316 range of couple keys against one anode key.
  {
    const fn = get('EMF');
    const keys = coupleRecords.map((c) => c.key);
    const cathodes = grid(316, 316, (i) => keys[i % keys.length]);
    const anode = 'Zn2+/Zn';
    const e0ByKey = new Map(coupleRecords.map((c) => [c.key, c.e0]));
    caseRange(
      'emf-range',
      'EMF(keys[316×316], "Zn2+/Zn")',
      fn,
      0.25,
      () => fn(cathodes, cell(anode), null, INVOCATION),
      () => {
        const ea = e0ByKey.get(anode);
        const out = new Array(cathodes.length);
        for (let r = 0; r < cathodes.length; r++) {
          const src = cathodes[r];
          const row = new Array(src.length);
          for (let c = 0; c < src.length; c++) row[c] = e0ByKey.get(src[c]) - ea;
          out[r] = row;
        }
        return out;
      },
      () => {
        const table = requireTs('src/table/builtin.ts').builtinTable();
        const { e0AtTemperature } = requireTs('src/cells/e0AtTemperature.ts');
        const { emf } = requireTs('src/cells/emf.ts');
        return () => {
          const a = table.findCouple(anode);
          return mapGrid(cathodes, (k) => emf(e0AtTemperature(table.findCouple(k), 25), e0AtTemperature(a, 25)));
        };
      },
    );
  }

  // STDPOTENTIAL over 1,000,000 cells of distinct unknown keys (half of them not species at all, half
  // species that are not in the table), against the same call over known keys: an unknown key must
  // not cost much more than a known one (each distinct text is looked up once per call either way).
  {
    const fn = get('STDPOTENTIAL');
    const known = coupleRecords.map((c) => c.key);
    const unknownKeys = grid(1000, 1000, (i) => (i % 2 ? `Qq${i}/Cu` : `Fe${i}/Cu`));
    const knownKeys = grid(1000, 1000, (i) => known[i % known.length]);
    caseRange(
      'unknown-keys',
      'STDPOTENTIAL(keys[1000×1000]), 1e6 distinct unknown keys (entry) against known keys (bare)',
      fn,
      0.2,
      () => fn(unknownKeys, null, INVOCATION),
      () => fn(knownKeys, null, INVOCATION),
      // the "core" part here: only making one error value per cell whose message names its key, as
      // the entry point must (the harness's CustomFunctions.Error, the message joined from three parts)
      () => {
        const Err = fns.sandbox.CustomFunctions.Error;
        const open = 'unknown couple "';
        const close = '"; use a key of the potential table such as "Cu2+/Cu"';
        return () =>
          unknownKeys.map((row) => {
            const line = new Array(row.length);
            for (let c = 0; c < row.length; c++) line[c] = new Err('#N/A', open + row[c] + close);
            return line;
          });
      },
    );
  }

  // HALFCELL over 100,000 pH values for MnO4-/Mn2+ (MnO4- + 8H+ + 5e- -> Mn2+ + 4H2O).
  {
    const fn = get('HALFCELL');
    const pH = grid(100000, 1, (i) => (i % 1400) / 100);
    const key = 'MnO4-/Mn2+';
    const rec = coupleRecords.find((c) => c.key === key);
    const rows = new Map([[key, { e0: rec?.e0 ?? 1.507, n: 5, h: 8 }]]);
    caseRange(
      'halfcell-range',
      'HALFCELL("MnO4-/Mn2+", , , pH[100000×1])',
      fn,
      0.25,
      () => fn(cell(key), null, null, pH, null, INVOCATION),
      () => {
        const k = (R * (25 + T0) * LN10) / F;
        const out = new Array(pH.length);
        for (let r = 0; r < pH.length; r++) {
          const src = pH[r];
          const line = new Array(src.length);
          for (let c = 0; c < src.length; c++) {
            const row = rows.get(key);
            line[c] = row.e0 - ((k * row.h) / row.n) * src[c];
          }
          out[r] = line;
        }
        return out;
      },
      () => {
        const row = requireTs('src/table/builtin.ts').builtinTable().findCouple(key);
        const { halfCell } = requireTs('src/nernst/halfCell.ts');
        return () => mapGrid(pH, (p) => halfCell(row, null, null, p, 25));
      },
    );
  }

  // DEPOSITMASS over a 100,000-cell range of currents: m = I·t·3600·M/(nF)·efficiency.
  {
    const fn = get('DEPOSITMASS');
    const I = grid(100000, 1, (i) => 1 + (i % 500) / 10);
    const M = 63.546; // Cu, IUPAC 2021 abridged
    caseRange(
      'depositmass-range',
      'DEPOSITMASS(I[100000×1], 1 h, "Cu", 2)',
      fn,
      0.5,
      () => fn(I, cell(1), cell('Cu'), cell(2), null, INVOCATION),
      () => {
        const out = new Array(I.length);
        for (let r = 0; r < I.length; r++) {
          const src = I[r];
          const row = new Array(src.length);
          for (let c = 0; c < src.length; c++) row[c] = (src[c] * 1 * 3600 * M) / (2 * F);
          out[r] = row;
        }
        return out;
      },
      () => {
        const { depositMass } = requireTs('src/faraday/depositMass.ts');
        return () => mapGrid(I, (i) => depositMass(i, 1, 'Cu', 2, 1));
      },
    );
  }

  // ACTIVITYCOEF over a 100,000-cell range of ionic strengths (Davies, z = 2, 25 °C).
  {
    const fn = get('ACTIVITYCOEF');
    const I = grid(100000, 1, (i) => (1 + (i % 500)) / 1000);
    const A = 0.5091; // Debye–Hückel A at 25 °C, (kg/mol)^½
    caseRange(
      'activitycoef-range',
      'ACTIVITYCOEF(2, I[100000×1]) (Davies)',
      fn,
      0.5,
      () => fn(cell(2), I, null, null, null, INVOCATION),
      () => {
        const out = new Array(I.length);
        for (let r = 0; r < I.length; r++) {
          const src = I[r];
          const row = new Array(src.length);
          for (let c = 0; c < src.length; c++) {
            const is = src[c];
            const s = Math.sqrt(is);
            row[c] = 10 ** (-A * 4 * (s / (1 + s) - 0.3 * is));
          }
          out[r] = row;
        }
        return out;
      },
      () => {
        const { activityCoef } = requireTs('src/solutions/activityCoef.ts');
        return () => mapGrid(I, (is) => activityCoef(2, is, 'DAVIES', 25, null));
      },
    );
  }

  // 100,000 separate scalar NERNST calls (Excel's per-cell path: every argument a 1×1 array).
  if (!ONLY || ONLY.includes('nernst-scalar')) {
    const fn = get('NERNST');
    if (!fn) report('nernst-scalar', '100000 scalar NERNST calls', { unavailable: 'no NERNST in the bundle' });
    else {
      const N = 100000;
      const qs = Array.from({ length: N }, (_, i) => [[10 ** ((i % 1200) / 100 - 6)]]);
      const e0 = [[0.3419]];
      const n = [[2]];
      const bareNernst = (E0, nn, q, t) => E0 - ((R * (t + T0)) / (nn * F)) * Math.log(q);
      const r = race(
        () => {
          let last;
          for (let i = 0; i < N; i++) last = fn(e0, n, qs[i], null, INVOCATION);
          return last;
        },
        () => {
          let s = 0;
          for (let i = 0; i < N; i++) s += bareNernst(0.3419, 2, qs[i][0][0], 25);
          return s;
        },
      );
      report('nernst-scalar', '100000 scalar NERNST calls', { ...r, calls: N }, undefined);
    }
  }

  // Look-up in a 10,000-row table against the built-in table (the core's findCouple).
  if (!ONLY || ONLY.includes('table-lookup')) tableLookup();

  console.log(`RESULT ${JSON.stringify(results)}`);
  if (sink === 42) console.log(''); // keeps `sink` observable
}

/**
 * Gzipped sizes of the page's scripts (gzip level 9): functions.js and taskpane.js with their targets,
 * data.js (the reference data both read, loaded once by the page before them; no target of its own) and
 * the three together, which is what the page loads.
 */
function sizes() {
  if (ONLY && !ONLY.includes('sizes')) return;
  // KB gzipped: functions.js within 60; the pane's script, E–pH view included, within 120
  const limits = { 'functions.js': 60, 'taskpane.js': 120, 'data.js': null };
  let pageRaw = 0;
  let pageGz = 0;
  for (const [f, limit] of Object.entries(limits)) {
    const p = resolve(DIST, f);
    if (!existsSync(p)) {
      console.log(`${'size'.padEnd(18)} ${f}: missing`);
      continue;
    }
    const raw = readFileSync(p);
    const gz = zlib.gzipSync(raw, { level: 9 }).length;
    pageRaw += raw.length;
    pageGz += gz;
    results.push({ name: `size ${f}`, bytes: raw.length, gzipBytes: gz });
    const target = limit === null ? '  no target (read by both bundles)' : `  target < ${limit} KB: ${gz < limit * 1024 ? 'met' : 'MISSED'}`;
    // decimal.js and decimal.js-light announce their errors as "[DecimalError]"; only decimal.js carries π
    // to 1,025 digits
    const pi = '3.14159265358979323846264338327950288419716939937510582097494459230781640628620899862803482534211706798214808651';
    const decimal = !raw.includes('[DecimalError]') ? 'no decimal.js' : raw.includes(pi) ? 'decimal.js bundled' : 'decimal.js-light bundled';
    console.log(`${'size'.padEnd(18)} ${f}: ${(raw.length / 1024).toFixed(1)} KB, gzipped ${(gz / 1024).toFixed(1)} KB, ${decimal}${target}`);
  }
  results.push({ name: 'size page', bytes: pageRaw, gzipBytes: pageGz });
  console.log(`${'size'.padEnd(18)} the page's three scripts together: ${(pageRaw / 1024).toFixed(1)} KB, gzipped ${(pageGz / 1024).toFixed(1)} KB`);
}

/* ------------------------------------------------------------------------------------------ */
/* Table look-ups                                                                              */
/* ------------------------------------------------------------------------------------------ */

/** 10,000 balanced, distinct synthetic couples: CnH2nO2 + 2H+ + 2e- -> CnH2n+2O2. */
function syntheticRecords(count) {
  const out = [];
  for (let i = 1; i <= count; i++) {
    const ox = `C${i}H${2 * i}O2`;
    const red = `C${i}H${2 * i + 2}O2`;
    out.push({
      key: `${ox}/${red}`,
      halfReaction: `${ox} + 2H+ + 2e- -> ${red}`,
      e0: ((i % 800) - 400) / 100,
      source: 'synthetic row for the benchmark',
    });
  }
  return out;
}

function tableLookup() {
  let tableMod;
  let builtinMod;
  try {
    tableMod = requireTs('src/table/table.ts');
    builtinMod = requireTs('src/table/builtin.ts');
  } catch (e) {
    report('table-lookup', '10000-row table', { unavailable: `the table module cannot be loaded: ${e.message}` });
    return;
  }
  const built = builtinMod.builtinTable();
  const big = tableMod.buildTable('bench', [...coupleRecords, ...syntheticRecords(10000)], []);
  if (big.problems.length > 0) console.log(`  (${big.problems.length} synthetic rows rejected: ${big.problems[0].message})`);
  const N = 100000;
  const builtinKeys = built.couples.map((c) => c.key);
  const bigKeys = big.table.couples.map((c) => c.key);
  // the same number of distinct keys in both runs, so that only the table's size differs
  const pick = (keys) => Array.from({ length: N }, (_, i) => keys[(i * 7919) % keys.length]);
  const qBuiltin = pick(builtinKeys);
  const qBig = pick(bigKeys.slice(-builtinKeys.length));
  const look = (t, qs) => () => {
    let s = 0;
    for (let i = 0; i < N; i++) s += t.findCouple(qs[i]).e0;
    return s;
  };
  releaseTs();
  const r = race(look(big.table, qBig), look(built, qBuiltin));
  report('table-lookup', 'findCouple in a 10,000-row table against the built-in one', { ...r, lookups: N, rows: big.table.couples.length, builtinRows: built.couples.length });
}

/* ------------------------------------------------------------------------------------------ */
/* Cold start                                                                                  */
/* ------------------------------------------------------------------------------------------ */

/** In a child process: what a fresh runtime pays before the first cell answers. */
function coldChild(what) {

  if (what === 'bundle') {
    const t1 = now();
    const fns = loadBundle(); // reads data.js, functions.js and functions.json, evaluates both scripts, registers
    const t2 = now();
    // first table-backed answer: makes the built-in table (its rows were checked at build time; see
    // src/dataset/buildTime.ts) and looks the key up
    const first = fns.get('STDPOTENTIAL') ?? fns.get('ELECTRONS') ?? fns.get('EMF');
    const v = first ? first(cell('Cu2+/Cu'), null, INVOCATION) : null;
    const t3 = now();
    if (first && typeof v?.[0]?.[0] !== 'number') throw new Error(`STDPOTENTIAL did not answer: ${JSON.stringify(v)}`);
    return { evalRegisterMs: t2 - t1, firstTableAnswerMs: t3 - t2, registered: fns.size, tableFn: !!first };
  }
  if (what === 'table') {
    const table = requireTs('src/table/table.ts');
    const t1 = now();
    const couples = JSON.parse(readFileSync(resolve(ROOT, 'data/couples.json'), 'utf8'));
    const electrodes = existsSync(resolve(ROOT, 'data/electrodes.json'))
      ? JSON.parse(readFileSync(resolve(ROOT, 'data/electrodes.json'), 'utf8'))
      : { electrodes: [] };
    const built = table.buildTable(couples.version, couples.couples, electrodes.electrodes ?? []);
    const t2 = now();
    return { parseValidateMs: t2 - t1, rows: built.table.couples.length + built.table.electrodes.length, problems: built.problems.length };
  }
  if (what === 'store') return coldStore();
  throw new Error(`unknown child ${what}`);
}

/**
 * A workbook with its own table of 2,000 user rows (beside the built-in rows) and a revision log of
 * 500 entries: the stored text is made first (not timed), then the bundle is evaluated with an Office
 * global (so that it opens its workbook channel, as in Excel's shared runtime) and the stored text is
 * handed to it the way the pane and the start-up read do (cellwrightFunctionsHost.useStoredValue:
 * parse, both checksums, every row and every log entry checked, table built), then the first table
 * look-up answers. Each log entry is a typical edit: one row's E° and source changed, a reason of
 * about 60 characters.
 */
async function coldStore() {
  const { pinnedCopy } = requireTs('src/store/copy.ts');
  const { recordsOf } = requireTs('src/store/rows.ts');
  const { writeStoredText } = requireTs('src/store/stored.ts');
  const { typicalEditLog } = requireTs('tests/store/fixtures.ts');
  const { builtinTable } = requireTs('src/table/builtin.ts');
  const pinned = pinnedCopy(recordsOf(builtinTable()));
  const extra = syntheticRecords(2000);
  const log = typicalEditLog(extra, Number(process.env.CELLWRIGHT_BENCH_LOG_ENTRIES ?? 500), pinned.basedOn);
  const copy = {
    ...pinned,
    revision: 500,
    changedAt: '2026-12-01T00:00:00.000Z',
    couples: [...pinned.couples, ...extra],
    own: { couples: extra.map((r) => r.key), electrodes: [] },
    log,
  };
  const text = writeStoredText(copy);
  const logChars = JSON.stringify(log).length;
  // The rest of the data set pinned beside it (atomic weights, species data, constants), as the pane's Pin writes it.
  const { writePinnedText } = requireTs('src/dataset/pinned.ts');
  const { DATASET_VERSION } = requireTs('src/dataset/parts.ts');
  const pinnedText = writePinnedText({ version: DATASET_VERSION, pinnedAt: '2026-12-01T00:00:00.000Z' });
  const office = {
    Office: { onReady: () => Promise.resolve({ host: 'Word' }), HostType: { Excel: 'Excel' }, context: { requirements: { isSetSupported: () => true } } },
    setTimeout,
    clearTimeout,
  };
  const t0 = now();
  const fns = loadBundle(office);
  const t1 = now();
  const host = fns.sandbox.cellwrightFunctionsHost;
  if (!host) return { unavailable: 'the bundle has no workbook channel (cellwrightFunctionsHost)' };
  await Promise.resolve(); // let the start-up read (no workbook in this host) settle
  await new Promise((r) => setTimeout(r, 0));
  const t2 = now();
  const status = host.useStoredValue(text);
  const t3 = now();
  const v = await fns.get('STDPOTENTIAL')(cell(extra[extra.length - 1].key), null, INVOCATION);
  const t4 = now();
  if (status.state !== 'workbook' || typeof v?.[0]?.[0] !== 'number') throw new Error(`the stored table was not used: ${JSON.stringify(status)} ${JSON.stringify(v)}`);
  const withData = host.usePinnedValue(pinnedText);
  const t5 = now();
  const m = await fns.get('MOLARMASS')(cell('NiSO4·6H2O'), INVOCATION);
  const t6 = now();
  if (withData.dataset?.pinned.length !== 10 || typeof m?.[0]?.[0] !== 'number') throw new Error(`the pinned data was not used: ${JSON.stringify(withData)} ${JSON.stringify(m)}`);
  return {
    rows: status.couples + status.electrodes,
    chars: text.length,
    logEntries: log.entries.length,
    logChars,
    evalRegisterMs: t1 - t0,
    readMs: t3 - t2,
    firstAnswerMs: t4 - t3,
    pinnedChars: pinnedText.length,
    bytes: Buffer.byteLength(text, 'utf8') + Buffer.byteLength(pinnedText, 'utf8'),
    pinnedReadMs: t5 - t4,
    pinnedFirstAnswerMs: t6 - t5,
  };
}

function coldStart() {
  const runs = 7;
  const child = (what) => {
    const out = [];
    for (let i = 0; i < runs; i++) {
      const r = spawnSync(process.execPath, [fileURLToPath(import.meta.url), '--child', what], { cwd: ROOT, encoding: 'utf8', env: process.env });
      if (r.status !== 0) throw new Error(`cold-start child failed: ${r.stderr}`);
      out.push(JSON.parse(r.stdout.trim().split('\n').pop()));
    }
    return out;
  };
  const b = child('bundle');
  const evalReg = median(b.map((x) => x.evalRegisterMs));
  const firstAns = median(b.map((x) => x.firstTableAnswerMs));
  const total = median(b.map((x) => x.evalRegisterMs + x.firstTableAnswerMs));
  results.push({ name: 'cold-start', evalRegisterMs: evalReg, firstTableAnswerMs: firstAns, totalMs: total, registered: b[0].registered });
  console.log(
    `${'cold-start'.padEnd(18)} read + evaluate + register ${b[0].registered} functions: ${evalReg.toFixed(1)} ms; first table answer (built-in table ready): ${firstAns.toFixed(1)} ms; together ${total.toFixed(1)} ms  target < 50 ms: ${total < 50 ? 'met' : 'MISSED'}${b[0].tableFn ? '' : ' (no table function in the bundle yet)'}`,
  );
  try {
    const t = child('table');
    const pv = median(t.map((x) => x.parseValidateMs));
    results.push({ name: 'cold-table', parseValidateMs: pv, rows: t[0].rows });
    console.log(`${'cold-table'.padEnd(18)} parse + validate the built-in table from data/ (${t[0].rows} rows, fresh process; done once at build time now): ${pv.toFixed(1)} ms`);
  } catch (e) {
    console.log(`${'cold-table'.padEnd(18)} not yet available (${e.message.split('\n')[0]})`);
  }
  const storeDir = resolve(ROOT, 'src/store');
  if (!existsSync(storeDir) || readdirSync(storeDir).length === 0) {
    console.log(`${'cold-store'.padEnd(18)} reading a 2000-row stored table: not yet available (no src/store)`);
    return;
  }
  try {
    const st = child('store');
    if (st[0].unavailable) {
      console.log(`${'cold-store'.padEnd(18)} not yet available (${st[0].unavailable})`);
      return;
    }
    const readMs = median(st.map((x) => x.readMs));
    const firstMs = median(st.map((x) => x.firstAnswerMs));
    const evalMs = median(st.map((x) => x.evalRegisterMs));
    const pinnedMs = median(st.map((x) => x.pinnedReadMs));
    const pinnedFirstMs = median(st.map((x) => x.pinnedFirstAnswerMs));
    results.push({ name: 'cold-store', rows: st[0].rows, chars: st[0].chars, logEntries: st[0].logEntries, logChars: st[0].logChars, evalRegisterMs: evalMs, readMs, firstAnswerMs: firstMs, pinnedChars: st[0].pinnedChars, bytes: st[0].bytes, pinnedReadMs: pinnedMs, pinnedFirstAnswerMs: pinnedFirstMs });
    console.log(
      `${'cold-store'.padEnd(18)} a workbook with its own ${st[0].rows}-row table and a ${st[0].logEntries}-entry log (${(st[0].chars / 1024).toFixed(0)} KB stored, the log ${(st[0].logChars / 1024).toFixed(0)} KB): evaluate + register ${evalMs.toFixed(1)} ms, read + validate + build the table ${readMs.toFixed(1)} ms, first look-up ${firstMs.toFixed(1)} ms (fresh process)`,
    );
    console.log(
      `${'cold-pinned'.padEnd(18)} the same workbook with the rest of its data set pinned (${(st[0].pinnedChars / 1024).toFixed(0)} KB more; ${(st[0].bytes / 1024).toFixed(0)} KB UTF-8 in all): read + check the pinned data ${pinnedMs.toFixed(1)} ms, first MOLARMASS with it ${pinnedFirstMs.toFixed(1)} ms`,
    );
  } catch (e) {
    console.log(`${'cold-store'.padEnd(18)} failed: ${e.message.split('\n')[0]}`);
  }
}

/** `cellwright check` on a workbook of 100,000 add-in formulas (scripts/lib/checkbench.mjs, a fresh process). */
function checkSpeed() {
  const r = spawnSync(process.execPath, [resolve(ROOT, 'scripts/lib/checkbench.mjs'), '100000'], { encoding: 'utf8' });
  const line = r.stdout.trim().split('\n').pop() ?? '';
  if (r.status !== 0 || !line.startsWith('{')) {
    console.log(`${'check'.padEnd(18)} failed: ${(r.stderr || r.stdout).split('\n').find((l) => l.trim() !== '') ?? r.status}`);
    return;
  }
  const x = JSON.parse(line);
  results.push({ name: 'check', ...x });
  console.log(
    `${'check'.padEnd(18)} cellwright check, ${x.formulas.toLocaleString('en-US')} add-in formulas (reading the file included): ${x.seconds.toFixed(1)} s, ${Math.round(x.formulasPerSecond).toLocaleString('en-US')} formulas per second, ${x.ok ? 'all agree' : 'NOT all agree'}`,
  );
}

if (args[0] === '--child') {
  Promise.resolve(coldChild(args[1])).then((r) => console.log(JSON.stringify(r)));
} else {
  main();
}
