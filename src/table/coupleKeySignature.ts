/**
 * A number that two spellings of one couple key always share: a 32-bit hash of the key's capital
 * letters A–Z and its "/" in the order they are written ("Cu(2+) / Cu" and "Cu2+/Cu" both hash
 * "C/C"). normalizeCoupleKey changes white space, charge spellings, phase marks and subscript
 * characters, none of which is a capital ASCII letter or "/", so a text whose signature differs from
 * every key of a table cannot be one of its keys and need not be read as species at all. Equal
 * signatures prove nothing (different keys share them); the look-up then goes the full way.
 * No allocation: one pass over the text.
 *
 * reversed true gives the signature of the key written the other way round (the text after its
 * first "/", a "/", the text before it), without writing that key out.
 *
 * Syntax: coupleKeySignature(key, [reversed])
 * Example: coupleKeySignature("Cu(2+)/Cu") === coupleKeySignature("Cu2+/Cu") → true;
 *   coupleKeySignature("Zn/Zn2+", true) === coupleKeySignature("Zn2+/Zn") → true
 * See also: normalizeCoupleKey
 */
export function coupleKeySignature(key: string, reversed = false): number {
  const slash = reversed ? key.indexOf('/') : -1;
  if (slash < 0) return capitals(key, 0, key.length, 0x811c9dc5) >>> 0;
  const h = capitals(key, slash + 1, key.length, 0x811c9dc5);
  return capitals(key, 0, slash, Math.imul(h ^ 47, 0x01000193)) >>> 0;
}

/** FNV-1a (32 bits) over the capitals A–Z and "/" of key[from, to), continuing from h. */
function capitals(key: string, from: number, to: number, h: number): number {
  for (let i = from; i < to; i++) {
    const c = key.charCodeAt(i);
    if ((c >= 65 && c <= 90) || c === 47) h = Math.imul(h ^ c, 0x01000193);
  }
  return h;
}
