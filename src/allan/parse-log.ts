/**
 * Streaming parse of a CSV/TSV sensor log: text goes in as chunks of any size
 * (the CLI feeds a file stream; a browser feeds a File's text), numbers come
 * out as Float64Arrays, one per requested column, with the time column
 * converted to seconds and checked (time-axis.ts).
 *
 * Layout accepted: optional blank lines and '#' comment lines, then a header
 * line naming the columns, then one row per line; delimiter comma, tab,
 * semicolon or vertical bar (detected from the header unless given); "\n",
 * "\r\n" or "\r" line ends; quoted cells per RFC 4180. Blank and '#' lines
 * among the rows are skipped. Extra columns are ignored.
 *
 * Each chunk is cut after its last line end outside quotes (an even number
 * of '"' before it); the complete lines go to papaparse and the rest waits
 * for the next chunk, so memory stays linear in the rows kept.
 */
/// <reference path="./papaparse-core.d.ts" />
import Papa from 'papaparse/papaparse.js';
import { InputError } from '../errors';
import { unitFor } from '../units';
import { GrowableFloat64Array } from './growable-float64';
import { detectDelimiter, findColumn, readHeader } from './log-header';
import { countOf, lastRecordEnd, rowLineOffsets } from './line-cuts';
import { parseDecimal } from './parse-decimal';
import { RowLines } from './row-lines';
import { cutWantedCells } from './plain-line-cells';
import { checkTimeAxis, DEFAULT_GAP_TOLERANCE } from './time-axis';
import type { LogParseOptions, SensorLogTable } from './log-table';

export type { LogParseOptions, SensorLogTable } from './log-table';

/** Characters handed to papaparse at a time. */
const PIECE_CHARS = 1 << 16;

/** Longest line (or quoted stretch) accepted, in characters. */
export const MAX_LINE_CHARS = 1 << 20;

interface Layout {
  delimiter: string;
  names: string[];
  indices: number[];
  /** Per field up to the last wanted one: whether it is read. */
  wanted: boolean[];
}

/** Reads a log chunk by chunk; call {@link push} for each chunk, then {@link finish} once. */
export class SensorLogReader {
  private readonly source: string;
  private readonly timeFactorToSI: number;
  private carry = '';
  private started = false;
  private nextLine = 1;
  private headerLine = 0;
  private newline = '\n';
  private layout: Layout | undefined;
  private columnsFound: string[] = [];
  private readonly columns: GrowableFloat64Array[];
  private readonly lines = new RowLines();
  /** The wanted cells of the current plain line, by field index. */
  private readonly cells: string[] = [];
  private rows = 0;
  /** The time column asked for or found among the candidates. */
  private timeColumn: string | undefined;

  /** @throws InputError when the time unit is not a time, or no value column is asked for. */
  constructor(private readonly options: LogParseOptions) {
    this.source = options.sourceName ?? 'log';
    this.timeFactorToSI = unitFor(options.timeUnit ?? 's', 'time', 'timeUnit').factorToSI;
    if (options.valueColumns.length === 0) throw new InputError('valueColumns', 'name at least one value column');
    this.timeColumn = options.timeColumn;
    const timed = options.timeColumn !== undefined || (options.timeColumnCandidates?.length ?? 0) > 0;
    const wanted = options.valueColumns.length + (timed ? 1 : 0);
    this.columns = Array.from({ length: wanted }, () => new GrowableFloat64Array(1 << 16));
  }

  /**
   * Takes the next piece of the text (any length, cut anywhere).
   * @throws InputError naming the line (and column) of the first bad row.
   */
  push(chunk: string): void {
    let text = this.carry + (this.started ? chunk : chunk.replace(/^\uFEFF/, ''));
    this.started ||= chunk.length > 0;
    if (!this.layout) {
      const rest = this.readPreamble(text);
      if (rest === undefined) return this.checkCarry();
      text = rest;
    }
    const cut = lastRecordEnd(text, this.newline);
    if (!cut) {
      this.carry = text;
      this.checkCarry();
      return;
    }
    this.carry = text.slice(cut.next);
    this.parseInPieces(text.slice(0, cut.end));
    this.checkCarry();
  }

  /** Refuses a line that never ends (or a quote never closed) before it eats the memory and time of re-scanning it. */
  private checkCarry(): void {
    if (this.carry.length > MAX_LINE_CHARS) {
      throw new InputError(
        `${this.source} line ${this.nextLine}`,
        `a line runs over ${MAX_LINE_CHARS} characters without ending; look for an unclosed quote (") from this line on, or a file that is not a text log`,
      );
    }
  }

