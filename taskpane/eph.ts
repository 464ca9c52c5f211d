// The E–pH tab of the pane: couples chosen from the table in use, drawn over pH 0…14 at one
// temperature and one activity of dissolved species, with water's stability lines; a readout of E
// at a pH (pointer or keyboard), a table of the same numbers, and "Write to sheet", which writes the
// numbers as live CELLWRIGHT.HALFCELL formulas with a native scatter chart of them.
import type { PotentialTable } from '../src/table/types';
import { byId, h, replace } from './dom';
import { type SvgNode, ephSvgTree } from './ephChart';
import { type EphSeries, ephSeries, pHGrid } from './ephData';

const DEFAULT_COUPLES = ['Cu2+/Cu', 'Fe3+/Fe2+', 'O2/OH-'];
const GRID = pHGrid(0.5);
let chosen: string[] | null = null;
let cursor = 7;
let getTable: () => PotentialTable | undefined = () => undefined;

const fmtE = (e: number) => e.toFixed(4);

function conditions(): { temperatureC: number; activity: number } {
  return { temperatureC: Number(byId<HTMLInputElement>('eph-temperature').value), activity: Number(byId<HTMLInputElement>('eph-activity').value) };
}

function title(c: { temperatureC: number; activity: number }): string {
  return `E–pH at ${c.temperatureC} °C, dissolved species at activity ${c.activity}, gases at 1 bar`;
}

function selected(): string[] {
  return [...document.querySelectorAll<HTMLInputElement>('#eph-couples input[type=checkbox]')].filter((x) => x.checked).map((x) => x.value);
}

/** Lists the table's couples as check boxes (kept when the table is unchanged). */
function renderChoices(table: PotentialTable | undefined): void {
  const box = byId('eph-couples');
  const keys = table ? table.couples.map((c) => c.key) : [];
  if (chosen === null) chosen = DEFAULT_COUPLES.filter((k) => keys.includes(k));
  else chosen = chosen.filter((k) => keys.includes(k));
  replace(box, ...keys.map((k) => h('label', { class: 'check' }, h('input', { type: 'checkbox', value: k, checked: chosen!.includes(k), onchange: () => { chosen = selected(); draw(); } }), ` ${k}`)));
}

/** Draws (or says why not) and fills the readout and the table view. */
export function draw(): void {
  const table = getTable();
  const c = conditions();
  const out = byId('eph-figure');
  const readout = byId('eph-readout');
  const tableView = byId('eph-table');
  const write = byId<HTMLButtonElement>('eph-write');
  const r = ephSeries(table, chosen ?? [], { ...c, pHs: GRID });
  if (!r.ok) {
    replace(out, h('p', { class: 'error', id: 'eph-why' }, r.reason));
    replace(readout);
    replace(tableView);
    write.disabled = true;
    return;
  }
  write.disabled = r.series.length === 0;
  replace(out, svgElement(ephSvgTree({ pHs: GRID, series: r.series, water: r.water, title: title(c), cursorPH: cursor })));
  // the readout: E at the cursor's pH for every line, from the same core call
  const at = ephSeries(table, chosen ?? [], { ...c, pHs: [cursor] });
  if (at.ok) {
    const line = (s: EphSeries, label = s.couple) => h('li', { 'data-couple': s.couple }, `${label}: ${fmtE(s.e[0])} V`);
    replace(readout, h('p', {}, `At pH ${cursor}:`), h('ul', {}, ...at.series.map((s) => line(s)), line(at.water.oxygen, 'O₂ evolution (O2/H2O)'), line(at.water.hydrogen, 'H₂ evolution (H+/H2)')));
  }
  const all = [...r.series, r.water.oxygen, r.water.hydrogen];
  replace(
    tableView,
    h('caption', {}, `${title(c)}; E in V vs SHE`),
    h('thead', {}, h('tr', {}, h('th', { scope: 'col' }, 'pH'), ...all.map((s) => h('th', { scope: 'col' }, s.couple)))),
    h('tbody', {}, ...GRID.map((p, i) => h('tr', {}, h('th', { scope: 'row' }, String(p)), ...all.map((s) => h('td', {}, fmtE(s.e[i])))))),
  );
}

