/**
 * What every command shares: exit codes, the output streams, turning an
 * input error into one line on stderr, and writing output to stdout or a file piece by piece. Each command is in
 * its own file (run-command.ts, size-command.ts, ...), listed in command-table.ts.
 */
import { closeSync, openSync, writeSync } from 'node:fs';
import { InputError, SigmaLedgerError } from '../errors';
import { EXIT } from './exit-codes';
import { escapeTerminalText } from './terminal-text';

export { EXIT } from './exit-codes';

/**
 * Runs a command body, turning a {@link SigmaLedgerError} into one line on
 * stderr and exit code 2 (for commands called directly, not through main).
 */
export async function exitOnInputError(io: Io, run: () => Promise<number>): Promise<number> {
  try {
    return await run();
  } catch (e) {
    if (e instanceof SigmaLedgerError) {
      io.err(`error: ${e.message}\n`);
      return EXIT.badInput;
    }
    throw e;
  }
}

/** Output streams, injectable for tests. */
export interface Io {
  out: (text: string) => void;
  err: (text: string) => void;
}

/** Characters written between pauses, so that a closed pipe (`| head`) is noticed while writing. */
const PAUSE_EVERY_CHARS = 1 << 20;

/**
 * Writes text pieces to `io.out`, or to the file `output` when given, one by
 * one (never joined into one string).
 * @throws InputError naming `--output` when the file cannot be written.
 */
export async function writePieces(pieces: Iterable<string>, io: Io, output?: string): Promise<void> {
  const fd = output === undefined ? undefined : openOutput(output);
  const write = fd === undefined ? io.out : (text: string) => writeSync(fd, escapeTerminalText(text));
  try {
    let sincePause = 0;
    for (const piece of pieces) {
      write(piece);
      sincePause += piece.length;
      if (sincePause > PAUSE_EVERY_CHARS) {
        sincePause = 0;
        await new Promise((resolve) => setImmediate(resolve));
      }
    }
  } finally {
    if (fd !== undefined) closeSync(fd);
  }
}

function openOutput(path: string): number {
  try {
    return openSync(path, 'w');
  } catch (e) {
    throw new InputError('--output', `cannot write ${path} (${(e as NodeJS.ErrnoException).code ?? 'error'}): check that its folder exists and is writable`);
  }
}
