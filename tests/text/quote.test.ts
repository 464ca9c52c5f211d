/**
 * The one quoting rule of messages (cells' #VALUE!/#N/A texts and the table's row problems):
 * at most 40 UTF-16 code units kept whole, longer text cut to 37 and "…", never inside a
 * surrogate pair; quoted the way a spreadsheet writes a text constant (inner quotes doubled).
 */
import { describe, expect, it } from 'vitest';
import { quote } from '../../src/text/quote';
import { shorten } from '../../src/text/shorten';

/** True when no high surrogate is left without its low half (and no low one without its high half). */
function wellFormed(s: string): boolean {
  return !/[\uD800-\uDBFF](?![\uDC00-\uDFFF])|(?<![\uD800-\uDBFF])[\uDC00-\uDFFF]/.test(s);
}

describe('shorten', () => {
  it('keeps a text of at most 40 code units whole', () => {
    expect(shorten('Cu2+/Cu')).toBe('Cu2+/Cu');
    expect(shorten('x'.repeat(40))).toBe('x'.repeat(40));
  });

  it('cuts a longer text to 37 code units and "…"', () => {
    expect(shorten('x'.repeat(41))).toBe(`${'x'.repeat(37)}…`);
    expect(shorten('abcdefghij', 8)).toBe('abcde…');
  });

  it('never splits a surrogate pair: a pair across the cut is left out whole', () => {
    // U+1F50B (a battery symbol) is the pair \uD83D\uDD0B; placed so that the cut at 37 would split it.
    const text = `${'a'.repeat(36)}\u{1F50B}${'b'.repeat(10)}`;
    const cut = shorten(text);
    expect(cut).toBe(`${'a'.repeat(36)}…`);
    expect(wellFormed(cut)).toBe(true);
    // A pair that ends at the cut is kept.
    const kept = shorten(`${'a'.repeat(35)}\u{1F50B}${'b'.repeat(10)}`);
    expect(kept).toBe(`${'a'.repeat(35)}\u{1F50B}…`);
    for (let pad = 0; pad < 45; pad++) expect(shorten(`${'a'.repeat(pad)}${'\u{1F50B}'.repeat(30)}`)).toSatisfy(wellFormed);
  });
});

describe('quote', () => {
  it('quotes spreadsheet-style: inner quotes doubled, white space runs as one space', () => {
    expect(quote('say "hi"')).toBe('"say ""hi"""');
    expect(quote('a\n\tb')).toBe('"a b"');
  });

  it('cuts before quoting', () => {
    expect(quote('y'.repeat(100))).toBe(`"${'y'.repeat(37)}…"`);
  });
});
