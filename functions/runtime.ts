/**
 * Start-up of the functions bundle.
 *
 * Evaluated with only a CustomFunctions global (tests, the demo, the benchmark: no Office, Excel,
 * window or document) this does nothing and the functions answer from the built-in table.
 *
 * With Office present (Excel's shared runtime, where the task pane page loads this bundle):
 *  1. puts the pane's channel on globalThis (functions/workbookHost.ts);
 *  2. starts reading the workbook's own table at once; every function that reads the table waits for
 *     that read, so no cell shows a value from the built-in table when the workbook has its own;
 *  3. a table that cannot be read makes those functions answer #N/A with the reason; it is never
 *     replaced by the built-in table and never written over here;
 *  4. if Excel has not answered within START_TIMEOUT_MS the functions answer #N/A ("did not answer")
 *     rather than wait for ever; when the answer comes later it is used and the workbook recalculated;
 *  5. when the stored table changes elsewhere (a co-author, another pane), the new one is read, used
 *     and the workbook recalculated;
 *  6. once the table in use is known, it is compared with the one the workbook's results were last
 *     computed with (settings key cellwright.computedWith, written at every recalculation Cellwright
 *     asks for); when they differ, or nothing is recorded, the workbook is recalculated once (full) and
 *     the table recorded, so results saved under another table (an older built-in one, a table edited
 *     elsewhere) do not stay in the cells silently.
 *  7. the workbook's pinned data (the data set's parts besides the table, settings key
 *     cellwright.pinnedData) is read with the table and used with it in one step (functions/dataHost.ts);
 *     the data the results were computed with is recorded under cellwright.computedWithData and checked
 *     at start-up like the table's record, so an add-in update that changes built-in atomic weights
 *     recalculates an unpinned workbook once.
 */
import { hostStatus, installFunctionsHost, installReadFailure, installStoredValue, lastStoredValue, readTicket, startTableLoad } from './workbookHost';
import { lastPinnedValue } from './dataHost';
import { readComputedWithData, readPinnedValue, recordComputedWithData } from '../workbook/pinnedData';
import { TABLE_SETTING_KEY, computedWithOf, readComputedWith, readStoredValue, recalculateAll } from '../workbook/store';
import { sameStoredValue } from '../workbook/settings';

/** How long the functions wait for Excel to hand over the workbook's table at start-up. */
export const START_TIMEOUT_MS = 60_000;

function officePresent(): boolean {
  return typeof Office !== 'undefined' && Office !== null && typeof Office.onReady === 'function';
}

class NoAnswer extends Error {}

let inExcel = false;
/** The table setting as last read from the workbook: the settings-changed event fires for every setting, the table's only matters. */
let lastRead: unknown = undefined;
/** The pinned-data setting as last read. */
let lastPinnedRead: unknown = undefined;
/** True once the start-up read has passed its time-out (its late answer is then installed here). */
let timedOut = false;

/** Reads the stored values (table, pinned data) once Office is ready; nulls when not running in Excel (no workbook to read). */
async function readAtStartup(): Promise<{ table: unknown; pinned: unknown }> {
  const info = await Office.onReady();
  if (info.host !== Office.HostType.Excel || typeof Excel === 'undefined') return { table: null, pinned: null };
  if (!Office.context.requirements.isSetSupported('ExcelApi', '1.4')) {
    throw new Error('this version of Excel cannot read workbook settings (ExcelApi 1.4 is needed)');
  }
  inExcel = true;
  lastRead = await readStoredValue();
  lastPinnedRead = await readPinnedValue();
  return { table: lastRead, pinned: lastPinnedRead };
}

/** Recalculates the workbook fully and records the table and the data the results are now computed with. */
async function recalculate(): Promise<void> {
  const s = hostStatus();
  await recalculateAll(computedWithOf(s));
  if (s.state !== 'loading' && s.dataChecksum !== undefined) await recordComputedWithData(s.dataChecksum);
}

function withTimeout<T>(p: Promise<T>, ms: number): Promise<T> {
  return new Promise<T>((resolve, reject) => {
    const timer = setTimeout(() => {
      timedOut = true;
      reject(new NoAnswer(`Excel did not answer within ${ms / 1000} s`));
    }, ms);
    p.then(
      (v) => {
        clearTimeout(timer);
        resolve(v);
      },
      (e: unknown) => {
        clearTimeout(timer);
        reject(e instanceof Error ? e : new Error(String(e)));
      },
    );
  });
}

/**
 * Reads the changed table and uses it, in the order of reads (a value the pane hands over after this
 * read started wins). A value that cannot be read, or a read that fails, makes the functions answer
 * #N/A: they never stay silently on the table they had.
 */
async function readChanged(): Promise<void> {
  const ticket = readTicket();
  let value: unknown;
  let pinned: unknown;
  try {
    value = await readStoredValue();
    pinned = await readPinnedValue();
  } catch (e) {
    console.error(`Cellwright: reading the changed ${TABLE_SETTING_KEY} setting failed`, e);
    const why = e instanceof Error ? e.message : String(e);
    if (installReadFailure(ticket, `the table was changed elsewhere and reading it failed (${why}); open the task pane to read it again`)) await recalculate();
    return;
  }
  if (sameStoredValue(value, lastRead) && sameStoredValue(pinned, lastPinnedRead)) return;
  lastRead = value;
  lastPinnedRead = pinned;
  if (sameStoredValue(value, lastStoredValue()) && sameStoredValue(pinned, lastPinnedValue())) return;
  if (installStoredValue(ticket, value, pinned)) await recalculate();
}

/** Recalculates once when the workbook's results were computed with another table than the one in use. */
async function recalculateIfStale(): Promise<void> {
  const s = hostStatus();
  const now = computedWithOf(s);
  if (now === undefined) return;
  if ((await readComputedWith()) === now && (s.dataChecksum === undefined || (await readComputedWithData()) === s.dataChecksum)) return;
  await recalculate();
}

async function watchForChanges(): Promise<void> {
  await Excel.run(async (context) => {
    context.workbook.settings.onSettingsChanged.add(async () => {
      try {
        await readChanged();
      } catch (e) {
        console.error(`Cellwright: using the changed ${TABLE_SETTING_KEY} setting failed`, e);
      }
    });
    await context.sync();
  });
}

function start(): void {
  installFunctionsHost();
  const read = readAtStartup();
  const load = startTableLoad(withTimeout(read, START_TIMEOUT_MS));
  read.then(
    async (value) => {
      await load.done;
      // The answer came after the time-out: use it now, unless the pane has handed a table over since.
      if (timedOut && installStoredValue(load.generation, value.table, value.pinned)) await recalculate();
      else if (inExcel) await recalculateIfStale();
      if (inExcel) await watchForChanges();
    },
    () => undefined, // the failure is already the table's reason (#N/A); nothing else to do
  ).catch((e: unknown) => console.error('Cellwright: watching the workbook table failed', e));
}

if (officePresent()) start();
