/**
 * What a worksheet function is, written once: its id, description, arguments (name, kind, unit,
 * default, domain, help text), result, help anchor and the per-element computation. Everything
 * else (the declarations the metadata generator reads, functions.json, the reference) is
 * generated from these specs.
 */
import type { CoupleRow, ElectrodeRow } from '../src/table/types';
import type { Domain } from './domains';
import type { Cell } from './excelErrors';

/** How an argument is read. */
export type ArgKind =
  | 'number' //     a number (numeric text accepted); domain checked
  | 'text' //       text (numbers are turned into text)
  | 'couple' //     a couple key → CoupleRow from the table in use
  | 'coupleOrPotential' // a couple key → CoupleRow, or a number → potential in V
  | 'electrode' //  a reference-electrode key or alias → ElectrodeRow
  | 'species' //    a formula text (kept as text) or a molar mass in g/mol (kept as number > 0)
  | 'boolean' //    TRUE or FALSE (also 1/0 and the texts "TRUE"/"FALSE")
  | 'numberList' // a whole range of numbers, not broadcast (e.g. COMBINE's potentials)
  | 'textList'; //  a whole range of texts, not broadcast

export interface ArgSpec {
  readonly name: string;
  readonly kind: ArgKind;
  /** Optional arguments take this default when omitted (null) or empty. Omit for required ones. */
  readonly default?: number | string | boolean | null;
  readonly optional?: boolean;
  /** Domain of a number (kinds number, coupleOrPotential's number, species' molar mass, numberList). */
  readonly domain?: Domain;
  /** Unit, for the generated reference ("V", "°C", "g/mol"). */
  readonly unit?: string;
  /** One sentence for Excel's argument help; an optional argument's says its default. */
  readonly help?: string;
}

/** Converted value handed to compute functions. */
export type ArgValue = number | string | boolean | CoupleRow | ElectrodeRow | number[] | string[] | null;

export interface FunctionSpec {
  /** The worksheet id, e.g. "NERNST". */
  readonly id: string;
  /** What the function gives, in one or two sentences (Excel's function help). */
  readonly description?: string;
  readonly args: readonly ArgSpec[];
  /** The result in a few words ("E in V."), for the reference. */
  readonly result?: string;
  /** The function's anchor in docs/functions.html (its help link). */
  readonly helpAnchor?: string;
  /** Per-element computation over converted arguments. May throw the core's errors. */
  // Each family's compute takes its own converted argument types; the adapter checks them at run time.
  // eslint-disable-next-line @typescript-eslint/no-explicit-any
  readonly compute: (...args: any[]) => Cell | Cell[];
  /** Result is a row of several values per element (e.g. GALVANIC's 1×3). */
  readonly rowResult?: number;
  /** True when the function reads the potential table (then it waits for the workbook's copy). */
  readonly usesTable?: boolean;
}

/** The fields a spec must have for its declaration to be generated. */
export const DOCUMENTED_FIELDS = ['description', 'result', 'helpAnchor'] as const;
