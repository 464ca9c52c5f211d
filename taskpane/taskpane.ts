/**
 * The Cellwright task pane: shows which potential table the workbook uses and lets its owners change it
 * (add, edit, delete, revert, reset, pin, update, import, export, copy to sheet).
 *
 * The page (taskpane.html) holds the static structure; this file fills in data with dom.ts (text is
 * always text). The model (model.ts) does the storing, the hand-over to the worksheet functions and
 * the recalculation; forms.ts checks the forms as the user types.
 */
import { parseHalfReaction } from '../src/chem/halfReaction';
import { describeDifference, type RowDifference } from '../src/store/diff';
import { type CsvImport, MAX_CSV_BYTES, exportCsv, importCsv } from '../src/store/csv';
import type { TableChange } from '../src/store/copy';
import { applyChange } from '../src/store/copy';
import { diffTables } from '../src/store/diff';
import { type AnyRecord, type RowKind, matchKey, recordsOf, rowsOf } from '../src/store/rows';
import { BUILTIN_TABLE_SOURCE, builtinTable } from '../src/table/builtin';
import type { CoupleRecord, ElectrodeRecord } from '../src/table/records';
import { type Child, append, byId, clear, h, replace } from './dom';
import { type CoupleFields, type ElectrodeFields, checkCoupleForm, checkElectrodeForm } from './forms';
import { type ActionResult, TableModel } from './model';
import { copyToSheet } from './sheet';
import { pollWhileVisible } from './visiblePolling';
import { wireVerification } from './verification';
import { renderEph, wireEph } from './eph';
import { buildTable } from '../src/table/table';
import type { PotentialTable } from '../src/table/types';

const builtin = recordsOf(builtinTable());
const model = new TableModel({ builtin, host: () => globalThis.cellwrightFunctionsHost });

/** Rows shown at most in a list (a filter narrows the rest). */
const MAX_SHOWN = 200;
/** How often the pane looks for changes made elsewhere (another pane, a co-author), while it is visible. */
const CHECK_EVERY_MS = 20_000;

const KINDS: readonly RowKind[] = ['couple', 'electrode'];
const noun = (k: RowKind) => (k === 'couple' ? 'couple' : 'reference electrode');

const ui = {
  busy: false,
  ready: false,
  loadError: null as string | null,
  editing: { couple: null, electrode: null } as Record<RowKind, { originalKey: string | null; touched: Set<string>; showAll: boolean } | null>,
  importCheck: null as null | { result: CsvImport; mode: 'merge' | 'replace' },
};

/* ----------------------------------------------------------------------------------------------- */
/* Formatting                                                                                       */
/* ----------------------------------------------------------------------------------------------- */

function signed(x: number): string {
  return `${x > 0 ? '+' : x < 0 ? '\u2212' : ''}${Math.abs(x)}`;
}

function when(iso: string): string {
  if (iso === '') return 'not recorded';
  const d = new Date(iso);
  return Number.isNaN(d.getTime()) ? iso : d.toLocaleString(undefined, { dateStyle: 'medium', timeStyle: 'short' });
}

function plural(n: number, one: string, many = `${one}s`): string {
  return `${n.toLocaleString('en-US')} ${n === 1 ? one : many}`;
}

function electronsOf(halfReaction: string): number | undefined {
  try {
    return parseHalfReaction(halfReaction).n;
  } catch {
    return undefined;
  }
}

function fieldLabel(f: string): string {
  return ({ e0: 'E°', potential: 'potential', dEdT_mV_K: 'dE/dT', halfReaction: 'half-reaction', aliases: 'other names' } as Record<string, string>)[f] ?? f;
}

/* ----------------------------------------------------------------------------------------------- */
/* Messages and confirmation                                                                        */
/* ----------------------------------------------------------------------------------------------- */

interface NoticeAction {
  readonly label: string;
  readonly run: () => void | Promise<void>;
}

function showNotice(text: string, opts: { conflict?: boolean; list?: readonly string[]; actions?: readonly NoticeAction[] } = {}): void {
  const el = byId('notice');
  el.classList.toggle('conflict', opts.conflict === true);
  const items = opts.list ?? [];
  replace(
    el,
    h('p', {}, text),
    items.length > 0 ? h('ul', {}, ...items.slice(0, 12).map((t) => h('li', {}, t)), items.length > 12 ? h('li', {}, `and ${items.length - 12} more`) : null) : null,
    (opts.actions ?? []).length > 0
      ? h('div', { class: 'actions' }, ...(opts.actions ?? []).map((a) => h('button', { type: 'button', onclick: () => void a.run() }, a.label)))
      : null,
  );
  clear(byId('problem'));
}

function showProblem(text: string, details: readonly string[] = []): void {
  replace(byId('problem'), h('p', {}, text), details.length > 0 ? h('ul', {}, ...details.slice(0, 12).map((d) => h('li', {}, d))) : null);
}

