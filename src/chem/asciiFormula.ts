/**
 * Unicode subscript and superscript digits and signs read as their ASCII forms, so that text
 * pasted from a document ("NiSO₄·6H₂O", "Cu²⁺", "SO₄²⁻") reads like what a keyboard gives
 * ("NiSO4·6H2O", "Cu2+", "SO42-"). The minus sign U+2212 and the superscript minus both read as "-".
 *
 * Syntax: asciiFormula(text)
 * Example: asciiFormula("Cu²⁺") → "Cu2+"
 * See also: splitSpecies
 */
export function asciiFormula(text: string): string {
  if (plainAscii(text)) return text;
  let out = '';
  for (const ch of text) out += ASCII_OF.get(ch) ?? ch;
  return out;
}

const ASCII_OF = new Map<string, string>();
'₀₁₂₃₄₅₆₇₈₉'.split('').forEach((c, d) => ASCII_OF.set(c, String(d)));
'⁰¹²³⁴⁵⁶⁷⁸⁹'.split('').forEach((c, d) => ASCII_OF.set(c, String(d)));
for (const [c, a] of [
  ['⁺', '+'],
  ['₊', '+'],
  ['⁻', '-'],
  ['₋', '-'],
  ['−', '-'],
  ['⁽', '('],
  ['⁾', ')'],
  ['₍', '('],
  ['₎', ')'],
]) ASCII_OF.set(c, a);

/** True when every character is ASCII, "·" or "•" (nothing to rewrite). */
function plainAscii(text: string): boolean {
  for (let i = 0; i < text.length; i++) {
    const c = text.charCodeAt(i);
    if (c > 0x7f && c !== 0xb7 && c !== 0x2022) return false;
  }
  return true;
}
