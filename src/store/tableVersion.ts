/**
 * The form of a built-in table version ("2026.1"): one to four groups of 1 to 6 digits separated by
 * points, at most MAX_VERSION_CHARS characters. A stored table's basedOn must have this form; anything
 * else (text that a spreadsheet program could run as a formula included) makes the table unreadable.
 */
import { MAX_VERSION_CHARS } from '../textLimits';

const FORM = /^\d{1,6}(?:\.\d{1,6}){0,3}$/;

/**
 * True when `text` is a well-formed table version.
 *
 * Syntax: isTableVersion(text)
 * Example: isTableVersion("2026.1") → true; isTableVersion("2026.1,=HYPERLINK(\"x\")") → false
 */
export function isTableVersion(text: unknown): boolean {
  return typeof text === 'string' && text.length <= MAX_VERSION_CHARS && FORM.test(text);
}
