/**
 * The consistency view (Couples tab, a collapsible section): the lines of the consistency report
 * (src/table/consistencyReport.ts) of the table in use that differ by more than the tolerance, each
 * with the explanation on file in data/consistency.json. An explanation is shown only while every row
 * it speaks of still holds the built-in E°: a workbook row that was edited is reported without it.
 * It reports; it never blocks.
 */
import consistency from '../data/consistency.json';
import { consistencyReport, type ConsistencyLine } from '../src/table/consistencyReport';
import type { PotentialTable } from '../src/table/types';
import { byId, h, replace } from './dom';

/** Differences accepted without an explanation, mV (the report's default). */
export const TOLERANCE_MV = 5;

/** One line of the view. */
export interface ConsistencyItem {
  /** What was compared, e.g. "Li+/Li against its species-derived E°". */
  readonly what: string;
  /** Table E° − derived E°, in mV, with its sign and one decimal: "+7.3 mV". */
  readonly difference: string;
  /** "table 1.2345 V, derived 1.2300 V". */
  readonly values: string;
  /** The explanation on file, or null. */
  readonly note: string | null;
}

/** What the view shows: how many lines were checked, and those outside the tolerance. */
export interface ConsistencyView {
  readonly checked: number;
  readonly items: readonly ConsistencyItem[];
}

function describe(l: ConsistencyLine): string {
  if (l.kind === 'species') return `${l.keys[0]} against its species-derived E°`;
  if (l.kind === 'cycle') return `${l.keys[0]} against ${l.keys[1]} and ${l.keys[2]} (a cycle)`;
  return `${l.keys[0]} against ${l.keys[1]} and the species that differ`;
}

/** The couple keys a note on file speaks of ("C = A + B", "A ~ B" or a single key). */
function keysOfNote(noteKey: string): string[] {
  return noteKey.split(/ = | \+ | ~ /);
}

/**
 * The explanations on file that still apply to a table: those whose rows all hold the built-in E°.
 *
 * @param table the table in use
 * @param builtin the built-in table
 */
export function applicableNotes(table: PotentialTable, builtin: PotentialTable): Record<string, string> {
  const out: Record<string, string> = {};
  for (const [noteKey, text] of Object.entries(consistency.notes as Record<string, string>)) {
    const same = keysOfNote(noteKey).every((k) => {
      const mine = table.findCouple(k);
      const theirs = builtin.findCouple(k);
      return mine !== undefined && theirs !== undefined && mine.e0 === theirs.e0 && mine.halfReaction === theirs.halfReaction;
    });
    if (same) out[noteKey] = text;
  }
  return out;
}

/** A potential with four decimals and a true minus sign. */
const volts = (v: number): string => v.toFixed(4).replace('-', '\u2212');

const cache = new WeakMap<PotentialTable, ConsistencyView>();

/**
 * The consistency view of a table: every report line outside ±TOLERANCE_MV, largest difference
 * first, with its explanation when one applies.
 *
 * @param table the table in use
 * @param builtin the built-in table (whose explanations are on file)
 */
export function consistencyView(table: PotentialTable, builtin: PotentialTable): ConsistencyView {
  const hit = cache.get(table);
  if (hit !== undefined) return hit;
  const lines = consistencyReport(table, applicableNotes(table, builtin), TOLERANCE_MV);
  const items = lines
    .filter((l) => !l.ok)
    .sort((a, b) => Math.abs(b.differenceMV) - Math.abs(a.differenceMV))
    .map((l) => ({
      what: describe(l),
      difference: `${l.differenceMV >= 0 ? '+' : '−'}${Math.abs(l.differenceMV).toFixed(1)} mV`,
      values: `table ${volts(l.tableV)} V, derived ${volts(l.derivedV)} V`,
      note: l.note ?? null,
    }));
  const view = { checked: lines.length, items };
  cache.set(table, view);
  return view;
}

/** The table in use: undefined while the workbook is being read, null when its table cannot be read. */
export type TableInUse = () => PotentialTable | null | undefined;

let tableInUse: TableInUse = () => undefined;
let builtinOf: () => PotentialTable = () => {
  throw new Error('wireConsistency was not called');
};

/**
 * Connects the section to the table in use; it is computed only while the section is open.
 *
 * @param table the table in use (see TableInUse)
 * @param builtin the built-in table
 */
export function wireConsistency(table: TableInUse, builtin: () => PotentialTable): void {
  tableInUse = table;
  builtinOf = builtin;
  byId('consistency').addEventListener('toggle', renderConsistency);
}

/** Fills the section #consistency-body when it is open (nothing is computed while it is closed). */
export function renderConsistency(): void {
  if (!byId<HTMLDetailsElement>('consistency').open) return;
  const body = byId('consistency-body');
  const table = tableInUse();
  if (table === undefined) {
    replace(body, h('p', { class: 'hint' }, 'Reading the workbook…'));
    return;
  }
  if (table === null) {
    replace(body, h('p', { class: 'hint' }, 'The table in use cannot be read, so it cannot be checked.'));
    return;
  }
  const { checked, items } = consistencyView(table, builtinOf());
  const unexplained = items.filter((i) => i.note === null).length;
  const summary =
    items.length === 0
      ? `All ${checked} checks agree within ${TOLERANCE_MV} mV.`
      : `${items.length} of ${checked} checks differ by more than ${TOLERANCE_MV} mV; ${unexplained === 0 ? 'each has an explanation on file' : `${unexplained} without an explanation on file`}.`;
  replace(
    body,
    h('p', { id: 'consistency-summary' }, summary),
    items.length === 0
      ? null
      : h(
          'ul',
          { id: 'consistency-list', class: 'consistency', 'aria-label': 'Differences over 5 mV' },
          ...items.map((i) =>
            h(
              'li',
              {},
              h('strong', {}, `${i.what}: ${i.difference}`),
              h('span', { class: 'hint' }, ` (${i.values})`),
              h('p', { class: i.note === null ? 'hint unexplained' : 'hint' }, i.note ?? 'No explanation on file: check this row against its source.'),
            ),
          ),
        ),
  );
}
