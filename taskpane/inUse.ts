/** The view of the table in use: built-in, the workbook's own, or unreadable; reset and update. */
import { describeDifference } from '../src/store/diff';
import { type Child, byId, h, replace } from './dom';
import { download } from './files';
import { when, plural } from './format';
import { clearMessages, confirmAction, confirmSigned, act } from './notices';
import { builtin, model, ui } from './state';
import { renderAll } from './taskpane';
import { confirmAndPin, dataModel } from './dataSet';

export function fact(name: string, value: Child, cls?: string): Child[] {
  return [h('dt', {}, name), h('dd', cls === undefined ? {} : { class: cls }, value)];
}

export function functionsLine(): HTMLElement {
  const st = model.functionsStatus();
  let text: string;
  if (st === undefined) text = 'Worksheet functions: not running in this page; they read the stored table when the workbook opens.';
  else if (st.state === 'loading') text = 'Worksheet functions: reading the workbook’s table…';
  else if (st.state === 'unreadable' && (st.reason ?? '').startsWith('its pinned data set')) text = 'Worksheet functions: answer #N/A until the workbook’s pinned data (Data set tab) is repaired or removed.';
  else if (st.state === 'unreadable') text = 'Worksheet functions: answer #N/A for table look-ups until the table is repaired or reset.';
  else if (st.state === 'builtin') text = `Worksheet functions: use the built-in table ${st.version ?? ''}.`;
  else text = `Worksheet functions: use this workbook’s table (revision ${st.revision ?? '?'}).`;
  return h('p', { class: 'hint', id: 'functions-status' }, text);
}

export function renderInUse(): void {
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
        h('button', { type: 'button', id: 'pin', class: 'primary', 'aria-describedby': 'pin-hint', onclick: () => void pinTable() }, 'Pin to this workbook…'),
      ),
      h('p', { class: 'hint', id: 'pin-hint' }, 'Stores the built-in table and the rest of the data set (atomic weights, species data, constants) in this workbook, so later add-in updates do not change its results. Editing a row pins the table only.'),
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

export async function reload(): Promise<void> {
  if (ui.busy) return;
  ui.busy = true;
  try {
    await model.load();
    await dataModel.load();
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

export async function resetTable(): Promise<void> {
  const unreadable = model.state.kind === 'unreadable';
  const diffs = model.differences();
  const ok = await confirmAction({
    title: 'Reset to the built-in table?',
    body: unreadable
      ? ['The workbook’s stored table cannot be read. Resetting removes it for good and the worksheet functions use the add-in’s built-in table again.', 'Download the stored text first if you may need it.']
      : [
          'This removes the workbook’s own table. The worksheet functions then use the add-in’s built-in table, which can change when the add-in is updated.',
          'The table’s revision log is removed with it: copy the table and its log to a sheet first (Log tab) if you need them.',
          diffs.length === 0 ? 'No row differs from the built-in table.' : `${plural(diffs.length, 'row')} that ${diffs.length === 1 ? 'differs' : 'differ'} from the built-in table will be lost:`,
        ],
    list: unreadable ? [] : diffs.map(describeDifference),
    ok: 'Reset',
    danger: true,
  });
  if (ok) await act(() => model.reset());
}

export async function updateToBuiltin(): Promise<void> {
  const notice = model.builtinNotice();
  if (notice === null) return;
  const signoff = await confirmSigned({
    title: `Update to built-in ${notice.builtin}?`,
    body: ['Rows added, edited or deleted in this workbook stay as they are. These rows change:'],
    list: notice.changes.map(describeDifference),
    ok: 'Update',
  });
  if (signoff !== null) await act(() => model.change({ kind: 'update-to-builtin' }, signoff));
}

export async function pinTable(): Promise<void> {
  await confirmAndPin();
}