function clearMessages(): void {
  clear(byId('notice'));
  clear(byId('problem'));
}

interface ConfirmOptions {
  readonly title: string;
  readonly body: readonly string[];
  readonly list?: readonly string[];
  readonly ok: string;
  readonly danger?: boolean;
}

/** A modal confirmation (native <dialog>: focus stays inside, Escape cancels). */
function confirmAction(o: ConfirmOptions): Promise<boolean> {
  const dialog = byId<HTMLDialogElement>('confirm');
  const ok = byId<HTMLButtonElement>('confirm-ok');
  const cancel = byId<HTMLButtonElement>('confirm-cancel');
  const opener = document.activeElement as HTMLElement | null;
  replace(byId('confirm-title'), o.title);
  const list = o.list ?? [];
  replace(
    byId('confirm-body'),
    ...o.body.map((p) => h('p', {}, p)),
    list.length > 0 ? h('ul', {}, ...list.slice(0, 15).map((t) => h('li', {}, t)), list.length > 15 ? h('li', {}, `and ${list.length - 15} more`) : null) : null,
  );
  replace(ok, o.ok);
  ok.className = o.danger ? 'primary danger-fill' : 'primary';
  return new Promise((resolve) => {
    const finish = (answer: boolean) => {
      ok.removeEventListener('click', onOk);
      cancel.removeEventListener('click', onCancel);
      dialog.removeEventListener('cancel', onEscape);
      if (dialog.open) dialog.close();
      opener?.focus();
      resolve(answer);
    };
    const onOk = () => finish(true);
    const onCancel = () => finish(false);
    const onEscape = (e: Event) => {
      e.preventDefault();
      finish(false);
    };
    ok.addEventListener('click', onOk);
    cancel.addEventListener('click', onCancel);
    dialog.addEventListener('cancel', onEscape);
    dialog.showModal();
    (o.danger ? cancel : ok).focus();
  });
}

/* ----------------------------------------------------------------------------------------------- */
/* Running actions                                                                                  */
/* ----------------------------------------------------------------------------------------------- */

/** Runs one action at a time; shows its result; re-renders. Returns the result (null when busy). */
async function act(run: () => Promise<ActionResult>): Promise<ActionResult | null> {
  if (ui.busy) return null;
  ui.busy = true;
  byId('app').setAttribute('aria-busy', 'true');
  let result: ActionResult | null = null;
  try {
    result = await run();
    report(result);
  } catch (e) {
    showProblem(`Something went wrong and the table may not have been saved: ${e instanceof Error ? e.message : String(e)}`);
  } finally {
    ui.busy = false;
    byId('app').setAttribute('aria-busy', 'false');
    renderAll();
    // The button that started the action may have been re-rendered away: keep keyboard users in place.
    if (document.activeElement === null || document.activeElement === document.body) byId('in-use-title').focus();
  }
  return result;
}

function report(r: ActionResult): void {
  if (r.kind === 'done') {
    showNotice(r.warning === undefined ? r.message : `${r.message} ${r.warning}`);
  } else if (r.kind === 'refused') {
    showProblem(r.message, r.details);
  } else {
    showConflict(r.message, r.theirs, r.retry);
  }
}

function showConflict(message: string, theirs: readonly RowDifference[], retry?: () => Promise<ActionResult>): void {
  showNotice(message, {
    conflict: true,
    list: theirs.length > 0 ? theirs.map(describeDifference) : ['(no row differs: only the revision changed)'],
    actions: retry === undefined ? [] : [{ label: 'Apply my change to the latest table', run: () => void act(retry) }],
  });
}

async function checkElsewhere(): Promise<void> {
  if (ui.busy || !ui.ready) return;
  ui.busy = true;
  try {
    const r = await model.checkForChangesElsewhere();
    if (r !== null) {
      showNotice(r.message, {
        conflict: true,
        list: r.theirs.map(describeDifference),
        actions: r.retry === undefined ? [] : [{ label: 'Apply my change again', run: () => void act(r.retry!) }],
      });
    }
    if (r !== null) renderAll();
  } catch {
    // Reading failed (the workbook is busy or closing): the next check tries again.
  } finally {
    ui.busy = false;
  }
}

/* ----------------------------------------------------------------------------------------------- */
/* Table in use                                                                                     */
/* ----------------------------------------------------------------------------------------------- */

function fact(name: string, value: Child, cls?: string): Child[] {
  return [h('dt', {}, name), h('dd', cls === undefined ? {} : { class: cls }, value)];
}

function functionsLine(): HTMLElement {
  const st = model.functionsStatus();
  let text: string;
  if (st === undefined) text = 'Worksheet functions: not running in this page; they read the stored table when the workbook opens.';
  else if (st.state === 'loading') text = 'Worksheet functions: reading the workbook’s table…';
  else if (st.state === 'unreadable') text = 'Worksheet functions: answer #N/A for table look-ups until the table is repaired or reset.';
  else if (st.state === 'builtin') text = `Worksheet functions: use the built-in table ${st.version ?? ''}.`;
  else text = `Worksheet functions: use this workbook’s table (revision ${st.revision ?? '?'}).`;
  return h('p', { class: 'hint', id: 'functions-status' }, text);
}

