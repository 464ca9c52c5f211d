// Loads the production functions bundle (dist/data.js, dist/functions.js + dist/functions.json) the
// way Excel's runtime does: the reference data (data.js) then the functions evaluated with a
// CustomFunctions global, in the order taskpane.html loads them, collecting the functions associated.
// Calls go by id with every declared parameter passed (null for omitted ones) and an invocation
// object appended last.
//
// Where it is evaluated: by default in this process's own context, with a CustomFunctions global
// installed for the rest of the run (so the functions run as fast as they do in Excel; inside
// node:vm every global look-up, Math included, goes through the context's interceptor). Given
// extra globals (Office, Excel, network stubs) or { isolated: true }, in a fresh node:vm context
// whose only globals are CustomFunctions and those: the self-containment contract (the bundle
// needs nothing else) is tested that way.
//
// The one loader: used by the demo (scripts/demo.mjs), the reference generator (scripts/docs.mjs)
// and, through tests/bundle/harness.ts (types in bundle.d.mts), by the test suite. Plain
// JavaScript so that those scripts run on bare node.
import { existsSync, readFileSync, statSync, readdirSync, utimesSync } from 'node:fs';
import { spawnSync } from 'node:child_process';
import { dirname, resolve, join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { createRequire } from 'node:module';
import vm from 'node:vm';

export const ROOT = resolve(dirname(fileURLToPath(import.meta.url)), '../..');
const { BUILD_SCRIPTS } = createRequire(import.meta.url)('./buildInputs.cjs');
export const DIST = resolve(ROOT, 'dist');

/** The scripts that make up the functions, in the order the page loads them (taskpane.html): the
 * reference data both bundles read, then the functions (which wait for the data before they run). */
export const FUNCTION_SCRIPTS = ['data.js', 'functions.js'];

/** An Excel error value as the bundle makes it (new CustomFunctions.Error(code, message)). */
export class FakeError {
  constructor(code, message) {
    this.code = code;
    this.message = message;
  }
}

export const ErrorCode = {
  invalidValue: '#VALUE!',
  notAvailable: '#N/A',
  divisionByZero: '#DIV/0!',
  invalidNumber: '#NUM!',
  nullReference: '#NULL!',
  invalidName: '#NAME?',
  invalidReference: '#REF!',
};

/** Newest modification time (ms) of the files under the given directories of the project. */
function newestSource(dirs) {
  let newest = 0;
  const walk = (dir) => {
    if (!existsSync(dir)) return;
    for (const entry of readdirSync(dir, { withFileTypes: true })) {
      const p = join(dir, entry.name);
      if (entry.isDirectory()) walk(p);
      else newest = Math.max(newest, statSync(p).mtimeMs);
    }
  };
  for (const d of dirs) walk(resolve(ROOT, d));
  for (const f of ['webpack.config.cjs', 'package.json', ...BUILD_SCRIPTS]) {
    const p = resolve(ROOT, f);
    if (existsSync(p)) newest = Math.max(newest, statSync(p).mtimeMs);
  }
  return newest;
}

/**
 * Builds dist/ with the production build when it is missing or older than the sources
 * (src/, workbook/, functions/, data/). Returns one plain sentence saying what was done, for the caller to print.
 * A failed rebuild over an existing dist/ keeps the old bundle and says so; a failed first build
 * throws.
 */
export function ensureBuilt({ quiet = false } = {}) {
  const built = [...FUNCTION_SCRIPTS, 'functions.json'].map((f) => resolve(DIST, f));
  const present = built.every((f) => existsSync(f));
  const stale = present && newestSource(['src', 'workbook', 'functions', 'data']) > Math.min(...built.map((f) => statSync(f).mtimeMs));
  if (present && !stale) return 'The existing production build in dist/ was used.';
  const why = present ? 'dist/ is older than the sources' : 'dist/ has no functions bundle yet';
  if (!quiet) process.stderr.write(`Building the functions bundle: ${why} …\n`);
  const webpackCli = resolve(ROOT, 'node_modules/webpack-cli/bin/cli.js');
  const r = spawnSync(process.execPath, [webpackCli, '--mode', 'production'], { cwd: ROOT, encoding: 'utf8' });
  const ok = r.status === 0 && built.every((f) => existsSync(f));
  if (!ok) {
    const tail = `${r.stdout ?? ''}${r.stderr ?? ''}`.trim().split('\n').slice(-15).join('\n');
    if (!present) throw new Error(`the production build failed, so there is no bundle to run:\n${tail}`);
    return `The rebuild failed (${tail.split('\n').pop()}), so the previous build in dist/ was used.`;
  }
  // webpack leaves an output file untouched when its content did not change: mark them all as fresh, or
  // every later run would find them older than the sources and build again
  const now = new Date();
  for (const f of built) utimesSync(f, now, now);
  return present ? 'dist/ was older than the sources, so it was rebuilt.' : 'dist/ had no functions bundle yet, so it was built.';
}

/** The array data.js puts its modules in (output.chunkLoadingGlobal in webpack.config.cjs). */
export const CHUNK_GLOBAL = 'cellwrightChunks';

/**
 * Evaluates dist/data.js and dist/functions.js with a CustomFunctions global (see above for where) and returns
 * { metadata, registered, byId, sandbox, call(id, ...args) }; `sandbox` holds the globals the
 * bundle was given (in a node:vm context, the context's global object).
 */
export function loadBundle(extraGlobals = {}, distDir = DIST, { isolated = false } = {}) {
  const scripts = FUNCTION_SCRIPTS.map((f) => ({ f, code: readFileSync(resolve(distDir, f), 'utf8') }));
  const metadata = JSON.parse(readFileSync(resolve(distDir, 'functions.json'), 'utf8'));
  const registered = new Map();
  const CustomFunctions = {
    Error: FakeError,
    ErrorCode,
    associate(idOrMap, fn) {
      if (typeof idOrMap === 'string') registered.set(idOrMap.toUpperCase(), fn);
      else for (const [k, v] of Object.entries(idOrMap)) registered.set(k.toUpperCase(), v);
    },
  };
  const sandbox = { CustomFunctions, ...extraGlobals };
  if (isolated || Object.keys(extraGlobals).length > 0) {
    vm.createContext(sandbox);
    for (const { f, code } of scripts) vm.runInContext(code, sandbox, { filename: f });
  } else {
    globalThis.CustomFunctions = CustomFunctions;
    // a fresh array for each load, as on a new page: data.js of this load, not an earlier one's
    delete globalThis[CHUNK_GLOBAL];
    for (const { f, code } of scripts) vm.runInThisContext(code, { filename: f });
  }
  const byId = new Map(metadata.functions.map((f) => [f.id, f]));
  return {
    metadata,
    registered,
    byId,
    sandbox,
    /** Calls a function like Excel: omitted parameters null, an invocation object appended. */
    call(id, ...args) {
      const meta = byId.get(id);
      const fn = registered.get(id);
      if (!meta || !fn) throw new Error(`no function ${id} in the bundle`);
      if (args.length > meta.parameters.length) throw new Error(`${id} takes ${meta.parameters.length} arguments`);
      const full = [...args];
      while (full.length < meta.parameters.length) full.push(null);
      full.push({ functionName: id, address: 'Sheet1!A1', setResult() {}, onCanceled: null });
      return fn(...full);
    },
  };
}
