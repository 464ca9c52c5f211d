/**
 * The E–pH view's numbers (taskpane/ephData.ts) and drawing (taskpane/ephChart.ts): every point
 * is what the production bundle's HALFCELL gives for the same arguments, and water's lines have
 * the Nernst slope −(RT ln 10)/F per pH unit.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { FARADAY_C_PER_MOL, GAS_CONSTANT_J_PER_MOL_K, LN10 } from '../../src/constants';
import { builtinTable } from '../../src/table/builtin';
import { ephSeries, halfCellArgsFor, pHGrid } from '../../taskpane/ephData';
import { LINE_STYLES, ephSvg } from '../../taskpane/ephChart';
import { type LoadedBundle, loadBundle, one } from '../bundle/harness';

let b: LoadedBundle;
beforeAll(() => {
  b = loadBundle();
});
const table = builtinTable();
// couples with a stored dE°/dT, so that they can be drawn at 80 °C as well
const COUPLES = ['Cu2+/Cu', 'Fe3+/Fe2+', 'O2/OH-'];
// RT ln10 / F with the CODATA 2018 exact R and F (common practice: the Nernst slope)
const slope = (tC: number) => (GAS_CONSTANT_J_PER_MOL_K * (tC + 273.15) * LN10) / FARADAY_C_PER_MOL;

describe('ephSeries', () => {
  for (const tC of [25, 80]) {
    it(`equals =CELLWRIGHT.HALFCELL at every pH, three couples at ${tC} °C and activity 1e-6`, async () => {
      const pHs = pHGrid(0.5);
      const r = ephSeries(table, COUPLES, { temperatureC: tC, activity: 1e-6, pHs });
      expect(r.ok).toBe(true);
      if (!r.ok) return;
      let checked = 0;
      for (const s of [...r.series, r.water.oxygen, r.water.hydrogen]) {
        for (let i = 0; i < pHs.length; i++) {
          const want = one(await b.call('HALFCELL', s.couple, s.oxActivity, s.redActivity, pHs[i], tC)) as number;
          expect(s.e[i], `${s.couple} pH ${pHs[i]}`).toBe(want);
          checked++;
        }
      }
      expect(checked).toBe(5 * 29);
    });
  }

  it('gives dissolved species the chosen activity and gases 1 bar', () => {
    expect(halfCellArgsFor(table.findCouple('Cu2+/Cu')!, 1e-6)).toEqual({ couple: 'Cu2+/Cu', oxActivity: 1e-6, redActivity: 1 });
    expect(halfCellArgsFor(table.findCouple('Fe3+/Fe2+')!, 1e-6)).toEqual({ couple: 'Fe3+/Fe2+', oxActivity: 1e-6, redActivity: 1e-6 });
    expect(halfCellArgsFor(table.findCouple('H+/H2')!, 1e-6)).toEqual({ couple: 'H+/H2', oxActivity: 1, redActivity: 1 });
  });

  it('draws water between lines of Nernst slope, and a pH-independent couple flat', () => {
    const pHs = [0, 7, 14];
    // MnO4- + 8H+ + 5e- -> Mn2+ + 4H2O: −(8/5)·slope per pH unit; 2H2O + 2e- -> H2 + 2OH-: −slope
    for (const [tC, key, perPH] of [[25, 'MnO4-/Mn2+', -8 / 5], [80, 'H2O/H2', -1]] as const) {
      const r = ephSeries(table, ['Cu2+/Cu', key], { temperatureC: tC, activity: 1e-6, pHs });
      if (!r.ok) throw new Error(r.reason);
      const [cu, other] = r.series;
      expect(cu.flat).toBe(true);
      expect(cu.e[2]).toBe(cu.e[0]);
      expect(other.flat).toBe(false);
      expect((other.e[2] - other.e[0]) / 14).toBeCloseTo(perPH * slope(tC), 12);
      for (const w of [r.water.oxygen, r.water.hydrogen]) expect((w.e[2] - w.e[0]) / 14).toBeCloseTo(-slope(tC), 12);
      // the gap between O2 and H2 evolution is E°(O2/H2O, T) at every pH
      expect(r.water.oxygen.e[1] - r.water.hydrogen.e[1]).toBeCloseTo(r.water.oxygen.e[0] - r.water.hydrogen.e[0], 12);
    }
    // a couple with neither species data nor dE°/dT cannot be drawn away from 25 °C: the view says so
    const r80 = ephSeries(table, ['Bi3+/Bi'], { temperatureC: 80, activity: 1e-6, pHs });
    expect(r80.ok).toBe(false);
    if (!r80.ok) expect(r80.reason).toMatch(/neither species data|dE°\/dT/);
    // 25 °C, pH 7: 1.2292 − 7 × 0.05916 = 0.8151 V (E° of the table's O2/H2O row, Thermoddem V1.10; slope from CODATA)
    const r25 = ephSeries(table, [], { temperatureC: 25, activity: 1e-6, pHs: [7] });
    if (!r25.ok) throw new Error(r25.reason);
    expect(r25.water.oxygen.e[0]).toBeCloseTo(1.2292 - 7 * slope(25), 9);
    expect(r25.water.hydrogen.e[0]).toBeCloseTo(-7 * slope(25), 9);
  });

  it('says why and gives nothing to draw for an unreadable table, a missing couple or bad conditions', () => {
    const c = { temperatureC: 25, activity: 1e-6, pHs: pHGrid() };
    const r1 = ephSeries(undefined, COUPLES, c);
    expect(r1.ok).toBe(false);
    if (!r1.ok) expect(r1.reason).toMatch(/cannot be read/);
    const r2 = ephSeries(table, ['Xx9+/Xx'], c);
    expect(!r2.ok && r2.reason).toMatch(/Xx9\+\/Xx is not in the table/);
    const r3 = ephSeries(table, COUPLES, { ...c, activity: 0 });
    expect(!r3.ok && r3.reason).toMatch(/above 0/);
    const r4 = ephSeries(table, COUPLES, { ...c, temperatureC: 120 });
    expect(!r4.ok && r4.reason).toMatch(/0 and 100 °C/);
  });
});

describe('ephSvg', () => {
  it('draws a labelled line per couple and per water line, the water region, with distinct dashes', () => {
    const pHs = pHGrid();
    const r = ephSeries(table, COUPLES, { temperatureC: 25, activity: 1e-6, pHs });
    if (!r.ok) throw new Error(r.reason);
    const svg = ephSvg({ pHs, series: r.series, water: r.water, title: 'E–pH at 25 °C, a = 1e-6', cursorPH: 7 });
    expect(svg.match(/<path /g)).toHaveLength(5);
    for (const k of COUPLES) expect(svg).toContain(`class="eph-label">${k.replace(/&/g, '&amp;')}</text>`);
    expect(svg).toContain('O₂ evolution');
    expect(svg).toContain('H₂ evolution');
    expect(svg).toContain('data-region="water"');
    expect(svg).toContain('class="eph-cursor"');
    expect(svg).not.toMatch(/NaN|Infinity|undefined/);
    expect(new Set(LINE_STYLES.map((s) => s.dash)).size).toBe(LINE_STYLES.length);
    expect(new Set(LINE_STYLES.map((s) => s.colour)).size).toBe(LINE_STYLES.length);
  });
});
