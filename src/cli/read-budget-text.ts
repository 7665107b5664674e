/**
 * A budget file's text, read safely: the size is checked before anything is
 * read (a 600 MB file is refused as too large, not parsed), and bytes that
 * are not UTF-8 are refused with the offset of the first bad byte instead
 * of being replaced silently by U+FFFD.
 */
import { readFileSync, statSync } from 'node:fs';
import { MAX_TEXT_CHARS } from '../document';
import { InputError } from '../errors';
import { firstInvalidUtf8Byte, invalidUtf8Message } from '../document/invalid-utf8';

/** Largest file read, in bytes: UTF-8 takes at most 4 bytes per character, so no file within the character limit is refused here. */
export const MAX_FILE_BYTES = 4 * MAX_TEXT_CHARS;

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
  const bad = firstInvalidUtf8Byte(bytes, text);
  if (bad >= 0) throw new InputError(fileName, invalidUtf8Message(bytes, bad));
  return text;
}