function renderInUse(): void {
  const card = byId('in-use');
  const body = byId('in-use-body');
  if (!ui.ready) {
    replace(
      body,
      ui.loadError === null ? h('p', {}, 'Reading the workbook…') : h('p', { class: 'error' }, `The workbook could not be read: ${ui.loadError}`),
      ui.loadError === null ? null : h('div', { class: 'actions' }, h('button', { type: 'button', id: 'reread', onclick: () => void reload() }, 'Read the workbook again')),
    );
    return;
  }
  card.classList.toggle('unreadable', model.state.kind === 'unreadable');
  const st = model.state;
  if (st.kind === 'none') {
    replace(
      body,
      h('p', {}, h('strong', {}, `Built-in table ${builtin.version}`)),
      h(
        'dl',
        { class: 'facts' },
        ...fact('Couples', builtin.couples.length),
        ...fact('Electrodes', builtin.electrodes.length),
        ...fact('Checksum', h('code', { class: 'checksum' }, model.checksum ?? '')),
      ),
      h('p', {}, 'This workbook has no table of its own. Its results follow the add-in’s built-in table, which can change when the add-in is updated.'),
      h(
        'div',
        { class: 'actions' },
        h('button', { type: 'button', id: 'pin', class: 'primary', 'aria-describedby': 'pin-hint', onclick: () => void act(() => model.pin()) }, 'Pin to this workbook'),
      ),
      h('p', { class: 'hint', id: 'pin-hint' }, 'Stores the built-in table in this workbook, so later add-in updates do not change its results. Editing a row does the same.'),
      functionsLine(),
    );
    return;
  }
  if (st.kind === 'unreadable') {
    const raw = typeof st.raw === 'string' ? st.raw : JSON.stringify(st.raw, null, 2) ?? String(st.raw);
    const wrap = h('div', { class: 'field', id: 'raw-wrap', hidden: true },
      h('label', { for: 'raw-text' }, 'Stored text (read only)'),
      h('textarea', { id: 'raw-text', rows: 6, readonly: true, spellcheck: 'false' }),
    );
    (wrap.querySelector('textarea') as HTMLTextAreaElement).value = raw;
    const show = h('button', {
      type: 'button', id: 'raw-show', 'aria-expanded': 'false', 'aria-controls': 'raw-wrap',
      onclick: () => {
        const open = wrap.hidden;
        wrap.hidden = !open;
        show.setAttribute('aria-expanded', String(open));
        replace(show, open ? 'Hide the stored text' : 'Show the stored text');
      },
    }, 'Show the stored text');
    replace(
      body,
      h('p', {}, h('strong', {}, 'This workbook’s table cannot be read')),
      h('p', { id: 'unreadable-reason' }, `${st.problem.message[0].toUpperCase()}${st.problem.message.slice(1)}.`),
      st.problem.details.length > 0
        ? h('details', { id: 'unreadable-details' }, h('summary', {}, 'Details'), h('ul', {}, ...st.problem.details.slice(0, 8).map((d) => h('li', {}, d))))
        : null,
      h('p', {}, 'Worksheet functions that use the table show #N/A until this is resolved. Nothing has been changed or replaced: the built-in table is not used in its place.'),
      h(
        'div',
        { class: 'actions' },
        h('button', { type: 'button', id: 'raw-download', onclick: () => download(raw, 'cellwright-stored-table.txt', 'text/plain') }, 'Download the stored text'),
        show,
        h('button', { type: 'button', id: 'reread', onclick: () => void reload() }, 'Read the workbook again'),
        h('button', { type: 'button', id: 'reset', class: 'danger', onclick: () => void resetTable() }, 'Reset to built-in table…'),
      ),
      wrap,
      functionsLine(),
    );
    return;
  }
  const copy = st.read.copy;
  const diffs = model.differences();
  const notice = model.builtinNotice();
  let newer: HTMLElement | null = null;
  if (notice !== null && notice.addinIsNewer) {
    newer = h(
      'div',
      { class: 'newer', id: 'newer-builtin' },
      h('p', {}, h('strong', {}, `The add-in’s built-in table ${notice.builtin} is newer`), ` than ${notice.basedOn}, the version this workbook’s table is based on.`),
      h('p', {}, notice.changes.length === 0 ? 'Updating would change no rows; it would only record the newer version.' : `Updating would change ${plural(notice.changes.length, 'row')}:`),
      notice.changes.length > 0 ? h('ul', {}, ...notice.changes.slice(0, 12).map((d) => h('li', {}, describeDifference(d))), notice.changes.length > 12 ? h('li', {}, `and ${notice.changes.length - 12} more`) : null) : null,
      h('p', { class: 'hint' }, 'Rows added, edited or deleted in this workbook stay as they are. Until you update, results stay as they are.'),
      h('div', { class: 'actions' }, h('button', { type: 'button', id: 'update-builtin', onclick: () => void updateToBuiltin() }, `Update to built-in ${notice.builtin}…`)),
    );
  } else if (notice !== null) {
    newer = h('p', { class: 'hint', id: 'older-addin' }, `This table is based on built-in ${notice.basedOn}, newer than this add-in’s ${notice.builtin}. It is used as stored.`);
  }
  replace(
    body,
    h('p', {}, h('strong', {}, 'This workbook’s own table')),
    h(
      'dl',
      { class: 'facts' },
      ...fact('Based on', `built-in ${copy.basedOn}`),
      ...fact('Revision', copy.revision === 0 ? 'not yet counted' : copy.revision),
      ...fact('Changed', when(copy.changedAt)),
      ...fact('Couples', copy.couples.length),
      ...fact('Electrodes', copy.electrodes.length),
      ...fact('Differ from built-in', h('span', { id: 'differ-count' }, diffs.length === 0 ? 'none' : plural(diffs.length, 'row'))),
      ...fact('Checksum', h('code', { class: 'checksum' }, st.read.checksum)),
    ),
    st.read.schema < 2 ? h('p', { class: 'hint' }, 'Stored in an older layout; it is rewritten in the current layout at the next change.') : null,
    newer,
    h('div', { class: 'actions' }, h('button', { type: 'button', id: 'reset', class: 'danger', onclick: () => void resetTable() }, 'Reset to built-in table…')),
    functionsLine(),
  );
}

