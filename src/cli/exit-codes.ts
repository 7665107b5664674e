/**
 * The command line's exit codes, one meaning each, so a script can tell a
 * failed requirement from a bad file and from a fault of the tool itself.
 */
export const EXIT = {
  /** Every requirement holds (or the command succeeded). */
  pass: 0,
  /** Some requirement fails: the expected answer for a budget that does not close. */
  fail: 1,
  /** Bad input: a message on stderr names the file and the field. */
  badInput: 2,
  /** An internal error of Sigma Ledger (a bug): one line on stderr, the stack trace only with --debug. */
  internalError: 3,
} as const;