const SVG_NS = 'http://www.w3.org/2000/svg';

/** DOM nodes from the chart's tree: attributes set one by one, text as text nodes. */
function svgElement(t: SvgNode): Element {
  const el = document.createElementNS(SVG_NS, t.tag);
  for (const [k, v] of Object.entries(t.attrs)) if (k !== 'xmlns') el.setAttribute(k, String(v));
  if (t.text !== undefined) el.appendChild(document.createTextNode(t.text));
  for (const c of t.children ?? []) el.appendChild(svgElement(c));
  return el;
}

function setCursor(pH: number): void {
  cursor = Math.min(14, Math.max(0, Math.round(pH * 2) / 2));
  byId<HTMLInputElement>('eph-ph').value = String(cursor);
  draw();
}

/** Writes the pH column, one live HALFCELL formula per couple and pH, and a scatter chart with lines. */
async function writeToSheet(): Promise<void> {
  const table = getTable();
  const c = conditions();
  const r = ephSeries(table, chosen ?? [], { ...c, pHs: GRID });
  const status = byId('eph-status');
  if (!r.ok) return replace(status, r.reason);
  const all = [...r.series, r.water.oxygen, r.water.hydrogen];
  const col = (j: number) => String.fromCharCode(66 + j); // B, C, …
  const values: (string | number)[][] = [['pH', ...all.map((s) => `${s.couple} (V vs SHE)`)]];
  GRID.forEach((p, i) => values.push([p, ...all.map((s) => `=CELLWRIGHT.HALFCELL("${s.couple}",${s.oxActivity},${s.redActivity},A${i + 2},${c.temperatureC})`)]));
  const last = GRID.length + 1;
  try {
    await Excel.run(async (ctx) => {
      const sheets = ctx.workbook.worksheets;
      sheets.load('items/name');
      await ctx.sync();
      let name = 'E-pH';
      for (let k = 2; sheets.items.some((s) => s.name === name); k++) name = `E-pH ${k}`;
      const ws = sheets.add(name);
      const range = ws.getRange(`A1:${col(all.length - 1)}${last}`);
      range.values = values as never;
      const chart = ws.charts.add(Excel.ChartType.xyscatterLines, ws.getRange(`A1:${col(all.length - 1)}${last}`), Excel.ChartSeriesBy.columns);
      chart.title.text = title(c);
      ws.activate();
      await ctx.sync();
      replace(status, `Wrote ${all.length} columns of live HALFCELL formulas and a chart to the sheet ${name}.`);
    });
  } catch (e) {
    replace(status, `Could not write the sheet: ${e instanceof Error ? e.message : String(e)}`);
  }
}

/** Wires the tab's controls; `table` gives the table in use (undefined when it cannot be read). */
export function wireEph(table: () => PotentialTable | undefined): void {
  getTable = table;
  byId('eph-temperature').addEventListener('change', draw);
  byId('eph-activity').addEventListener('change', draw);
  const slider = byId<HTMLInputElement>('eph-ph');
  slider.addEventListener('input', () => setCursor(Number(slider.value)));
  const fig = byId('eph-figure');
  fig.addEventListener('pointermove', (e) => {
    const svg = fig.querySelector('svg');
    if (!svg) return;
    const box = svg.getBoundingClientRect();
    const x = ((e.clientX - box.left) / box.width) * 560; // viewBox units
    const pH = ((x - 56) / (560 - 56 - 112)) * 14;
    if (pH >= 0 && pH <= 14) setCursor(pH);
  });
  byId('eph-write').addEventListener('click', () => void writeToSheet());
}

/** Re-reads the table in use and redraws. */
export function renderEph(): void {
  renderChoices(getTable());
  draw();
}
