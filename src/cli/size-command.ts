/** `sigma-ledger size FILE --requirement ID --vary SENSOR.ROW`: the largest allowable value of one row. */
import { sizeSource, type SizableInput, type SizingResult } from '../budget/sizing';
import { InputError } from '../errors';
import { formatSignificant } from '../units';
import { EXIT, type Io } from './commands';
import { JSON_OPTION, textOption, UsageError, type CliCommand } from './cli-command';
import { loadAnyBudget, reportProblems, withDocumentPaths, withInertialDocumentPaths } from './load-budget';
import { positiveOption } from './number-options';
import { checkSizingTarget } from './sizing-target';
import { sizeSweepCommand } from './size-sweep';
import { parseShard, SHARD_HELP } from './shard-option';
import { formatToTolerance } from '../report/tolerance-text';

/** Runs `size`; returns the exit code (1 when the requirement fails even with the row at zero). @throws SigmaLedgerError for bad input. */
export function sizeCommand(file: string, requirementId: string, rowId: string, tolerance: number, json: boolean, io: Io): number {
  const loaded = loadAnyBudget(file, { contributions: false, report: false });
  if (reportProblems(loaded, io)) return EXIT.badInput;
  const size = (input: SizableInput) => {
    checkSizingTarget(input, rowId, requirementId);
    return sizeSource(input, requirementId, rowId, {
      relativeTolerance: tolerance,
      onTrial: (n, value, verdict) => io.err(`trial ${n}: ${rowId} = ${formatSignificant(value, 6)} -> ${verdict}\n`),
    });
  };
  const result = loaded.model === 'inertial' ? withInertialDocumentPaths(loaded, size) : withDocumentPaths(loaded, size);
  io.out(json ? JSON.stringify(result) + '\n' : formatSizing(result));
  return result.outcome === 'never-passes' ? EXIT.fail : EXIT.pass;
}

function relativeTolerance(text: string | undefined): number {
  const v = positiveOption({ tolerance: text }, 'tolerance', 1e-3);
  if (v >= 0.5) throw new InputError('--tolerance', `is a relative width and must be below 0.5 (e.g. 0.001), got "${text}"`);
  return v;
}

function formatSizing(r: SizingResult): string {
  const at = (x: SizingResult['atLargestPassing']) => (x ? `${formatSignificant(x.worstValue, 5)} ${x.limit.unit} (limit ${x.limit.value} ${x.limit.unit})` : 'n/a');
  switch (r.outcome) {
    case 'never-passes':
      return `${r.requirementId} fails even with ${r.sourceId} = 0 ${r.unit}: worst ${at(r.atSmallestFailing)}. Other sources must improve first.\n`;
    case 'always-passes':
      return `${r.requirementId} holds for every ${r.sourceId} tried, up to ${formatSignificant(r.largestPassing, 6)} ${r.unit} (${r.stoppedBecause}).\n`;
    default: {
      const pass = formatToTolerance(r.largestPassing, r.tolerance), fail = formatToTolerance(r.smallestFailing!, r.tolerance);
      return [
        `largest ${r.sourceId} meeting ${r.requirementId}: ${pass.value} ${r.unit} (± ${pass.tolerance} ${r.unit}, ${r.trials} runs)`,
        `  at ${pass.value} ${r.unit}: worst ${at(r.atLargestPassing)}`,
        `  at ${fail.value} ${r.unit}: worst ${at(r.atSmallestFailing)}`,
        '',
      ].join('\n');
    }
  }
}

export const SIZE_COMMAND: CliCommand = {
  operands: ['FILE'],
  synopsis: '--requirement ID --vary SENSOR.ROW [--tolerance REL] [--json]\n      | --vary SENSOR.ROW --sweep FROM:TO:N [--requirement ID] [--shard I/N [--output PART]]',
  description: "the largest value of one row's magnitude that still meets a requirement,\nby bisection; each trial is reported on stderr",
  options: {
    requirement: { type: 'string', value: 'ID', help: 'the requirement to meet' },
    vary: { type: 'string', value: 'SENSOR.ROW', help: 'the row whose magnitude is sized, e.g. gyro.arw' },
    tolerance: { type: 'string', value: 'REL', help: 'relative width of the answer (default 0.001)' },
    sweep: { type: 'string', value: 'FROM:TO:N', help: "instead of sizing, print each requirement's worst value at N values of the row as CSV" },
    shard: { type: 'string', value: 'I/N', help: `with --sweep: ${SHARD_HELP}` },
    output: { type: 'string', value: 'OUT', help: 'with --shard: the part file to write (default sweep-part-I-of-N.json)' },
    ...JSON_OPTION,
  },
  run: ([file], values, io) => {
    const requirement = textOption(values, 'requirement');
    const vary = textOption(values, 'vary');
    const sweep = textOption(values, 'sweep');
    const shardText = textOption(values, 'shard');
    if (shardText !== undefined && sweep === undefined) throw new UsageError('size --shard splits a sweep: give --sweep FROM:TO:N too');
    const sharded = shardText === undefined ? undefined : { shard: parseShard(shardText, process.env), output: textOption(values, 'output') };
    if (sweep !== undefined && vary) return sizeSweepCommand(file, vary, requirement, sweep, io, sharded);
    if (!requirement || !vary) throw new UsageError('size needs --requirement ID and --vary SENSOR.ROW');
    return sizeCommand(file, requirement, vary, relativeTolerance(textOption(values, 'tolerance')), values.json === true, io);
  },
};
