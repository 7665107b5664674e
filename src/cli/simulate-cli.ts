/** `simulate` and `merge` in the command table: their options and help (simulate-command.ts, merge-command.ts). */
import { simulateCommand, simulateOptionsFromArgs } from './simulate-command';
import { mergeCommand } from './merge-command';
import { EVERY_OPTION, JSON_OPTION, OUTPUT_OPTION, textOption, type CliCommand, type CliOption } from './cli-command';
import { positiveOption } from './number-options';
import { SHARD_HELP } from './shard-option';

const OUTPUT_OPTIONS: Record<string, CliOption> = { ...JSON_OPTION, ...EVERY_OPTION, ...OUTPUT_OPTION };

export const SIMULATE_COMMAND: CliCommand = {
  operands: ['FILE'],
  synopsis: '--runs N [--seed S] [--workers N] [--shard I/N|auto/N] [--json] [--every N] [--output OUT]',
  description: [
    'Monte Carlo check of the linearised budget: N seeded runs of the truth and an',
    'extended Kalman filter, RMS error beside the predicted sigma, NEES with 95 % bounds;',
    '--shard writes a part file for `merge` (auto/N reads JOB_COMPLETION_INDEX or SLURM_ARRAY_TASK_ID)',
  ].join('\n'),
  options: {
    runs: { type: 'string', value: 'N', help: 'number of runs' },
    seed: { type: 'string', value: 'S', help: 'the study seed (default 1); run i replays from (S, i) alone' },
    workers: { type: 'string', value: 'N', help: 'worker threads (default: the number of cores)' },
    shard: { type: 'string', value: 'I/N', help: SHARD_HELP },
    ...OUTPUT_OPTIONS,
  },
  run: ([file], values, io) => simulateCommand(simulateOptionsFromArgs(file, values, process.env), io),
};

export const MERGE_COMMAND: CliCommand = {
  operands: [],
  variadic: 'PARTS...',
  synopsis: 'PARTS... [--json] [--every N] [--output OUT]',
  description: 'combines the part files of a sharded simulate (or size --sweep) into exactly the one-machine result',
  options: OUTPUT_OPTIONS,
  run: (parts, values, io) => mergeCommand([...parts], { json: values.json === true, every: positiveOption(values, 'every', 1), output: textOption(values, 'output') }, io),
};
