/**
 * What one command of `sigma-ledger` declares: its usage text, its operands
 * and every option it takes, in one table that main.ts checks the command
 * line against (an option from another command is refused, a near miss gets
 * "did you mean"). Register a command with one line in command-table.ts.
 */
import { SigmaLedgerError } from '../errors';
import type { Io } from './commands';

/** One option, in node:util parseArgs form, with the words `--help` shows for it. */
export interface CliOption {
  readonly type: 'string' | 'boolean';
  readonly default?: string | boolean;
  /** Placeholder of the value in help, e.g. `N` or `FILE` (string options). */
  readonly value?: string;
  /** One line for the command's option list. */
  readonly help?: string;
}

/** Option values as node:util parseArgs returns them. */
export type ParsedValues = Readonly<Record<string, string | boolean | undefined>>;

/** A command: what it takes, and the function that runs it. */
export interface CliCommand {
  /** Names of its operands in order, e.g. ['FILE']; a budget operand may be `-` for standard input. */
  readonly operands: readonly string[];
  /** Set when the command takes any number (at least one) of further operands, e.g. `PARTS...`: their name for help. */
  readonly variadic?: string;
  /** The options after the operands, e.g. `[--json] [--every N]`, for the usage line. */
  readonly synopsis: string;
  /** What it does, a few lines for `sigma-ledger COMMAND --help`. */
  readonly description: string;
  readonly options: Readonly<Record<string, CliOption>>;
  /** Runs it; returns the exit code. Throws SigmaLedgerError for bad input (main prints it and exits 2). */
  run(operands: readonly string[], values: ParsedValues, io: Io): number | Promise<number>;
}

/** `--json`, shared by the commands that can print JSON. */
export const JSON_OPTION = { json: { type: 'boolean', default: false, help: 'print the result as JSON' } } as const;

/** `--every N`, shared by the commands whose JSON has series over the mission's steps. */
export const EVERY_OPTION = {
  every: { type: 'string', value: 'N', help: 'keep every N-th step (and the last) in the --json series' },
} as const;

/** `--output OUT`, shared by the commands that write their result through writePieces (commands.ts). */
export const OUTPUT_OPTION = {
  output: { type: 'string', value: 'OUT', help: 'write to the file OUT instead of standard output' },
} as const;

/** Reads a string option. */
export function textOption(values: ParsedValues, key: string): string | undefined {
  const v = values[key];
  return typeof v === 'string' ? v : undefined;
}

/** A command line that does not fit the command: main prints the message and where to find the command's usage. */
export class UsageError extends SigmaLedgerError {
  constructor(message: string) {
    super('', message);
    this.name = 'UsageError';
  }
}

/** Options in parseArgs form with their help words added (for a command file that declares bare parseArgs options). */
export function withHelp(
  options: Readonly<Record<string, CliOption>>,
  help: Readonly<Record<string, Pick<CliOption, 'value' | 'help'>>>,
): Record<string, CliOption> {
  return Object.fromEntries(Object.entries(options).map(([name, o]) => [name, { ...o, ...help[name] }]));
}
