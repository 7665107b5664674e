/** `sigma-ledger size FILE --requirement ID --vary SENSOR.ROW`: the largest allowable value of one row. */
import { sizeSource, type SizingResult } from '../budget/sizing';
import { InputError } from '../errors';
import type { BudgetInput } from '../inputs/budget-input';
import { formatSignificant } from '../units';
import { EXIT, type Io } from './commands';
import { JSON_OPTION, textOption, UsageError, type CliCommand } from './cli-command';
import { loadBudget, reportProblems, withDocumentPaths } from './load-budget';
import { positiveOption } from './number-options';

/** Runs `size`; returns the exit code (1 when the requirement fails even with the row at zero). @throws SigmaLedgerError for bad input. */
export function sizeCommand(file: string, requirementId: string, rowId: string, tolerance: number, json: boolean, io: Io): number {
  const loaded = loadBudget(file, { contributions: false, report: false });
  if (reportProblems(loaded, io)) return EXIT.badInput;
  const result = withDocumentPaths(loaded, (input) => {
    const [sensorId, ...rest] = rowId.split('.');
    if (!input.sensors.find((s) => s.id === sensorId)?.sources.some((r) => r.id === rest.join('.'))) {
      throw new InputError('--vary', `no row "${rowId}"; give it as SENSOR.ROW, one of:\n${variableRows(input).map((r) => `  ${r}`).join('\n')}`);
    }
    if (!input.requirements?.some((r) => r.id === requirementId)) {
      throw new InputError('--requirement', `no requirement "${requirementId}"; the file has ${(input.requirements ?? []).map((r) => r.id).join(', ') || 'none'}`);
    }
    return sizeSource(input, requirementId, rowId, {
      relativeTolerance: tolerance,
      onTrial: (n, value, verdict) => io.err(`trial ${n}: ${rowId} = ${formatSignificant(value, 6)} -> ${verdict}\n`),
    });
  });
  io.out(json ? JSON.stringify(result) + '\n' : formatSizing(result));
  return result.outcome === 'never-passes' ? EXIT.fail : EXIT.pass;
}

/** Every row `--vary` can name, as SENSOR.ROW. */
function variableRows(input: BudgetInput): string[] {
  return input.sensors.flatMap((s) => s.sources.map((r) => `${s.id}.${r.id}`));
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
    default:
      return [
        `largest ${r.sourceId} meeting ${r.requirementId}: ${formatSignificant(r.largestPassing, 6)} ${r.unit} (± ${formatSignificant(r.tolerance, 2)} ${r.unit}, ${r.trials} runs)`,
        `  at ${formatSignificant(r.largestPassing, 6)} ${r.unit}: worst ${at(r.atLargestPassing)}`,
        `  at ${formatSignificant(r.smallestFailing!, 6)} ${r.unit}: worst ${at(r.atSmallestFailing)}`,
        '',
      ].join('\n');
  }
}

export const SIZE_COMMAND: CliCommand = {
  operands: ['FILE'],
  synopsis: '--requirement ID --vary SENSOR.ROW [--tolerance REL] [--json]',
  description: "the largest value of one row's magnitude that still meets a requirement,\nby bisection; each trial is reported on stderr",
  options: {
    requirement: { type: 'string', value: 'ID', help: 'the requirement to meet' },
    vary: { type: 'string', value: 'SENSOR.ROW', help: 'the row whose magnitude is sized, e.g. gyro.arw' },
    tolerance: { type: 'string', value: 'REL', help: 'relative width of the answer (default 0.001)' },
    ...JSON_OPTION,
  },
  run: ([file], values, io) => {
    const requirement = textOption(values, 'requirement');
    const vary = textOption(values, 'vary');
    if (!requirement || !vary) throw new UsageError('size needs --requirement ID and --vary SENSOR.ROW');
    return sizeCommand(file, requirement, vary, relativeTolerance(textOption(values, 'tolerance')), values.json === true, io);
  },
};
