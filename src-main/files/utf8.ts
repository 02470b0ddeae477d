/**
 * Where a byte sequence stops being UTF-8, so a refusal can name the line instead of only saying "not
 * UTF-8". Follows the well-formed byte sequences of the Unicode Standard §3.9, Table 3-7 (no overlong
 * forms, no surrogates, nothing above U+10FFFF).
 */

/** Offset of the first byte that starts an ill-formed sequence, or -1 when all of it is UTF-8. */
export function firstInvalidUtf8(bytes: Uint8Array): number {
  let i = 0;
  while (i < bytes.length) {
    const b = bytes[i] as number;
    if (b < 0x80) {
      i += 1;
      continue;
    }
    let length: number;
    let low = 0x80;
    let high = 0xbf;
    if (b >= 0xc2 && b <= 0xdf) length = 2;
    else if (b >= 0xe0 && b <= 0xef) {
      length = 3;
      if (b === 0xe0) low = 0xa0;
      if (b === 0xed) high = 0x9f;
    } else if (b >= 0xf0 && b <= 0xf4) {
      length = 4;
      if (b === 0xf0) low = 0x90;
      if (b === 0xf4) high = 0x8f;
    } else return i;
    for (let k = 1; k < length; k += 1) {
      const c = bytes[i + k];
      if (c === undefined || c < (k === 1 ? low : 0x80) || c > (k === 1 ? high : 0xbf)) return i;
    }
    i += length;
  }
  return -1;
}

/** 1-based line of a byte offset (lines end at LF). */
export function lineOfByte(bytes: Uint8Array, offset: number): number {
  let line = 1;
  for (let i = 0; i < offset && i < bytes.length; i += 1) if (bytes[i] === 0x0a) line += 1;
  return line;
}
