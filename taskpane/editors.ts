/** The add/edit forms of couples and electrodes, checked as the user types. */
import { type TableChange } from '../src/store/copy';
import { type RowKind, matchKey, rowsOf } from '../src/store/rows';
import { type CoupleRecord, type ElectrodeRecord } from '../src/table/records';
import { byId, replace } from './dom';
import { type CoupleFields, type ElectrodeFields, checkCoupleForm, checkElectrodeForm } from './forms';
import { renderList, focusRowButton } from './lists';
import { act } from './notices';
import { type SignoffControl, mountSignoff } from './signoff';
import { model, KINDS, noun, ui } from './state';

export const COUPLE_FIELDS: readonly (keyof CoupleFields)[] = ['halfReaction', 'key', 'e0', 'dEdT', 'source', 'note'];
export const ELECTRODE_FIELDS: readonly (keyof ElectrodeFields)[] = ['key', 'aliases', 'potential', 'dEdT', 'source', 'note'];
export const fieldsOf = (kind: RowKind): readonly string[] => (kind === 'couple' ? COUPLE_FIELDS : ELECTRODE_FIELDS);

export function input(kind: RowKind, field: string): HTMLInputElement | HTMLTextAreaElement {
  return byId(`f-${kind}-${field}`);
}

/** The text of each field of a form, by field name. */
function readForm<K extends string>(kind: RowKind, fields: readonly K[]): Record<K, string> {
  const out = {} as Record<K, string>;
  for (const f of fields) out[f] = input(kind, f).value;
  return out;
}

/** A form's messages by field (errors or information), read by any field name. */
type FieldMessages = Partial<Record<string, string>>;

export function keyTaken(kind: RowKind, originalKey: string | null) {
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

export function check(kind: RowKind) {
  const ed = ui.editing[kind]!;
  return kind === 'couple'
    ? checkCoupleForm(readForm(kind, COUPLE_FIELDS), keyTaken(kind, ed.originalKey))
    : checkElectrodeForm(readForm(kind, ELECTRODE_FIELDS), keyTaken(kind, ed.originalKey));
}

/** Shows the form's errors (for fields touched, or all after a save attempt) and information. */
export function showChecks(kind: RowKind): ReturnType<typeof check> {
  const ed = ui.editing[kind]!;
  const c = check(kind);
  const errors: FieldMessages = c.errors;
  const info: FieldMessages = c.info;
  for (const f of fieldsOf(kind)) {
    const el = input(kind, f);
    const err = errors[f];
    const shown = err !== undefined && (ed.showAll || ed.touched.has(f)) ? err : '';
    const errEl = document.getElementById(`f-${kind}-${f}-error`);
    if (errEl) replace(errEl, shown === '' ? '' : `${shown[0].toUpperCase()}${shown.slice(1)}${/[.?!]$/.test(shown) ? '' : '.'}`);
    if (shown === '') el.removeAttribute('aria-invalid');
    else el.setAttribute('aria-invalid', 'true');
    const infoEl = document.getElementById(`f-${kind}-${f}-info`);
    if (infoEl) replace(infoEl, info[f] ?? '');
  }
  return c;
}

export function openEditor(kind: RowKind, originalKey: string | null): void {
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
  signoffs[kind]?.reset();
  replace(byId(`f-${kind}-form-error`), '');
  form.hidden = false;
  showChecks(kind);
  input(kind, fieldsOf(kind)[0]).focus();
}

export function closeEditor(kind: RowKind, focusKey: string | null): void {
  ui.editing[kind] = null;
  byId<HTMLFormElement>(`editor-${kind}`).hidden = true;
  if (focusKey !== null) focusRowButton(kind, focusKey);
  else byId(`add-${kind}`).focus();
}

export async function saveEditor(kind: RowKind): Promise<void> {
  const ed = ui.editing[kind];
  if (ed === null || ui.busy) return;
  ed.showAll = true;
  const c = showChecks(kind);
  if (c.record === undefined) {
    const errors: FieldMessages = c.errors;
    const first = fieldsOf(kind).find((f) => errors[f] !== undefined);
    replace(byId(`f-${kind}-form-error`), 'Not saved: correct the fields marked above.');
    if (first !== undefined) input(kind, first).focus();
    return;
  }
  const signoff = signoffs[kind]?.value() ?? null;
  if (signoff === null) {
    replace(byId(`f-${kind}-form-error`), 'Not saved: give a reason for the change (and your name, if asked).');
    signoffs[kind]?.focus();
    return;
  }
  const change: TableChange = { kind: 'put', rowKind: kind, originalKey: ed.originalKey, record: c.record };
  const r = await act(() => model.change(change, signoff));
  if (r === null) return;
  if (r.kind === 'done') {
    closeEditor(kind, c.record.key);
  } else if (r.kind === 'refused') {
    replace(byId(`f-${kind}-form-error`), `Not saved: ${r.message}`);
  } else {
    replace(byId(`f-${kind}-form-error`), 'Not saved: the table was changed elsewhere (see the message above). Save again to apply your row to the latest table.');
  }
}

/** The who-and-why fields of each form (Save stays disabled until a reason is given). */
const signoffs: Record<RowKind, SignoffControl | null> = { couple: null, electrode: null };

export function wireEditors(): void {
  for (const kind of KINDS) {
    const form = byId<HTMLFormElement>(`editor-${kind}`);
    signoffs[kind] = mountSignoff(byId(`f-${kind}-signoff`), `f-${kind}`, (valid) => {
      byId<HTMLButtonElement>(`save-${kind}`).disabled = !valid;
    });
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
