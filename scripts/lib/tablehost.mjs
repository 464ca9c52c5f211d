// The production bundle with a workbook's stored potential table in use, read by the runtime's own
// start-up path (functions/runtime.ts → readStoredText, checksum included): the bundle is evaluated
// with a minimal Office/Excel pair whose workbook settings hold exactly the stored value, so the
// functions read, check and use it as they do in Excel; the same for the pinned data (the data set's
// other parts) when given. Used by `cellwright check` and the demo.
import { loadBundle } from './bundle.mjs';
import { PINNED_DATA_KEY, TABLE_SETTING_KEY } from './webextension.mjs';

/** An Office + Excel pair that answers the settings reads of workbook/store.ts and workbook/pinnedData.ts with `stored` and `pinned`. */
function hostFor(stored, pinned) {
  const values = { [TABLE_SETTING_KEY]: stored, [PINNED_DATA_KEY]: pinned };
  const Office = {
    onReady: async () => ({ host: 'Excel', platform: 'PC' }),
    HostType: { Excel: 'Excel' },
    context: { requirements: { isSetSupported: () => true } },
  };
  const context = {
    workbook: {
      settings: {
        getItemOrNullObject(key) {
          const v = values[key];
          const has = v !== null && v !== undefined;
          return { load() {}, isNullObject: !has, value: has ? v : null, delete() {} };
        },
        // the start-up recalculation records the table it computed with (cellwright.computedWith)
        add() {},
        onSettingsChanged: { add() {} },
      },
      application: { calculate() {} },
    },
    sync: async () => undefined,
  };
  const Excel = { run: async (cb) => cb(context), CalculationType: { full: 'Full', recalculate: 'Recalculate' } };
  return { Office, Excel };
}

/**
 * Loads the bundle with `stored` (null: the workbook has no table of its own) and waits until the
 * functions have read it. Returns the loaded bundle and the functions' status:
 * { state: 'builtin' | 'workbook' | 'unreadable', version, revision, checksum, couples, electrodes, reason }.
 */
export async function loadBundleWithTable(stored, distDir, pinned = null) {
  const { Office, Excel } = hostFor(stored, pinned);
  const bundle = loadBundle({ Office, Excel, setTimeout, clearTimeout, console }, distDir);
  const host = bundle.sandbox.cellwrightFunctionsHost;
  if (!host) throw new Error('the functions bundle did not install its host channel');
  for (let i = 0; i < 1000 && host.status().state === 'loading'; i++) await new Promise((r) => setTimeout(r, 1));
  const status = host.status();
  if (status.state === 'loading') throw new Error('the functions bundle did not finish reading the table');
  return { bundle, status: { ...status } };
}
