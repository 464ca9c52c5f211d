/**
 * The one form of time the stored table holds: ISO 8601 in UTC, as Date.prototype.toISOString writes
 * it ("2026-11-30T12:00:00.000Z"; the fraction of a second may be left out or have 1 to 9 digits).
 * Nothing else is taken for a time, however leniently a browser's date parser would read it.
 */

const FORM = /^(\d{4})-(\d{2})-(\d{2})T(\d{2}):(\d{2}):(\d{2})(?:\.\d{1,9})?Z$/;

/**
 * True when `text` is a real instant written YYYY-MM-DDTHH:MM:SS[.fraction]Z (a calendar date that
 * exists, hours 00–23, minutes and seconds 00–59).
 *
 * Syntax: isUtcTimestamp(text)
 * Example: isUtcTimestamp("2026-11-30T12:00:00.000Z") → true; isUtcTimestamp("2026-02-30T00:00:00Z") → false
 */
export function isUtcTimestamp(text: unknown): boolean {
  if (typeof text !== 'string' || text.length > 30) return false;
  const m = FORM.exec(text);
  if (m === null) return false;
  const [y, mo, d, h, mi, s] = m.slice(1, 7).map(Number);
  if (mo < 1 || mo > 12 || d < 1 || h > 23 || mi > 59 || s > 59) return false;
  const date = new Date(Date.UTC(y, mo - 1, d));
  return date.getUTCFullYear() === y && date.getUTCMonth() === mo - 1 && date.getUTCDate() === d;
}
