import { describe, expect, it } from 'vitest';
import { firstInvalidUtf8, lineOfByte } from '../../../src-main/files/utf8.ts';

const bytes = (...values: number[]): Uint8Array => Uint8Array.from(values);

describe('firstInvalidUtf8()', () => {
  it('accepts what TextEncoder writes, from ASCII to four-byte characters', () => {
    expect(firstInvalidUtf8(new TextEncoder().encode('ASCII, µH, Ω, 温度, 🔥, \u{10FFFF}'))).toBe(-1); // WHATWG Encoding: TextEncoder emits UTF-8
  });

  it('agrees with the strict decoder on every two-byte sequence', () => {
    const strict = new TextDecoder('utf-8', { fatal: true }); // WHATWG Encoding Standard UTF-8 decoder as the reference
    for (let a = 0; a < 256; a += 1) {
      for (let b = 0; b < 256; b += 5) {
        const input = bytes(a, b);
        let valid = true;
        try {
          strict.decode(input);
        } catch {
          valid = false;
        }
        expect(firstInvalidUtf8(input) === -1, `${a.toString(16)} ${b.toString(16)}`).toBe(valid);
      }
    }
  });

  it('refuses overlong forms, surrogates, values above U+10FFFF and cut sequences (Unicode §3.9 Table 3-7)', () => {
    expect(firstInvalidUtf8(bytes(0x41, 0xc0, 0x80))).toBe(1); // overlong NUL
    expect(firstInvalidUtf8(bytes(0xe0, 0x80, 0x80))).toBe(0); // overlong three-byte form
    expect(firstInvalidUtf8(bytes(0xed, 0xa0, 0x80))).toBe(0); // U+D800, a surrogate
    expect(firstInvalidUtf8(bytes(0xf4, 0x90, 0x80, 0x80))).toBe(0); // U+110000
    expect(firstInvalidUtf8(bytes(0x41, 0x42, 0xe2, 0x82))).toBe(2); // cut short at the end
  });

  it('counts lines at LF', () => {
    expect(lineOfByte(new TextEncoder().encode('a\nb\nc'), 4)).toBe(3);
  });
});
