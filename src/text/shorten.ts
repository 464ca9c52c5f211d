/**
 * Cuts a text that is quoted inside a message: a text of at most `max` UTF-16 code units is kept
 * whole; a longer one keeps its first `max − 3` and ends in "…", cut before a character, never
 * between the two halves of a surrogate pair.
 *
 * Syntax: shorten(text, max = 40)
 * Example: shorten('Cu2+/Cu') → 'Cu2+/Cu'; shorten('x'.repeat(50)) → 'xxx…x…' (37 "x" then "…")
 * See also: quote (a text quoted the way a spreadsheet writes it).
 */
export function shorten(text: string, max = 40): string {
  if (text.length <= max) return text;
  let end = max - 3;
  const last = text.charCodeAt(end - 1);
  if (last >= 0xd800 && last <= 0xdbff) end--;
  return `${text.slice(0, end)}…`;
}
