import { InputError } from '../errors';

/** One quantity of a study as `simulate --json` writes it (display units: heading in deg). */
export interface SimulationJsonQuantity {
  id: string;
  unit: string;
  rms: number[];
  mean: number[];
  filterSigma: number[];
  budgetSigma: number[];
  bandLow: number[];
  bandHigh: number[];
}

/** One NEES group of a study as `simulate --json` writes it. */
export interface SimulationJsonNees {
  id: string;
  dof: number[];
  average: number[];
  low: number[];
  high: number[];
}

/** A flag as `simulate --json` writes it. */
export interface SimulationJsonFlag {
  subject: string;
  startS: number;
  endS: number;
  worstS: number;
  ratio: number;
  outage: string | null;
  sensor: string | null;
  text: string;
}

/** The output of `simulate --json` and `merge --json` (format "sigma-ledger-simulation", version 1). */
export interface SimulationJson {
  format: 'sigma-ledger-simulation';
  formatVersion: 1;
  budget: { file: string; sha256: string };
  seed: number;
  runs: number;
  verdict: string;
  flags: SimulationJsonFlag[];
  t_s: number[];
  quantities: SimulationJsonQuantity[];
  nees: SimulationJsonNees[];
  caution: string;
}

/**
 * Checks parsed JSON against the shape of {@link SimulationJson} (what a
 * report reads of it) and returns it typed.
 * @param source the file's name, for messages.
 * @throws InputError naming the file and the field; a part file of a sharded study is told to merge first.
 */
export function readSimulationJson(raw: unknown, source: string): SimulationJson {
  // eslint-disable-next-line @typescript-eslint/no-explicit-any -- JSON of unknown shape: every field is checked here.
  const r = raw as Record<string, any> | null;
  if (r?.format === 'sigma-ledger-simulation-part') {
    throw new InputError(source, 'is one part of a sharded study: combine the parts with "sigma-ledger merge PARTS... --json --output FILE" first');
  }
  if (r?.format !== 'sigma-ledger-simulation' || r.formatVersion !== 1) {
    throw new InputError(`${source}: format`, 'is not "sigma-ledger-simulation" version 1 (the output of simulate --json or merge --json)');
  }
  const fail = (field: string, what: string): never => { throw new InputError(`${source}: ${field}`, what); };
  const numbers = (v: unknown, field: string, length: number) => {
    if (!Array.isArray(v) || v.length !== length || v.some((x) => typeof x !== 'number')) fail(field, `must be ${length} numbers, one per time in t_s`);
  };
  if (!Number.isInteger(r.runs) || r.runs < 1) fail('runs', 'must be a whole number of runs');
  if (!Number.isInteger(r.seed)) fail('seed', 'must be a whole number');
  if (typeof r.budget?.sha256 !== 'string' || typeof r.budget?.file !== 'string') fail('budget', 'must name the budget file and its sha256');
  if (typeof r.verdict !== 'string') fail('verdict', 'must be text');
  if (!Array.isArray(r.t_s) || r.t_s.length === 0) fail('t_s', 'must be a list of times');
  const steps = r.t_s.length;
  numbers(r.t_s, 't_s', steps);
  if (!Array.isArray(r.quantities)) fail('quantities', 'must be a list');
  // eslint-disable-next-line @typescript-eslint/no-explicit-any -- JSON of unknown shape: every field is checked here.
  r.quantities.forEach((q: any, i: number) => {
    if (typeof q?.id !== 'string' || typeof q.unit !== 'string') fail(`quantities[${i}]`, 'must have an id and a unit');
    for (const k of ['rms', 'mean', 'filterSigma', 'budgetSigma', 'bandLow', 'bandHigh']) numbers(q[k], `quantities[${i}].${k}`, steps);
  });
  if (!Array.isArray(r.nees)) fail('nees', 'must be a list');
  // eslint-disable-next-line @typescript-eslint/no-explicit-any -- JSON of unknown shape: every field is checked here.
  r.nees.forEach((g: any, i: number) => {
    if (typeof g?.id !== 'string') fail(`nees[${i}]`, 'must have an id');
    for (const k of ['dof', 'average', 'low', 'high']) numbers(g[k], `nees[${i}].${k}`, steps);
  });
  // eslint-disable-next-line @typescript-eslint/no-explicit-any -- JSON of unknown shape: every field is checked here.
  if (!Array.isArray(r.flags) || r.flags.some((f: any) => typeof f?.text !== 'string' || typeof f.subject !== 'string')) {
    fail('flags', 'must be a list of flags with subject and text');
  }
  return r as SimulationJson;
}
