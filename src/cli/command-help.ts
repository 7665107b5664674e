/** The help texts of `sigma-ledger`: the command list, and one command's usage and options. */
import { CAUTION } from '../report/caution';
import type { CliCommand } from './cli-command';
import { COMMANDS } from './command-table';

/** Exit codes as the help and the README describe them. */
export const EXIT_CODES_TEXT = 'exit codes: 0 every requirement holds, 1 some requirement fails, 2 bad input,\n  3 internal error (a fault of sigma-ledger; add --debug for the stack trace)';

/** `sigma-ledger help`: every command with its summary. */
export function mainHelp(): string {
  const width = Math.max(...COMMANDS.map((c) => c.name.length));
  return [
    'sigma-ledger: sensor error budgets by covariance analysis',
    '',
    'usage: sigma-ledger COMMAND FILE [options]   (FILE "-" reads the budget from standard input)',
    '       sigma-ledger COMMAND --help           (the command\'s options)',
    '       sigma-ledger --version',
    '',
    'commands:',
    ...COMMANDS.map((c) => `  ${c.name.padEnd(width)}  ${c.summary}`),
    '',
    EXIT_CODES_TEXT,
    '',
    CAUTION,
    '',
  ].join('\n');
}

/** `sigma-ledger COMMAND --help`: its usage line, description and options. */
export function commandHelp(name: string, command: CliCommand): string {
  const rows = Object.entries(command.options).map(([key, o]) => [`--${key}${o.value ? ` ${o.value}` : ''}`, o.help ?? '']);
  const width = Math.max(0, ...rows.map(([flag]) => flag.length));
  return [
    `usage: sigma-ledger ${name} ${command.operands.join(' ')} ${command.synopsis}`.trimEnd(),
    ...command.description.split('\n').map((line) => `  ${line}`),
    '',
    ...(rows.length ? ['options:', ...rows.map(([flag, help]) => `  ${flag.padEnd(width)}  ${help}`.trimEnd())] : ['no options']),
    '',
  ].join('\n');
}

/** The command's options as a list for messages: `--json, --every N, ...`. */
export function optionList(command: CliCommand): string {
  const names = Object.entries(command.options).map(([key, o]) => `--${key}${o.value ? ` ${o.value}` : ''}`);
  return names.length ? names.join(', ') : 'none';
}
