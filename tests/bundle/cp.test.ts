/**
 * The production bundle (node:vm): the cathodic-protection and corrosion functions on scalars,
 * ranges, omitted arguments and error cells, with the standards' clauses beside the values.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { type LoadedBundle, isError, loadBundle, one } from './harness';

let b: LoadedBundle;
beforeAll(() => {
  b = loadBundle();
});
const call = async (id: string, ...args: unknown[]) => (await b.call(id, ...args)) as unknown[][];
const msg = (v: unknown): string => String((v as { message?: string }).message ?? '');

describe('PROTECTIONCRITERION and SOURCE', () => {
  it('criteria per electrode as stated, over a column of electrodes', async () => {
    const r = await call('PROTECTIONCRITERION', [['CSE'], ['Cu/CuSO4'], ['Ag/AgCl/seawater'], ['Zn/seawater'], ['SCE'], ['SHE']]);
    // SP0169 / ISO 15589-1; DNV-RP-B401 Sec. 5 and 49 CFR 192 App. D §IV.A; Peabody 1973; 49 CFR 192 App. D §IV.A (saturated calomel −0.78 V)
    expect(r.slice(0, 5).map((x) => x[0])).toEqual([-0.85, -0.85, -0.8, 0.25, -0.78]);
    expect(isError(r[5][0], '#N/A')).toBe(true);
  });
  it('conditions: 100 mV polarisation, the seawater limit, and #N/A naming the standard for SRB', async () => {
    expect(one(await call('PROTECTIONCRITERION', 'CSE', 'polarisation'))).toBe(0.1);
    const limit = one(await call('PROTECTIONCRITERION', 'Ag/AgCl/seawater', 'limit')); // ISO 15589-2 §5.2, not read: not held
    expect(isError(limit, '#N/A')).toBe(true);
    expect(msg(limit)).toMatch(/ISO 15589-2/);
    // ISO 15589-1 as quoted in World Pipelines Aug 2015 p. 118 (−950 mV with active MIC): −0.95 V CSE
    expect(one(await call('PROTECTIONCRITERION', 'CSE', 'anaerobic'))).toBe(-0.95);
    const srb = one(await call('PROTECTIONCRITERION', 'Ag/AgCl/seawater', 'anaerobic')); // DNV-RP-B401 / ISO 15589-2 sediments: not read
    expect(isError(srb, '#N/A')).toBe(true);
    expect(msg(srb)).toMatch(/ISO 15589-2/);
    const hot = one(await call('PROTECTIONCRITERION', 'CSE', 'hightemperature'));
    expect(isError(hot, '#N/A')).toBe(true);
    expect(msg(hot)).toMatch(/ISO 15589-1/);
    expect(isError(one(await call('PROTECTIONCRITERION', 'CSE', 'damp')), '#VALUE!')).toBe(true);
  });
  it('SOURCE answers for an electrode key as well as a couple', async () => {
    expect(one(await call('SOURCE', 'CSE'))).toMatch(/Szabó & Bakos/);
    expect(one(await call('SOURCE', 'Cu2+/Cu'))).toMatch(/Thermoddem/); // data/couples.json: the row's cited database
    expect(isError(one(await call('SOURCE', 'nothing')), '#N/A')).toBe(true);
    expect(one(await call('SOURCE', 'Ag/AgCl/seawater', 'standard'))).toMatch(/DNV-RP-B401 Sec\. 5.*Source: /);
    expect(one(await call('SOURCE', 'CSE', 'anaerobic'))).toMatch(/ISO 15589-1.*Source: World Pipelines/);
    expect(one(await call('SOURCE', 'CSE', null))).toMatch(/Szabó & Bakos/);
  });
});

describe('survey helpers', () => {
  it('POLARIZATIONSHIFT, IRDROP and READINGAT25; millivolts refused', async () => {
    expect(one(await call('POLARIZATIONSHIFT', -0.78, -0.65))).toBeCloseTo(0.13, 12);
    const ir = await call('IRDROP', [[-1.2], [-1.1]], -0.92);
    expect(ir[0][0]).toBeCloseTo(-0.28, 12);
    expect(ir[1][0]).toBeCloseTo(-0.18, 12);
    const mv = one(await call('IRDROP', -1200, -920));
    expect(isError(mv, '#VALUE!')).toBe(true);
    expect(msg(mv)).toMatch(/millivolts/);
    expect(one(await call('READINGAT25', -0.85, 'CSE', 35))).toBeCloseTo(-0.841, 9); // table CSE dE/dT 0.9 mV/K
    expect(isError(one(await call('READINGAT25', -0.8, 'Ag/AgCl/seawater', 30)), '#N/A')).toBe(true);
  });
});

describe('galvanic-anode design (DNV-RP-B401)', () => {
  it('ANODEMASS 10 A, 25 y, 2000 A·h/kg, u = 0.90 → 1216.7 kg (§7.6.2); ANODELIFE back to 25 y', async () => {
    expect(one(await call('ANODEMASS', 10, 25, 2000, 0.9))).toBeCloseTo(1216.67, 2);
    expect(one(await call('ANODELIFE', 1216.6667, 2000, 0.9, 10))).toBeCloseTo(25, 4);
    const r = await call('ANODEMASS', 10, [[10, 25]], 2000, 0.9);
    expect(r[0][0]).toBeCloseTo(486.67, 2);
    expect(isError(one(await call('ANODEMASS', 10, 25, 2000, 1.1)), '#VALUE!')).toBe(true);
  });
  it('COATINGBREAKDOWN (§6.4), CURRENTDEMAND (§7.3), phase omitted = mean', async () => {
    expect(one(await call('COATINGBREAKDOWN', 0.05, 0.025, 20))).toBeCloseTo(0.3, 12);
    const f = await call('COATINGBREAKDOWN', 0.05, 0.025, 20, [['initial', 'mean', 'final']]);
    expect(f[0]).toEqual([0.05, expect.closeTo(0.3, 12), expect.closeTo(0.55, 12)]);
    expect(one(await call('CURRENTDEMAND', 1000, 0.1, 0.3))).toBeCloseTo(30, 12);
    expect(one(await call('CURRENTDEMAND', 100, 0.1, null))).toBeCloseTo(10, 12);
  });
  it('ANODERESISTANCE (Table 10-7), ANODEOUTPUT (§7.7), ANODECOUNT (§7.8), ANODEDATA (handbook zinc; #N/A naming Table 10-6 for Al-Zn-In)', async () => {
    expect(one(await call('ANODERESISTANCE', 'long-standoff', 0.3, 2, 0.1, null, null, null, null))).toBeCloseTo(0.0807399, 6);
    expect(one(await call('ANODERESISTANCE', 'bracelet', 0.3, null, null, null, null, 0.5, null))).toBeCloseTo(0.1336432, 6);
    expect(isError(one(await call('ANODERESISTANCE', 'long-standoff', 0.3, 0.3, 0.1, null, null, null, null)), '#VALUE!')).toBe(true);
    expect(one(await call('ANODEOUTPUT', -0.8, -1.05, 0.125))).toBeCloseTo(2, 12);
    expect(one(await call('ANODECOUNT', 30, 2, null, null))).toBe(15);
    expect(one(await call('ANODEDATA', 'Zn/seawater', null))).toBe(780); // Pipeline Rules of Thumb Handbook p. 219 Table 3: 354 A·h/lb
    expect(one(await call('ANODEDATA', 'Zn/seawater', 'potential'))).toBe(-1.03); // same table: −1.03 V Ag/AgCl in seawater
    const al = one(await call('ANODEDATA', 'Al-Zn-In/seawater', null)); // design value not read: #N/A naming the standard
    expect(isError(al, '#N/A')).toBe(true);
    expect(msg(al)).toMatch(/DNV-RP-B401 Table 10-6/);
  });
});

describe('impressed current and environment', () => {
  it('GROUNDBEDRESISTANCE (Dwight), RECTIFIERVOLTAGE, CABLEDROP', async () => {
    expect(one(await call('GROUNDBEDRESISTANCE', 'vertical', 30, 2, 0.1, null, null, null))).toBeCloseTo(9.72876, 4); // ρ/(2πL)(ln(8L/d) − 1)
    // USACE ETL 1110-9-10(FR) example 2-3: 2 in × 60 in anodes in 4,500 Ω·cm, 10 ft apart: nine 3.29 Ω, fourteen 2.26 Ω
    const r = await call('GROUNDBEDRESISTANCE', 'parallel', 45, 1.524, 0.0508, [[9], [14], [1]], 3.048, null);
    expect(r[0][0]).toBeCloseTo(3.29, 2);
    expect(r[1][0]).toBeCloseTo(2.26, 2);
    expect(isError(r[2][0], '#VALUE!')).toBe(true); // one anode is not a line
    const close = one(await call('GROUNDBEDRESISTANCE', 'parallel', 30, 2, 0.1, 5, 1, null));
    expect(isError(close, '#VALUE!')).toBe(true);
    expect(msg(close)).toMatch(/spacing/);
    // MIL-HDBK-1004/10 pier example: dc voltage = IR + 3 = 14.7 × 0.06 + 3 = 3.882 V
    expect(one(await call('RECTIFIERVOLTAGE', 14.7, 0.06, 3))).toBeCloseTo(3.882, 9);
    expect(one(await call('RECTIFIERVOLTAGE', 10, 1.5, null))).toBe(17);
    expect(one(await call('CABLEDROP', 10, 200, 1.15))).toBeCloseTo(2.3, 12);
  });
  it('WENNERRESISTIVITY, LAYERRESISTIVITY, SEAWATERRESISTIVITY (PSS-78)', async () => {
    expect(one(await call('WENNERRESISTIVITY', 3, 5))).toBeCloseTo(94.2478, 4);
    expect(one(await call('LAYERRESISTIVITY', 1.5, 10, 3, 4))).toBeCloseTo(62.8319, 4);
    expect(one(await call('SEAWATERRESISTIVITY', 35, 15))).toBeCloseTo(0.233, 3); // UNESCO 1983: C(35, 15) = 42.914 mS/cm
    expect(isError(one(await call('SEAWATERRESISTIVITY', 35, 60)), '#VALUE!')).toBe(true);
  });
});

describe('ranges: each function spills a column element by element, a bad element giving its own error', () => {
  // [id, scalar arguments, index of the argument given as a range, its values, the index of a value that must fail]
  const cases: Array<[string, unknown[], number, unknown[], number | null]> = [
    ['POLARIZATIONSHIFT', [-0.78, -0.65], 0, [-0.78, -0.9, -850], 2],
    ['IRDROP', [-1.2, -0.92], 1, [-0.92, -1.0, -920], 2],
    ['READINGAT25', [-0.85, 'CSE', 35], 2, [15, 25, 35, 150], 3],
    ['COATINGBREAKDOWN', [0.05, 0.025, 20, 'mean'], 2, [10, 20, 30, 5000], 3],
    ['CURRENTDEMAND', [1000, 0.1, 0.3], 1, [0.05, 0.1, 0.2, 100], 3],
    ['ANODEMASS', [10, 25, 2000, 0.9], 2, [780, 1300, 2000, 2], 3],
    ['ANODELIFE', [1216.67, 2000, 0.9, 10], 3, [5, 10, 20, 0], 3],
    ['ANODERESISTANCE', ['bracelet', 0.3, null, null, null, null, 0.5, null], 1, [0.2, 0.3, 1.5, -1], 3],
    ['ANODEOUTPUT', [-0.8, -1.05, 0.125], 1, [-1.05, -1.0, -1.7, -0.7], 3],
    ['ANODECOUNT', [30, 2, null, null], 0, [10, 30, 31, -1], 3],
    ['ANODEDATA', ['Zn/seawater', 'capacity'], 0, ['Zn/seawater', 'Mg/standard', 'Mg/high-potential', 'Al-Zn-In/seawater'], 3],
    ['GROUNDBEDRESISTANCE', ['vertical', 30, 2, 0.1, null, null, null], 1, [10, 30, 100, -5], 3],
    ['RECTIFIERVOLTAGE', [10, 1.5, 2], 0, [5, 10, 20, -1], 3],
    ['CABLEDROP', [10, 200, 1.15], 1, [100, 200, 400, -1], 3],
    ['WENNERRESISTIVITY', [3, 5], 1, [2, 5, 8, -1], 3],
    ['LAYERRESISTIVITY', [1.5, 10, 3, 4], 3, [3, 4, 6, 20], 3],
    ['SEAWATERRESISTIVITY', [35, 15], 1, [5, 15, 25, 60], 3],
    ['PROTECTIONCRITERION', ['CSE', 'standard'], 1, ['standard', 'polarisation', 'anaerobic', 'hightemperature'], 3],
    ['MASSLOSSRATE', [0.65, 28.5, 168, 7.85, 'mm/y'], 4, ['mm/y', 'um/y', 'mpy', 'furlong/fortnight'], 3],
    ['PITTINGFACTOR', [500, 50], 1, [25, 50, 500, 0], 3],
    ['STERNGEARYB', [0.026, 1000], 1, [100, 1000, 1e5, 0.026], 3],
    ['RATECONVERT', [1, 'uA/cm2', 'mm/y', 27.92, 7.87], 4, [2.7, 7.87, 8.96, 7870], 3],
  ];
  it.each(cases)('%s', async (id, args, at, values, bad) => {
    const column = values.map((v) => [v]);
    const r = await call(id, ...args.map((a, i) => (i === at ? column : a)));
    expect(r.length).toBe(values.length);
    for (let i = 0; i < values.length; i++) {
      const alone = one(await call(id, ...args.map((a, j) => (j === at ? values[i] : a))));
      if (i === bad) {
        expect(isError(r[i][0], '#VALUE!') || isError(r[i][0], '#NUM!') || isError(r[i][0], '#N/A')).toBe(true);
      } else {
        expect(typeof r[i][0]).toBe('number');
      }
      expect(r[i][0]).toEqual(alone);
    }
  });
});

describe('corrosion rates and materials', () => {
  it('MASSLOSSRATE (ASTM G1), density in kg/m³ refused with the mistake named', async () => {
    expect(one(await call('MASSLOSSRATE', 0.65, 28.5, 168, 7.85))).toBeCloseTo(1.515, 3);
    const e = one(await call('MASSLOSSRATE', 0.65, 28.5, 168, 7870));
    expect(isError(e, '#VALUE!')).toBe(true);
    expect(msg(e)).toMatch(/kg\/m³/);
  });
  it('PITTINGFACTOR, STERNGEARYB, RATECONVERT', async () => {
    expect(one(await call('PITTINGFACTOR', 500, 50))).toBe(10);
    expect(one(await call('STERNGEARYB', 0.026, 1000))).toBeCloseTo(26, 9);
    expect(one(await call('RATECONVERT', 1, 'uA/cm2', 'mm/y', 27.92, 7.87))).toBeCloseTo(0.0116, 4); // ASTM G102
    expect(one(await call('RATECONVERT', 1, 'mm/y', 'mpy', null, null))).toBeCloseTo(39.37, 2);
  });
  it('EQUIVWEIGHT of type 304 at mid-range composition (ASTM G102 Table 2: 25.12, from memory)', async () => {
    expect(one(await call('EQUIVWEIGHT', [['Fe'], ['Cr'], ['Ni'], ['Mn']], [[0.7075], [0.19], [0.0925], [0.01]], [[2], [3], [2], [2]]))).toBeCloseTo(25.12, 1);
    expect(one(await call('EQUIVWEIGHT', 'Fe', 1, 2))).toBeCloseTo(27.92, 2);
  });
  it('GALVANICSERIES spills [min, max] V vs SCE', async () => {
    expect(await call('GALVANICSERIES', 'Zinc')).toEqual([[-1.03, -0.98]]);
    const r = await call('GALVANICSERIES', [['Magnesium'], ['nope']]);
    expect(r[0]).toEqual([-1.63, -1.6]);
    expect(r[1].every((x) => isError(x, '#N/A'))).toBe(true);
  });
  it('existing functions: STERNGEARY takes a negative cathodic slope by magnitude and refuses mV/decade or swapped Rp; CORROSIONRATE refuses kg/m³', async () => {
    expect(one(await call('STERNGEARY', 0.12, -0.12, 1000))).toBeCloseTo(26.06, 2); // Stern & Geary 1957, B = 26 mV
    const mv = one(await call('STERNGEARY', 120, 120, 1000));
    expect(isError(mv, '#VALUE!')).toBe(true);
    expect(msg(mv)).toMatch(/mV\/decade/);
    expect(isError(one(await call('STERNGEARY', 1000, 0.12, 0.12)), '#VALUE!')).toBe(true);
    expect(msg(one(await call('CORROSIONRATE', 1, 27.92, 7870)))).toMatch(/kg\/m³/);
    expect(msg(one(await call('TAFELSLOPE', 50)))).toMatch(/percentage/);
    expect(one(await call('TAFELSLOPE', 0.5))).toBeCloseTo(0.1183, 4);
  });
});
