import { createHash } from 'node:crypto';
import { readFileSync, writeFileSync } from 'node:fs';
import { InputError } from '../errors';
import type { BlockNode } from '../simulation/block-tree';
import type { StudyIdentity } from '../simulation/simulation-report';

/** A shard's share of a study as written to disk (format "sigma-ledger-simulation-part"). */
export interface SimulationPart {
  id: StudyIdentity;
  shard: { index: number; count: number };
  /** Doubles per step of the sums (must agree between parts). */
  fieldsPerStep: number;
  nodes: BlockNode[];
}

const FORMAT = 'sigma-ledger-simulation-part';

/** The identity of a study of this budget file (its bytes' SHA-256), seed and run count. */
export function studyIdentity(file: string, seed: number, runs: number): StudyIdentity {
  return { budget: { file, sha256: fileSha256(file) }, seed, runs };
}

/** SHA-256 of a file's bytes, hex (what part files identify their budget by). */
export function fileSha256(file: string): string {
  return createHash('sha256').update(readFileSync(file)).digest('hex');
}

/** Writes a part as JSON; each node's sums go in as base64 of their little-endian doubles. */
export function writePart(path: string, part: SimulationPart): void {
  const body = {
    format: FORMAT, formatVersion: 1, ...part.id, shard: part.shard, fieldsPerStep: part.fieldsPerStep,
    nodes: part.nodes.map((n) => ({
      level: n.level, index: n.index, runs: n.sums.runs,
      sums: Buffer.from(n.sums.data.buffer, n.sums.data.byteOffset, n.sums.data.byteLength).toString('base64'),
    })),
  };
  try {
    writeFileSync(path, JSON.stringify(body) + '\n');
  } catch (e) {
    throw new InputError('--output', `cannot write ${path} (${(e as NodeJS.ErrnoException).code ?? 'error'}): check that its folder exists and is writable`);
  }
}

/**
 * Reads a part written by {@link writePart}.
 * @throws InputError naming the file and the field for anything else.
 */
export function readPart(path: string): SimulationPart {
  // eslint-disable-next-line @typescript-eslint/no-explicit-any -- JSON of unknown shape: every field is checked below.
  let raw: any;
  try {
    raw = JSON.parse(readFileSync(path, 'utf8'));
  } catch (e) {
    const why = e instanceof SyntaxError ? 'is not JSON' : `cannot be read (${(e as NodeJS.ErrnoException).code ?? 'error'})`;
    throw new InputError(path, `${why}; give files written by "sigma-ledger simulate --shard"`);
  }
  if (raw?.format !== FORMAT || raw.formatVersion !== 1) throw new InputError(`${path}: format`, `is not "${FORMAT}" version 1`);
  const num = (v: unknown, field: string) => {
    if (typeof v !== 'number' || !Number.isFinite(v)) throw new InputError(`${path}: ${field}`, 'must be a number');
    return v;
  };
  if (typeof raw.budget?.file !== 'string' || typeof raw.budget?.sha256 !== 'string') throw new InputError(`${path}: budget`, 'must name the budget file and its sha256');
  const fieldsPerStep = num(raw.fieldsPerStep, 'fieldsPerStep');
  if (!Array.isArray(raw.nodes)) throw new InputError(`${path}: nodes`, 'must be a list');
  // eslint-disable-next-line @typescript-eslint/no-explicit-any -- as raw above.
  const nodes = raw.nodes.map((n: any, i: number): BlockNode => {
    const bytes = Buffer.from(String(n?.sums ?? ''), 'base64');
    if (bytes.byteLength % 8 !== 0) throw new InputError(`${path}: nodes[${i}].sums`, 'is not a whole number of doubles');
    const data = new Float64Array(bytes.byteLength / 8);
    new Uint8Array(data.buffer).set(bytes);
    return { level: num(n.level, `nodes[${i}].level`), index: num(n.index, `nodes[${i}].index`), sums: { runs: num(n.runs, `nodes[${i}].runs`), data } };
  });
  return {
    id: { budget: raw.budget, seed: num(raw.seed, 'seed'), runs: num(raw.runs, 'runs') },
    shard: { index: num(raw.shard?.index, 'shard.index'), count: num(raw.shard?.count, 'shard.count') },
    fieldsPerStep, nodes,
  };
}
