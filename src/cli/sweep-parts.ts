/**
 * Part files of a sharded `size --sweep` (format "sigma-ledger-sweep-part"):
 * each holds the points of its share of the sweep's values, and `merge`
 * joins them in order into exactly the CSV one machine prints (every point is
 * computed on its own, from the same value, so where it ran changes nothing).
 */
import { readFileSync, writeFileSync } from 'node:fs';
import { InputError } from '../errors';
import type { RowSweep } from '../budget/row-sweep';
import type { ShardSelection } from './shard-option';

export const SWEEP_PART_FORMAT = 'sigma-ledger-sweep-part';

/** What identifies a sweep: parts of one sweep agree on all of it. */
export interface SweepIdentity {
  budget: { file: string; sha256: string };
  /** The swept row, e.g. "gyro.arw". */
  vary: string;
  /** The --sweep text, FROM:TO:N. */
  sweep: string;
  /** The one requirement asked for, or null for every requirement. */
  requirement: string | null;
}

/** One shard's points of a sweep. */
export interface SweepPart {
  id: SweepIdentity;
  shard: ShardSelection;
  /** Index of this part's first point in the whole sweep. */
  firstPoint: number;
  sweep: RowSweep;
}

/** Writes a part as JSON (numbers as JSON writes them: the shortest text that reads back to the same double). */
export function writeSweepPart(path: string, part: SweepPart): void {
  const body = { format: SWEEP_PART_FORMAT, formatVersion: 1, ...part.id, shard: part.shard, firstPoint: part.firstPoint, result: part.sweep };
  try {
    writeFileSync(path, JSON.stringify(body) + '\n');
  } catch (e) {
    throw new InputError('--output', `cannot write ${path} (${(e as NodeJS.ErrnoException).code ?? 'error'}): check that its folder exists and is writable`);
  }
}

/**
 * Reads a part written by {@link writeSweepPart} from its parsed JSON.
 * @throws InputError naming the file and the field.
 */
// eslint-disable-next-line @typescript-eslint/no-explicit-any -- JSON of unknown shape: every field is checked here.
export function sweepPartFromJson(path: string, raw: any): SweepPart {
  if (raw?.format !== SWEEP_PART_FORMAT || raw.formatVersion !== 1) throw new InputError(`${path}: format`, `is not "${SWEEP_PART_FORMAT}" version 1`);
  const text = (v: unknown, field: string) => {
    if (typeof v !== 'string') throw new InputError(`${path}: ${field}`, 'must be text');
    return v;
  };
  const int = (v: unknown, field: string) => {
    if (!Number.isInteger(v) || (v as number) < 0) throw new InputError(`${path}: ${field}`, 'must be a whole number');
    return v as number;
  };
  const r = raw.result;
  if (typeof r?.sourceId !== 'string' || typeof r.unit !== 'string' || !Array.isArray(r.requirements) || !Array.isArray(r.points)) {
    throw new InputError(`${path}: result`, 'must hold sourceId, unit, requirements and points');
  }
  // eslint-disable-next-line @typescript-eslint/no-explicit-any -- JSON of unknown shape: every field is checked here.
  r.points.forEach((p: any, i: number) => {
    const ok = typeof p?.value === 'number' && Array.isArray(p.worst) && Array.isArray(p.verdicts)
      && p.worst.length === r.requirements.length && p.verdicts.length === r.requirements.length;
    if (!ok) throw new InputError(`${path}: result.points[${i}]`, "must have a value and one worst value and verdict per requirement");
  });
  return {
    id: {
      budget: { file: text(raw.budget?.file, 'budget.file'), sha256: text(raw.budget?.sha256, 'budget.sha256') },
      vary: text(raw.vary, 'vary'), sweep: text(raw.sweep, 'sweep'),
      requirement: raw.requirement === null ? null : text(raw.requirement, 'requirement'),
    },
    shard: { index: int(raw.shard?.index, 'shard.index'), count: int(raw.shard?.count, 'shard.count') },
    firstPoint: int(raw.firstPoint, 'firstPoint'),
    sweep: r as RowSweep,
  };
}

/** Reads a part file's JSON and its `format` (to tell simulation parts from sweep parts). @throws InputError naming the file. */
// eslint-disable-next-line @typescript-eslint/no-explicit-any -- JSON of unknown shape: every field is checked here.
export function readPartJson(path: string): { format: unknown; raw: any } {
  try {
    const raw = JSON.parse(readFileSync(path, 'utf8'));
    return { format: raw?.format, raw };
  } catch (e) {
    const why = e instanceof SyntaxError ? 'is not JSON' : `cannot be read (${(e as NodeJS.ErrnoException).code ?? 'error'})`;
    throw new InputError(path, `${why}; give part files written by simulate --shard or size --sweep --shard`);
  }
}

/**
 * Joins the parts of one sweep, in shard order, into the whole sweep.
 * @throws InputError for parts of different sweeps, a repeated or missing shard.
 */
export function joinSweepParts(parts: { path: string; part: SweepPart }[]): RowSweep {
  const first = parts[0];
  for (const { path, part } of parts) {
    const a = part.id, b = first.part.id;
    const same = a.budget.sha256 === b.budget.sha256 && a.vary === b.vary && a.sweep === b.sweep && a.requirement === b.requirement;
    if (!same) throw new InputError(path, `is from another sweep (budget, --vary, --sweep or --requirement differ from ${first.path})`);
  }
  const ordered = parts.slice().sort((x, y) => x.part.shard.index - y.part.shard.index);
  let next = 0;
  for (const { path, part } of ordered) {
    if (part.firstPoint !== next) throw new InputError(path, `starts at point ${part.firstPoint}, expected ${next}`);
    next += part.sweep.points.length;
  }
  const withPoints = ordered.find((p) => p.part.sweep.points.length > 0)?.part.sweep ?? first.part.sweep;
  return { ...withPoints, points: ordered.flatMap((p) => p.part.sweep.points) };
}