async function reload(): Promise<void> {
  if (ui.busy) return;
  ui.busy = true;
  try {
    await model.load();
    clearMessages();
    ui.ready = true;
    ui.loadError = null;
  } catch (e) {
    ui.loadError = e instanceof Error ? e.message : String(e);
  } finally {
    ui.busy = false;
    byId('app').setAttribute('aria-busy', 'false');
  }
  renderAll();
}

async function resetTable(): Promise<void> {
  const unreadable = model.state.kind === 'unreadable';
  const diffs = model.differences();
  const ok = await confirmAction({
    title: 'Reset to the built-in table?',
    body: unreadable
      ? ['The workbook’s stored table cannot be read. Resetting removes it for good and the worksheet functions use the add-in’s built-in table again.', 'Download the stored text first if you may need it.']
      : [
          'This removes the workbook’s own table. The worksheet functions then use the add-in’s built-in table, which can change when the add-in is updated.',
          diffs.length === 0 ? 'No row differs from the built-in table.' : `${plural(diffs.length, 'row')} that ${diffs.length === 1 ? 'differs' : 'differ'} from the built-in table will be lost:`,
        ],
    list: unreadable ? [] : diffs.map(describeDifference),
    ok: 'Reset',
    danger: true,
  });
  if (ok) await act(() => model.reset());
}

async function updateToBuiltin(): Promise<void> {
  const notice = model.builtinNotice();
  if (notice === null) return;
  const ok = await confirmAction({
    title: `Update to built-in ${notice.builtin}?`,
    body: ['Rows added, edited or deleted in this workbook stay as they are. These rows change:'],
    list: notice.changes.map(describeDifference),
    ok: 'Update',
  });
  if (ok) await act(() => model.change({ kind: 'update-to-builtin' }));
}

/* ----------------------------------------------------------------------------------------------- */
/* Lists                                                                                            */
/* ----------------------------------------------------------------------------------------------- */

function matches(kind: RowKind, r: AnyRecord, filter: string): boolean {
  if (filter === '') return true;
  const parts = kind === 'couple' ? [r.key, (r as CoupleRecord).halfReaction, r.source, r.note ?? ''] : [r.key, ...(r as ElectrodeRecord).aliases, r.source, r.note ?? ''];
  return parts.some((p) => p.toLowerCase().includes(filter));
}

