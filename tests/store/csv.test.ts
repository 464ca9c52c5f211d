import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { CSV_COLUMNS, exportCsv, importCsv } from '../../src/store/csv';
import { builtin, manyCouples } from './fixtures';

const B = builtin();
const header = CSV_COLUMNS.join(',');

describe('CSV layout 1', () => {
  it('round-trips the built-in table exactly', () => {
    const text = exportCsv(B, 'built-in table 2026.1');
    const r = importCsv(text);
    expect(r.fileProblem).toBeUndefined();
    expect(r.rejected).toEqual([]);
    expect(r.couples).toEqual(B.couples);
    expect(r.electrodes).toEqual(B.electrodes);
    expect(text.startsWith('\uFEFF# Cellwright potential table')).toBe(true);
    expect(text.includes('\r\n')).toBe(true);
    // Numbers are written as numbers: a negative E° is not guarded like a formula.
    expect(text).toContain('couple,Zn2+/Zn,Zn2+ + 2e- -> Zn,,-0.7628,'); // the built-in Zn2+/Zn row (data/couples.json)
  });

  it('round-trips hostile text: quotes, commas, line breaks, markup and formula starts', () => {
    const rows = [
      { key: 'Cu2+/Cu', halfReaction: 'Cu2+ + 2e- -> Cu', e0: 0.3521, source: '=HYPERLINK("http://x","y")', note: '<img src=x onerror=alert(1)>, "quoted"\nsecond line' },
      { key: 'Ag+/Ag', halfReaction: 'Ag+ + e- -> Ag', e0: 0.7996, source: '+1 lab, @team', note: '-minus start' },
      { key: 'Zn2+/Zn', halfReaction: 'Zn2+ + 2e- -> Zn', e0: -0.7618, source: "'=already quoted", note: "''two apostrophes" },
      { key: 'Ni2+/Ni', halfReaction: 'Ni2+ + 2e- -> Ni', e0: -0.257, source: "'plain apostrophe" },
    ];
    const text = exportCsv({ couples: rows, electrodes: [] }, 'test');
    expect(text).not.toMatch(/^=|,=|,\+|,@/m); // no cell starts a formula
    const r = importCsv(text);
    expect(r.rejected).toEqual([]);
    expect(r.couples).toEqual(rows);
  });

  it('reports each bad line with its number and reason, and keeps the good ones apart', () => {
    const text = [
      '# a comment, with "quotes',
      header,
      'couple,Cu2+/Cu,Cu2+ + 2e- -> Cu,,0.3419,0.011,CRC,',
      'couple,Fe3+/Fe2+,Fe3+ + e- -> Fe2+,,abc,,CRC,',
      'couple,Zn2+/Zn,Zn2+ + e- -> Zn,,-0.7618,,CRC,',
      '',
      'couple,Ag+/Ag,Ag+ + e- -> Ag,,0.7996,,,',
      'metal,X,,,1,,CRC,',
      'couple,Cu(2+)/Cu,Cu2+ + 2e- -> Cu,,0.3521,,CRC,',
      'couple,Ni2+/Ni,Ni2+ + 2e- -> Ni,,-0.257,,CRC',
      'couple,Pb2+/Pb,Pb2+ + 2e- -> Pb,,"-0,126",,CRC,',
      'couple,Sn2+/Sn,Sn2+ + 2e- -> Sn,,9.5,,CRC,',
      'electrode,SCE,,Calomel|Hg/Hg2Cl2/KCl(sat),0.2412,-0.67,"Bates, 1973",',
      'electrode,calomel,,,0.25,,x,',
    ].join('\n');
    const r = importCsv(text);
    expect(r.fileProblem).toBeUndefined();
    expect(r.accepted.map((a) => a.line)).toEqual([3, 13]);
    const reasons = new Map(r.rejected.map((x) => [x.line, x.reason]));
    expect([...reasons.keys()]).toEqual([4, 5, 7, 8, 9, 10, 11, 12, 14]);
    expect(reasons.get(4)).toMatch(/potential_V "abc" is not a number/);
    expect(reasons.get(5)).toMatch(/charge|balance/i);
    expect(reasons.get(7)).toMatch(/source/);
    expect(reasons.get(8)).toMatch(/row_type "metal"/);
    expect(reasons.get(9)).toMatch(/already given on line 3/);
    expect(reasons.get(10)).toMatch(/7 fields; the header has 8/);
    expect(reasons.get(11)).toMatch(/decimal comma/);
    expect(reasons.get(12)).toMatch(/outside the plausible range/);
    expect(reasons.get(14)).toMatch(/"calomel" was already given on line 13/);
    expect(r.electrodes[0].aliases).toEqual(['Calomel', 'Hg/Hg2Cl2/KCl(sat)']);
  });

  it('refuses the whole file for a missing header column, an unknown column or an unclosed quote', () => {
    expect(importCsv('').fileProblem).toMatch(/no header/);
    expect(importCsv('row_type,key,potential_V\ncouple,a,1').fileProblem).toMatch(/lacks source/);
    expect(importCsv(`${header},colour\n`).fileProblem).toMatch(/"colour" is not a column/);
    expect(importCsv(`${header}\ncouple,"Cu2+/Cu,x`).fileProblem).toMatch(/never closed/);
  });

  it('reads semicolon-separated files with decimal commas and columns in another order', () => {
    const text = 'source;potential_V;key;row_type;half_reaction\r\n"CRC; 92nd ed.";0,3419;Cu2+/Cu;couple;Cu2+ + 2e- -> Cu\r\n';
    const r = importCsv(text);
    expect(r.rejected).toEqual([]);
    expect(r.couples).toEqual([{ key: 'Cu2+/Cu', halfReaction: 'Cu2+ + 2e- -> Cu', e0: 0.3419, source: 'CRC; 92nd ed.' }]);
  });

  it('round-trips 2,000 rows', () => {
    const rows = manyCouples(2000);
    const r = importCsv(exportCsv({ couples: rows, electrodes: [] }, 'big'));
    expect(r.rejected).toEqual([]);
    expect(r.couples).toEqual(rows);
  });

  it('round-trips any printable source and note text', () => {
    fc.assert(
      fc.property(fc.string({ minLength: 1, maxLength: 60 }).filter((s) => s.trim() !== '' && s === s.trim()), fc.string({ maxLength: 60 }), (source, note) => {
        const row = { key: 'Cu2+/Cu', halfReaction: 'Cu2+ + 2e- -> Cu', e0: 0.3521, source, ...(note.trim() === '' ? {} : { note: note.trim() }) };
        const r = importCsv(exportCsv({ couples: [row], electrodes: [] }, 't'));
        return r.rejected.length === 0 && JSON.stringify(r.couples[0]) === JSON.stringify(row);
      }),
      { numRuns: 300 },
    );
  });
});

