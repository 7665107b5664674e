/** `report` in the command table: its options and help (the command itself is report-command.ts). */
import { reportCommand, reportOptionsFromArgs } from './report-command';
import { textOption, type CliCommand } from './cli-command';
import type { ParsedValues } from './allan-command';
import type { ReviewAnalyses } from '../report/review';
import { parseRange, parseRows } from './sensitivity-command';

/**
 * The analyses `--sensitivity`, `--rows`, `--range` and `--r-sweep` ask for.
 * @throws InputError at --range for a bad range.
 */
function reviewAnalysesFromArgs(values: ParsedValues): ReviewAnalyses {
  const sweep = textOption(values, 'r-sweep');
  return {
    ...(values.sensitivity === true && { sensitivity: { rows: parseRows(values.rows), range: parseRange(values.range) } }),
    ...(sweep && { rSweepSensors: parseRows(sweep) }),
  };
}

export const REPORT_COMMAND: CliCommand = {
  operands: ['FILE'],
  synopsis: '[--out PATH] [--format html|md] [--simulation STUDY] [--sensitivity [--rows A.B,...] [--range LOW,HIGH]] [--r-sweep ID,...]',
  description: [
    'the design-review report: one self-contained HTML file (inline SVG charts,',
    'a print stylesheet) or Markdown, with every R, Q and P0 entry traced to its row',
  ].join('\n'),
  options: {
    out: { type: 'string', value: 'PATH', help: 'write the report to PATH (Markdown when it ends in .md); else standard output' },
    format: { type: 'string', value: 'html|md', help: 'the report format (default html, or md for an --out ending in .md)' },
    simulation: { type: 'string', value: 'STUDY', help: 'add the Monte Carlo check from STUDY, the output of simulate --json (or merge --json) of this file' },
    sensitivity: { type: 'boolean', default: false, help: 'add the sensitivity of the assumed values (and --rows) over --range' },
    rows: { type: 'string', value: 'A.B,C.D', help: 'with --sensitivity: rows to vary besides the assumed values' },
    range: { type: 'string', value: 'LOW,HIGH', help: 'with --sensitivity: the scales to try (default 0.5,2)' },
    'r-sweep': { type: 'string', value: 'ID,...', help: "add the sweep of each named aiding sensor's filter R from x0.1 to x10" },
  },
  run: ([file], values, io) => reportCommand({
    ...reportOptionsFromArgs(file, { out: textOption(values, 'out'), format: textOption(values, 'format'), simulation: textOption(values, 'simulation') }),
    analyses: reviewAnalysesFromArgs(values),
  }, io),
};
