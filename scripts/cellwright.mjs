#!/usr/bin/env node
// cellwright: command-line tools of the Cellwright add-in.
//
//   cellwright check <book.xlsx> [--table <file.csv>] [--tolerance <relative>] [--json]
//
// Recomputes every formula of the workbook outside Excel (the add-in's functions through the
// production bundle, everything else through the formula engine) and compares each result with the
// value cached in the file. Exit status: 0 everything agrees; 1 a cell differs or a formula cannot be
// evaluated; 2 the file (or its stored potential table, or the --table file) cannot be read.
import { readFileSync } from 'node:fs';
import { ensureBuilt } from './lib/bundle.mjs';
import { UnreadableError, checkWorkbook, reportLines, show } from './lib/check.mjs';

const USAGE = 'usage: cellwright check <book.xlsx> [--table <file.csv>] [--tolerance <relative>] [--json]';

function fail(code, line) {
  process.stderr.write(`cellwright: ${line}\n`);
  process.exit(code);
}

function parseArgs(argv) {
  const [command, ...rest] = argv;
  if (command !== 'check') fail(2, command ? `unknown command "${command}"; ${USAGE}` : USAGE);
  const opts = { file: null, table: null, tolerance: 1e-9, json: false };
  for (let i = 0; i < rest.length; i++) {
    const a = rest[i];
    if (a === '--json') opts.json = true;
    else if (a === '--table') opts.table = rest[++i] ?? fail(2, `--table needs a file; ${USAGE}`);
    else if (a === '--tolerance') {
      const t = Number(rest[++i]);
      if (!(t >= 0 && t < 1)) fail(2, `--tolerance needs a relative tolerance between 0 and 1, e.g. 1e-9; ${USAGE}`);
      opts.tolerance = t;
    } else if (a.startsWith('-')) fail(2, `unknown option "${a}"; ${USAGE}`);
    else if (opts.file === null) opts.file = a;
    else fail(2, `one workbook at a time; ${USAGE}`);
  }
  if (opts.file === null) fail(2, USAGE);
  return opts;
}

function progressBar() {
  if (!process.stderr.isTTY) return null;
  let last = 0;
  return (done, total) => {
    const now = Date.now();
    if (done < total && now - last < 100) return;
    last = now;
    const width = 30;
    const filled = Math.round((done / total) * width);
    process.stderr.write(`\r  [${'#'.repeat(filled)}${'.'.repeat(width - filled)}] ${done}/${total} formulas`);
    if (done === total) process.stderr.write('\r\x1b[K');
  };
}

async function main() {
  const opts = parseArgs(process.argv.slice(2));
  let buffer;
  try {
    buffer = readFileSync(opts.file);
  } catch (e) {
    fail(2, `${opts.file}: cannot be read (${e.code ?? e.message})`);
  }
  let tableCsv = null;
  if (opts.table) {
    try {
      tableCsv = readFileSync(opts.table, 'utf8');
    } catch (e) {
      fail(2, `${opts.table}: cannot be read (${e.code ?? e.message})`);
    }
  }
  try {
    ensureBuilt({ quiet: opts.json });
  } catch (e) {
    fail(2, `the functions bundle cannot be built: ${String(e.message).split('\n')[0]}`);
  }
  let report;
  try {
    report = await checkWorkbook(buffer, { tolerance: opts.tolerance, tableCsv, tableCsvName: opts.table, onProgress: opts.json ? null : progressBar() });
  } catch (e) {
    if (e instanceof UnreadableError) fail(2, `${opts.file}: ${e.message}`);
    throw e;
  }
  if (opts.json) {
    const plain = (v) => (v !== null && typeof v === 'object' && 'error' in v ? { error: v.error } : v);
    const out = {
      file: opts.file,
      ok: report.ok,
      table: report.table,
      tolerance: report.tolerance,
      counts: report.counts,
      differing: report.differing.map((d) => ({ ...d, stored: plain(d.stored), recomputed: plain(d.recomputed), shown: { stored: show(d.stored), recomputed: show(d.recomputed) } })),
      notEvaluable: report.notEvaluable,
      seconds: Number(report.seconds.toFixed(3)),
    };
    process.stdout.write(`${JSON.stringify(out, null, 2)}\n`);
  } else {
    process.stdout.write(`${reportLines(report, opts.file).join('\n')}\n`);
  }
  process.exitCode = report.ok ? 0 : 1;
}

main().catch((e) => fail(2, `unexpected failure: ${e && e.message ? e.message : String(e)}`));
