/**
 * The data-set view: every part of the data the worksheet functions read (the potential table, atomic
 * weights, species data, constants), each pinned in the workbook or following the add-in's built-in
 * data, with its version, checksum and source; what the add-in's built-in data would change in pinned
 * parts; pinning the whole data set; and the unreadable state of pinned data. Atomic weights and
 * constants are read-only here: only couples and electrodes are edited (their own tabs).
 */
import type { PartDescription, PartComparison, ValueChange } from '../src/dataset/describe';
import type { TablePart } from '../src/dataset/describe';
import { BUILTIN_TABLE_SOURCE } from '../src/table/builtin';
import { recordComputedWithData } from '../workbook/pinnedData';
import { PinnedDataModel } from './dataModel';
import { type Child, byId, h, replace } from './dom';
import { download } from './files';
import { plural, when } from './format';
import type { ActionResult } from './model';
import type { Signoff } from '../src/store/log';
import { act, confirmAction, confirmSigned, showNotice } from './notices';
import { builtin, model, ui } from './state';

export const dataModel = new PinnedDataModel({ host: () => globalThis.cellwrightFunctionsHost });

/** A checksum's short form: "sha256:" and its first 12 hex digits. */
export function shortChecksum(sum: string): string {
  return sum.length > 19 ? `${sum.slice(0, 19)}…` : sum;
}

function checksumCell(sum: string, label: string, id?: string): HTMLElement {
  return h(
    'span',
    { class: 'checksum-short' },
    h('code', { title: sum, ...(id === undefined ? {} : { id }), 'data-full': sum }, shortChecksum(sum)),
    ' ',
    h('button', {
      type: 'button', class: 'link', 'aria-label': `Copy ${label}`,
      onclick: () => {
        const done = () => showNotice(`Copied ${label}: ${sum}`);
        if (navigator.clipboard === undefined) showNotice(`${label[0].toUpperCase()}${label.slice(1)}: ${sum}`);
        else navigator.clipboard.writeText(sum).then(done, () => showNotice(`${label[0].toUpperCase()}${label.slice(1)}: ${sum}`));
      },
    }, 'Copy'),
  );
}

/** The table's part, as the pane's table model knows it. */
function tablePart(): TablePart {
  const copy = model.copy;
  const r = model.records;
  return {
    pinned: copy !== null,
    version: copy?.basedOn ?? builtin.version,
    checksum: model.checksum ?? '',
    rows: r.couples.length + r.electrodes.length,
    source: copy === null ? BUILTIN_TABLE_SOURCE : 'the source given on each row',
  };
}

const show = (v: unknown): string => {
  const t = typeof v === 'string' ? v : JSON.stringify(v);
  return t.length > 60 ? `${t.slice(0, 59)}…` : t;
};

function describeValueChange(c: ValueChange): string {
  if (c.before === undefined) return `${c.where}: added ${show(c.after)}`;
  if (c.after === undefined) return `${c.where}: removed (was ${show(c.before)})`;
  return `${c.where}: ${show(c.before)} → ${show(c.after)}`;
}

/** One line per difference of a part, at most `max`. */
export function describeComparison(c: PartComparison, max = 8): string[] {
  const lines = [...c.changed.map(describeValueChange), ...c.added.map((k) => `${k}: added`), ...c.removed.map((k) => `${k}: removed`)];
  return lines.length > max ? [...lines.slice(0, max), `and ${lines.length - max} more`] : lines;
}

function partItem(p: PartDescription): HTMLElement {
  return h(
    'li',
    { 'data-part': p.name },
    h('p', {}, h('strong', {}, p.title), ' ', h('span', { class: p.pinned ? 'tag pinned' : 'tag builtin' }, p.pinned ? 'pinned' : 'built-in')),
    h('p', { class: 'hint' }, `Version ${p.version}`, p.rows === null ? '' : ` · ${plural(p.rows, 'row')}`, ' · ', checksumCell(p.checksum, `the checksum of ${p.title.toLowerCase()}`)),
    p.name === 'table' ? null : h('p', { class: 'hint source' }, `Read-only. Source: ${p.source}`),
    p.fromBuiltin === undefined || p.fromBuiltin.length === 0
      ? null
      : h('p', { class: 'hint' }, `Pinned by an earlier add-in version, before these fields existed; they are read from this add-in’s built-in data until you update the pinned data: ${p.fromBuiltin.slice(0, 5).join(', ')}${p.fromBuiltin.length > 5 ? ` and ${p.fromBuiltin.length - 5} more` : ''}.`),
  );
}

