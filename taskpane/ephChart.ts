// Draws the E–pH view as plain SVG markup: the couples' lines, water's two stability lines with
// the region between them shaded, axes with ticks, a text label at the end of every line, and a
// readout marker at a chosen pH. Each couple has a colour and a dash pattern of its own, so the
// lines stay apart in greyscale print and for readers who do not tell the colours apart.
import type { EphSeries } from './ephData';

/** Line styles, in order of use: dark-to-light colours that differ in lightness, each with its own dashes. */
export const LINE_STYLES: readonly { colour: string; dash: string }[] = [
  { colour: '#1f3a93', dash: '' },
  { colour: '#b35806', dash: '8 4' },
  { colour: '#2d6a2d', dash: '2 3' },
  { colour: '#6a1b6a', dash: '10 3 2 3' },
  { colour: '#7a5c00', dash: '4 2' },
  { colour: '#0b6b74', dash: '12 3 2 3 2 3' },
];
const WATER_STYLE = { colour: '#555555', dash: '1 3' };

export interface ChartInput {
  readonly pHs: readonly number[];
  readonly series: readonly EphSeries[];
  readonly water: { readonly oxygen: EphSeries; readonly hydrogen: EphSeries };
  readonly title: string;
  /** pH of the readout marker, if any. */
  readonly cursorPH?: number;
}

const W = 560;
const H = 400;
const M = { left: 56, right: 112, top: 34, bottom: 44 };

