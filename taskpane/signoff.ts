/**
 * Who and why for the revision log. Every write asks for a reason (the Save or OK button stays
 * disabled until one is given) and, until this computer remembers one, for the person's name.
 *
 * The name is kept in the browser's localStorage of this computer (key cellwright.userName), not in
 * the workbook: Office does not reliably tell an add-in who is signed in, so the person says it once
 * and can change it in the Log tab. Where localStorage cannot be used (blocked storage), the name is
 * asked on every save.
 */
import { type Signoff, signoffProblem } from '../src/store/log';
import { MAX_PERSON_CHARS, MAX_REASON_CHARS } from '../src/textLimits';
import { h, replace } from './dom';

export const NAME_STORAGE_KEY = 'cellwright.userName';

/** The name remembered on this computer ('' when none). */
export function rememberedName(): string {
  try {
    const v = globalThis.localStorage?.getItem(NAME_STORAGE_KEY);
    return typeof v === 'string' ? v.trim().slice(0, MAX_PERSON_CHARS) : '';
  } catch {
    return '';
  }
}

/** Remembers a name on this computer (an empty name forgets it). Returns false when storage is not available. */
export function rememberName(name: string): boolean {
  try {
    const t = name.trim();
    if (t === '') globalThis.localStorage.removeItem(NAME_STORAGE_KEY);
    else globalThis.localStorage.setItem(NAME_STORAGE_KEY, t);
    return true;
  } catch {
    return false;
  }
}

export interface SignoffControl {
  /** Who and why as given, or null while either is missing or too long. */
  value(): Signoff | null;
  /** Clears the reason (after a save) and shows the name field again only when no name is remembered. */
  reset(): void;
  /** Focuses the first field still to fill. */
  focus(): void;
}

/**
 * Puts the name (only while none is remembered) and reason fields into `box`; `onChange(valid)` is
 * called on every keystroke and once at the start, so the caller can enable its Save or OK button.
 * Field ids: `${prefix}-by`, `${prefix}-why`.
 */
export function mountSignoff(box: HTMLElement, prefix: string, onChange: (valid: boolean) => void): SignoffControl {
  const by = h('input', { id: `${prefix}-by`, name: 'by', autocomplete: 'name', maxlength: MAX_PERSON_CHARS, 'aria-describedby': `${prefix}-by-hint` });
  const why = h('input', { id: `${prefix}-why`, name: 'why', autocomplete: 'off', maxlength: MAX_REASON_CHARS, 'aria-describedby': `${prefix}-why-hint`, 'aria-required': 'true' });
  const byField = h(
    'div',
    { class: 'field' },
    h('label', { for: `${prefix}-by` }, 'Your name'),
    by,
    h('p', { class: 'hint', id: `${prefix}-by-hint` }, 'Recorded with each change you save; remembered on this computer (change it in the Log tab).'),
  );
  const recordedAs = h('p', { class: 'hint', id: `${prefix}-recorded-as` });
  const whyField = h(
    'div',
    { class: 'field' },
    h('label', { for: `${prefix}-why` }, 'Reason for this change (required)'),
    why,
    h('p', { class: 'hint', id: `${prefix}-why-hint` }, `Recorded in the table’s revision log with your name and the time; at most ${MAX_REASON_CHARS} characters.`),
  );
  const current = (): Signoff => ({ by: rememberedName() || by.value, why: why.value });
  const update = () => onChange(signoffProblem(current()) === null);
  const layout = () => {
    const known = rememberedName();
    byField.hidden = known !== '';
    recordedAs.hidden = known === '';
    replace(recordedAs, known === '' ? '' : `Recorded as ${known}.`);
  };
  replace(box, byField, recordedAs, whyField);
  box.addEventListener('input', update);
  layout();
  update();
  return {
    value() {
      const s = current();
      if (signoffProblem(s) !== null) return null;
      if (rememberedName() === '') rememberName(s.by);
      return { by: s.by.trim(), why: s.why.trim() };
    },
    reset() {
      why.value = '';
      by.value = '';
      layout();
      update();
    },
    focus() {
      (rememberedName() === '' && by.value.trim() === '' ? by : why).focus();
    },
  };
}