function renderUnreadable(): Child[] {
  const st = dataModel.state;
  if (st.kind !== 'unreadable') return [];
  const raw = typeof st.raw === 'string' ? st.raw : JSON.stringify(st.raw) ?? String(st.raw);
  return [
    h('p', {}, h('strong', {}, 'This workbook’s pinned data cannot be read')),
    h('p', { id: 'data-unreadable-reason' }, `${st.problem.message[0].toUpperCase()}${st.problem.message.slice(1)}.`),
    st.problem.details.length > 0 ? h('details', {}, h('summary', {}, 'Details'), h('ul', {}, ...st.problem.details.slice(0, 8).map((d) => h('li', {}, d)))) : null,
    h('p', {}, 'Every worksheet function that reads the data set shows #N/A until this is resolved. Nothing has been changed or replaced: the built-in data is not used in its place.'),
    h(
      'div',
      { class: 'actions' },
      h('button', { type: 'button', id: 'data-raw-download', onclick: () => download(raw, 'cellwright-pinned-data.txt', 'text/plain') }, 'Download the stored text'),
      h('button', { type: 'button', id: 'data-remove', class: 'danger', onclick: () => void removePinned() }, 'Remove the pinned data…'),
    ),
  ];
}

function renderNotice(): HTMLElement | null {
  const n = dataModel.notice();
  if (n === null) return null;
  const head = n.addinIsNewer
    ? [h('strong', {}, `The add-in’s built-in data ${n.builtinVersion} is newer`), ` than ${n.pinnedVersion}, the data pinned in this workbook.`]
    : [h('strong', {}, `The data pinned in this workbook (${n.pinnedVersion}) differs from the add-in’s built-in data ${n.builtinVersion}.`)];
  return h(
    'div',
    { class: 'newer', id: 'newer-data' },
    h('p', {}, ...head),
    h('p', {}, `Updating would change ${plural(n.changes.length, 'part')}:`),
    h('ul', {}, ...n.changes.map((c) => h('li', { 'data-part': c.name }, h('strong', {}, c.title), h('ul', {}, ...describeComparison(c).map((l) => h('li', {}, l)))))),
    h('p', { class: 'hint' }, 'Until you update, this workbook’s results stay as they are.'),
    h('div', { class: 'actions' }, h('button', { type: 'button', id: 'update-data', onclick: () => void updatePinned() }, `Update pinned data to ${n.builtinVersion}…`)),
  );
}

function functionsDataLine(): HTMLElement {
  const st = model.functionsStatus();
  let text: string;
  if (st === undefined) text = 'Worksheet functions: not running in this page; they read the pinned data when the workbook opens.';
  else if (st.state === 'loading') text = 'Worksheet functions: reading the workbook’s data…';
  else if (st.dataset === undefined) text = 'Worksheet functions: answer #N/A until the workbook’s data can be read.';
  else text = `Worksheet functions: use data set ${st.dataset.version}, checksum ${shortChecksum(st.dataset.checksum)}.`;
  return h('p', { class: 'hint', id: 'data-functions-status' }, text);
}

