/**
 * Which assumptions matter: every value marked assumed (rows with
 * `assumed: true` and the start-pose sigmas), and any row the user names,
 * is scaled over a range (default ×0.5 to ×2) one at a time, and the change
 * in each requirement's worst value is ranked, largest relative change first. A row's
 * magnitude is scaled, and its correlation time too when it has one (as a
 * separate entry: correlation times are not monotone, docs/planar-model.md
 * §9, so five scales across the range are tried and the largest change
 * kept). With a filter design the requirement is judged on the actual
 * error, and a row without its own tuned value moves truth and filter together.
 */
import { InputError } from '../errors';
import type { BudgetInput, Quantity } from '../inputs/budget-input';
import { computeBudget } from '../pipeline';
import { computeFilterDesign } from '../suboptimal/compute-filter-design';
import { hasFilterDesign } from '../suboptimal/filter-rows';

/** One varied value and its effect on one requirement (values in the requirement's unit). */
export interface SensitivityEntry {
  /** `gyro.bi`, `gyro.bi.correlationTime`, `mission.initialPosition`. */
  target: string;
  assumed: boolean;
  requirementId: string;
  unit: string;
  baseWorst: number;
  /** Worst value at each scale tried. */
  byScale: { scale: number; worst: number }[];
  /** Largest |worst − baseWorst| over the scales, in `unit`. */
  change: number;
  /** `change` over the base worst value: the ranking key (requirements differ in unit). */
  relativeChange: number;
}

/** Options of {@link assumptionSensitivity}. */
export interface SensitivityOptions {
  /** Extra rows to vary, as `sensorId.rowId`. */
  rows?: string[];
  /** Scale range [low, high], default [0.5, 2]. */
  range?: [number, number];
  /** Called after each analysis run with how many are done of the total (the page's progress line). */
  onRun?: (done: number, total: number) => void;
}

type Target = { name: string; assumed: boolean; get: (b: BudgetInput) => Quantity };

/**
 * The ranked sensitivity table (largest change first).
 * @throws InputError for an unknown row, a bad range, or a budget without requirements.
 */
export function assumptionSensitivity(input: BudgetInput, options: SensitivityOptions = {}): SensitivityEntry[] {
  const [lo, hi] = options.range ?? [0.5, 2];
  if (!(lo > 0) || !(hi > lo) || !Number.isFinite(hi)) throw new InputError('--range', `must be two scales 0 < low < high, e.g. 0.5,2; got ${lo},${hi}`);
  if (!input.requirements?.length) throw new InputError('requirements', 'sensitivity reports the change in each requirement\'s worst value; the budget has no requirements');
  const scales = [lo, Math.sqrt(lo * Math.sqrt(lo * hi)), Math.sqrt(lo * hi), Math.sqrt(hi * Math.sqrt(lo * hi)), hi].filter((s) => s !== 1);
  const list = targets(input, options.rows ?? []);
  const total = 1 + list.length * scales.length;
  let done = 0;
  const tick = () => options.onRun?.(++done, total);
  const base = worstValues(input);
  tick();
  const entries: SensitivityEntry[] = [];
  for (const target of list) {
    const byScale = scales.map((scale) => {
      const varied: BudgetInput = JSON.parse(JSON.stringify(input));
      target.get(varied).value *= scale;
      const worst = worstValues(varied);
      tick();
      return { scale, worst };
    });
    input.requirements.forEach((r, i) => {
      const rows = byScale.map((s) => ({ scale: s.scale, worst: s.worst[i].worst }));
      const change = Math.max(...rows.map((s) => Math.abs(s.worst - base[i].worst)));
      const relativeChange = base[i].worst > 0 ? change / base[i].worst : 0;
      entries.push({ target: target.name, assumed: target.assumed, requirementId: r.id, unit: base[i].unit, baseWorst: base[i].worst, byScale: rows, change, relativeChange });
    });
  }
  return entries.sort((a, b) => b.relativeChange - a.relativeChange || a.target.localeCompare(b.target));
}

function worstValues(input: BudgetInput): { worst: number; unit: string }[] {
  const base = computeBudget(input, { contributions: false });
  const reqs = hasFilterDesign(input.sensors) ? computeFilterDesign(input, base, { contributions: false }).actual.requirements : base.requirements;
  return reqs.map((r) => ({ worst: r.worstValue, unit: r.limit.unit }));
}

function targets(input: BudgetInput, picked: string[]): Target[] {
  const list: Target[] = [];
  const notes = input.mission.initialSigmaNotes ?? {};
  if (notes.position?.assumed) list.push({ name: 'mission.initialPosition', assumed: true, get: (b) => b.mission.initialSigma.position });
  if (notes.heading?.assumed) list.push({ name: 'mission.initialHeading', assumed: true, get: (b) => b.mission.initialSigma.heading });
  const known = new Set<string>();
  input.sensors.forEach((s, i) => s.sources.forEach((row, j) => {
    const name = `${s.id}.${row.id}`;
    known.add(name);
    if (!row.assumed && !picked.includes(name)) return;
    list.push({ name, assumed: row.assumed === true, get: (b) => b.sensors[i].sources[j].value });
    if (row.correlationTime) list.push({ name: `${name}.correlationTime`, assumed: row.assumed === true, get: (b) => b.sensors[i].sources[j].correlationTime! });
  }));
  for (const p of picked) {
    if (!known.has(p)) throw new InputError('--rows', `no row "${p}"; give rows as sensorId.rowId, e.g. ${[...known][0] ?? 'gyro.arw'}`);
  }
  return list;
}
