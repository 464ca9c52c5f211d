/**
 * Write verification sheet: a new worksheet that qualifies the installed add-in on this computer.
 *
 * Header: the add-in's version and the potential table in use, both through live TABLEINFO formulas,
 * the date, the overall result (a live count of the PASS cells) and lines for the reviewer. Then one row
 * per published check case of data/verification.json: the function, its inputs, the live formula, the
 * expected value, the tolerance, the unit, a live PASS/FAIL formula and the source. Printed, the sheet
 * fits the page width (landscape, one page wide, the column header repeated on every page).
 */
import verification from '../data/verification.json';
import { byId } from './dom';

export interface VerificationCase {
  readonly id: string;
  readonly family: string;
  readonly function: string;
  readonly args: readonly unknown[];
  readonly expected: number | string;
  readonly tolerance: number | null;
  readonly unit: string;
  readonly what: string;
  readonly source: string;
  readonly basis: string;
  readonly tableRow?: boolean;
  readonly note?: string;
}

export const VERIFICATION_CASES: readonly VerificationCase[] = (verification as { cases: VerificationCase[] }).cases;
export const BASE_VERIFICATION_NAME = 'Verification';
export const NAMESPACE = 'CELLWRIGHT';

export const VERIFICATION_COLUMNS = ['Case', 'Function', 'Inputs', 'Result (live formula)', 'Expected', 'Tolerance (±)', 'Unit', 'Check', 'What', 'Source', 'Basis'] as const;
/** Column widths in points (landscape A4/Letter, fitted to one page wide). */
const COLUMN_WIDTHS = [34, 140, 160, 90, 70, 56, 56, 40, 130, 300, 80];
/** What, Source and Basis wrap. */
const WRAPPED = [8, 9, 10];

export interface VerificationSheet {
  readonly values: (string | number)[][];
  readonly formats: string[][];
  readonly headingRows: readonly number[];
  /** 1-based rows of the first and last case. */
  readonly firstCaseRow: number;
  readonly lastCaseRow: number;
}

function colLetter(i: number): string {
  return String.fromCharCode(65 + i);
}

/** One argument as formula text: text quoted, numbers as they are, a range as an array constant, omitted empty. */
export function formulaArg(a: unknown): string {
  if (a === null || a === undefined) return '';
  if (typeof a === 'string') return `"${a.replace(/"/g, '""')}"`;
  if (typeof a === 'number') return String(a).replace('e', 'E');
  if (typeof a === 'boolean') return a ? 'TRUE' : 'FALSE';
  if (Array.isArray(a)) return `{${(a as unknown[][]).map((row) => row.map(formulaArg).join(',')).join(';')}}`;
  return JSON.stringify(a) ?? '';
}

/** The formula of a case, e.g. =CELLWRIGHT.NERNST(0.3419,2,100). Trailing omitted arguments are left out. */
export function caseFormula(c: VerificationCase): string {
  const args = c.args.map(formulaArg);
  while (args.length > 0 && args[args.length - 1] === '') args.pop();
  return `=${NAMESPACE}.${c.function}(${args.join(',')})`;
}

/** The inputs of a case as people read them: "couple = "Cu2+/Cu", temperature_C = 25". */
function inputsText(c: VerificationCase, names: readonly string[] | undefined): string {
  return c.args
    .map((a, i) => (a === null ? null : `${names?.[i] ?? `argument ${i + 1}`} = ${formulaArg(a)}`))
    .filter((s): s is string => s !== null)
    .join('; ');
}

/**
 * The cells of the sheet (pure). `names` gives each function's argument names (from the functions'
 * metadata) for the inputs column; `now` is the date written in the header.
 */
