/** Files: export and import CSV, copy the table to a sheet. */
import { type TableChange, applyChange } from '../src/store/copy';
import { type CsvImport, MAX_CSV_BYTES, exportCsv, importCsv } from '../src/store/csv';
import { diffTables } from '../src/store/diff';
import { logLines } from '../src/store/log';
import { type Child, byId, clear, h, replace } from './dom';
import { plural } from './format';
import { showNotice, showProblem, confirmSigned, act } from './notices';
import { copyToSheet } from './sheet';
import { wireVerification } from './verification';
import { builtin, model, ui } from './state';

export function describeInUse(): string {
  const st = model.state;
  if (st.kind === 'readable') return `This workbook’s own table, based on built-in ${st.read.copy.basedOn}, revision ${st.read.copy.revision}`;
  return `The add-in’s built-in table ${builtin.version} (the workbook has no table of its own)`;
}

export function versionInUse(): string {
  return model.state.kind === 'readable' ? model.state.read.copy.basedOn : builtin.version;
}

export function download(text: string, filename: string, type: string): void {
  const url = URL.createObjectURL(new Blob([text], { type: `${type};charset=utf-8` }));
  const a = h('a', { href: url, download: filename, hidden: true });
  document.body.appendChild(a);
  a.click();
  a.remove();
  setTimeout(() => URL.revokeObjectURL(url), 10_000);
}

export function csvOfTable(): string {
  const log = model.copy?.log;
  return exportCsv(model.records, `${describeInUse()}; checksum ${model.checksum ?? ''}; exported ${new Date().toISOString()}.`, log === undefined ? [] : logLines(log));
}

export function exportDownload(): void {
  try {
    const csv = csvOfTable();
    download(csv, 'cellwright-potential-table.csv', 'text/csv');
    showNotice(`CSV file prepared: ${plural(model.records.couples.length, 'couple')} and ${plural(model.records.electrodes.length, 'electrode')}. If no download starts, use Show CSV text and copy it.`);
  } catch (e) {
    showProblem(`The table could not be exported: ${e instanceof Error ? e.message : String(e)}`);
  }
}

export function exportShow(): void {
  const wrap = byId('export-text-wrap');
  const btn = byId('export-show');
  const open = wrap.hidden;
  if (open) {
    try {
      byId<HTMLTextAreaElement>('export-text').value = csvOfTable();
    } catch (e) {
      showProblem(`The table could not be exported: ${e instanceof Error ? e.message : String(e)}`);
      return;
    }
  }
  wrap.hidden = !open;
  btn.setAttribute('aria-expanded', String(open));
  replace(btn, open ? 'Hide CSV text' : 'Show CSV text');
  if (open) byId<HTMLTextAreaElement>('export-text').select();
}

export function importMode(): 'merge' | 'replace' {
  const checked = document.querySelector<HTMLInputElement>('input[name="import-mode"]:checked');
  return checked?.value === 'replace' ? 'replace' : 'merge';
}

export function importChange(result: CsvImport, mode: 'merge' | 'replace'): TableChange {
  return { kind: 'import', mode, couples: result.couples, electrodes: result.electrodes };
}

