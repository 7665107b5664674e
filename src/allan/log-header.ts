/**
 * The header line of a sensor log: which delimiter the file uses and where
 * the requested columns are.
 */
/// <reference path="./papaparse-core.d.ts" />
import Papa from 'papaparse/papaparse.js';
import { InputError } from '../errors';

/** Delimiters recognised when none is given, in order of preference on a tie. */
export const DELIMITER_CANDIDATES: readonly string[] = [',', '\t', ';', '|'];

/**
 * The delimiter of a header line: the candidate (comma, tab, semicolon,
 * vertical bar) that occurs most often in it; a comma when none occurs (a
 * one-column log). Throws nothing.
 */
export function detectDelimiter(headerLine: string): string {
  let best = ',', bestCount = 0;
  for (const d of DELIMITER_CANDIDATES) {
    const count = headerLine.split(d).length - 1;
    if (count > bestCount) {
      best = d;
      bestCount = count;
    }
  }
  return best;
}

/**
 * The column names of a header line, trimmed, parsed with papaparse so that
 * quoted names may hold the delimiter.
 * @throws InputError naming the line when the quotes are broken.
 */
export function readHeader(headerLine: string, delimiter: string, where: string): string[] {
  const parsed = Papa.parse(headerLine, { delimiter, header: false });
  if (parsed.errors.length > 0) throw new InputError(where, `the header cannot be read (${parsed.errors[0].message}); check its quotes`);
  return (parsed.data[0] ?? []).map((name) => name.trim());
}

/**
 * The index of the column called `name`: an exact match, else the only
 * match ignoring case.
 * @param option the command-line option or field that named it, for the message.
 * @throws InputError listing the columns found when there is no match, or
 *   naming the positions when several columns match.
 */
export function findColumn(columns: readonly string[], name: string, where: string, option: string): number {
  const exact = columns.flatMap((c, i) => (c === name ? [i] : []));
  const loose = exact.length > 0 ? exact : columns.flatMap((c, i) => (c.toLowerCase() === name.trim().toLowerCase() ? [i] : []));
  if (loose.length === 1) return loose[0];
  const found = columns.map((c) => `"${c}"`).join(', ');
  if (loose.length > 1) {
    throw new InputError(where, `${loose.length} columns are called "${name}" (fields ${loose.map((i) => i + 1).join(' and ')}); rename one so that ${option} can pick it`);
  }
  throw new InputError(where, `there is no column "${name}" (named by ${option}); the columns found are ${found || 'none'}`);
}