  /**
   * Ends the input and returns the table.
   * @throws InputError for an empty log, a log without data rows, too few
   *   rows, a bad last row, or a time column that is not monotonic and even.
   */
  finish(): SensorLogTable {
    if (!this.layout) {
      const rest = this.readPreamble(this.carry + '\n');
      if (rest === undefined || !this.layout) throw new InputError(`${this.source} line 1`, 'the log is empty: it needs a header line naming the columns, then one row per sample');
      this.carry = rest;
    }
    if (this.carry !== '') this.parseInPieces(this.carry.replace(/[\r\n]+$/, ''));
    this.carry = '';
    return this.table();
  }

  /** Skips blank and comment lines, reads the header; returns the text after it, or undefined when the header is not complete yet. */
  private readPreamble(text: string): string | undefined {
    for (;;) {
      const end = text.search(/[\r\n]/);
      // A '\r' at the very end may be the first half of '\r\n': wait for the next character.
      if (end < 0 || (end === text.length - 1 && text[end] === '\r')) {
        this.carry = text;
        return undefined;
      }
      const line = text.slice(0, end);
      const terminator = text.startsWith('\r\n', end) ? '\r\n' : text[end];
      text = text.slice(end + terminator.length);
      if (line.trim() === '' || line.trimStart().startsWith('#')) {
        this.nextLine++;
        continue;
      }
      this.newline = terminator;
      this.headerLine = this.nextLine++;
      this.setLayout(line);
      return text;
    }
  }

  private setLayout(headerText: string): void {
    const where = `${this.source} line ${this.headerLine} (header)`;
    const delimiter = this.options.delimiter ?? detectDelimiter(headerText);
    this.columnsFound = readHeader(headerText, delimiter, where);
    if (this.timeColumn === undefined && this.options.timeColumnCandidates?.length) this.timeColumn = this.findTimeColumn(where);
    const names = [...this.options.valueColumns, ...(this.timeColumn === undefined ? [] : [this.timeColumn])];
    const option = (name: string): string =>
      this.options.optionNames?.[name] ?? (name === this.timeColumn ? this.options.optionNames?.timeColumn ?? 'timeColumn' : 'valueColumns');
    const indices = names.map((n) => findColumn(this.columnsFound, n, where, option(n)));
    const wanted = Array.from({ length: Math.max(...indices) + 1 }, (_, i) => indices.includes(i));
    this.layout = { delimiter, names: indices.map((i) => this.columnsFound[i]), indices, wanted };
  }

  /** The first of the candidate names in the header (ignoring case). */
  private findTimeColumn(where: string): string {
    const candidates = this.options.timeColumnCandidates!;
    for (const name of candidates) {
      const found = this.columnsFound.find((c) => c.toLowerCase() === name.toLowerCase());
      if (found !== undefined) return found;
    }
    const option = this.options.optionNames?.timeColumn ?? 'timeColumn';
    throw new InputError(where, `no time column: none is called ${candidates.map((c) => `"${c}"`).join(', ')}; name it (${option}) or give the sample rate; the columns found are ${this.columnsFound.map((c) => `"${c}"`).join(', ')}`);
  }

  /**
   * Parses complete lines in pieces of about {@link PIECE_CHARS}: papaparse
   * makes an array and strings per row, and pieces this size let the garbage
   * collector free them young (measured: a quarter faster than 1 MiB pieces).
   * Text with quotes is parsed whole, as a quoted cell may hold line ends.
   */
  private parseInPieces(segment: string): void {
    if (segment.indexOf('"') < 0) return this.readPlainLines(segment);
    if (segment.length <= PIECE_CHARS) return this.parseLines(segment);
    for (let start = 0; ; ) {
      const found = segment.indexOf(this.newline, start + PIECE_CHARS);
      const end = found < 0 ? segment.length : found;
      this.parseLines(segment.slice(start, end));
      if (found < 0) return;
      start = end + this.newline.length;
    }
  }

  /**
   * Complete lines without a quote anywhere: each line is one row, so the
   * cells are cut at the delimiter directly and only the wanted ones are
   * read. Hand-written because papaparse builds an array and a string per
   * cell of every row, and collecting them was a third of the parse time of
   * a 10-million-row log (measured with --cpu-prof); quoted text still goes
   * to papaparse. The rows, messages and line numbers are the same.
   */
  private readPlainLines(segment: string): void {
    const nl = this.newline;
    let line = this.nextLine;
    for (let start = 0; ; line++) {
      const end = segment.indexOf(nl, start);
      this.takeLine(end < 0 ? segment.slice(start) : segment.slice(start, end), line);
      if (end < 0) break;
      start = end + nl.length;
    }
    this.nextLine = line + 1;
  }

