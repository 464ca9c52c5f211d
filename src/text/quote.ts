import { shorten } from './shorten';

/**
 * A text as a message quotes it: shortened to 40 characters (see shorten), white space runs
 * written as one space, in double quotes with inner quotes doubled, the way a spreadsheet writes
 * a text constant.
 *
 * Syntax: quote(text)
 * Example: quote('say "hi"') → '"say ""hi"""'
 * See also: shorten.
 */
export function quote(text: string): string {
  return `"${shorten(text).replace(/\s+/g, ' ').replace(/"/g, '""')}"`;
}
