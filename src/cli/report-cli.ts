/** `report` in the command table: its options and help (the command itself is report-command.ts). */
import { reportCommand, reportOptionsFromArgs } from './report-command';
import { textOption, type CliCommand } from './cli-command';

export const REPORT_COMMAND: CliCommand = {
  operands: ['FILE'],
  synopsis: '[--out PATH] [--format html|md] [--simulation STUDY]',
  description: [
    'the design-review report: one self-contained HTML file (inline SVG charts,',
    'a print stylesheet) or Markdown, with every R, Q and P0 entry traced to its row',
  ].join('\n'),
  options: {
    out: { type: 'string', value: 'PATH', help: 'write the report to PATH (Markdown when it ends in .md); else standard output' },
    format: { type: 'string', value: 'html|md', help: 'the report format (default html, or md for an --out ending in .md)' },
    simulation: { type: 'string', value: 'STUDY', help: 'add the Monte Carlo check from STUDY, the output of simulate --json (or merge --json) of this file' },
  },
  run: ([file], values, io) => reportCommand(reportOptionsFromArgs(file, { out: textOption(values, 'out'), format: textOption(values, 'format'), simulation: textOption(values, 'simulation') }), io),
};