/**
 * Splits CSV text into cells the way a spreadsheet program could (at commas, semicolons or tabs,
 * honouring double quotes), for checking what a program would run as a formula.
 */
function spreadsheetCells(text: string): string[] {
  const cells: string[] = [];
  for (const line of text.replace(/^\uFEFF/, '').split('\r\n')) {
    let cell = '';
    let quoted = false;
    let start = true;
    for (let i = 0; i < line.length; i++) {
      const c = line[i];
      if (quoted) {
        if (c === '"' && line[i + 1] === '"') {
          cell += '"';
          i++;
        }
        else if (c === '"') quoted = false;
        else cell += c;
      } else if (c === '"' && start) {
        quoted = true;
        start = false;
      } else if (c === ',' || c === ';' || c === '\t') {
        cells.push(cell);
        cell = '';
        start = true;
      } else if (c === ' ' && start) cell += c;
      else {
        cell += c;
        start = false;
      }
    }
    cells.push(cell);
  }
  return cells;
}
const isNumberCell = (c: string) => c.trim() !== '' && Number.isFinite(Number(c));

describe('CSV export: no cell a spreadsheet program would run as a formula', () => {
  it('the description line is guarded like every other cell (a basedOn or description holding a formula)', () => {
    for (const description of [
      'workbook copy based on 2026.1,=HYPERLINK("http://x"&A1); checksum sha256:0',
      '2026.1;+1+1\t-2+3,@SUM(A1), "=1+1",\'=x',
    ]) {
      const text = exportCsv(B, description);
      const bad = spreadsheetCells(text).filter((c) => /^\s*[=+\-@]/.test(c) && !isNumberCell(c));
      expect(bad, description).toEqual([]);
      // still a comment line the import skips, and the table still reads back
      const r = importCsv(text);
      expect(r.rejected).toEqual([]);
      expect(r.couples).toEqual(B.couples);
    }
  });
});

describe('CSV import: the same 8 MB limit for pasted text as for a chosen file', () => {
  it('refuses text over 8 MB (bytes of UTF-8) without reading it', () => {
    const head = `${header}\ncouple,Cu2+/Cu,Cu2+ + 2e- -> Cu,,0.3419,,CRC,note\n`;
    const justUnder = head + '#'.repeat(8_000_000 - head.length - 1) + '\n';
    expect(importCsv(justUnder).fileProblem).toBeUndefined();
    const over = `${head}# ${'é'.repeat(4_000_000)}\n`; // 4,000,000 characters, 8,000,000 bytes of UTF-8 plus the rest
    const t0 = performance.now();
    const r = importCsv(over);
    expect(performance.now() - t0).toBeLessThan(2000); // reading 8 MB of rows would take many seconds; counting bytes does not
    expect(r.fileProblem).toMatch(/larger than 8 MB/);
    expect(r.accepted).toEqual([]);
  });
});