  private takeLine(text: string, line: number): void {
    const layout = this.layout!;
    const fields = cutWantedCells(text, layout.delimiter, layout.wanted, this.cells);
    if (fields < 0) return;
    for (let k = 0; k < layout.indices.length; k++) {
      const at = layout.indices[k];
      if (at >= fields) throw this.missingField(layout.names[k], at, fields, line);
      this.takeCell(this.cells[at], layout.names[k], k, line);
    }
    this.lines.record(this.rows++, line);
  }

  /** Parses complete lines (no trailing line end). */
  private parseLines(segment: string): void {
    if (segment === '') {
      this.nextLine++;
      return;
    }
    const layout = this.layout!;
    const parsed = Papa.parse(segment, { delimiter: layout.delimiter, newline: this.newline, header: false });
    const lineCount = countOf(segment, this.newline) + 1;
    const lineOfRow = rowLineOffsets(parsed.data, lineCount, this.newline);
    const quoteError = parsed.errors.find((e) => e.type === 'Quotes');
    if (quoteError) {
      const line = this.nextLine + (lineOfRow(quoteError.row ?? 0) ?? 0);
      throw new InputError(`${this.source} line ${line}`, `${quoteError.message}; check the quotes on this line`);
    }
    parsed.data.forEach((row, r) => this.takeRow(row, this.nextLine + lineOfRow(r)));
    this.nextLine += lineCount;
  }

  private takeRow(row: string[], line: number): void {
    // Only rows starting with '#', a space or nothing can be comments or blank: test cheaply first.
    const c0 = row[0].charCodeAt(0);
    if (c0 === 35 || !(c0 > 32)) {
      if ((row.length === 1 && row[0].trim() === '') || row[0].trimStart().startsWith('#')) return;
    }
    const layout = this.layout!;
    for (let k = 0; k < layout.indices.length; k++) {
      const cell = row[layout.indices[k]];
      if (cell === undefined) throw this.missingField(layout.names[k], layout.indices[k], row.length, line);
      this.takeCell(cell, layout.names[k], k, line);
    }
    this.lines.record(this.rows++, line);
  }

  private missingField(name: string, index: number, fields: number, line: number): InputError {
    return new InputError(
      `${this.source} line ${line}`,
      `the row has ${fields} field${fields === 1 ? '' : 's'} but column "${name}" is field ${index + 1}; fill in the missing value or check the delimiter`,
    );
  }

  private takeCell(cell: string, name: string, k: number, line: number): void {
    const value = parseDecimal(cell);
    if (Number.isNaN(value)) {
      throw new InputError(`${this.source} line ${line}, column "${name}"`, `${JSON.stringify(cell.trim())} is not a number; write a decimal number such as 0.0125 or 1.25e-2`);
    }
    this.columns[k].push(value);
  }

  private table(): SensorLogTable {
    const minimum = this.options.minimumRows ?? 4;
    if (this.rows < minimum) {
      throw new InputError(`${this.source} line ${this.nextLine - 1}`, `the log has ${this.rows} data row${this.rows === 1 ? '' : 's'}; at least ${minimum} are needed: record a longer log`);
    }
    const arrays = this.columns.map((c) => c.toFloat64Array());
    const values = arrays.slice(0, this.options.valueColumns.length);
    if (this.timeColumn === undefined) return { columnsFound: this.columnsFound, values, rowCount: this.rows, headerLine: this.headerLine };
    const timeS = arrays[arrays.length - 1];
    if (this.timeFactorToSI !== 1) for (let i = 0; i < timeS.length; i++) timeS[i] *= this.timeFactorToSI;
    const timeName = this.layout!.names[this.layout!.names.length - 1];
    const axis = checkTimeAxis(timeS, this.lines, this.source, timeName, this.options.gapTolerance ?? DEFAULT_GAP_TOLERANCE);
    return { columnsFound: this.columnsFound, values, timeColumn: timeName, timeS, rateHz: axis.rateHz, rowCount: this.rows, headerLine: this.headerLine };
  }
}

/**
 * Parses a whole log held in one string (tests, small files, a browser File's text).
 * @throws InputError as {@link SensorLogReader.push} and {@link SensorLogReader.finish}.
 */
export function parseSensorLog(text: string, options: LogParseOptions): SensorLogTable {
  const reader = new SensorLogReader(options);
  reader.push(text);
  return reader.finish();
}