function rowItem(kind: RowKind, r: AnyRecord, diff: RowDifference | undefined, own: boolean, inBuiltin: boolean): HTMLElement {
  const key = r.key;
  const value = kind === 'couple' ? (r as CoupleRecord).e0 : (r as ElectrodeRecord).potential;
  const detail: string[] = [];
  if (kind === 'couple') {
    const c = r as CoupleRecord;
    detail.push(c.halfReaction);
    const n = electronsOf(c.halfReaction);
    if (n !== undefined) detail.push(`n = ${n}`);
  } else {
    const e = r as ElectrodeRecord;
    if (e.aliases.length > 0) detail.push(`also: ${e.aliases.join(', ')}`);
  }
  if (r.dEdT_mV_K !== undefined) detail.push(`${kind === 'couple' ? 'dE°/dT' : 'dE/dT'} ${signed(r.dEdT_mV_K)} mV/K`);
  let tag: string | null = null;
  if (diff !== undefined) {
    if (diff.status === 'added') tag = 'Added in this workbook';
    else if (own) tag = `Edited here: ${diff.fields.map(fieldLabel).join(', ')}`;
    else tag = `Differs from built-in ${builtin.version}: ${diff.fields.map(fieldLabel).join(', ')}`;
  }
  const canRevert = inBuiltin && diff !== undefined;
  return h(
    'li',
    { class: diff === undefined ? 'row' : 'row differs', 'data-key': key },
    h('div', { class: 'row-main' }, h('span', { class: 'row-key' }, key), h('span', { class: 'row-value' }, `${signed(value)} V`)),
    detail.length > 0 ? h('div', { class: 'row-detail' }, detail.join(' · ')) : null,
    h('div', { class: 'row-source' }, `Source: ${r.source}`),
    r.note !== undefined ? h('div', { class: 'row-note' }, `Note: ${r.note}`) : null,
    tag !== null ? h('span', { class: 'tag' }, tag) : null,
    h(
      'div',
      { class: 'actions' },
      h('button', { type: 'button', class: 'edit', 'aria-label': `Edit ${key}`, onclick: () => openEditor(kind, key) }, 'Edit'),
      h('button', { type: 'button', class: 'delete', 'aria-label': `Delete ${key}`, onclick: () => void deleteRow(kind, key) }, 'Delete'),
      canRevert ? h('button', { type: 'button', class: 'revert', 'aria-label': `Revert ${key} to the built-in value`, onclick: () => void revertRow(kind, key) }, 'Revert') : null,
    ),
  );
}

function renderList(kind: RowKind): void {
  const list = byId(`list-${kind}`);
  const count = byId(`count-${kind}`);
  const removedBox = byId(`removed-${kind}`);
  const add = byId<HTMLButtonElement>(`add-${kind}`);
  add.disabled = model.state.kind === 'unreadable' || !ui.ready;
  if (model.state.kind === 'unreadable') {
    clear(list);
    clear(removedBox);
    replace(count, 'The workbook’s table cannot be read (see above), so there are no rows to show.');
    return;
  }
  const rows = rowsOf(model.records, kind);
  const filter = byId<HTMLInputElement>(`filter-${kind}`).value.trim().toLowerCase();
  const onlyDiff = byId<HTMLInputElement>(`only-diff-${kind}`).checked;
  const diffs = new Map(model.differences().filter((d) => d.rowKind === kind && d.status !== 'removed').map((d) => [matchKey(kind, d.key), d]));
  const copy = model.copy;
  const own = new Set((copy === null ? [] : kind === 'couple' ? copy.own.couples : copy.own.electrodes).map((k) => matchKey(kind, k)));
  const inBuiltin = new Set(rowsOf(builtin, kind).map((r) => matchKey(kind, r.key)));
  const shown = rows.filter((r) => matches(kind, r, filter) && (!onlyDiff || diffs.has(matchKey(kind, r.key))));
  const items = shown.slice(0, MAX_SHOWN).map((r) => {
    const k = matchKey(kind, r.key);
    return rowItem(kind, r, diffs.get(k), own.has(k), inBuiltin.has(k));
  });
  replace(list, ...items);
  const what = kind === 'couple' ? 'couple' : 'electrode';
  let text: string;
  if (filter === '' && !onlyDiff) text = `${plural(rows.length, what)}.`;
  else text = `${shown.length.toLocaleString('en-US')} of ${plural(rows.length, what)} ${shown.length === 1 ? 'matches' : 'match'}.`;
  if (shown.length > MAX_SHOWN) text += ` Showing the first ${MAX_SHOWN}; narrow the filter to see the others.`;
  replace(count, text);
  list.setAttribute('aria-label', `${kind === 'couple' ? 'Couples' : 'Reference electrodes'}: ${plural(Math.min(shown.length, MAX_SHOWN), 'row')} shown`);

  const removed = copy === null ? [] : kind === 'couple' ? copy.removed.couples : copy.removed.electrodes;
  if (removed.length === 0) clear(removedBox);
  else {
    replace(
      removedBox,
      h('h3', { id: `removed-${kind}-title` }, `Built-in rows deleted in this workbook (${removed.length})`),
      h(
        'ul',
        { 'aria-labelledby': `removed-${kind}-title` },
        ...removed.map((key) =>
          h('li', {}, `${key} `, h('button', { type: 'button', class: 'link', 'aria-label': `Restore ${key} from the built-in table`, onclick: () => void revertRow(kind, key) }, 'Restore')),
        ),
      ),
    );
  }
}

function focusRowButton(kind: RowKind, key: string | null, cls = 'edit'): void {
  if (key !== null) {
    const k = matchKey(kind, key);
    for (const li of Array.from(byId(`list-${kind}`).children) as HTMLElement[]) {
      if (li.dataset.key !== undefined && matchKey(kind, li.dataset.key) === k) {
        (li.querySelector(`button.${cls}`) as HTMLButtonElement | null)?.focus();
        return;
      }
    }
  }
  byId(`filter-${kind}`).focus();
}

