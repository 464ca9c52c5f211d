// npm run test:browser — the task pane in a real browser.
//
// 1. Builds dist/ when it is missing or older than the sources.
// 2. Serves dist/ on a free localhost port, with a stand-in office.js (tests/browser/stub-office.js) at
//    /office-js/office.js that fakes Office and Excel in the page (the workbook lives in localStorage).
// 3. Drives the built pane with playwright-core in Debian's Chromium (/usr/bin/chromium, headless), one
//    fresh browser context per test, 320 px wide. The tests are in tests/browser/pane.tests.mjs.
// 4. Saves screenshots under test-output/screenshots/, writes test-output/browser.json
//    ({ numPassedTests, numFailedTests, … }, read by .ci/run) and exits non-zero when a test failed.
//
// Options: --grep <text> runs only tests whose name contains the text; --no-build skips the build check.
import { spawnSync } from 'node:child_process';
import { createReadStream, existsSync, mkdirSync, readdirSync, statSync, writeFileSync, rmSync } from 'node:fs';
import { createServer } from 'node:http';
import { dirname, extname, join, normalize, resolve, sep } from 'node:path';
import { fileURLToPath } from 'node:url';
import { chromium } from 'playwright-core';
import { tests } from '../tests/browser/pane.tests.mjs';

const root = resolve(dirname(fileURLToPath(import.meta.url)), '..');
const dist = resolve(root, 'dist');
const outDir = resolve(root, 'test-output');
const shotDir = resolve(outDir, 'screenshots');
const stubOffice = resolve(root, 'tests/browser/stub-office.js');
const CHROMIUM = process.env.CHROMIUM_PATH || '/usr/bin/chromium';
const TEST_TIMEOUT_MS = 90_000;
const WIDTH = 320;

const args = process.argv.slice(2);
const grepAt = args.indexOf('--grep');
const grep = grepAt >= 0 ? args[grepAt + 1] : null;

mkdirSync(shotDir, { recursive: true });

function writeSummary(summary) {
  writeFileSync(resolve(outDir, 'browser.json'), `${JSON.stringify(summary, null, 2)}\n`);
}

function newestMtime(dir) {
  let newest = 0;
  if (!existsSync(dir)) return 0;
  for (const entry of readdirSync(dir, { withFileTypes: true })) {
    const p = join(dir, entry.name);
    if (entry.isDirectory()) newest = Math.max(newest, newestMtime(p));
    else newest = Math.max(newest, statSync(p).mtimeMs);
  }
  return newest;
}

function ensureBuilt() {
  const built = ['taskpane.html', 'taskpane.js', 'data.js', 'functions.js', 'taskpane.css'].map((f) => resolve(dist, f));
  const missing = built.some((f) => !existsSync(f));
  const oldest = missing ? 0 : Math.min(...built.map((f) => statSync(f).mtimeMs));
  const sources = Math.max(...['src', 'functions', 'taskpane', 'data'].map((d) => newestMtime(resolve(root, d))), statSync(resolve(root, 'webpack.config.cjs')).mtimeMs);
  if (!missing && oldest >= sources) return true;
  console.log(missing ? 'dist/ is missing: building …' : 'dist/ is older than the sources: building …');
  const r = spawnSync(process.execPath, [resolve(root, 'node_modules/webpack-cli/bin/cli.js'), '--mode', 'production'], { cwd: root, stdio: 'inherit' });
  return r.status === 0;
}

const TYPES = {
  '.html': 'text/html; charset=utf-8',
  '.js': 'text/javascript; charset=utf-8',
  '.css': 'text/css; charset=utf-8',
  '.json': 'application/json; charset=utf-8',
  '.png': 'image/png',
  '.xml': 'application/xml; charset=utf-8',
};

function serve() {
  const server = createServer((req, res) => {
    const url = new URL(req.url ?? '/', 'http://localhost');
    let file;
    if (url.pathname === '/office-js/office.js') file = stubOffice;
    else {
      const rel = normalize(decodeURIComponent(url.pathname)).replace(/^[/\\]+/, '');
      file = resolve(dist, rel === '' ? 'taskpane.html' : rel);
      if (!file.startsWith(dist + sep)) file = null;
    }
    if (file === null || !existsSync(file) || !statSync(file).isFile()) {
      res.writeHead(404, { 'content-type': 'text/plain' });
      res.end('not found');
      return;
    }
    res.writeHead(200, { 'content-type': TYPES[extname(file)] ?? 'application/octet-stream', 'cache-control': 'no-store' });
    createReadStream(file).pipe(res);
  });
  return new Promise((ok) => server.listen(0, '127.0.0.1', () => ok(server)));
}

function withTimeout(p, ms, what) {
  let timer;
  return Promise.race([p, new Promise((_, no) => (timer = setTimeout(() => no(new Error(`${what} took longer than ${ms / 1000} s`)), ms)))]).finally(() => clearTimeout(timer));
}

