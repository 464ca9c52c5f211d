// The demo workbook's own potential table: the built-in table pinned to the workbook, stored in the
// add-in's settings (web-extension part) the way Excel saves them, and the functions bundle with that
// stored table in use.
import { readFileSync } from 'node:fs';
import { resolve } from 'node:path';
import { ROOT } from './bundle.mjs';
import { pinnedStoredText } from './storedtable.mjs';
import { loadBundleWithTable } from './tablehost.mjs';
import { TABLE_SETTING_KEY, manifestIdentity, writeWebExtension } from './webextension.mjs';

/**
 * { bundle, status, stored, attach(xlsxBuffer) → buffer with the web-extension part }: the bundle is
 * loaded with the stored table in use.
 */
export async function pinnedTableWorkbook() {
  const stored = await pinnedStoredText();
  const { bundle, status } = await loadBundleWithTable(stored);
  if (status.state !== 'workbook') throw new Error(`the pinned table was not taken up by the functions: ${status.reason ?? status.state}`);
  const { id, version } = manifestIdentity(readFileSync(resolve(ROOT, 'manifest.xml'), 'utf8'));
  return {
    bundle,
    status,
    stored,
    attach: (buffer) => writeWebExtension(buffer, { addinId: id, version, settings: { [TABLE_SETTING_KEY]: stored } }),
  };
}
