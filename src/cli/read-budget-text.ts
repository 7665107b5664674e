/**
 * A budget file's text, read safely: the size is checked before anything is
 * read (a 600 MB file is refused as too large, not parsed), and bytes that
 * are not UTF-8 are refused with the offset of the first bad byte instead
 * of being replaced silently by U+FFFD.
 */
import { readFileSync, statSync } from 'node:fs';
import { MAX_TEXT_CHARS } from '../document';
import { InputError } from '../errors';

/** Largest file read, in bytes: UTF-8 takes at most 4 bytes per character, so no file within the character limit is refused here. */
export const MAX_FILE_BYTES = 4 * MAX_TEXT_CHARS;

/**
 * Offset of the first byte that is not part of valid UTF-8, or -1. Node's
 * lenient decoder replaces each bad sequence by U+FFFD; the first U+FFFD
 * that the bytes do not spell (EF BF BD) marks it. Throws nothing.
 */
export function firstInvalidUtf8Byte(bytes: Buffer, text: string): number {
  let offset = 0;
  for (const ch of text) {
    if (ch === '\uFFFD' && !(bytes[offset] === 0xef && bytes[offset + 1] === 0xbf && bytes[offset + 2] === 0xbd)) return offset;
    offset += Buffer.byteLength(ch, 'utf8');
  }
  return -1;
}

/**
 * Reads `fileName` as UTF-8 text.
 * @throws InputError naming the file when it is missing, not a file, too large or not UTF-8.
 */
export function readBudgetText(fileName: string): string {
  let size: number;
  try {
    const stat = statSync(fileName);
    if (!stat.isFile()) throw new InputError(fileName, 'is not a file (a folder?); give the path of a budget .json file');
    size = stat.size;
  } catch (e) {
    if (e instanceof InputError) throw e;
    throw new InputError(fileName, `cannot be read (${(e as NodeJS.ErrnoException).code ?? 'error'}): check the path`);
  }
  if (size > MAX_FILE_BYTES) {
    throw new InputError(fileName, `is too large: ${size} bytes; a budget file may have at most ${MAX_TEXT_CHARS} characters (split it or remove unused entries)`);
  }
  const bytes = readFileSync(fileName);
  const text = bytes.toString('utf8');
  const bad = text.includes('\uFFFD') ? firstInvalidUtf8Byte(bytes, text) : -1;
  if (bad >= 0) {
    throw new InputError(fileName, `is not valid UTF-8 text: byte offset ${bad} (0x${bytes[bad].toString(16).padStart(2, '0')}) starts no character; save the file as UTF-8`);
  }
  return text;
}
