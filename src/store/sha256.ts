/**
 * SHA-256 (FIPS 180-4) of a text's UTF-8 bytes, by an audited implementation (@noble/hashes, plain
 * JavaScript and synchronous).
 *
 * The stored table's checksum must be computable synchronously in the functions bundle, which may run
 * with nothing but a CustomFunctions global (no Web Crypto, no Node crypto, no TextEncoder), so the
 * text is encoded here and hashed by @noble/hashes, which needs none of them. It is tested against the
 * FIPS 180-4 example vectors and against Node's crypto on random texts (tests/store/sha256.test.ts).
 * It detects damage and accidental edits; it is not a signature: anyone who can edit the stored text
 * can also recompute the checksum.
 */
import { sha256 } from '@noble/hashes/sha2.js';
import { bytesToHex } from '@noble/hashes/utils.js';

/** The UTF-8 bytes of a text (lone surrogates become U+FFFD, as TextEncoder does). */
export function utf8Bytes(text: string): Uint8Array {
  const out = new Uint8Array(text.length * 3);
  let j = 0;
  for (let i = 0; i < text.length; i++) {
    let c = text.charCodeAt(i);
    if (c < 0x80) {
      out[j++] = c;
      continue;
    }
    if (c >= 0xd800 && c <= 0xdbff && i + 1 < text.length) {
      const d = text.charCodeAt(i + 1);
      if (d >= 0xdc00 && d <= 0xdfff) {
        c = 0x10000 + ((c - 0xd800) << 10) + (d - 0xdc00);
        i++;
      } else c = 0xfffd;
    } else if (c >= 0xd800 && c <= 0xdfff) c = 0xfffd;
    if (c < 0x800) {
      out[j++] = 0xc0 | (c >> 6);
      out[j++] = 0x80 | (c & 63);
    } else if (c < 0x10000) {
      out[j++] = 0xe0 | (c >> 12);
      out[j++] = 0x80 | ((c >> 6) & 63);
      out[j++] = 0x80 | (c & 63);
    } else {
      // A surrogate pair is two UTF-16 units and four bytes: within the 3-per-unit room.
      out[j++] = 0xf0 | (c >> 18);
      out[j++] = 0x80 | ((c >> 12) & 63);
      out[j++] = 0x80 | ((c >> 6) & 63);
      out[j++] = 0x80 | (c & 63);
    }
  }
  return out.subarray(0, j);
}

/**
 * Lower-case hex SHA-256 of the UTF-8 encoding of a text.
 *
 * Syntax: sha256Hex(text)
 * Example: sha256Hex('abc') → 'ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad'
 * See also: canonicalJson
 */
export function sha256Hex(text: string): string {
  return bytesToHex(sha256(utf8Bytes(text)));
}
