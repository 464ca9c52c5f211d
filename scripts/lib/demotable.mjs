// The demo workbook's own data set: the built-in table and the built-in reference data (atomic weights,
// species data, constants) pinned to the workbook, stored in the add-in's settings (web-extension part)
// the way Excel saves them, and the functions bundle with that stored data set in use.
import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { ROOT } from './bundle.mjs';
import { pinnedDataText, pinnedStoredText } from './storedtable.mjs';
import { loadBundleWithTable } from './tablehost.mjs';
import { PINNED_DATA_KEY, TABLE_SETTING_KEY, manifestIdentity, writeWebExtension } from './webextension.mjs';

/**
 * { bundle, status, stored, attach(xlsxBuffer) → buffer with the web-extension part }: the bundle is
 * loaded with the stored table and pinned data in use.
 */
export async function pinnedTableWorkbook() {
  const stored = await pinnedStoredText();
  const pinned = await pinnedDataText();
  const { bundle, status } = await loadBundleWithTable(stored, undefined, pinned);
  if (status.state !== 'workbook') throw new Error(`the pinned table was not taken up by the functions: ${status.reason ?? status.state}`);
  if ((status.dataset?.pinned.length ?? 0) < 2) throw new Error('the pinned data was not taken up by the functions');
  const { id, version } = manifestIdentity(readFileSync(resolve(ROOT, 'manifest.xml'), 'utf8'));
  return {
    bundle,
    status,
    stored,
    pinned,
    attach: (buffer) => writeWebExtension(buffer, { addinId: id, version, settings: { [TABLE_SETTING_KEY]: stored, [PINNED_DATA_KEY]: pinned } }),
  };
}
