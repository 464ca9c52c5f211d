import { createHash, randomBytes } from 'node:crypto';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { canonicalJson } from '../../src/store/canonical';
import { sha256Hex, utf8Bytes } from '../../src/store/sha256';

describe('sha256Hex', () => {
  // The SHA-256 examples NIST publishes with FIPS 180-4 (Cryptographic Standards and Guidelines,
  // example values, https://csrc.nist.gov/CSRC/media/Projects/Cryptographic-Standards-and-Guidelines/documents/examples/SHA256.pdf:
  // one block "abc", two blocks "abcdbcdecdefdefgefghfghighijhijkijkljklmklmnlmnomnopnopq") and the
  // long message of FIPS 180-2 Appendix B.3 (one million "a"); the digests as listed with the empty
  // message beside the FIPS-180 vectors in php-src, ext/hash/tests/sha256.phpt.
  it('matches the published example vectors', () => {
    expect(sha256Hex('abc')).toBe('ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad');
    expect(sha256Hex('abcdbcdecdefdefgefghfghighijhijkijkljklmklmnlmnomnopnopq')).toBe(
      '248d6a61d20638b8e5c026930c3e6039a33ce45964ff2167f6ecedd419db06c1',
    );
    expect(sha256Hex('a'.repeat(1_000_000))).toBe('cdc76e5c9914fb9281a1c7e284d73e67f1809a48a497200e046d39ccc7112cd0');
    expect(sha256Hex('')).toBe('e3b0c44298fc1c149afbf4c8996fb92427ae41e4649b934ca495991b7852b855');
  });

  it('agrees with Node crypto on texts of every length around the block boundaries and on random Unicode', () => {
    for (let len = 0; len < 200; len++) {
      const s = randomBytes(len).toString('latin1');
      expect(sha256Hex(s)).toBe(createHash('sha256').update(s, 'utf8').digest('hex'));
    }
    fc.assert(
      fc.property(fc.string({ unit: 'grapheme', maxLength: 300 }), (s) => sha256Hex(s) === createHash('sha256').update(s, 'utf8').digest('hex')),
      { numRuns: 300 },
    );
  });

  it('encodes UTF-8 like TextEncoder, lone surrogates included', () => {
    for (const s of ['E° ⇌ Vanýsek', '😀 H₂', '\ud800x', 'x\udc00']) expect([...utf8Bytes(s)]).toEqual([...new TextEncoder().encode(s)]);
  });
});

describe('canonicalJson', () => {
  it('sorts keys, drops undefined, keeps array order, writes -0 as 0', () => {
    expect(canonicalJson({ b: 1, a: [true, 'x', null], c: undefined, d: -0 })).toBe('{"a":[true,"x",null],"b":1,"d":0}');
  });
  it('gives the same text for objects that differ only in key order', () => {
    fc.assert(
      fc.property(fc.dictionary(fc.string(), fc.oneof(fc.integer(), fc.string(), fc.boolean())), (o) => {
        const reversed = Object.fromEntries(Object.entries(o).reverse());
        return canonicalJson(o) === canonicalJson(reversed);
      }),
    );
  });
  it('refuses values JSON cannot hold', () => {
    expect(() => canonicalJson({ x: NaN })).toThrow(/NaN/);
    expect(() => canonicalJson({ x: Infinity })).toThrow();
    expect(() => canonicalJson(new Date(0))).toThrow(/plain objects/);
    expect(() => canonicalJson(() => 1)).toThrow(/function/);
  });
});