async function deleteRow(kind: RowKind, key: string): Promise<void> {
  const inBuiltin = rowsOf(builtin, kind).some((r) => matchKey(kind, r.key) === matchKey(kind, key));
  const ok = await confirmAction({
    title: `Delete ${key}?`,
    body: [
      `Cells that use the ${noun(kind)} ${key} will show #N/A.`,
      inBuiltin ? 'It is a built-in row: it can be restored from the built-in table later.' : 'It is not in the built-in table: only an export or undo by hand brings it back.',
    ],
    ok: 'Delete',
    danger: true,
  });
  if (!ok) return;
  const rows = rowsOf(model.records, kind);
  const i = rows.findIndex((r) => matchKey(kind, r.key) === matchKey(kind, key));
  const next = rows[i + 1]?.key ?? rows[i - 1]?.key ?? null;
  const r = await act(() => model.change({ kind: 'delete', rowKind: kind, key }));
  if (r?.kind === 'done') focusRowButton(kind, next);
}

async function revertRow(kind: RowKind, key: string): Promise<void> {
  const b = rowsOf(builtin, kind).find((r) => matchKey(kind, r.key) === matchKey(kind, key));
  if (b === undefined) return;
  const current = rowsOf(model.records, kind).find((r) => matchKey(kind, r.key) === matchKey(kind, key));
  const one = (r: AnyRecord) => (kind === 'couple' ? { couples: [r as CoupleRecord], electrodes: [] } : { couples: [], electrodes: [r as ElectrodeRecord] });
  const change = current === undefined ? [] : diffTables(one(current), one(b));
  const ok = await confirmAction({
    title: current === undefined ? `Restore ${key}?` : `Revert ${key} to the built-in value?`,
    body: [current === undefined ? `The built-in row ${key} comes back with its built-in values.` : 'The row takes the built-in table’s values again:'],
    list: change.map(describeDifference),
    ok: current === undefined ? 'Restore' : 'Revert',
  });
  if (!ok) return;
  const r = await act(() => model.change({ kind: 'revert', rowKind: kind, key }));
  if (r?.kind === 'done') focusRowButton(kind, key);
}

/* ----------------------------------------------------------------------------------------------- */
/* Editors                                                                                          */
/* ----------------------------------------------------------------------------------------------- */

const COUPLE_FIELDS: readonly (keyof CoupleFields)[] = ['halfReaction', 'key', 'e0', 'dEdT', 'source', 'note'];
const ELECTRODE_FIELDS: readonly (keyof ElectrodeFields)[] = ['key', 'aliases', 'potential', 'dEdT', 'source', 'note'];
const fieldsOf = (kind: RowKind): readonly string[] => (kind === 'couple' ? COUPLE_FIELDS : ELECTRODE_FIELDS);

function input(kind: RowKind, field: string): HTMLInputElement | HTMLTextAreaElement {
  return byId(`f-${kind}-${field}`);
}

function readFields(kind: RowKind): Record<string, string> {
  return Object.fromEntries(fieldsOf(kind).map((f) => [f, input(kind, f).value]));
}

function keyTaken(kind: RowKind, originalKey: string | null) {
  const rows = rowsOf(model.records, kind);
  const mine = originalKey === null ? null : matchKey(kind, originalKey);
  return (name: string): boolean => {
    const k = matchKey(kind, name.trim());
    return rows.some((r) => {
      const rk = matchKey(kind, r.key);
      if (rk === mine) return false;
      if (rk === k) return true;
      return kind === 'electrode' && (r as ElectrodeRecord).aliases.some((a) => matchKey(kind, a) === k);
    });
  };
}

function check(kind: RowKind) {
  const ed = ui.editing[kind]!;
  const f = readFields(kind);
  return kind === 'couple'
    ? checkCoupleForm(f as unknown as CoupleFields, keyTaken(kind, ed.originalKey))
    : checkElectrodeForm(f as unknown as ElectrodeFields, keyTaken(kind, ed.originalKey));
}

/** Shows the form's errors (for fields touched, or all after a save attempt) and information. */
function showChecks(kind: RowKind): ReturnType<typeof check> {
  const ed = ui.editing[kind]!;
  const c = check(kind);
  for (const f of fieldsOf(kind)) {
    const el = input(kind, f);
    const err = (c.errors as Record<string, string | undefined>)[f];
    const shown = err !== undefined && (ed.showAll || ed.touched.has(f)) ? err : '';
    const errEl = document.getElementById(`f-${kind}-${f}-error`);
    if (errEl) replace(errEl, shown === '' ? '' : `${shown[0].toUpperCase()}${shown.slice(1)}${/[.?!]$/.test(shown) ? '' : '.'}`);
    if (shown === '') el.removeAttribute('aria-invalid');
    else el.setAttribute('aria-invalid', 'true');
    const infoEl = document.getElementById(`f-${kind}-${f}-info`);
    if (infoEl) replace(infoEl, (c.info as Record<string, string | undefined>)[f] ?? '');
  }
  return c;
}

