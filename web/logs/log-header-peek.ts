/**
 * Finds the header line of a log from the start of its text, by the rules of
 * the streaming parser (src/allan/parse-log.ts): blank lines and lines
 * starting with '#' come first, then one line naming the columns. The page
 * shows these names so the user picks columns that exist.
 */
import { InputError } from '../../src';
import { MAX_LINE_CHARS } from '../../src';
import { detectDelimiter, readHeader } from '../../src';
import type { LogHeader } from './log-protocol';
import { readBlobStart } from './read-log-blob';

/** Bytes read to find the header: comment lines plus one header line of the longest accepted length (UTF-8 up to 3 bytes a character). */
export const HEADER_PEEK_BYTES = 4 * MAX_LINE_CHARS;

/**
 * The header of a log whose text starts with `start`.
 * @param name names the log in messages.
 * @param whole true when `start` is the whole file (its last line is then complete without a line end).
 * @throws InputError naming the line when there is no header line or its quotes are broken.
 */
export function headerFromText(start: string, name: string, sizeBytes: number, whole: boolean): LogHeader {
  const lines = start.replace(/^\uFEFF/, '').split(/\r\n|\n|\r/);
  const complete = whole ? lines : lines.slice(0, -1);
  const index = complete.findIndex((l) => l.trim() !== '' && !l.trimStart().startsWith('#'));
  if (index < 0) {
    throw new InputError(`${name} line 1`, 'no header line was found: the log needs a line naming the columns (e.g. "time,gyro_z"), then one row per sample');
  }
  const where = `${name} line ${index + 1} (header)`;
  const delimiter = detectDelimiter(complete[index]);
  const columns = readHeader(complete[index], delimiter, where);
  return { fileName: name, sizeBytes, columns, headerLine: index + 1, delimiter };
}

/**
 * Reads the header of a log file.
 * @throws InputError as {@link headerFromText}.
 */
export async function peekLogHeader(file: File): Promise<LogHeader> {
  return headerFromText(await readBlobStart(file, HEADER_PEEK_BYTES), file.name, file.size, file.size <= HEADER_PEEK_BYTES);
}
