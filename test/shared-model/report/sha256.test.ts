/**
 * SHA-256 against the FIPS 180-2 example vectors and against Node's own implementation (OpenSSL) as an
 * independent general-purpose reference, across the padding boundaries and non-ASCII text.
 */
import { createHash } from 'node:crypto';
import { describe, expect, it } from 'vitest';
import { sha256Hex, utf8Bytes } from '../../../shared-model/report/sha256.ts';

const reference = (data: Uint8Array | string): string => createHash('sha256').update(data).digest('hex');

describe('sha256Hex', () => {
  it('hashes "abc" as in the one-block example', () => {
    expect(sha256Hex('abc')).toBe('ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad'); // FIPS 180-2 Appendix B.1
  });

  it('hashes the 448-bit two-block example', () => {
    const message = 'abcdbcdecdefdefgefghfghighijhijkijkljklmklmnlmnomnopnopq';
    expect(sha256Hex(message)).toBe('248d6a61d20638b8e5c026930c3e6039a33ce45964ff2167f6ecedd419db06c1'); // FIPS 180-2 Appendix B.2
  });

  it('hashes one million repetitions of "a"', () => {
    expect(sha256Hex('a'.repeat(1_000_000))).toBe('cdc76e5c9914fb9281a1c7e284d73e67f1809a48a497200e046d39ccc7112cd0'); // FIPS 180-2 Appendix B.3
  });

  it('hashes the empty message', () => {
    expect(sha256Hex('')).toBe(reference('')); // Node crypto (OpenSSL) as the independent reference
    expect(sha256Hex('')).toBe('e3b0c44298fc1c149afbf4c8996fb92427ae41e4649b934ca495991b7852b855'); // NIST CSRC SHA-256 empty-string example [from memory]
  });

  it('agrees with Node crypto at every length around the 55/56/64-byte padding boundaries', () => {
    for (let n = 0; n <= 130; n++) {
      const bytes = Uint8Array.from({ length: n }, (_, i) => (i * 37 + n * 11) & 0xff);
      expect(sha256Hex(bytes), `length ${n}`).toBe(reference(bytes)); // Node crypto (OpenSSL) reference
    }
  });

  it('hashes text as its UTF-8 bytes, astral characters and lone surrogates included', () => {
    const texts = ['Ω µH °C — 4µ7', '\u{1F50C} plug', 'a\uD800b', 'x\uDC00', '\u0000\u007f\u0080\u07ff\u0800\uffff'];
    for (const text of texts) {
      expect(Array.from(utf8Bytes(text)), text).toEqual(Array.from(new TextEncoder().encode(text))); // WHATWG TextEncoder (RFC 3629, U+FFFD for lone surrogates)
      expect(sha256Hex(text), text).toBe(reference(new TextEncoder().encode(text))); // Node crypto reference
    }
  });
});