export function runImportCheck(): void {
  const text = byId<HTMLTextAreaElement>('import-text').value;
  const box = byId('import-report');
  ui.importCheck = null;
  if (text.trim() === '') {
    replace(box, h('p', { class: 'error' }, 'Choose a CSV file or paste CSV text first.'));
    return;
  }
  const result = importCsv(text);
  const mode = importMode();
  if (result.fileProblem !== undefined) {
    replace(box, h('p', { class: 'error', id: 'import-file-problem' }, `The file cannot be imported: ${result.fileProblem}. Nothing was changed.`));
    box.focus();
    return;
  }
  ui.importCheck = { result, mode };
  const nOk = result.accepted.length;
  const nBad = result.rejected.length;
  let preview: Child = null;
  if (nOk > 0 && model.state.kind !== 'unreadable') {
    try {
      const next = applyChange(model.copy, builtin, importChange(result, mode));
      const d = diffTables(model.records, next);
      preview = h('p', {}, d.length === 0 ? 'Importing the accepted lines would change no row.' : `Importing the accepted lines would change ${plural(d.length, 'row')}: ${d.filter((x) => x.status === 'added').length} added, ${d.filter((x) => x.status === 'changed').length} changed, ${d.filter((x) => x.status === 'removed').length} removed.`);
    } catch (e) {
      preview = h('p', { class: 'error' }, `The accepted lines cannot be imported together with the table: ${e instanceof Error ? e.message : String(e)}`);
      ui.importCheck = null;
    }
  }
  const buttons: HTMLElement[] = [];
  if (ui.importCheck !== null && nOk > 0 && model.state.kind !== 'unreadable') {
    if (nBad === 0) buttons.push(h('button', { type: 'button', class: 'primary', id: 'import-all', onclick: () => void doImport(false) }, `Import ${plural(nOk, 'row')}`));
    else buttons.push(h('button', { type: 'button', id: 'import-valid', onclick: () => void doImport(true) }, `Import only the ${plural(nOk, 'valid line')}, skip ${nBad} rejected`));
  }
  buttons.push(h('button', { type: 'button', id: 'import-cancel', onclick: () => { ui.importCheck = null; clear(box); byId('import-check').focus(); } }, 'Cancel'));
  replace(
    box,
    h('h4', { id: 'import-summary', tabindex: '-1' }, `${plural(nOk, 'line')} accepted, ${plural(nBad, 'line')} rejected.`),
    nBad > 0 ? h('p', {}, 'Nothing is imported while lines are rejected, unless you choose to import only the valid lines.') : null,
    nBad > 0
      ? h('ol', { id: 'import-rejected', 'aria-label': 'Rejected lines' }, ...result.rejected.map((r) => h('li', {}, h('strong', {}, `Line ${r.line}: `), `${r.reason}. `, h('code', {}, r.text))))
      : null,
    preview,
    h('div', { class: 'actions' }, ...buttons),
  );
  (box.querySelector('#import-summary') as HTMLElement).focus();
}

export async function doImport(skipRejected: boolean): Promise<void> {
  const chk = ui.importCheck;
  if (chk === null) return;
  if (skipRejected && chk.result.rejected.length === 0) return;
  const n = plural(chk.result.accepted.length, 'row');
  const signoff = await confirmSigned(
    chk.mode === 'replace'
      ? {
          title: 'Replace the whole table?',
          body: [`The table becomes the ${plural(chk.result.accepted.length, 'imported row')}; every other row is removed from this workbook’s table.`],
          ok: 'Replace',
          danger: true,
        }
      : { title: `Import ${n}?`, body: [`The ${n} are added to this workbook’s table, or replace the rows with the same keys; other rows stay.`], ok: 'Import' },
  );
  if (signoff === null) return;
  const r = await act(() => model.change(importChange(chk.result, chk.mode), signoff));
  if (r?.kind === 'done') {
    ui.importCheck = null;
    clear(byId('import-report'));
    byId<HTMLTextAreaElement>('import-text').value = '';
    byId<HTMLInputElement>('import-file').value = '';
    byId('import-check').focus();
  }
}

export async function readImportFile(): Promise<void> {
  const file = byId<HTMLInputElement>('import-file').files?.[0];
  if (file === undefined) return;
  if (file.size > MAX_CSV_BYTES) {
    showProblem(`The file ${file.name} is larger than 8 MB; Cellwright does not read it.`);
    return;
  }
  byId<HTMLTextAreaElement>('import-text').value = await file.text();
  runImportCheck();
}

export async function copySheet(): Promise<void> {
  if (ui.busy) return;
  if (model.state.kind === 'unreadable') {
    showProblem('The workbook’s table cannot be read, so there is nothing to copy.');
    return;
  }
  ui.busy = true;
  try {
    const name = await copyToSheet({
      records: model.records,
      builtin,
      description: describeInUse(),
      version: versionInUse(),
      checksum: model.checksum ?? '',
      now: new Date(),
      ...(model.copy?.log === undefined ? {} : { log: model.copy.log }),
    });
    showNotice(`Copied the table to the new sheet “${name}”.`);
  } catch (e) {
    showProblem(`The table could not be copied to a sheet: ${e instanceof Error ? e.message : String(e)}`);
  } finally {
    ui.busy = false;
  }
}

export function wireFiles(): void {
  byId('export-download').addEventListener('click', exportDownload);
  byId('export-show').addEventListener('click', exportShow);
  byId('import-check').addEventListener('click', runImportCheck);
  byId('import-file').addEventListener('change', () => void readImportFile());
  byId('copy-sheet').addEventListener('click', () => void copySheet());
  wireVerification();
  byId('import-report').tabIndex = -1;
}
