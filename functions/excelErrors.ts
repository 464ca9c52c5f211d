/**
 * Excel error values and their messages: the one place that builds a CustomFunctions.Error.
 *
 * Message style: one line of plain words saying what was wrong and what is accepted,
 * `Q must be a number; got "abc"`. A message longer than 300 characters keeps its beginning and
 * end and loses the middle. #N/A and #VALUE! always carry a message; #NUM! never does (Excel
 * shows none) and is one shared value.
 */
import { DomainError, InputError, NotFoundError } from '../src/errors';
import { quote } from '../src/text/quote';

/** What one element of a result may be before it reaches Excel. */
export type Cell = number | string | boolean | CustomFunctions.Error;

/** A message that is one line of words: no white space but single spaces, none at either end. */
const ONE_LINE = /^(?! )(?:[^\s]| (?! |$))*$/;
/** Longest message an error value carries. */
const MAX_MESSAGE = 300;

let ErrorClass: typeof CustomFunctions.Error | null = null;
/** CustomFunctions.Error, looked up on first use (the runtime defines it before any call). */
export function errorClass(): typeof CustomFunctions.Error {
  if (ErrorClass === null) ErrorClass = CustomFunctions.Error;
  return ErrorClass;
}

/** CustomFunctions.ErrorCode, looked up on first use. */
let Codes: typeof CustomFunctions.ErrorCode | null = null;
function codes(): typeof CustomFunctions.ErrorCode {
  if (Codes === null) Codes = CustomFunctions.ErrorCode;
  return Codes;
}

/**
 * One line of plain words, at most MAX_MESSAGE characters. A longer message keeps its beginning
 * (what was wrong) and its end (what is accepted) and loses the middle, which is where long
 * quoted input sits.
 */
function tidyMessage(message: string): string {
  // Most messages are one line already: then nothing is rebuilt.
  let m = ONE_LINE.test(message) ? message : message.replace(/\s+/g, ' ').trim();
  if (m.length > MAX_MESSAGE) {
    const tail = Math.floor(MAX_MESSAGE / 3);
    m = `${m.slice(0, MAX_MESSAGE - tail - 1)}…${m.slice(m.length - tail)}`;
  }
  return m === '' ? 'the value cannot be used here' : m;
}

/** #N/A with a message. */
export function notAvailable(message: string): CustomFunctions.Error {
  return new (errorClass())(codes().notAvailable, tidyMessage(message));
}
/** The last fixed parts notAvailableNaming found fit for a one-line message, with the quotes joined on. */
const fit = { before: '', after: '', open: '', close: '' };

/**
 * #N/A whose message is `before`, the text as quote() writes it, then `after`: the same message as
 * notAvailable(before + quote(text) + after), built without scanning it. The fixed parts repeat
 * from cell to cell (a range of a million distinct unknown keys has one `before` and one `after`),
 * so they are checked when they change, not per cell; a short text of printable ASCII without
 * quotes is quoted as it stands. Such a key then costs one joined string and one error value.
 */
export function notAvailableNaming(before: string, text: string, after: string): CustomFunctions.Error {
  if (before !== fit.before || after !== fit.after || fit.open === '') {
    const open = `${before}"`;
    const close = `"${after}`;
    if (!ONE_LINE.test(open + close) || open.length + close.length + 80 > MAX_MESSAGE) return notAvailable(before + quote(text) + after);
    fit.before = before;
    fit.after = after;
    fit.open = open;
    fit.close = close;
  }
  // Printable ASCII but '"', at most 40 characters: quote() would return it unchanged, in quotes.
  if (text.length > 40) return notAvailable(before + quote(text) + after);
  for (let i = 0; i < text.length; i++) {
    const c = text.charCodeAt(i);
    if (c <= 32 || c === 34 || c >= 127) return notAvailable(before + quote(text) + after);
  }
  return new (errorClass())(codes().notAvailable, fit.open + text + fit.close);
}
/** #VALUE! with a message. */
export function invalidValue(message: string): CustomFunctions.Error {
  return new (errorClass())(codes().invalidValue, tidyMessage(message));
}
let numError: CustomFunctions.Error | null = null;
/** #NUM! (Excel shows no message for it). One shared value: it carries nothing but its code. */
export function invalidNumber(): CustomFunctions.Error {
  if (numError === null) numError = new (errorClass())(codes().invalidNumber);
  return numError;
}

/** Maps anything thrown by the core to an Excel error value. */
export function toExcelError(e: unknown): CustomFunctions.Error {
  if (e instanceof NotFoundError) return notAvailable(e.message);
  if (e instanceof InputError) return invalidValue(e.message);
  if (e instanceof DomainError) return invalidNumber();
  if (isErrorValue(e)) return asResultError(e, 'the value');
  if (e instanceof RangeError) return invalidNumber();
  const msg = e instanceof Error ? e.message : String(e);
  return invalidValue(`unexpected problem: ${msg}`);
}

let errorCodes: Set<string> | null = null;
/** The codes of CustomFunctions.ErrorCode (read when first needed: the global exists by then). */
function knownCode(code: string): boolean {
  if (errorCodes === null) errorCodes = new Set<string>(Object.values(codes()) as string[]);
  return errorCodes.has(code);
}

/**
 * True for an Excel error value arriving from a cell (or produced here): a CustomFunctions.Error,
 * or an object whose `code` is one of Excel's error codes. An object that only looks like an
 * error (a `code` that is not an Excel error code) is not one.
 */
export function isErrorValue(v: unknown): v is CustomFunctions.Error {
  if (typeof v !== 'object' || v === null) return false;
  if (v instanceof errorClass()) return true;
  if (Array.isArray(v)) return false;
  const code = (v as { code?: unknown }).code;
  return typeof code === 'string' && knownCode(code);
}

/** Error codes Excel accepts as a custom function's input but not as its result. */
function inputOnly(code: CustomFunctions.ErrorCode): boolean {
  return code === codes().invalidReference || code === codes().invalidName;
}

/**
 * An error value from an input cell, made fit to be returned: passed through unchanged when it is a
 * CustomFunctions.Error Excel accepts as a result (#N/A, #VALUE!, #NUM!, #DIV/0!, #NULL!); rebuilt
 * when it only has the shape of one; #REF! and #NAME? (input-only codes) become #VALUE! naming the
 * argument.
 */
export function asResultError(e: CustomFunctions.Error, name: string): CustomFunctions.Error {
  const code = e.code;
  if (inputOnly(code)) return invalidValue(`${name} comes from a cell showing ${code}`);
  if (e instanceof errorClass()) return e;
  const message: unknown = (e as { message?: unknown }).message;
  const Err = errorClass();
  if (code === codes().invalidValue || code === codes().notAvailable) {
    const text = typeof message === 'string' && message.trim() !== '' ? message : `${name} comes from a cell showing ${code}`;
    return new Err(code, tidyMessage(text));
  }
  return code === codes().invalidNumber ? invalidNumber() : new Err(code);
}
