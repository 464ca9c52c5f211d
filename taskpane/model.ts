/**
 * The task pane's model of the workbook's table: what the workbook holds, what the worksheet functions
 * use, and every action the pane offers (change a row, pin, update to a newer built-in table, reset,
 * notice changes made elsewhere). No DOM here, so it is tested with office-addin-mock
 * (tests/taskpane/*.test.ts) and driven by the page (taskpane.ts).
 *
 * After every action that changes the stored table the model
 *  1. writes it (workbook/store.ts: only if the workbook still holds what this pane last
 *     read; otherwise nothing is written and the user is told what changed elsewhere),
 *  2. hands the stored value to the worksheet functions (globalThis.cellwrightFunctionsHost),
 *  3. recalculates: application.calculate(Excel.CalculationType.full).
 */
import { type TableChange, type WorkbookCopy, ChangeError, applyChange, pinnedCopy } from '../src/store/copy';
import { type RowDifference, describeDifference, diffTables } from '../src/store/diff';
import { type TableRecords, type VersionedRecords, cleanRecord, matchKey, rowsOf, sameRecord } from '../src/store/rows';
import { type LogAction, type Signoff } from '../src/store/log';
import { builtinChecksum } from '../src/store/stored';
import type { CellwrightFunctionsHost, FunctionsHostStatus } from '../workbook/channel';
import { type StoredState, type WriteOutcome, computedWithOf, readStoredValue, interpret, recalculateAll, removeTable, writeCopy } from '../workbook/store';
import { sameStoredValue } from '../workbook/settings';

export interface ModelDeps {
  readonly builtin: VersionedRecords;
  /** The functions bundle's channel (undefined when the functions do not run in this page). */
  readonly host: () => CellwrightFunctionsHost | undefined;
  readonly now?: () => Date;
}

export type ActionResult =
  | { readonly kind: 'done'; readonly message: string; readonly warning?: string }
  /** Nothing was written: the stored table changed elsewhere. The model now holds the latest; `retry` applies the change to it. */
  | { readonly kind: 'conflict'; readonly message: string; readonly theirs: readonly RowDifference[]; readonly retry?: () => Promise<ActionResult> }
  | { readonly kind: 'refused'; readonly message: string; readonly details: readonly string[] };

export interface ElsewhereReport {
  readonly message: string;
  /** What changed, from the table this pane knew to the one stored now. */
  readonly theirs: readonly RowDifference[];
  /** True when this pane's last change is no longer in the table. */
  readonly lostMine: boolean;
  readonly retry?: () => Promise<ActionResult>;
}

/** Compares versions like "2026.1" < "2026.10" < "2027.1" (numbers by value, other text by code). */
export function compareVersions(a: string, b: string): number {
  const pa = a.split(/[^0-9A-Za-z]+/);
  const pb = b.split(/[^0-9A-Za-z]+/);
  for (let i = 0; i < Math.max(pa.length, pb.length); i++) {
    const x = pa[i] ?? '';
    const y = pb[i] ?? '';
    if (x === y) continue;
    if (/^\d+$/.test(x) && /^\d+$/.test(y)) return Number(x) - Number(y);
    return x < y ? -1 : 1;
  }
  return 0;
}

const EMPTY: TableRecords = { couples: [], electrodes: [] };

export class TableModel {
  state: StoredState = { kind: 'none', raw: null };
  private lastChange: { change: TableChange; signoff: Signoff; mine: readonly RowDifference[]; written: string } | null = null;

  constructor(private readonly deps: ModelDeps) {}

  get builtin(): VersionedRecords {
    return this.deps.builtin;
  }

  /** The workbook's copy, when it has a readable one. */
  get copy(): WorkbookCopy | null {
    return this.state.kind === 'readable' ? this.state.read.copy : null;
  }

