import { InputError } from '../errors';
import type { MonteCarloModel } from '../simulation/monte-carlo-model';
import { findFlags } from '../simulation/study-flags';
import { formatSimulationSummary, simulationJson, type StudyIdentity } from '../simulation/simulation-report';
import { studyStatistics } from '../simulation/study-statistics';
import type { StudySums } from '../simulation/study-sums';
import { EXIT, type Io } from './commands';

/** Statistics, flags and the summary or JSON of a finished study (shared by simulate and merge); exit 1 when flagged. */
export function finishStudy(
  model: MonteCarloModel, id: StudyIdentity, sums: StudySums, opts: { json: boolean; every: number; output?: string }, io: Io,
  write: (path: string, text: string) => void,
): number {
  const stats = studyStatistics(model, sums);
  const flags = findFlags(stats, model.outages);
  const text = opts.json ? JSON.stringify(simulationJson(id, stats, flags, opts.every)) + '\n' : formatSimulationSummary(id, stats, flags);
  if (opts.output) {
    try {
      write(opts.output, text);
    } catch (e) {
      throw new InputError('--output', `cannot write ${opts.output} (${(e as NodeJS.ErrnoException).code ?? 'error'})`);
    }
  } else io.out(text);
  return flags.length ? EXIT.fail : EXIT.pass;
}
