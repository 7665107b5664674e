/**
 * Every command of `sigma-ledger`, one line each: its name, the summary that
 * `sigma-ledger help` lists, and a loader. Commands load on use, so `--help`
 * and `--version` start without the engine (HyperFormula alone takes about
 * 0.2 s to load). To add a command: write `src/cli/<name>-command.ts`
 * exporting a {@link CliCommand} and add its line here.
 */
import type { CliCommand } from './cli-command';

/** A registered command. */
export interface CommandEntry {
  readonly name: string;
  readonly summary: string;
  readonly load: () => Promise<CliCommand>;
}

export const COMMANDS: readonly CommandEntry[] = [
  { name: 'run', summary: 'the budget: verdicts, margins, time to exceed, checkpoints, R, Q, P0', load: async () => (await import('./run-command')).RUN_COMMAND },
  { name: 'size', summary: "the largest value of one row's magnitude that still meets a requirement", load: async () => (await import('./size-command')).SIZE_COMMAND },
  { name: 'report', summary: 'the design-review report (HTML or Markdown) with every R, Q and P0 entry traced', load: async () => (await import('./report-cli')).REPORT_COMMAND },
  { name: 'sensitivity', summary: "each assumed value's effect on every requirement's worst value, ranked", load: async () => (await import('./sensitivity-cli')).SENSITIVITY_COMMAND },
  { name: 'r-sweep', summary: "one sensor's filter R scaled x0.1 to x10: actual and believed worst values", load: async () => (await import('./r-sweep-cli')).R_SWEEP_COMMAND },
  { name: 'simulate', summary: 'Monte Carlo check of the linearised budget (seeded, parallel, shardable)', load: async () => (await import('./simulate-cli')).SIMULATE_COMMAND },
  { name: 'merge', summary: "combine simulate --shard part files into the one-machine result", load: async () => (await import('./simulate-cli')).MERGE_COMMAND },
  { name: 'check', summary: 'validate a budget and evaluate its cells without running the analysis', load: async () => (await import('./check-command')).CHECK_COMMAND },
  { name: 'allan', summary: "a static log's Allan deviation and its IEEE Std 952 noise terms", load: async () => (await import('./allan-cli')).ALLAN_COMMAND },
  { name: 'calibrate', summary: "a sensor's offset and scale factor against known truth", load: async () => (await import('./calibrate-cli')).CALIBRATE_COMMAND },
  { name: 'compare', summary: 'candidate rows for a sensor side by side: verdicts, margins, cheapest that passes', load: async () => (await import('./compare-command')).COMPARE_COMMAND },
];