export function verificationSheet(cases: readonly VerificationCase[], now: Date, names: ReadonlyMap<string, readonly string[]> = new Map()): VerificationSheet {
  const width = VERIFICATION_COLUMNS.length;
  const values: (string | number)[][] = [];
  const formats: string[][] = [];
  const headingRows: number[] = [];
  const push = (cells: (string | number)[], fmt: string[] = [], heading = false): number => {
    const row = Array.from({ length: width }, (_, i) => cells[i] ?? '');
    if (heading) headingRows.push(values.length);
    values.push(row);
    formats.push(row.map((v, i) => fmt[i] ?? (typeof v === 'string' && !v.startsWith('=') ? '@' : 'General')));
    return values.length; // 1-based row just written
  };
  const headerRows = 11;
  const firstCaseRow = headerRows + 2;
  const lastCaseRow = firstCaseRow + cases.length - 1;
  const checks = `H${firstCaseRow}:H${lastCaseRow}`;
  const tinfo = (field: string) => `=${NAMESPACE}.TABLEINFO("${field}")`;

  push(['Cellwright verification of this installation'], [], true);
  push(['', 'Add-in version', tinfo('addin')]);
  push(['', 'Potential table', tinfo('origin')]);
  push(['', 'Table version', tinfo('version')]);
  push(['', 'Table checksum', tinfo('checksum')]);
  push(['', 'Table changed', `=IFERROR(TEXT(${NAMESPACE}.TABLEINFO("changed"),"yyyy-mm-dd hh:mm")&" UTC, revision "&${NAMESPACE}.TABLEINFO("revision"),"not stored (the built-in table)")`]);
  push(['', 'Sheet written', now.toISOString().slice(0, 10)], ['@', '@', '@']);
  push(['', 'Result', `=IF(COUNTIF(${checks},"PASS")=${cases.length},"PASS: all ${cases.length} cases","FAIL: "&(${cases.length}-COUNTIF(${checks},"PASS"))&" of ${cases.length} cases do not pass")`]);
  push(['', 'Reviewed by (name)', '______________________________', '', 'Signature', '______________________________', '', '', 'Date', '______________']);
  push(['', 'Each case is a published value with its source. A case passes when |result − expected| ≤ tolerance (texts: equal). Basis "computed from …" means the expected value was computed from the published constants named; "from memory" marks a value that still has to be checked against the printed source.']);
  push([]);
  push([...VERIFICATION_COLUMNS], [], true);
  cases.forEach((c, i) => {
    const r = firstCaseRow + i;
    const check =
      c.tolerance === null
        ? `=IF(ISERROR(D${r}),"FAIL",IF(EXACT(D${r},E${r}),"PASS","FAIL"))`
        : `=IF(ISNUMBER(D${r}),IF(ABS(D${r}-E${r})<=F${r},"PASS","FAIL"),"FAIL")`;
    const what = `${c.what}${c.tableRow ? ' (a row of the potential table: follows the table in use)' : ''}${c.note ? `. ${c.note}` : ''}`;
    push(
      [c.id, `${NAMESPACE}.${c.function}`, inputsText(c, names.get(c.function)), caseFormula(c), c.expected, c.tolerance ?? 'exact', c.unit, check, what, c.source, c.basis],
      ['@', '@', '@', 'General', typeof c.expected === 'number' ? 'General' : '@', c.tolerance === null ? '@' : 'General', '@', 'General', '@', '@', '@'],
    );
  });
  return { values, formats, headingRows, firstCaseRow, lastCaseRow };
}

/** A sheet name not yet used: "Verification", "Verification (2)", … */
export function freeVerificationName(existing: readonly string[]): string {
  const taken = new Set(existing.map((n) => n.toLowerCase()));
  if (!taken.has(BASE_VERIFICATION_NAME.toLowerCase())) return BASE_VERIFICATION_NAME;
  for (let i = 2; ; i++) {
    const name = `${BASE_VERIFICATION_NAME} (${i})`;
    if (!taken.has(name.toLowerCase())) return name;
  }
}

/** Writes the sheet, sets it up for printing and activates it; returns its name. */
export async function writeVerificationSheet(now: Date = new Date(), names: ReadonlyMap<string, readonly string[]> = new Map()): Promise<string> {
  const content = verificationSheet(VERIFICATION_CASES, now, names);
  const last = colLetter(VERIFICATION_COLUMNS.length - 1);
  return Excel.run(async (context) => {
    const sheets = context.workbook.worksheets;
    sheets.load('items/name');
    await context.sync();
    const name = freeVerificationName(sheets.items.map((s) => s.name));
    const sheet = sheets.add(name);
    const range = sheet.getRange(`A1:${last}${content.values.length}`);
    // formats first, so that text (sources, "=" inside inputs) stays text and formulas are formulas
    range.numberFormat = content.formats;
    range.formulas = content.values;
    for (const r of content.headingRows) sheet.getRange(`A${r + 1}:${last}${r + 1}`).format.font.bold = true;
    COLUMN_WIDTHS.forEach((w, i) => {
      const col = sheet.getRange(`${colLetter(i)}:${colLetter(i)}`);
      col.format.columnWidth = w;
      if (WRAPPED.includes(i)) col.format.wrapText = true;
    });
    // printing: landscape, one page wide, the case header repeated on every page (ExcelApi 1.9)
    sheet.pageLayout.orientation = 'Landscape';
    sheet.pageLayout.zoom = { horizontalFitToPages: 1, verticalFitToPages: 0 };
    sheet.pageLayout.setPrintTitleRows(`$${content.firstCaseRow - 1}:$${content.firstCaseRow - 1}`);
    sheet.activate();
    await context.sync();
    return name;
  });
}

/** Argument names of each function, from functions.json served beside the pane (empty when it cannot be read). */
async function argumentNames(): Promise<Map<string, readonly string[]>> {
  const out = new Map<string, readonly string[]>();
  try {
    const res = await fetch('functions.json');
    if (!res.ok) return out;
    const meta = (await res.json()) as { functions?: Array<{ id: string; parameters: Array<{ name: string }> }> };
    for (const f of meta.functions ?? []) out.set(f.id, f.parameters.map((p) => p.name));
  } catch {
    /* the inputs column then says "argument 1", … */
  }
  return out;
}

/** Wires the pane's button (taskpane.html, Files tab) to the writer. */
export function wireVerification(): void {
  const button = byId<HTMLButtonElement>('write-verification');
  const status = byId('verification-status');
  button.addEventListener('click', () => {
    button.disabled = true;
    status.textContent = 'Writing the verification sheet…';
    argumentNames().then((names) => writeVerificationSheet(new Date(), names)).then(
      (name) => {
        status.textContent = `Wrote the sheet “${name}” with ${VERIFICATION_CASES.length} cases. Its Result line counts the PASS cells once Excel has calculated them.`;
        button.disabled = false;
      },
      (e: unknown) => {
        status.textContent = `The verification sheet could not be written: ${e instanceof Error ? e.message : String(e)}`;
        button.disabled = false;
      },
    );
  });
}
