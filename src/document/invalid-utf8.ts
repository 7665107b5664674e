/**
 * Where a file stops being UTF-8. Decoders replace a bad byte sequence by
 * U+FFFD silently; the first U+FFFD that the bytes do not spell (EF BF BD)
 * marks the first bad byte, so the message can name its offset.
 */

/** Bytes a code point takes in UTF-8. */
function utf8Length(codePoint: number): number {
  return codePoint < 0x80 ? 1 : codePoint < 0x800 ? 2 : codePoint < 0x10000 ? 3 : 4;
}

/**
 * Offset of the first byte of `bytes` that is not part of valid UTF-8, or -1,
 * given `text`, the bytes decoded leniently (bad sequences as U+FFFD). Throws nothing.
 */
export function firstInvalidUtf8Byte(bytes: Uint8Array, text: string): number {
  if (!text.includes('\uFFFD')) return -1;
  let offset = 0;
  for (const ch of text) {
    if (ch === '\uFFFD' && !(bytes[offset] === 0xef && bytes[offset + 1] === 0xbf && bytes[offset + 2] === 0xbd)) return offset;
    offset += utf8Length(ch.codePointAt(0)!);
  }
  return -1;
}

/** The message for a file that is not UTF-8, naming the offset and the byte. */
export function invalidUtf8Message(bytes: Uint8Array, offset: number): string {
  return `is not valid UTF-8 text: byte offset ${offset} (0x${bytes[offset].toString(16).padStart(2, '0')}) starts no character; save the file as UTF-8`;
}