function openEditor(kind: RowKind, originalKey: string | null): void {
  const form = byId<HTMLFormElement>(`editor-${kind}`);
  const rec = originalKey === null ? undefined : rowsOf(model.records, kind).find((r) => matchKey(kind, r.key) === matchKey(kind, originalKey));
  if (originalKey !== null && rec === undefined) return;
  ui.editing[kind] = { originalKey: rec?.key ?? null, touched: new Set(), showAll: false };
  replace(byId(`editor-${kind}-title`), rec === undefined ? `Add ${noun(kind)}` : `Edit ${noun(kind)} ${rec.key}`);
  const values: Record<string, string> =
    rec === undefined
      ? {}
      : kind === 'couple'
        ? { key: rec.key, halfReaction: (rec as CoupleRecord).halfReaction, e0: String((rec as CoupleRecord).e0), dEdT: rec.dEdT_mV_K === undefined ? '' : String(rec.dEdT_mV_K), source: rec.source, note: rec.note ?? '' }
        : { key: rec.key, aliases: (rec as ElectrodeRecord).aliases.join('\n'), potential: String((rec as ElectrodeRecord).potential), dEdT: rec.dEdT_mV_K === undefined ? '' : String(rec.dEdT_mV_K), source: rec.source, note: rec.note ?? '' };
  for (const f of fieldsOf(kind)) input(kind, f).value = values[f] ?? '';
  replace(byId(`f-${kind}-form-error`), '');
  form.hidden = false;
  showChecks(kind);
  input(kind, fieldsOf(kind)[0]).focus();
}

function closeEditor(kind: RowKind, focusKey: string | null): void {
  ui.editing[kind] = null;
  byId<HTMLFormElement>(`editor-${kind}`).hidden = true;
  if (focusKey !== null) focusRowButton(kind, focusKey);
  else byId(`add-${kind}`).focus();
}

async function saveEditor(kind: RowKind): Promise<void> {
  const ed = ui.editing[kind];
  if (ed === null || ui.busy) return;
  ed.showAll = true;
  const c = showChecks(kind);
  if (c.record === undefined) {
    const first = fieldsOf(kind).find((f) => (c.errors as Record<string, string | undefined>)[f] !== undefined);
    replace(byId(`f-${kind}-form-error`), 'Not saved: correct the fields marked above.');
    if (first !== undefined) input(kind, first).focus();
    return;
  }
  const change: TableChange = { kind: 'put', rowKind: kind, originalKey: ed.originalKey, record: c.record };
  const r = await act(() => model.change(change));
  if (r === null) return;
  if (r.kind === 'done') {
    closeEditor(kind, c.record.key);
  } else if (r.kind === 'refused') {
    replace(byId(`f-${kind}-form-error`), `Not saved: ${r.message}`);
  } else {
    replace(byId(`f-${kind}-form-error`), 'Not saved: the table was changed elsewhere (see the message above). Save again to apply your row to the latest table.');
  }
}

/* ----------------------------------------------------------------------------------------------- */
/* Files: export, import, copy to sheet                                                             */
/* ----------------------------------------------------------------------------------------------- */

function describeInUse(): string {
  const st = model.state;
  if (st.kind === 'readable') return `This workbook’s own table, based on built-in ${st.read.copy.basedOn}, revision ${st.read.copy.revision}`;
  return `The add-in’s built-in table ${builtin.version} (the workbook has no table of its own)`;
}

function versionInUse(): string {
  return model.state.kind === 'readable' ? model.state.read.copy.basedOn : builtin.version;
}

function download(text: string, filename: string, type: string): void {
  const url = URL.createObjectURL(new Blob([text], { type: `${type};charset=utf-8` }));
  const a = h('a', { href: url, download: filename, hidden: true });
  document.body.appendChild(a);
  a.click();
  a.remove();
  setTimeout(() => URL.revokeObjectURL(url), 10_000);
}

function csvOfTable(): string {
  return exportCsv(model.records, `${describeInUse()}; checksum ${model.checksum ?? ''}; exported ${new Date().toISOString()}.`);
}

function exportDownload(): void {
  try {
    const csv = csvOfTable();
    download(csv, 'cellwright-potential-table.csv', 'text/csv');
    showNotice(`CSV file prepared: ${plural(model.records.couples.length, 'couple')} and ${plural(model.records.electrodes.length, 'electrode')}. If no download starts, use Show CSV text and copy it.`);
  } catch (e) {
    showProblem(`The table could not be exported: ${e instanceof Error ? e.message : String(e)}`);
  }
}

