/**
 * Messages between the page and the sensor-log worker (log-worker.ts). One
 * worker runs one job: read a log's header, or stream a whole log and
 * compute its Allan deviation or its calibration. The page never parses a
 * log itself, so a 10-million-row file cannot freeze it.
 */
import type { LogAllanResult } from '../../src';
import type { AllanSensorKind } from '../../src';
import type { CalibrationReport } from '../../src';

/** What the Allan job reads and how (column names as the header spells them). */
export interface AllanJobOptions {
  /** Header name of the value column. */
  valueColumn: string;
  /** Header name of the time column; absent when the log has none (then `rateHz` is needed). */
  timeColumn?: string;
  /** Unit of the time column (s, ms, min, h); default s. */
  timeUnit?: string;
  /** Sample rate in Hz, when there is no time column. */
  rateHz?: number;
  /** Unit of the value column: a rate (deg/s, m/s², m/s) or an increment per sample (deg, m/s, m). */
  unit: string;
  kind: AllanSensorKind;
}

/** What the calibration job reads: sensor output beside known truth, both in `unit`. */
export interface CalibrationJobOptions {
  measuredColumn: string;
  truthColumn: string;
  unit: string;
}

/** Page -> worker: the one job this worker runs. A File is cloned to the worker without copying its bytes. */
export type LogJob =
  | { type: 'header'; file: File }
  | { type: 'allan'; file: File; options: AllanJobOptions }
  | { type: 'calibration'; file: File; options: CalibrationJobOptions };

/** A log's header line, read from the start of the file. */
export interface LogHeader {
  fileName: string;
  sizeBytes: number;
  /** Column names, trimmed, in file order. */
  columns: string[];
  /** Line number (from 1) of the header. */
  headerLine: number;
  /** The delimiter found in the header (',', '\t', ';' or '|'). */
  delimiter: string;
}

/** How far a job has read. */
export interface LogProgress {
  /** Lines read so far (data rows plus the header and any comment lines). */
  linesRead: number;
  bytesRead: number;
  totalBytes: number;
}

/** The finished Allan job. */
export interface AllanOutcome {
  fileName: string;
  /** Data rows (samples) read. */
  samples: number;
  /** Sample rate in Hz (from the time column, or as given). */
  rateHz: number;
  /** Unit of the value column as picked. */
  unit: string;
  /** Wall time of reading and parsing the file, ms. */
  parseMs: number;
  /** Wall time of the Allan curve and its analysis, ms. */
  computeMs: number;
  result: LogAllanResult;
}

/** The finished calibration job. */
export interface CalibrationOutcome {
  fileName: string;
  samples: number;
  unit: string;
  parseMs: number;
  computeMs: number;
  report: CalibrationReport;
}

/** Worker -> page: progress while reading, then exactly one of the others. */
export type LogJobMessage =
  | { type: 'progress'; progress: LogProgress }
  | { type: 'header'; header: LogHeader }
  | { type: 'allan'; outcome: AllanOutcome }
  | { type: 'calibration'; outcome: CalibrationOutcome }
  | { type: 'error'; message: string };