  /** The rows of the table in use (the built-in ones when the workbook has none; none when unreadable). */
  get records(): TableRecords {
    if (this.state.kind === 'readable') return this.state.read.copy;
    if (this.state.kind === 'none') return this.deps.builtin;
    return EMPTY;
  }

  /** Checksum of the table in use. */
  get checksum(): string | null {
    if (this.state.kind === 'readable') return this.state.read.checksum;
    if (this.state.kind === 'none') return builtinChecksum(this.deps.builtin);
    return null;
  }

  /** Rows of the table in use that differ from the add-in's built-in table. */
  differences(): RowDifference[] {
    return this.state.kind === 'readable' ? diffTables(this.deps.builtin, this.state.read.copy) : [];
  }

  /** What the functions use, as they report it (undefined without the channel). */
  functionsStatus(): FunctionsHostStatus | undefined {
    return this.deps.host()?.status();
  }

  /**
   * When the workbook's table is based on another built-in version than the add-in's: which is newer,
   * and (when the add-in's is) what updating would change.
   */
  builtinNotice(): { readonly basedOn: string; readonly builtin: string; readonly addinIsNewer: boolean; readonly changes: readonly RowDifference[] } | null {
    const copy = this.copy;
    if (copy === null || copy.basedOn === this.deps.builtin.version) return null;
    const addinIsNewer = compareVersions(this.deps.builtin.version, copy.basedOn) > 0;
    let changes: RowDifference[] = [];
    if (addinIsNewer) {
      try {
        changes = diffTables(copy, applyChange(copy, this.deps.builtin, { kind: 'update-to-builtin' }));
      } catch {
        changes = [];
      }
    }
    return { basedOn: copy.basedOn, builtin: this.deps.builtin.version, addinIsNewer, changes };
  }

  /** Reads what the workbook holds, and makes sure the functions use the same. */
  async load(): Promise<void> {
    this.state = interpret(await readStoredValue(), this.deps.builtin);
    await this.syncFunctions(false);
  }

  /**
   * Hands the stored value to the functions when they use something else, then recalculates.
   * Returns a warning when the functions cannot be reached or recalculation failed.
   */
  private async syncFunctions(force: boolean): Promise<string | undefined> {
    const host = this.deps.host();
    let warning: string | undefined;
    /** The table the functions answer from after this, recorded with the recalculation. */
    let computedWith: string | undefined;
    if (host === undefined) {
      warning = 'The worksheet functions do not run in this pane’s page, so they were not told; they read the table when the workbook is next opened.';
      // Only a change is worth a recalculation (for functions running elsewhere); opening the pane is not.
      if (!force) return warning;
    } else {
      const st = host.status();
      const same =
        (this.state.kind === 'none' && st.state === 'builtin') ||
        (this.state.kind === 'readable' && st.state === 'workbook' && st.checksum === this.state.read.checksum && st.revision === this.state.read.copy.revision) ||
        (this.state.kind === 'unreadable' && st.state === 'unreadable') ||
        // The table is fine but the pinned data is not: handing the table over again changes nothing.
        (this.state.kind !== 'unreadable' && st.state === 'unreadable' && (st.reason ?? '').startsWith('its pinned data set'));
      if (same && !force) return undefined;
      computedWith = computedWithOf(host.useStoredValue(this.state.raw));
      // Still reading at start-up: the cells are waiting and will get this table; nothing to recalculate.
      if (st.state === 'loading' && !force) return undefined;
    }
    try {
      await recalculateAll(computedWith);
    } catch (e) {
      warning = `${warning ?? ''} Recalculation failed (${e instanceof Error ? e.message : String(e)}); press Ctrl+Alt+F9 in Excel to recalculate.`.trim();
    }
    return warning;
  }

  private seen(): unknown {
    return this.state.raw;
  }

