/** The Log tab: the workbook table's revision log, newest first (what, who, when, why), and the person's name. */
import { MAX_LOG_ENTRIES, describeEntry } from '../src/store/log';
import { byId, clear, h, replace } from './dom';
import { copySheet } from './files';
import { plural, when } from './format';
import { rememberName, rememberedName } from './signoff';
import { MAX_SHOWN, model, ui } from './state';

/** Row lines shown per entry before "and N more". */
const ROWS_SHOWN = 12;
/** Longest text of a value shown in the pane (the sheet copy and the CSV export show it whole). */
const VALUE_CHARS = 120;

export function renderLog(): void {
  const summary = byId('log-summary');
  const list = byId('log-list');
  const copy = byId<HTMLButtonElement>('log-copy-sheet');
  const name = byId<HTMLInputElement>('log-name');
  if (document.activeElement !== name) name.value = rememberedName();
  const st = model.state;
  copy.disabled = !ui.ready || st.kind !== 'readable';
  if (st.kind !== 'readable') {
    clear(list);
    replace(
      summary,
      st.kind === 'none'
        ? 'This workbook has no table of its own, so there is no revision log. Pinning the table or changing a row starts one.'
        : 'The workbook’s table cannot be read (see above), so its revision log cannot be shown.',
    );
    return;
  }
  const log = st.read.copy.log ?? { entries: [], dropped: 0 };
  const n = log.entries.length;
  const parts = [`${plural(n, 'entry', 'entries')}, newest first. The log keeps the newest ${MAX_LOG_ENTRIES.toLocaleString('en-US')} entries.`];
  if (log.dropped > 0) parts.push(`${plural(log.dropped, 'older entry', 'older entries')} ${log.dropped === 1 ? 'was' : 'were'} dropped to keep it within its bounds.`);
  const first = log.entries[0]?.revision ?? st.read.copy.revision + 1;
  if (log.dropped === 0 && first > 1) parts.push(`${first === 2 ? 'Revision 1 was' : `Revisions 1 to ${first - 1} were`} made before this workbook’s table kept a log.`);
  if (n === 0) parts.push('The next change you save starts it.');
  replace(summary, parts.join(' '));
  const shown = [...log.entries].reverse().slice(0, MAX_SHOWN);
  replace(
    list,
    ...shown.map((e) => {
      const [action, ...rows] = describeEntry(e, VALUE_CHARS);
      return h(
        'li',
        { class: 'log-entry', 'data-revision': e.revision },
        h('div', { class: 'log-head' }, h('strong', {}, `Revision ${e.revision}`), ` · ${when(e.at)} · ${e.by}`),
        h('div', { class: 'log-what' }, `${action[0].toUpperCase()}${action.slice(1)}.`),
        rows.length > 0
          ? h('ul', {}, ...rows.slice(0, ROWS_SHOWN).map((r) => h('li', {}, r)), rows.length > ROWS_SHOWN ? h('li', {}, `and ${rows.length - ROWS_SHOWN} more (Copy to sheet lists them)`) : null)
          : null,
        h('div', { class: 'log-why' }, `Why: ${e.why}`),
        h('div', { class: 'hint' }, `UTC ${e.at}`),
      );
    }),
    n > MAX_SHOWN ? h('li', {}, `Showing the newest ${MAX_SHOWN}; Copy to sheet writes all ${n}.`) : null,
  );
}

export function wireLog(): void {
  const input = byId<HTMLInputElement>('log-name');
  input.value = rememberedName();
  byId('log-copy-sheet').addEventListener('click', () => void copySheet());
  byId('log-name-save').addEventListener('click', () => {
    const name = input.value.trim();
    const status = byId('log-name-status');
    if (!rememberName(name)) replace(status, 'This browser does not let the pane remember a name; it is asked with every change.');
    else if (name === '') replace(status, 'Name forgotten: it is asked with your next change.');
    else replace(status, `Your changes are recorded as ${name}.`);
    input.value = rememberedName();
  });
}
