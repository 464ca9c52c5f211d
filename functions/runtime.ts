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
 *     and the workbook recalculated.
 */
import { installFunctionsHost, isCurrent, lastStoredValue, startTableLoad, useStoredValue } from './workbookHost';
import { TABLE_SETTING_KEY, readStoredValue, recalculateAll, sameStoredValue } from '../workbook/store';

/** How long the functions wait for Excel to hand over the workbook's table at start-up. */
export const START_TIMEOUT_MS = 60_000;

function officePresent(): boolean {
  return typeof Office !== 'undefined' && Office !== null && typeof Office.onReady === 'function';
}

class NoAnswer extends Error {}

let inExcel = false;

/** Reads the stored value once Office is ready; null when not running in Excel (no workbook to read). */
async function readAtStartup(): Promise<unknown> {
  const info = await Office.onReady();
  if (info.host !== Office.HostType.Excel || typeof Excel === 'undefined') return null;
  if (!Office.context.requirements.isSetSupported('ExcelApi', '1.4')) {
    throw new Error('this version of Excel cannot read workbook settings (ExcelApi 1.4 is needed)');
  }
  inExcel = true;
  return readStoredValue();
}

function withTimeout<T>(p: Promise<T>, ms: number): Promise<T> {
  return new Promise<T>((resolve, reject) => {
    const timer = setTimeout(() => reject(new NoAnswer(`Excel did not answer within ${ms / 1000} s`)), ms);
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

async function useIfChanged(value: unknown): Promise<void> {
  if (sameStoredValue(value, lastStoredValue())) return;
  useStoredValue(value);
  await recalculateAll();
}

async function watchForChanges(): Promise<void> {
  await Excel.run(async (context) => {
    context.workbook.settings.onSettingsChanged.add(async () => {
      try {
        await useIfChanged(await readStoredValue());
      } catch (e) {
        console.error(`Cellwright: reading the changed ${TABLE_SETTING_KEY} setting failed`, e);
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
      // The answer came after the time-out: use it now, unless the pane has set a table since.
      if (isCurrent(load.generation) && lastStoredValue() === undefined) {
        useStoredValue(value);
        await recalculateAll();
      }
      if (inExcel) await watchForChanges();
    },
    () => undefined, // the failure is already the table's reason (#N/A); nothing else to do
  ).catch((e: unknown) => console.error('Cellwright: watching the workbook table failed', e));
}

if (officePresent()) start();
