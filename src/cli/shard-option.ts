/**
 * The `--shard I/N` option every shardable command shares (`simulate`,
 * `size --sweep`, and any command that splits independent work the same
 * way): parsing, the index from a cluster's job array, and which share of
 * a list of work items a shard owns.
 */
import { InputError } from '../errors';

/** Shard `index` (0-based) of `count`. */
export interface ShardSelection {
  index: number;
  count: number;
}

/** Most shards one study may be split into. */
const MAX_SHARDS = 1_000_000;

/** Words for --help: what the option takes and where `auto` reads the index. */
export const SHARD_HELP = 'run only shard I of N (0-based) and write a part file for merge; auto/N reads JOB_COMPLETION_INDEX or SLURM_ARRAY_TASK_ID';

/**
 * Reads `I/N` (0-based) or `auto/N`. `auto` takes the index from
 * JOB_COMPLETION_INDEX (Kubernetes Indexed Jobs) or SLURM_ARRAY_TASK_ID
 * (Slurm job arrays, counted from SLURM_ARRAY_TASK_MIN, so `--array=1-100`
 * gives indices 0 to 99).
 * @param option the option's name for messages, e.g. "--shard".
 * @throws InputError naming the option for anything else, or an index outside 0 to N - 1.
 */
export function parseShard(text: string, env: Record<string, string | undefined>, option = '--shard'): ShardSelection {
  const m = /^(auto|\d+)\/(\d+)$/.exec(text.trim());
  if (!m) throw new InputError(option, `must be INDEX/COUNT (0-based, e.g. 3/100) or auto/COUNT, got "${text}"`);
  const count = Number(m[2]);
  if (!(count >= 1 && count <= MAX_SHARDS)) throw new InputError(option, `COUNT must be from 1 to ${MAX_SHARDS}, got ${m[2]}`);
  let index: number;
  if (m[1] !== 'auto') index = Number(m[1]);
  else if (env.JOB_COMPLETION_INDEX !== undefined) index = Number(env.JOB_COMPLETION_INDEX);
  else if (env.SLURM_ARRAY_TASK_ID !== undefined) index = Number(env.SLURM_ARRAY_TASK_ID) - Number(env.SLURM_ARRAY_TASK_MIN ?? 0);
  else throw new InputError(option, 'auto needs JOB_COMPLETION_INDEX (Kubernetes Indexed Job) or SLURM_ARRAY_TASK_ID (Slurm array) in the environment');
  if (!Number.isInteger(index) || index < 0 || index >= count) {
    throw new InputError(option, `index ${index} is not in 0 to ${count - 1}`);
  }
  return { index, count };
}

/**
 * The items [start, end) of `items` that a shard owns: contiguous, in order,
 * as even as whole items allow (shard sizes differ by at most one; with more
 * shards than items some own none). Every item belongs to exactly one shard.
 */
export function shardSlice(items: number, shard: ShardSelection): [number, number] {
  return [Math.floor((items * shard.index) / shard.count), Math.floor((items * (shard.index + 1)) / shard.count)];
}

/**
 * Checks that parts carry shards 0 to N - 1 of one N, each once.
 * @param parts each part's file and shard.
 * @throws InputError naming the file of a duplicate or the missing index.
 */
export function checkShardsComplete(parts: { path: string; shard: ShardSelection }[]): void {
  const count = parts[0].shard.count;
  const seen = new Map<number, string>();
  for (const { path, shard } of parts) {
    if (shard.count !== count) throw new InputError(path, `is shard ${shard.index} of ${shard.count}, but ${parts[0].path} is of ${count}`);
    const before = seen.get(shard.index);
    if (before !== undefined) throw new InputError(path, `repeats shard ${shard.index} of ${count} (also in ${before})`);
    seen.set(shard.index, path);
  }
  for (let i = 0; i < count; i++) {
    if (!seen.has(i)) throw new InputError('merge', `shard ${i} of ${count} is missing: give every part`);
  }
}