export function renderDataSet(): void {
  const body = byId('data-set-body');
  if (!ui.ready) {
    replace(body, h('p', {}, 'Reading the workbook…'));
    return;
  }
  if (model.state.kind === 'unreadable') {
    replace(body, h('p', {}, 'The data set cannot be described while the workbook’s potential table cannot be read (see “Table in use” above).'), functionsDataLine());
    return;
  }
  if (dataModel.state.kind === 'unreadable') {
    replace(body, ...renderUnreadable(), functionsDataLine());
    return;
  }
  const ds = dataModel.describe(tablePart());
  if (ds === null) return;
  const pinnedCount = ds.parts.filter((p) => p.pinned).length;
  const whole = pinnedCount === ds.parts.length;
  const pinned = dataModel.pinned;
  replace(
    body,
    h('p', {}, h('strong', {}, `Data set ${ds.version}`), ' ', h('span', { id: 'data-set-state' }, whole ? '(pinned in this workbook)' : pinnedCount === 0 ? '(built-in: follows the add-in)' : `(${pinnedCount} of ${ds.parts.length} parts pinned)`)),
    h(
      'dl',
      { class: 'facts' },
      h('dt', {}, 'Checksum'), h('dd', {}, checksumCell(ds.checksum, 'the data set checksum', 'data-set-checksum')),
      pinned === null ? null : h('dt', {}, 'Pinned'), pinned === null ? null : h('dd', {}, when(pinned.pinnedAt)),
    ),
    whole ? null : h('p', {}, 'Parts marked built-in follow the add-in’s data and can change when the add-in is updated.'),
    renderNotice(),
    h('ul', { id: 'data-parts', class: 'parts' }, ...ds.parts.map(partItem)),
    h(
      'div',
      { class: 'actions' },
      whole ? null : h('button', { type: 'button', id: 'pin-data-set', class: 'primary', onclick: () => void confirmAndPin() }, 'Pin the whole data set to this workbook'),
      pinned === null ? null : h('button', { type: 'button', id: 'data-remove', class: 'danger', onclick: () => void removePinned() }, 'Follow the built-in data again…'),
    ),
    h('p', { class: 'hint' }, 'The checksum of the data set is computed over the checksum of each part (SHA-256 of its canonical JSON); equal data gives equal checksums in every workbook.'),
    functionsDataLine(),
  );
}

/**
 * Pins every part: the table through its own store (when the workbook has no table yet) and the rest
 * under the pinned-data key, in one recalculation.
 */
/** Asks for the name and a reason (the table's revision log records the pin), then pins every part. */
export async function confirmAndPin(): Promise<void> {
  const signoff = await confirmSigned({
    title: `Pin the built-in data set ${builtin.version} to this workbook?`,
    body: ['The workbook keeps its own copy of the potential table and of the rest of the data set (atomic weights, species data, constants), so later add-in updates do not change its results. The table’s revision log starts with this entry.'],
    ok: 'Pin',
  });
  if (signoff !== null) await act(() => pinDataSet(signoff));
}

export async function pinDataSet(signoff: Signoff): Promise<ActionResult> {
  if (model.state.kind === 'unreadable') return model.pin(signoff);
  if (model.state.kind === 'none') {
    const d = await dataModel.pin({ recalculate: false });
    if (d.kind !== 'done') return d;
    const t = await model.pin(signoff);
    const data = globalThis.cellwrightFunctionsHost?.status().dataChecksum;
    if (data !== undefined) await recordComputedWithData(data).catch(() => undefined);
    if (t.kind !== 'done') return t;
    return { kind: 'done', message: `${t.message} ${d.message}`, ...(t.warning === undefined ? {} : { warning: t.warning }) };
  }
  if (dataModel.state.kind === 'readable' && dataModel.notice() === null) return { kind: 'done', message: 'The whole data set is already pinned in this workbook.' };
  return dataModel.pin();
}

async function updatePinned(): Promise<void> {
  const n = dataModel.notice();
  if (n === null) return;
  const ok = await confirmAction({
    title: `Update pinned data to ${n.builtinVersion}?`,
    body: ['The workbook’s pinned reference data is replaced by the add-in’s built-in data, and every formula is recalculated. These parts change:'],
    list: n.changes.flatMap((c) => describeComparison(c, 4).map((l) => `${c.title}: ${l}`)),
    ok: 'Update',
  });
  if (ok) await act(() => dataModel.pin());
}

async function removePinned(): Promise<void> {
  const unreadable = dataModel.state.kind === 'unreadable';
  const ok = await confirmAction({
    title: unreadable ? 'Remove the unreadable pinned data?' : 'Follow the built-in data again?',
    body: unreadable
      ? ['The workbook’s pinned data cannot be read. Removing it deletes it for good, and the worksheet functions use the add-in’s built-in data again.', 'Download the stored text first if you may need it.']
      : ['This removes the reference data pinned in this workbook (atomic weights, species data, constants). Results then follow the add-in’s built-in data, which can change when the add-in is updated. The potential table is not affected.'],
    ok: 'Remove',
    danger: true,
  });
  if (ok) await act(() => dataModel.remove());
}
