// Stored forms of the potential table made with the add-in's own store modules (src/store/*.ts,
// read through scripts/lib/ts-hooks.mjs): the pinned built-in table (what the pane's Pin writes), a
// copy with one change, and the table of an exported CSV file (`cellwright check --table`).
import { register } from 'node:module';
import { resolve } from 'node:path';
import { pathToFileURL } from 'node:url';
import { ROOT } from './bundle.mjs';

let mods;
async function store() {
  if (mods) return mods;
  register('./ts-hooks.mjs', import.meta.url);
  const load = (p) => import(pathToFileURL(resolve(ROOT, p)).href);
  const [copy, stored, rows, builtin, csv, pinnedData, parts] = await Promise.all([
    load('src/store/copy.ts'),
    load('src/store/stored.ts'),
    load('src/store/rows.ts'),
    load('src/table/builtin.ts'),
    load('src/store/csv.ts'),
    load('src/dataset/pinned.ts'),
    load('src/dataset/parts.ts'),
  ]);
  mods = { copy, stored, rows, builtin, csv, pinnedData, parts, records: rows.recordsOf(builtin.builtinTable()) };
  return mods;
}

/** The stored text of the built-in table pinned to a workbook (revision 1, written at `changedAt`). */
export async function pinnedStoredText(changedAt = new Date().toISOString()) {
  const m = await store();
  return m.stored.writeStoredText({ ...m.copy.pinnedCopy(m.records), revision: 1, changedAt });
}

/** The stored text of the add-in's built-in reference data pinned to a workbook (every part besides the table; what the pane's Pin writes). */
export async function pinnedDataText(pinnedAt = new Date().toISOString()) {
  const m = await store();
  return m.pinnedData.writePinnedText({ version: m.parts.DATASET_VERSION, pinnedAt });
}

/** The stored text after one table change (see TableChange in src/store/copy.ts) applied to `text`. */
export async function changedStoredText(text, change, changedAt = new Date().toISOString()) {
  const m = await store();
  const read = m.stored.readStoredText(text, m.records);
  if (!read.ok) throw new Error(read.problem.message);
  const next = m.copy.applyChange(read.copy, m.records, change);
  return m.stored.writeStoredText({ ...next, revision: read.copy.revision + 1, changedAt });
}

/**
 * The stored text of the table an exported CSV file describes (the table becomes exactly the file's rows,
 * as the pane's "replace" import does). Throws with every rejected line when the file is not usable.
 */
export async function storedTextFromCsv(csvText, changedAt = new Date().toISOString()) {
  const m = await store();
  const imp = m.csv.importCsv(csvText);
  if (imp.fileProblem) throw new Error(imp.fileProblem);
  if (imp.rejected.length) throw new Error(`${imp.rejected.length} line(s) rejected: ${imp.rejected.map((r) => `line ${r.line}: ${r.reason}`).join('; ')}`);
  const next = m.copy.applyChange(null, m.records, { kind: 'import', mode: 'replace', couples: imp.couples, electrodes: imp.electrodes });
  return m.stored.writeStoredText({ ...next, revision: 1, changedAt });
}
