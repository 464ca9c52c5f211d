/**
 * The Cellwright task pane: shows which potential table the workbook uses and lets its owners change it
 * (add, edit, delete, revert, reset, pin, update, import, export, copy to sheet).
 *
 * The page (taskpane.html) holds the static structure; the views fill in data with dom.ts (text is
 * always text): inUse.ts (the table in use), lists.ts, editors.ts, files.ts, with notices.ts for
 * messages, confirmations and running actions, and state.ts for what they share. The model
 * (model.ts) does the storing, the hand-over to the worksheet functions and the recalculation;
 * forms.ts checks the forms as the user types. This module wires the page and starts it (start(),
 * called by main.ts, the bundle's entry), so the views can be loaded by tests without starting.
 */
import { BUILTIN_TABLE_SOURCE } from '../src/table/builtin';
import { byId, h, replace } from './dom';
import { wireEditors } from './editors';
import { wireFiles } from './files';
import { renderInUse, reload } from './inUse';
import { renderList, focusRowButton } from './lists';
import { checkElsewhere } from './notices';
import { builtin, model, CHECK_EVERY_MS, KINDS, ui } from './state';
import { pollWhileVisible } from './visiblePolling';
import { renderEph, wireEph } from './eph';
import { renderConsistency, wireConsistency } from './consistency';
import { builtinTable } from '../src/table/builtin';
import { renderLog, wireLog } from './logView';
import { renderDataSet } from './dataSet';
import { buildTable } from '../src/table/table';
import type { PotentialTable } from '../src/table/types';

export const TABS = ['couples', 'electrodes', 'files', 'eph', 'log', 'data', 'about'] as const;

export function selectTab(name: (typeof TABS)[number], focus: boolean): void {
  for (const t of TABS) {
    const tab = byId(`tab-${t}`);
    const on = t === name;
    tab.setAttribute('aria-selected', String(on));
    tab.tabIndex = on ? 0 : -1;
    byId(`panel-${t}`).hidden = !on;
    if (on && focus) tab.focus();
  }
}

export function wireTabs(): void {
  TABS.forEach((t, i) => {
    const tab = byId(`tab-${t}`);
    tab.addEventListener('click', () => selectTab(t, false));
    tab.addEventListener('keydown', (e) => {
      let j = -1;
      if (e.key === 'ArrowRight') j = (i + 1) % TABS.length;
      else if (e.key === 'ArrowLeft') j = (i - 1 + TABS.length) % TABS.length;
      else if (e.key === 'Home') j = 0;
      else if (e.key === 'End') j = TABS.length - 1;
      if (j >= 0) {
        e.preventDefault();
        selectTab(TABS[j], true);
      }
    });
  });
}


/** Re-renders what depends on the table, keeping keyboard focus on the same control when it was re-made. */
export function renderAll(): void {
  const el = document.activeElement instanceof HTMLElement ? document.activeElement : null;
  const id = el?.id ?? '';
  const li = el?.closest<HTMLElement>('li[data-key]') ?? null;
  const listId = li?.parentElement?.id ?? '';
  const cls = el?.classList[0] ?? '';
  renderInUse();
  for (const kind of KINDS) renderList(kind);
  renderEph();
  renderConsistency();
  renderLog();
  renderDataSet();
  const unreadable = model.state.kind === 'unreadable';
  for (const bid of ['export-download', 'export-show', 'copy-sheet', 'import-check']) byId<HTMLButtonElement>(bid).disabled = unreadable || !ui.ready;
  if (el !== null && !el.isConnected) {
    if (id !== '' && document.getElementById(id) !== null) byId(id).focus();
    else if (li !== null && (listId === 'list-couple' || listId === 'list-electrode')) focusRowButton(listId === 'list-couple' ? 'couple' : 'electrode', li.dataset.key ?? null, cls);
  }
}

let ephCache: { records: unknown; table: PotentialTable } | null = null;
/** The table in use for the E–pH view; undefined when the workbook's table cannot be read. */
function ephTable(): PotentialTable | undefined {
  if (!ui.ready || model.state.kind === 'unreadable') return undefined;
  const records = model.records;
  if (ephCache?.records !== records) ephCache = { records, table: buildTable(builtin.version, records.couples, records.electrodes).table };
  return ephCache.table;
}

export function start(): void {
  replace(byId('about-version'), builtin.version);
  replace(byId('about-source'), BUILTIN_TABLE_SOURCE || 'see the source on each row.');
  wireTabs();
  wireEditors();
  wireFiles();
  wireEph(ephTable);
  wireConsistency(() => (ui.ready ? (ephTable() ?? null) : undefined), builtinTable);
  wireLog();
  if (typeof Office === 'undefined' || typeof Office.onReady !== 'function') {
    replace(byId('in-use-body'), h('p', {}, 'Office is not available here: open Cellwright from Excel.'));
    byId('app').setAttribute('aria-busy', 'false');
    return;
  }
  void Office.onReady().then(async (info) => {
    if (info.host !== Office.HostType.Excel) {
      replace(byId('in-use-body'), h('p', {}, 'This pane works inside Excel: open Cellwright from Excel’s ribbon.'));
      byId('app').setAttribute('aria-busy', 'false');
      return;
    }
    await reload();
    if (ui.ready) {
      pollWhileVisible(() => void checkElsewhere(), CHECK_EVERY_MS);
    }
  });
}
