/** The lists of couples and electrodes: filter, differences from the built-in table, delete, revert. */
import { describeDifference, type RowDifference, diffTables } from '../src/store/diff';
import { type AnyRecord, type RowKind, matchKey, rowsOf } from '../src/store/rows';
import { type CoupleRecord, type ElectrodeRecord } from '../src/table/records';
import { byId, clear, h, replace } from './dom';
import { openEditor } from './editors';
import { signed, plural, electronsOf, fieldLabel } from './format';
import { confirmSigned, act } from './notices';
import { builtin, model, MAX_SHOWN, noun, ui } from './state';

export function matches(kind: RowKind, r: AnyRecord, filter: string): boolean {
  if (filter === '') return true;
  const parts = kind === 'couple' ? [r.key, (r as CoupleRecord).halfReaction, r.source, r.note ?? ''] : [r.key, ...(r as ElectrodeRecord).aliases, r.source, r.note ?? ''];
  return parts.some((p) => p.toLowerCase().includes(filter));
}

export function rowItem(kind: RowKind, r: AnyRecord, diff: RowDifference | undefined, own: boolean, inBuiltin: boolean): HTMLElement {
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

export function renderList(kind: RowKind): void {
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

export function focusRowButton(kind: RowKind, key: string | null, cls = 'edit'): void {
  if (key !== null) {
    const k = matchKey(kind, key);
    for (const li of Array.from(byId(`list-${kind}`).children) as HTMLElement[]) {
      if (li.dataset.key !== undefined && matchKey(kind, li.dataset.key) === k) {
        li.querySelector<HTMLButtonElement>(`button.${cls}`)?.focus();
        return;
      }
    }
  }
  byId(`filter-${kind}`).focus();
}

export async function deleteRow(kind: RowKind, key: string): Promise<void> {
  const inBuiltin = rowsOf(builtin, kind).some((r) => matchKey(kind, r.key) === matchKey(kind, key));
  const signoff = await confirmSigned({
    title: `Delete ${key}?`,
    body: [
      `Cells that use the ${noun(kind)} ${key} will show #N/A.`,
      inBuiltin ? 'It is a built-in row: it can be restored from the built-in table later.' : 'It is not in the built-in table: only an export or undo by hand brings it back.',
    ],
    ok: 'Delete',
    danger: true,
  });
  if (signoff === null) return;
  const rows = rowsOf(model.records, kind);
  const i = rows.findIndex((r) => matchKey(kind, r.key) === matchKey(kind, key));
  const next = rows[i + 1]?.key ?? rows[i - 1]?.key ?? null;
  const r = await act(() => model.change({ kind: 'delete', rowKind: kind, key }, signoff));
  if (r?.kind === 'done') focusRowButton(kind, next);
}

export async function revertRow(kind: RowKind, key: string): Promise<void> {
  const b = rowsOf(builtin, kind).find((r) => matchKey(kind, r.key) === matchKey(kind, key));
  if (b === undefined) return;
  const current = rowsOf(model.records, kind).find((r) => matchKey(kind, r.key) === matchKey(kind, key));
  const one = (r: AnyRecord) => (kind === 'couple' ? { couples: [r as CoupleRecord], electrodes: [] } : { couples: [], electrodes: [r as ElectrodeRecord] });
  const change = current === undefined ? [] : diffTables(one(current), one(b));
  const signoff = await confirmSigned({
    title: current === undefined ? `Restore ${key}?` : `Revert ${key} to the built-in value?`,
    body: [current === undefined ? `The built-in row ${key} comes back with its built-in values.` : 'The row takes the built-in table’s values again:'],
    list: change.map(describeDifference),
    ok: current === undefined ? 'Restore' : 'Revert',
  });
  if (signoff === null) return;
  const r = await act(() => model.change({ kind: 'revert', rowKind: kind, key }, signoff));
  if (r?.kind === 'done') focusRowButton(kind, key);
}