  private async afterWrite(outcome: WriteOutcome, done: string, change: TableChange | null, signoff: Signoff | null, before: TableRecords): Promise<ActionResult> {
    const previous = this.state;
    this.state = outcome.state;
    if (outcome.kind === 'written') {
      this.lastChange = change === null || typeof outcome.state.raw !== 'string'
        ? null
        : { change, signoff: signoff!, mine: diffTables(before, this.records), written: outcome.state.raw };
      const warning = await this.syncFunctions(true);
      return { kind: 'done', message: done, ...(warning === undefined ? {} : { warning }) };
    }
    await this.syncFunctions(false);
    const theirs = diffTables(previous.kind === 'unreadable' ? EMPTY : before, this.records);
    const what = outcome.kind === 'conflict' ? 'Not saved' : 'Saved, but written over';
    const why = outcome.kind === 'conflict'
      ? 'this workbook’s table was changed elsewhere (another pane or a co-author) after this pane read it'
      : 'another pane wrote the table at the same moment, and its version is the one kept';
    return {
      kind: 'conflict',
      message: `${what}: ${why}. ${this.describeState()}`,
      theirs,
      ...(change === null || signoff === null ? {} : { retry: () => this.change(change, signoff) }),
    };
  }

  /** One line saying what the workbook holds now. */
  describeState(): string {
    if (this.state.kind === 'none') return 'The workbook now has no table of its own (the built-in table is in use).';
    if (this.state.kind === 'unreadable') return `The workbook’s table now cannot be read: ${this.state.problem.message}.`;
    return `The workbook’s table is now revision ${this.state.read.copy.revision}.`;
  }

  private refuseUnreadable(): ActionResult | null {
    if (this.state.kind !== 'unreadable') return null;
    return {
      kind: 'refused',
      message: 'The workbook’s table cannot be read, so nothing was changed. Export the stored text if you need it, then reset to the built-in table.',
      details: [this.state.problem.message],
    };
  }

  /**
   * Applies a change to the table in use (making the workbook's own copy if it has none yet) and stores
   * it, with an entry in the revision log saying who made it and why (both required).
   */
  async change(change: TableChange, signoff: Signoff): Promise<ActionResult> {
    const refused = this.refuseUnreadable();
    if (refused) return refused;
    const before = this.records;
    let next: WorkbookCopy;
    try {
      next = applyChange(this.copy, this.deps.builtin, change);
    } catch (e) {
      if (e instanceof ChangeError) return { kind: 'refused', message: capital(e.message), details: [...e.details] };
      throw e;
    }
    try {
      const outcome = await writeCopy(next, this.seen(), this.deps.builtin, { ...signoff, action: actionOf(change) }, this.now());
      return this.afterWrite(outcome, capital(describeChange(change)), change, signoff, before);
    } catch (e) {
      if (e instanceof ChangeError) return { kind: 'refused', message: capital(e.message), details: [...e.details] };
      throw e;
    }
  }

  /** Writes the add-in's built-in table into the workbook, so later add-in updates do not change its results; the log starts with it. */
  async pin(signoff: Signoff): Promise<ActionResult> {
    const refused = this.refuseUnreadable();
    if (refused) return refused;
    if (this.state.kind === 'readable') {
      return { kind: 'refused', message: 'This workbook already has its own table; its results do not change when the add-in is updated.', details: [] };
    }
    let outcome: WriteOutcome;
    try {
      outcome = await writeCopy(pinnedCopy(this.deps.builtin), this.seen(), this.deps.builtin, { ...signoff, action: 'pin' }, this.now());
    } catch (e) {
      if (e instanceof ChangeError) return { kind: 'refused', message: capital(e.message), details: [...e.details] };
      throw e;
    }
    return this.afterWrite(outcome, `Pinned: the built-in table ${this.deps.builtin.version} is now stored in this workbook.`, null, null, this.records);
  }

