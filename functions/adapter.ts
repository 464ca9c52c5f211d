/**
 * The one adapter between Excel and the core: the front door the families import.
 *
 * A worksheet function is declared once as a spec (functions/spec.ts: id, description, arguments
 * with kind, unit, default, domain and help, result, help anchor, and a per-element compute over
 * already-converted values). `worksheet(spec)` turns it into the function Excel calls. Everything
 * Excel-specific happens behind this module, in these parts:
 *
 *  - excelErrors.ts  error values and messages: NotFoundError → #N/A + message, InputError →
 *                    #VALUE! + message, DomainError or a non-finite result → #NUM! (no message; only for results
 *                    that cannot be represented);
 *                    an error value in an input cell is passed through in that element only
 *                    (#REF! and #NAME?, which Excel does not accept as results, become #VALUE!);
 *  - domains.ts      domains of numbers, each one record of bounds and words (→ #VALUE! naming the range outside);
 *  - convert.ts      reading one element: numbers, numeric text, text, booleans, null (omitted or
 *                    empty: the default), couple and electrode keys (memoized per table);
 *  - lists.ts        whole-range arguments, read whole and paired by position;
 *  - shapes.ts       range shapes and the #VALUE! for shapes that cannot be broadcast; result
 *                    elements made fit for a cell (a text longer than 32,767 characters → #VALUE!);
 *  - compile.ts      the element loops: scalars with ranges, equal shapes element by element, a
 *                    row against a column gives the full table; waiting for the workbook's table.
 *
 * The result is always a 2-D array (1×1 for scalar arguments), which Excel spills. Nothing throws:
 * every failure becomes a CustomFunctions.Error value.
 *
 * Message style: one line of plain words saying what was wrong and what is accepted,
 * `Q must be a number; got "abc"`, `unknown couple "Xx/Yy"; use a key of the potential table such
 * as "Cu2+/Cu"`, `n is required; the cell is empty`. Echoed text is quoted the way a spreadsheet
 * writes it and cut to 40 characters (src/text/quote.ts).
 */
export type { ArgKind, ArgSpec, ArgValue, FunctionSpec } from './spec';
export { type Bounds, type Domain, bounded, domains } from './domains';
export { type Cell, invalidNumber, invalidValue, isErrorValue, notAvailable, toExcelError } from './excelErrors';
export { show } from './convert';
export { type WorksheetFunction, type WorksheetResult, registry, worksheet } from './compile';
