/**
 * Reading a number written as text, in one pass over its characters (no pattern that could
 * backtrack), after a length check: the one reader of numeric text for the worksheet functions, CSV
 * import and the task pane's fields.
 */
import { MAX_NUMBER_CHARS } from './textLimits';

function isDigit(c: number): boolean {
  return c >= 48 && c <= 57;
}

/**
 * What a trimmed text is as a number: 'number' for plain decimal or exponent notation
 * ([+-]digits[.digits][e[+-]digits], at least one digit before the exponent: "0.25", "-1.5e-3", ".5",
 * "2."), 'decimal-comma' for a number written with a decimal comma ("0,25", "-,5"), 'other' for
 * anything else, including text longer than MAX_NUMBER_CHARS characters. Number(text) gives the value
 * of a 'number'.
 *
 * Syntax: numberTextKind(text)
 * Example: numberTextKind("-1.5e-3") → "number"; numberTextKind("0,25") → "decimal-comma"
 * See also: MAX_NUMBER_CHARS (src/textLimits.ts)
 */
export function numberTextKind(text: string): 'number' | 'decimal-comma' | 'other' {
  const n = text.length;
  if (n === 0 || n > MAX_NUMBER_CHARS) return 'other';
  let i = 0;
  if (text[0] === '+' || text[0] === '-') i++;
  let before = 0;
  while (i < n && isDigit(text.charCodeAt(i))) {
    i++;
    before++;
  }
  if (i < n && text[i] === ',') {
    // [+-] digits* , digits+ and nothing else
    i++;
    let after = 0;
    while (i < n && isDigit(text.charCodeAt(i))) {
      i++;
      after++;
    }
    return after > 0 && i === n ? 'decimal-comma' : 'other';
  }
  let after = 0;
  if (i < n && text[i] === '.') {
    i++;
    while (i < n && isDigit(text.charCodeAt(i))) {
      i++;
      after++;
    }
  }
  if (before + after === 0) return 'other';
  if (i < n && (text[i] === 'e' || text[i] === 'E')) {
    i++;
    if (i < n && (text[i] === '+' || text[i] === '-')) i++;
    let exp = 0;
    while (i < n && isDigit(text.charCodeAt(i))) {
      i++;
      exp++;
    }
    if (exp === 0) return 'other';
  }
  return i === n ? 'number' : 'other';
}
