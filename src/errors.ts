/**
 * The one family of errors the engine throws. The CLI and the UI catch
 * {@link SigmaLedgerError} in one place and show `message`; nothing else the
 * engine throws is meant for a user.
 *
 * Numerical conditions (a covariance that lost positive definiteness) are not
 * errors: they come back as a status in the results.
 */
export class SigmaLedgerError extends Error {
  /** Where the problem is, as a path into the input (`sensors[2].sources[1].value`), or '' when global. */
  readonly path: string;

  constructor(path: string, message: string) {
    super(path ? `${path}: ${message}` : message);
    this.name = 'SigmaLedgerError';
    this.path = path;
  }
}

/**
 * A value the user gave is invalid: wrong unit, out of range, missing.
 * The message says what would be valid.
 */
export class InputError extends SigmaLedgerError {
  constructor(path: string, message: string) {
    super(path, message);
    this.name = 'InputError';
  }
}

/** Joins path parts the way messages print them: `a.b[2].c`. */
export function joinPath(base: string, key: string | number): string {
  if (typeof key === 'number') return `${base}[${key}]`;
  return base ? `${base}.${key}` : key;
}
