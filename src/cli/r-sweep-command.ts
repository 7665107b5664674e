/**
 * `sigma-ledger r-sweep FILE --sensor ID [--json]`: the sensor's R in the
 * filter scaled from ×0.1 to ×10, with each requirement's actual and
 * believed worst value: what inflating (or trusting) R costs.
 */
import { InputError } from '../errors';
import { sweepFilterR } from '../suboptimal/r-sweep';
import { formatRSweep } from '../report/sensitivity-text';
import type { ParsedValues } from './allan-command';
import { EXIT, type Io } from './commands';
import { loadBudget, sheetProblems, throwIfBlocked, withDocumentPaths } from './load-budget';

/**
 * Runs the command (uses `--sensor`, which main.ts already declares); exit 0 with the table, 2 for bad input.
 * @throws InputError naming the option or the file's field.
 */
export function rSweepCommand(file: string, values: ParsedValues, io: Io): number {
  if (typeof values.sensor !== 'string' || !values.sensor) throw new InputError('--sensor', 'is required: the aiding sensor whose R the filter scales, e.g. --sensor gnss');
  const sensorId = values.sensor;
  // The load's analysis (totals only) is the base every point of the sweep reuses.
  const loaded = loadBudget(file, { contributions: false, report: false });
  const problems = sheetProblems(loaded);
  for (const p of problems) io.err(`${p}\n`);
  if (problems.length) return EXIT.badInput;
  throwIfBlocked(loaded);
  const base = loaded.budget!;
  const sweep = withDocumentPaths(loaded, (input) => sweepFilterR(input, base, sensorId));
  io.out(values.json === true ? JSON.stringify(sweep) + '\n' : formatRSweep(sweep));
  return EXIT.pass;
}