const esc = (s: string) => s.replace(/&/g, '&amp;').replace(/</g, '&lt;').replace(/>/g, '&gt;').replace(/"/g, '&quot;');
const fmt = (x: number) => (Math.round(x * 100) / 100).toString();

/** Round bounds and a tick step for the E axis covering every value. */
export function eAxis(values: readonly number[]): { min: number; max: number; step: number } {
  const lo = Math.min(...values);
  const hi = Math.max(...values);
  const span = Math.max(hi - lo, 0.2);
  const step = span > 3 ? 1 : span > 1.2 ? 0.5 : span > 0.5 ? 0.2 : 0.1;
  return { min: Math.floor(lo / step - 0.25) * step, max: Math.ceil(hi / step + 0.25) * step, step };
}

/** One SVG element: tag, attributes, text, children (made into DOM nodes by the pane, never parsed as markup). */
export interface SvgNode {
  readonly tag: string;
  readonly attrs: Readonly<Record<string, string | number>>;
  readonly text?: string;
  readonly children?: readonly SvgNode[];
}

const n = (tag: string, attrs: Record<string, string | number>, text?: string, children?: SvgNode[]): SvgNode => ({ tag, attrs, text, children });

/** The chart as a tree of SVG elements (no script, no external resources). */
export function ephSvgTree(input: ChartInput): SvgNode {
  const all = [...input.series, input.water.oxygen, input.water.hydrogen].flatMap((s) => s.e);
  const ax = eAxis(all);
  const pw = W - M.left - M.right;
  const ph = H - M.top - M.bottom;
  const x = (pH: number) => M.left + (pH / 14) * pw;
  const y = (e: number) => M.top + ((ax.max - e) / (ax.max - ax.min)) * ph;
  const path = (s: EphSeries) => input.pHs.map((p, i) => `${i ? 'L' : 'M'}${x(p).toFixed(1)},${y(s.e[i]).toFixed(1)}`).join(' ');
  const out: SvgNode[] = [];
  out.push(n('title', { id: 'eph-svg-title' }, input.title));
  out.push(n('text', { x: M.left, y: 20, class: 'eph-title', 'font-size': 13, 'font-weight': 'bold' }, input.title));
  // water's stability region, shaded between the O2 and H2 lines
  const o = input.water.oxygen;
  const h = input.water.hydrogen;
  const band = [...input.pHs.map((p, i) => `${x(p).toFixed(1)},${y(o.e[i]).toFixed(1)}`), ...input.pHs.map((p, i) => `${x(p).toFixed(1)},${y(h.e[i]).toFixed(1)}`).reverse()];
  out.push(n('polygon', { points: band.join(' '), fill: '#dfe9f3', 'fill-opacity': 0.7, stroke: 'none', 'data-region': 'water' }));
  // axes and grid
  const axes: SvgNode[] = [];
  for (let p = 0; p <= 14; p += 2) {
    axes.push(n('line', { x1: x(p), y1: M.top, x2: x(p), y2: M.top + ph, stroke: '#e4e4e4' }));
    axes.push(n('text', { x: x(p), y: M.top + ph + 15, 'text-anchor': 'middle' }, String(p)));
  }
  for (let e = ax.min; e <= ax.max + 1e-9; e += ax.step) {
    axes.push(n('line', { x1: M.left, y1: y(e).toFixed(1), x2: M.left + pw, y2: y(e).toFixed(1), stroke: '#e4e4e4' }));
    axes.push(n('text', { x: M.left - 6, y: (y(e) + 4).toFixed(1), 'text-anchor': 'end' }, fmt(e)));
  }
  axes.push(n('rect', { x: M.left, y: M.top, width: pw, height: ph, fill: 'none', stroke: '#222' }));
  axes.push(n('text', { x: M.left + pw / 2, y: H - 8, 'text-anchor': 'middle' }, 'pH'));
  axes.push(n('text', { transform: `translate(14 ${M.top + ph / 2}) rotate(-90)`, 'text-anchor': 'middle' }, 'E (V vs SHE)'));
  out.push(n('g', { class: 'eph-axes', 'font-size': 11, fill: '#222' }, undefined, axes));
  // lines with a label at their right end; labels pushed apart so that none overlaps
  const lines: { s: EphSeries; colour: string; dash: string; label: string; width: number }[] = [
    { s: o, ...WATER_STYLE, label: 'O₂ evolution', width: 1.5 },
    { s: h, ...WATER_STYLE, label: 'H₂ evolution', width: 1.5 },
    ...input.series.map((s, i) => ({ s, ...LINE_STYLES[i % LINE_STYLES.length], label: s.couple, width: 2.5 })),
  ];
  const labelY = lines.map((l) => y(l.s.e[l.s.e.length - 1]));
  const order = labelY.map((_, i) => i).sort((a, b) => labelY[a] - labelY[b]);
  for (let k = 1; k < order.length; k++) labelY[order[k]] = Math.max(labelY[order[k]], labelY[order[k - 1]] + 13);
  lines.forEach((l, i) => {
    out.push(n('path', { d: path(l.s), fill: 'none', stroke: l.colour, 'stroke-width': l.width, ...(l.dash ? { 'stroke-dasharray': l.dash } : {}), 'data-couple': l.s.couple }));
    out.push(n('text', { x: M.left + pw + 6, y: (labelY[i] + 4).toFixed(1), 'font-size': 11, fill: l.colour, class: 'eph-label' }, l.label));
  });
  if (input.cursorPH !== undefined) {
    out.push(n('line', { x1: x(input.cursorPH).toFixed(1), y1: M.top, x2: x(input.cursorPH).toFixed(1), y2: M.top + ph, stroke: '#000', 'stroke-width': 1, class: 'eph-cursor' }));
  }
  return n('svg', { xmlns: 'http://www.w3.org/2000/svg', viewBox: `0 0 ${W} ${H}`, width: '100%', role: 'img', 'aria-labelledby': 'eph-svg-title', class: 'eph-svg' }, undefined, out);
}

/** The same tree as SVG markup (for files and tests; the pane builds DOM nodes from the tree). */
export function ephSvg(input: ChartInput): string {
  const ser = (t: SvgNode): string => {
    const attrs = Object.entries(t.attrs).map(([k, v]) => ` ${k}="${esc(String(v))}"`).join('');
    return `<${t.tag}${attrs}>${t.text !== undefined ? esc(t.text) : ''}${(t.children ?? []).map(ser).join('')}</${t.tag}>`;
  };
  return ser(ephSvgTree(input));
}
