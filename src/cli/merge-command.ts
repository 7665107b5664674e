/**
 * `sigma-ledger merge PARTS... [--json] [--every K] [--output OUT]`: combines
 * the part files of a sharded `simulate` (or of a sharded `size --sweep`,
 * sweep-parts.ts, printed as the sweep's CSV) into exactly the result one machine
 * would print (the sums meet in the same fixed tree, block-tree.ts). The
 * budget file named in the parts must be at hand, unchanged (its SHA-256 is
 * checked), for the predicted σ.
 */
import { writeFileSync } from 'node:fs';
import { InputError } from '../errors';
import { blockCount, reduceNodes } from '../simulation/block-tree';
import { sumLayout } from '../simulation/study-sums';
import { EXIT, exitOnInputError, type Io } from './commands';
import { checkShardsComplete } from './shard-option';
import { sweepCsv } from './size-sweep';
import { joinSweepParts, readPartJson, sweepPartFromJson, SWEEP_PART_FORMAT } from './sweep-parts';
import { loadBudget } from './load-budget';
import { simulationModelFor, SIMULATION_LOAD } from './simulation-model';
import { finishStudy } from './simulation-output';
import { readPart, studyIdentity } from './simulation-parts';

/** Runs `merge`: exit 0 consistent, 1 with warnings, 2 for parts that do not belong together or leave runs out. */
export async function mergeCommand(parts: string[], opts: { json: boolean; every: number; output?: string }, io: Io): Promise<number> {
  return exitOnInputError(io, async () => {
    if (parts.length === 0) throw new InputError('merge', 'give the part files written by simulate --shard or size --sweep --shard');
    const json = parts.map((p) => ({ path: p, ...readPartJson(p) }));
    if (json[0].format === SWEEP_PART_FORMAT) return mergeSweep(json, io);
    const read = parts.map((p) => ({ path: p, part: readPart(p) }));
    const first = read[0].part;
    for (const { path, part } of read) {
      const same = part.id.budget.sha256 === first.id.budget.sha256 && part.id.seed === first.id.seed && part.id.runs === first.id.runs;
      if (!same) throw new InputError(path, `is from another study (budget, seed or runs differ from ${read[0].path})`);
    }
    const id = studyIdentity(first.id.budget.file, first.id.seed, first.id.runs);
    if (id.budget.sha256 !== first.id.budget.sha256) {
      throw new InputError(first.id.budget.file, 'has changed since the parts were simulated (its SHA-256 differs); simulate again');
    }
    const model = simulationModelFor(loadBudget(id.budget.file, SIMULATION_LOAD));
    const fields = sumLayout(model).fields;
    const size = sumLayout(model).steps * fields;
    const bad = read.find(({ part }) => part.fieldsPerStep !== fields || part.nodes.some((n) => n.sums.data.length !== size));
    if (bad) throw new InputError(bad.path, `does not hold sums of this budget's ${sumLayout(model).steps} steps × ${fields} fields`);
    const sums = reduceNodes(read.flatMap((r) => r.part.nodes), blockCount(id.runs));
    return finishStudy(model, id, sums, opts, io, (p, t) => writeFileSync(p, t));
  });
}

/** Joins the parts of a sharded `size --sweep` and prints the CSV one machine prints. */
function mergeSweep(json: { path: string; format: unknown; raw: unknown }[], io: Io): number {
  const parts = json.map(({ path, raw }) => ({ path, part: sweepPartFromJson(path, raw) }));
  checkShardsComplete(parts.map(({ path, part }) => ({ path, shard: part.shard })));
  io.out(sweepCsv(joinSweepParts(parts)));
  return EXIT.pass;
}
