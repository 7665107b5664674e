/**
 * The command line: finds the command in command-table.ts, checks the
 * arguments against the options it declares, and runs it. `--help` and
 * `--version` answer without loading the engine.
 */
import { parseArgs } from 'node:util';
import { closest, distance } from 'fastest-levenshtein';
import { SigmaLedgerError } from '../errors';
import { EXIT, type Io } from './commands';
import { UsageError, type CliCommand, type CliOption } from './cli-command';
import { COMMANDS } from './command-table';
import { commandHelp, mainHelp, optionList } from './command-help';
import { packageVersion } from './package-version';
import { reportInternalError, wantsDebug, DEBUG_OPTION } from './internal-error';
import { escapeTerminalText } from './terminal-text';

/**
 * Runs the command line; returns the exit code ({@link EXIT}). Messages for
 * bad input go to `io.err`, never as a stack trace; an internal error exits 3
 * with a stack trace only under `--debug`. Every text printed is escaped for
 * the terminal (see terminal-text.ts).
 */
export async function main(argv: string[], rawIo: Io = processIo()): Promise<number> {
  const io: Io = { out: (t) => rawIo.out(escapeTerminalText(t)), err: (t) => rawIo.err(escapeTerminalText(t)) };
  const debug = wantsDebug(argv);
  const [first, ...rest] = argv.filter((a) => a !== DEBUG_OPTION);
  if (first === '--version' || first === '-V') {
    io.out(`sigma-ledger ${packageVersion()}\n`);
    return EXIT.pass;
  }
  if (first === undefined) {
    io.err(mainHelp());
    return EXIT.badInput;
  }
  if (first === '--help' || first === '-h' || (first === 'help' && rest.length === 0)) {
    io.out(mainHelp());
    return EXIT.pass;
  }
  const name = first === 'help' ? rest[0] : first;
  const entry = COMMANDS.find((c) => c.name === name);
  if (!entry) {
    const names = COMMANDS.map((c) => c.name);
    const hint = name.startsWith('-') ? '' : `; did you mean "${closest(name, names)}"?`;
    return usageError(io, `unknown command "${name}"${hint} (commands: ${names.join(', ')})`);
  }
  try {
    const command = await entry.load();
    if (first === 'help' || rest.includes('--help') || rest.includes('-h')) {
      io.out(commandHelp(entry.name, command));
      return EXIT.pass;
    }
    const { operands, values } = parseCommandLine(entry.name, command, rest);
    return await command.run(operands, values, io);
  } catch (e) {
    if (e instanceof UsageError) return usageError(io, e.message, entry.name);
    if (e instanceof SigmaLedgerError) {
      io.err(`error: ${e.message}\n`);
      return EXIT.badInput;
    }
    return reportInternalError(e, debug, io.err);
  }
}

/**
 * Checks `args` against the command's options and operands.
 * @throws UsageError for an option the command does not take (listing those it
 *   does, with "did you mean" for a near miss), a missing option value, or a
 *   wrong number of operands.
 */
export function parseCommandLine(name: string, command: CliCommand, args: string[]): { operands: string[]; values: Record<string, string | boolean | undefined> } {
  const options: Record<string, CliOption> = { ...command.options, help: { type: 'boolean' } };
  const loose = parseArgs({ args, options, allowPositionals: true, strict: false, tokens: true });
  for (const token of loose.tokens ?? []) {
    if (token.kind !== 'option' || token.name in options) continue;
    const known = Object.keys(command.options);
    const near = known.length ? closest(token.name, known) : undefined;
    const hint = near && isNear(token.name, near) ? `; did you mean --${near}?` : '';
    throw new UsageError(`${name} has no option ${token.rawName}${hint}\n${name} takes: ${optionList(command)}`);
  }
  let parsed;
  try {
    parsed = parseArgs({ args, options, allowPositionals: true, strict: true });
  } catch (e) {
    if (e instanceof TypeError && 'code' in e && String(e.code).startsWith('ERR_PARSE_ARGS')) throw new UsageError(e.message);
    throw e;
  }
  const operands = parsed.positionals;
  const wanted = command.operands;
  if (operands.length < wanted.length) throw new UsageError(`"${name}" needs ${wanted.length === 1 ? 'a file' : wanted.join(' ')}`);
  if (command.variadic && operands.length === wanted.length) throw new UsageError(`"${name}" needs ${command.variadic}`);
  if (!command.variadic && operands.length > wanted.length) throw new UsageError(`unexpected argument "${operands[wanted.length]}"`);
  return { operands, values: parsed.values };
}

/** True when `guess` is close enough to `typed` to suggest: one starts the other, or at most a third of its letters differ (Levenshtein distance). */
function isNear(typed: string, guess: string): boolean {
  return guess.startsWith(typed) || typed.startsWith(guess) || distance(typed, guess) <= Math.max(1, Math.floor(guess.length / 3));
}

function usageError(io: Io, message: string, command?: string): number {
  io.err(`error: ${message}\n(see sigma-ledger help${command ? ` ${command}` : ''})\n`);
  return EXIT.badInput;
}

function processIo(): Io {
  return { out: (t) => process.stdout.write(t), err: (t) => process.stderr.write(t) };
}