async function main() {
  const started = Date.now();
  if (!args.includes('--no-build') && !ensureBuilt()) {
    writeSummary({ numPassedTests: 0, numFailedTests: 1, numTotalTests: 1, tests: [{ name: 'build', status: 'failed', error: 'webpack build failed' }] });
    process.exit(1);
  }
  if (!existsSync(CHROMIUM)) {
    writeSummary({ numPassedTests: 0, numFailedTests: 1, numTotalTests: 1, tests: [{ name: 'chromium', status: 'failed', error: `no Chromium at ${CHROMIUM} (apt-get install -y chromium)` }] });
    console.error(`No Chromium at ${CHROMIUM}. Install it with: apt-get update && apt-get install -y chromium`);
    process.exit(1);
  }
  for (const f of readdirSync(shotDir)) if (f.endsWith('.png')) rmSync(resolve(shotDir, f));
  const server = await serve();
  const base = `http://127.0.0.1:${server.address().port}`;
  const browser = await chromium.launch({
    executablePath: CHROMIUM,
    args: ['--headless', '--no-sandbox', '--disable-gpu', '--disable-background-networking', '--disable-component-update', '--disable-sync', '--no-first-run'],
  });
  const results = [];
  const screenshots = [];
  const selected = tests.filter((t) => grep === null || t.name.includes(grep));
  for (const t of selected) {
    const context = await browser.newContext({ viewport: { width: WIDTH, height: 900 }, acceptDownloads: true });
    const problems = [];
    const allowed = [];
    const pages = [];
    const open = async (path = '/taskpane.html') => {
      const page = await context.newPage();
      page.on('pageerror', (e) => problems.push(`page error: ${e.message}`));
      page.on('console', (m) => {
        if (m.type() === 'error') problems.push(`console error: ${m.text()}`);
      });
      // Anything the page tries to load from elsewhere is a failure (it must load only its own files).
      page.on('request', (r) => {
        if (!r.url().startsWith(base) && !r.url().startsWith('blob:') && !r.url().startsWith('data:')) problems.push(`request to ${r.url()}`);
      });
      await page.goto(base + path);
      pages.push(page);
      return page;
    };
    // A screenshot of what the pane shows (320 × 900, a usual task pane), scrolled to `selector` when given.
    const shot = async (page, name, selector) => {
      const file = resolve(shotDir, `${name}.png`);
      if (selector) {
        await page.locator(selector).first().evaluate((el) => {
          el.scrollIntoView({ block: 'start' });
          window.scrollBy(0, -8);
        });
      } else await page.evaluate(() => window.scrollTo(0, 0));
      await page.screenshot({ path: file });
      screenshots.push(`test-output/screenshots/${name}.png`);
    };
    const t0 = Date.now();
    let error = null;
    try {
      await withTimeout(t.run({ open, shot, base, allow: (re) => allowed.push(re) }), TEST_TIMEOUT_MS, t.name);
      const unexpected = problems.filter((p) => !allowed.some((re) => re.test(p)));
      if (unexpected.length > 0) throw new Error(`the page reported problems:\n  ${unexpected.join('\n  ')}`);
    } catch (e) {
      error = e instanceof Error ? (e.stack ?? e.message) : String(e);
      if (pages[0]) {
        try {
          await shot(pages[pages.length - 1], `FAILED-${t.name.replace(/[^a-z0-9]+/gi, '-').slice(0, 60)}`);
        } catch {
          /* the page is gone */
        }
      }
    }
    await context.close();
    const ms = Date.now() - t0;
    results.push({ name: t.name, status: error === null ? 'passed' : 'failed', durationMs: ms, ...(error === null ? {} : { error }) });
    console.log(`${error === null ? '✓' : '✗'} ${t.name} (${ms} ms)${error === null ? '' : `\n    ${error.split('\n').join('\n    ')}`}`);
  }
  await browser.close();
  server.close();
  const passed = results.filter((r) => r.status === 'passed').length;
  const failed = results.length - passed;
  writeSummary({
    numPassedTests: passed,
    numFailedTests: failed,
    numTotalTests: results.length,
    durationMs: Date.now() - started,
    viewportWidth: WIDTH,
    screenshots: [...new Set(screenshots)],
    tests: results,
  });
  console.log(`\nbrowser tests: ${passed} passed, ${failed} failed (test-output/browser.json; screenshots in test-output/screenshots/)`);
  process.exit(failed === 0 && results.length > 0 ? 0 : 1);
}

main().catch((e) => {
  console.error(e);
  writeSummary({ numPassedTests: 0, numFailedTests: 1, numTotalTests: 1, tests: [{ name: 'runner', status: 'failed', error: String(e?.stack ?? e) }] });
  process.exit(1);
});
