/** Notices, problems and confirmations; running one action at a time; looking for changes made elsewhere. */
import { describeDifference, type RowDifference } from '../src/store/diff';
import { byId, clear, h, replace } from './dom';
import { type ActionResult } from './model';
import { model, ui } from './state';
import { renderAll } from './taskpane';
import { type Signoff } from '../src/store/log';
import { type SignoffControl, mountSignoff } from './signoff';

export interface NoticeAction {
  readonly label: string;
  readonly run: () => void | Promise<void>;
}

export function showNotice(text: string, opts: { conflict?: boolean; list?: readonly string[]; actions?: readonly NoticeAction[] } = {}): void {
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

export function showProblem(text: string, details: readonly string[] = []): void {
  replace(byId('problem'), h('p', {}, text), details.length > 0 ? h('ul', {}, ...details.slice(0, 12).map((d) => h('li', {}, d))) : null);
}

export function clearMessages(): void {
  clear(byId('notice'));
  clear(byId('problem'));
}

export interface ConfirmOptions {
  readonly title: string;
  readonly body: readonly string[];
  readonly list?: readonly string[];
  readonly ok: string;
  readonly danger?: boolean;
}

/**
 * A confirmation that also asks who and why for the revision log (OK stays disabled until a reason is
 * given): the signoff, or null when cancelled.
 */
export async function confirmSigned(o: ConfirmOptions): Promise<Signoff | null> {
  let control: SignoffControl | null = null;
  const ok = await confirmAction(o, (box, okButton) => {
    control = mountSignoff(box, 'confirm', (valid) => {
      okButton.disabled = !valid;
    });
    return () => control?.focus();
  });
  return ok && control !== null ? (control as SignoffControl).value() : null;
}

/**
 * A modal confirmation (native <dialog>: focus stays inside, Escape cancels). `extra` fills the space
 * below the text (the signoff fields) and returns what focuses it.
 */
export function confirmAction(o: ConfirmOptions, extra?: (box: HTMLElement, ok: HTMLButtonElement) => () => void): Promise<boolean> {
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
  ok.disabled = false;
  const box = byId('confirm-extra');
  clear(box);
  const focusExtra = extra?.(box, ok);
  return new Promise((resolve) => {
    const finish = (answer: boolean) => {
      if (answer && ok.disabled) return;
      ok.removeEventListener('click', onOk);
      cancel.removeEventListener('click', onCancel);
      dialog.removeEventListener('cancel', onEscape);
      if (dialog.open) dialog.close();
      ok.disabled = false;
      clear(box);
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
    if (focusExtra !== undefined) focusExtra();
    else (o.danger ? cancel : ok).focus();
  });
}

/* ----------------------------------------------------------------------------------------------- */
/* Running actions                                                                                  */
/* ----------------------------------------------------------------------------------------------- */

/** Runs one action at a time; shows its result; re-renders. Returns the result (null when busy). */
export async function act(run: () => Promise<ActionResult>): Promise<ActionResult | null> {
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

export function report(r: ActionResult): void {
  if (r.kind === 'done') {
    showNotice(r.warning === undefined ? r.message : `${r.message} ${r.warning}`);
  } else if (r.kind === 'refused') {
    showProblem(r.message, r.details);
  } else {
    showConflict(r.message, r.theirs, r.retry);
  }
}

export function showConflict(message: string, theirs: readonly RowDifference[], retry?: () => Promise<ActionResult>): void {
  showNotice(message, {
    conflict: true,
    list: theirs.length > 0 ? theirs.map(describeDifference) : ['(no row differs: only the revision changed)'],
    actions: retry === undefined ? [] : [{ label: 'Apply my change to the latest table', run: () => void act(retry) }],
  });
}

export async function checkElsewhere(): Promise<void> {
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