  /** Removes the workbook's table (readable or not), so the built-in table is used again. */
  async reset(): Promise<ActionResult> {
    if (this.state.kind === 'none') return { kind: 'refused', message: 'The workbook has no table of its own; the built-in table is already in use.', details: [] };
    const before = this.records;
    const outcome = await removeTable(this.seen(), this.deps.builtin);
    return this.afterWrite(outcome, `Reset: the workbook’s own table was removed; the built-in table ${this.deps.builtin.version} is in use.`, null, null, before);
  }

  /**
   * Reads the workbook again and reports when its table was changed elsewhere since this pane last
   * read or wrote it (null when nothing changed). The functions are switched to the stored table and
   * the workbook recalculated. `lostMine` says when this pane's last change is no longer there.
   */
  async checkForChangesElsewhere(): Promise<ElsewhereReport | null> {
    const raw = await readStoredValue();
    if (sameStoredValue(raw, this.state.raw)) return null;
    const knew = this.state.raw;
    const before = this.records;
    this.state = interpret(raw, this.deps.builtin);
    await this.syncFunctions(false);
    const theirs = diffTables(before, this.records);
    let lostMine = false;
    const last = this.lastChange;
    if (last !== null && sameStoredValue(last.written, knew)) {
      lostMine = last.mine.some((d) => !holds(this.records, d));
    }
    this.lastChange = null;
    const change = last?.change;
    const signoff = last?.signoff;
    return {
      message: lostMine
        ? `Your last change (${describeChange(last!.change)}) is no longer in the workbook’s table: another pane wrote over it. ${this.describeState()}`
        : `The workbook’s table was changed elsewhere. ${this.describeState()}`,
      theirs,
      lostMine,
      ...(lostMine && change !== undefined && signoff !== undefined ? { retry: () => this.change(change, signoff) } : {}),
    };
  }

  private now(): Date {
    return this.deps.now?.() ?? new Date();
  }
}

/** True when a table still shows a difference this pane made (the row as it wrote it, or the row gone). */
function holds(t: TableRecords, d: RowDifference): boolean {
  const rows = rowsOf(t, d.rowKind);
  const k = matchKey(d.rowKind, d.key);
  const row = rows.find((r) => matchKey(d.rowKind, r.key) === k);
  if (d.status === 'removed') return row === undefined;
  return row !== undefined && d.after !== undefined && sameRecord(d.rowKind, cleanRecord(d.rowKind, d.after), row);
}

function capital(s: string): string {
  return s.length === 0 ? s : s[0].toUpperCase() + s.slice(1) + (/[.!?]$/.test(s) ? '' : '.');
}

/** The word the revision log records for a change. */
export function actionOf(c: TableChange): LogAction {
  switch (c.kind) {
    case 'put':
      return c.originalKey === null ? 'add' : 'edit';
    case 'delete':
      return 'delete';
    case 'revert':
      return 'revert';
    case 'import':
      return c.mode === 'merge' ? 'import-merge' : 'import-replace';
    case 'update-to-builtin':
      return 'update';
  }
}

/** A change in a few words, for messages: "saved couple Cu2+/Cu". */
export function describeChange(c: TableChange): string {
  const what = (k: 'couple' | 'electrode') => (k === 'couple' ? 'couple' : 'reference electrode');
  switch (c.kind) {
    case 'put':
      return `${c.originalKey === null ? 'added' : 'saved'} ${what(c.rowKind)} ${c.record.key}`;
    case 'delete':
      return `deleted ${what(c.rowKind)} ${c.key}`;
    case 'revert':
      return `reverted ${what(c.rowKind)} ${c.key} to its built-in value`;
    case 'import':
      return `imported ${c.couples.length} couple${c.couples.length === 1 ? '' : 's'} and ${c.electrodes.length} electrode${c.electrodes.length === 1 ? '' : 's'} (${c.mode === 'merge' ? 'added and updated' : 'table replaced'})`;
    case 'update-to-builtin':
      return 'updated the workbook’s table to the add-in’s built-in table, keeping the rows set here';
  }
}

export { describeDifference };