function exportShow(): void {
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

function importMode(): 'merge' | 'replace' {
  const checked = document.querySelector<HTMLInputElement>('input[name="import-mode"]:checked');
  return checked?.value === 'replace' ? 'replace' : 'merge';
}

function importChange(result: CsvImport, mode: 'merge' | 'replace'): TableChange {
  return { kind: 'import', mode, couples: result.couples, electrodes: result.electrodes };
}

function runImportCheck(): void {
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

async function doImport(skipRejected: boolean): Promise<void> {
  const chk = ui.importCheck;
  if (chk === null) return;
  if (chk.mode === 'replace') {
    const ok = await confirmAction({
      title: 'Replace the whole table?',
      body: [`The table becomes the ${plural(chk.result.accepted.length, 'imported row')}; every other row is removed from this workbook’s table.`],
      ok: 'Replace',
      danger: true,
    });
    if (!ok) return;
  }
  if (skipRejected && chk.result.rejected.length === 0) return;
  const r = await act(() => model.change(importChange(chk.result, chk.mode)));
  if (r?.kind === 'done') {
    ui.importCheck = null;
    clear(byId('import-report'));
    byId<HTMLTextAreaElement>('import-text').value = '';
    byId<HTMLInputElement>('import-file').value = '';
    byId('import-check').focus();
  }
}

async function readImportFile(): Promise<void> {
  const file = byId<HTMLInputElement>('import-file').files?.[0];
  if (file === undefined) return;
  if (file.size > MAX_CSV_BYTES) {
    showProblem(`The file ${file.name} is larger than 8 MB; Cellwright does not read it.`);
    return;
  }
  byId<HTMLTextAreaElement>('import-text').value = await file.text();
  runImportCheck();
}

async function copySheet(): Promise<void> {
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
    });
    showNotice(`Copied the table to the new sheet “${name}”.`);
  } catch (e) {
    showProblem(`The table could not be copied to a sheet: ${e instanceof Error ? e.message : String(e)}`);
  } finally {
    ui.busy = false;
  }
}

/* ----------------------------------------------------------------------------------------------- */
/* Tabs, wiring, start                                                                              */
/* ----------------------------------------------------------------------------------------------- */

const TABS = ['couples', 'electrodes', 'files', 'eph', 'about'] as const;

function selectTab(name: (typeof TABS)[number], focus: boolean): void {
  for (const t of TABS) {
    const tab = byId(`tab-${t}`);
    const on = t === name;
    tab.setAttribute('aria-selected', String(on));
    tab.tabIndex = on ? 0 : -1;
    byId(`panel-${t}`).hidden = !on;
    if (on && focus) tab.focus();
  }
}

function wireTabs(): void {
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

function wireEditors(): void {
  for (const kind of KINDS) {
    const form = byId<HTMLFormElement>(`editor-${kind}`);
    form.addEventListener('submit', (e) => {
      e.preventDefault();
      void saveEditor(kind);
    });
    form.addEventListener('input', (e) => {
      const ed = ui.editing[kind];
      if (ed === null) return;
      const name = (e.target as HTMLInputElement).name;
      if (name) ed.touched.add(name);
      showChecks(kind);
    });
    form.addEventListener('keydown', (e) => {
      if (e.key === 'Escape') {
        e.preventDefault();
        closeEditor(kind, ui.editing[kind]?.originalKey ?? null);
      }
    });
    byId(`cancel-${kind}`).addEventListener('click', () => closeEditor(kind, ui.editing[kind]?.originalKey ?? null));
    byId(`add-${kind}`).addEventListener('click', () => openEditor(kind, null));
    byId(`filter-${kind}`).addEventListener('input', () => renderList(kind));
    byId(`only-diff-${kind}`).addEventListener('change', () => renderList(kind));
  }
}

function wireFiles(): void {
  byId('export-download').addEventListener('click', exportDownload);
  byId('export-show').addEventListener('click', exportShow);
  byId('import-check').addEventListener('click', runImportCheck);
  byId('import-file').addEventListener('change', () => void readImportFile());
  byId('copy-sheet').addEventListener('click', () => void copySheet());
  wireVerification();
  byId('import-report').tabIndex = -1;
}

/** Re-renders what depends on the table, keeping keyboard focus on the same control when it was re-made. */
function renderAll(): void {
  const el = document.activeElement instanceof HTMLElement ? document.activeElement : null;
  const id = el?.id ?? '';
  const li = el?.closest<HTMLElement>('li[data-key]') ?? null;
  const listId = li?.parentElement?.id ?? '';
  const cls = el?.classList[0] ?? '';
  renderInUse();
  for (const kind of KINDS) renderList(kind);
  renderEph();
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

function start(): void {
  replace(byId('about-version'), builtin.version);
  replace(byId('about-source'), BUILTIN_TABLE_SOURCE || 'see the source on each row.');
  wireTabs();
  wireEditors();
  wireFiles();
  wireEph(ephTable);
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

start();
