/**
 * The task pane's model of the workbook's pinned data (the data set's parts besides the potential
 * table; workbook/pinnedData.ts): what the workbook holds, pinning, bringing pinned data up to the
 * add-in's built-in data, removing it, and what a newer built-in data set would change. No DOM here.
 *
 * Like the table's model (model.ts): every write names the value this pane last read (nothing is
 * written when the workbook holds another), the value written is handed to the worksheet functions,
 * and the workbook is recalculated, recording the data the results are now computed with.
 */
import { builtinPartChecksums, partChecksum } from '../src/dataset/checksum';
import { type DataSetDescription, type PartComparison, type TablePart, compareDataParts, describeDataSet } from '../src/dataset/describe';
import { BUILTIN_PARTS, DATASET_VERSION } from '../src/dataset/parts';
import { type PinnedData, storedPartsWithPinned, writePinnedText } from '../src/dataset/pinned';
import type { CellwrightFunctionsHost } from '../workbook/channel';
import { type PinnedState, type PinnedWriteOutcome, interpretPinned, readPinnedValue, recordComputedWithData, replacePinnedValue } from '../workbook/pinnedData';
import { computedWithOf, recalculateAll } from '../workbook/store';
import { sameStoredValue } from '../workbook/settings';
import { type ActionResult, compareVersions } from './model';

export interface DataModelDeps {
  readonly host: () => CellwrightFunctionsHost | undefined;
  readonly now?: () => Date;
}

/** What a newer (or other) built-in data set would change in the workbook's pinned parts. */
export interface DataNotice {
  readonly pinnedVersion: string;
  readonly builtinVersion: string;
  readonly addinIsNewer: boolean;
  readonly changes: readonly PartComparison[];
}

export class PinnedDataModel {
  state: PinnedState = { kind: 'none', raw: null };

  constructor(private readonly deps: DataModelDeps) {}

  /** The pinned data, when the workbook holds readable pinned data. */
  get pinned(): PinnedData | null {
    return this.state.kind === 'readable' ? this.state.read.pinned : null;
  }

  /** The data set in use, given the table's part (null when the pinned data cannot be read). */
  describe(table: TablePart): DataSetDescription | null {
    if (this.state.kind === 'unreadable') return null;
    return describeDataSet(table, this.pinned);
  }

  /** When the workbook pins data that differs from the add-in's built-in data: what updating would change. */
  notice(): DataNotice | null {
    const p = this.pinned;
    if (p === null) return null;
    const changes = compareDataParts(storedPartsWithPinned(p), BUILTIN_PARTS);
    if (changes.length === 0) return null;
    return { pinnedVersion: p.version, builtinVersion: DATASET_VERSION, addinIsNewer: compareVersions(DATASET_VERSION, p.version) > 0, changes };
  }

  /** The checksum the functions report over the parts besides the table, for the data this pane read. */
  private expectedDataChecksum(): string {
    if (this.state.kind === 'unreadable') return 'unreadable';
    return partChecksum({ ...builtinPartChecksums(), ...(this.pinned?.checksums ?? {}) });
  }

  async load(): Promise<void> {
    this.state = interpretPinned(await readPinnedValue());
    await this.syncFunctions(false);
  }

  /** Hands the pinned value to the functions when they use other data (or always, after a write), then recalculates. */
  private async syncFunctions(force: boolean, recalculate = true): Promise<string | undefined> {
    const host = this.deps.host();
    if (host?.usePinnedValue === undefined) {
      return force ? 'The worksheet functions do not run in this pane’s page, so they were not told; they read the pinned data when the workbook is next opened.' : undefined;
    }
    const st = host.status();
    if (!force && (st.state === 'loading' || st.dataChecksum === this.expectedDataChecksum())) return undefined;
    const now = host.usePinnedValue(this.state.raw);
    if (!recalculate) return undefined;
    try {
      await recalculateAll(computedWithOf(now));
      if (now.dataChecksum !== undefined) await recordComputedWithData(now.dataChecksum);
    } catch (e) {
      return `Recalculation failed (${e instanceof Error ? e.message : String(e)}); press Ctrl+Alt+F9 in Excel to recalculate.`;
    }
    return undefined;
  }

  private async after(outcome: PinnedWriteOutcome, done: string, recalculate = true): Promise<ActionResult> {
    this.state = outcome.state;
    if (outcome.kind === 'written') {
      const warning = await this.syncFunctions(true, recalculate);
      return { kind: 'done', message: done, ...(warning === undefined ? {} : { warning }) };
    }
    await this.syncFunctions(false);
    return {
      kind: 'refused',
      message: outcome.kind === 'conflict'
        ? 'Not saved: this workbook’s pinned data was changed elsewhere (another pane or a co-author) after this pane read it. The pane now shows what it holds.'
        : 'Saved, but written over: another pane wrote the pinned data at the same moment, and its version is the one kept.',
      details: [],
    };
  }

  /**
   * Pins the add-in's built-in parts (all of them) to the workbook, or brings pinned ones up to them.
   * With `recalculate: false` the functions get the data but the caller recalculates (pinning the
   * table as well, in one recalculation).
   */
  async pin(opts: { readonly recalculate?: boolean } = {}): Promise<ActionResult> {
    if (this.state.kind === 'unreadable') {
      return { kind: 'refused', message: 'The workbook’s pinned data cannot be read, so nothing was changed. Download the stored text if you need it, then remove it.', details: [this.state.problem.message] };
    }
    const was = this.pinned;
    const text = writePinnedText({ version: DATASET_VERSION, pinnedAt: this.now().toISOString() });
    const outcome = await replacePinnedValue(this.state.raw, text);
    return this.after(outcome, was === null
      ? `Pinned: the add-in’s reference data ${DATASET_VERSION} (atomic weights, species data, constants) is now stored in this workbook.`
      : `Updated: the workbook’s pinned reference data is now the add-in’s ${DATASET_VERSION}.`, opts.recalculate ?? true);
  }

  /** Removes the pinned data (readable or not, when the workbook still holds `this.state.raw`): the built-in data is used again. */
  async remove(): Promise<ActionResult> {
    if (this.state.kind === 'none') return { kind: 'refused', message: 'The workbook pins no reference data; the built-in data is already in use.', details: [] };
    const outcome = await replacePinnedValue(this.state.raw, null);
    return this.after(outcome, `Removed: the workbook’s pinned reference data; the add-in’s built-in data ${DATASET_VERSION} is in use.`);
  }

  /** True when the workbook holds `raw` as last read by this pane. */
  holds(raw: unknown): boolean {
    return sameStoredValue(raw, this.state.raw);
  }

  private now(): Date {
    return this.deps.now?.() ?? new Date();
  }
}
