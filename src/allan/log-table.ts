/**
 * What the log parser is asked for and what it returns.
 */

/** What to read from a log. */
export interface LogParseOptions {
  /** Header names of the value columns wanted (matched exactly, else ignoring case). */
  readonly valueColumns: readonly string[];
  /** Header name of the time column, if any. */
  readonly timeColumn?: string;
  /**
   * Without `timeColumn`: names tried in order (ignoring case) for a time
   * column, e.g. ['time', 't', 'time_s']; the first found is used, and none
   * found is an error naming them. Leave out for a log without time stamps.
   */
  readonly timeColumnCandidates?: readonly string[];
  /** Unit of the time column (s, ms, µs, min, h); default 's'. */
  readonly timeUnit?: string;
  /** Delimiter; default detected from the header line. */
  readonly delimiter?: string;
  /** Names the log in messages; default 'log'. */
  readonly sourceName?: string;
  /** Fewest data rows accepted; default 4 (the least an Allan curve takes). */
  readonly minimumRows?: number;
  /** Relative tolerance of a time step; default 0.5 (see time-axis.ts). */
  readonly gapTolerance?: number;
  /** The option that named each column, for messages, e.g. { gyro_z: '--column' }; default 'valueColumns' or 'timeColumn'. */
  readonly optionNames?: Readonly<Record<string, string>>;
}

/** The numbers read from a log. */
export interface SensorLogTable {
  /** Every column name in the header, trimmed. */
  readonly columnsFound: readonly string[];
  /** One array per `valueColumns` entry, in the file's own unit. */
  readonly values: readonly Float64Array[];
  /** The time column's header name, when one was named or found. */
  readonly timeColumn?: string;
  /** Time of each row in s, when a time column was named. */
  readonly timeS?: Float64Array;
  /** Mean sample rate in Hz from the time column, when named. */
  readonly rateHz?: number;
  /** Number of data rows. */
  readonly rowCount: number;
  /** Line number (from 1) of the header. */
  readonly headerLine: number;
}
