/**
 * The provenance texts of rows written from logs, and the numbers they
 * carry: the file, the date of the fit (ISO yyyy-mm-dd, local calendar) and
 * the sample count come first, so every such row reads the same way.
 */
import { formatSignificant } from '../units';

/** Longest file name kept in a provenance text (the document allows 1000 characters in all). */
const MAX_NAME_CHARS = 120;

/** Significant digits of a value written into a cell: the fits are good to a few per cent at best. */
export const WRITTEN_DIGITS = 4;

/** `date` as yyyy-mm-dd in the local calendar. Throws nothing. */
export function isoDate(date: Date): string {
  const two = (n: number) => String(n).padStart(2, '0');
  return `${date.getFullYear()}-${two(date.getMonth() + 1)}-${two(date.getDate())}`;
}

/** A file name shortened for a provenance text. Throws nothing. */
export function shortName(fileName: string): string {
  return fileName.length <= MAX_NAME_CHARS ? fileName : `${fileName.slice(0, MAX_NAME_CHARS - 1)}…`;
}

/** `x` rounded to {@link WRITTEN_DIGITS} significant digits, as a number for a cell. Throws nothing for finite x. */
export function cellNumber(x: number): number {
  return Number(formatSignificant(x, WRITTEN_DIGITS));
}

/** A value with its unit for a text: 4 significant digits. */
export const valueText = (x: number, unit: string): string => `${formatSignificant(x, 4)} ${unit}`;

/** An uncertainty for a text: 2 significant digits. */
export const uncertaintyText = (x: number): string => formatSignificant(x, 2);

/** What a log the rows come from is: its name, the fit's date and its sample count. */
export interface LogSource {
  fileName: string;
  /** yyyy-mm-dd. */
  date: string;
  samples: number;
}

/** "fitted from FILE, DATE, N samples". */
export function fittedFrom(s: LogSource): string {
  return `fitted from ${shortName(s.fileName)}, ${s.date}, ${s.samples} samples`;
}

/** "calibrated from FILE, DATE, N samples". */
export function calibratedFrom(s: LogSource): string {
  return `calibrated from ${shortName(s.fileName)}, ${s.date}, ${s.samples} samples`;
}
