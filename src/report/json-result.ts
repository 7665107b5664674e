import type { BudgetResult } from '../pipeline';
import type { BudgetSeries } from '../budget/budget-series';
import type { ErrorModel } from '../covariance/error-model';
import { quantitySpec, VARIANCE_QUANTITIES, type VarianceQuantity } from '../inputs/quantities';
import { CAUTION } from './caution';
import { confidenceFactor1D } from '../budget/confidence';
import { DISPLAY, varianceFactor } from './display-units';
import { traceNoise, type NoiseTrace } from './noise-trace';
import type { RequirementResult } from '../budget/requirements';
import type { FilterDesignJson } from './filter-design-json';

/** Keys of the per-step series and of the contributions in the JSON result, from the quantity table. */
export const resultKeys = (q: VarianceQuantity) => ({ series: quantitySpec(q).seriesKey!, contributions: quantitySpec(q).resultKey! });

/** How long one requirement holds after an aiding sensor's outage begins (times in s from the mission start). */
export interface OutageHoldEntry {
  sensor: string;
  outage: string;
  start_s: number;
  end_s: number;
  /** Seconds from the outage's start until the requirement first breaks; null when it holds throughout. */
  timeToExceed_s: number | null;
}

/** One requirement's verdict; limit, margin and worst are in `unit`. */
export interface RequirementEntry {
  id: string;
  quantity: string;
  level: string;
  limit: number;
  unit: string;
  verdict: 'pass' | 'fail';
  margin: number;
  worst: number;
  worst_t_s: number;
  window_s: [number, number];
  outages: OutageHoldEntry[];
}

/** One quantity's budget at a checkpoint: σ (and σ at the report level) in `unit`, sources sorted by share of variance (0 to 1). */
export interface CheckpointBudgetEntry {
  quantity: string;
  unit: string;
  sigma: number;
  atLevel: number;
  sources: { id: string; sigma: number; atLevel: number; share: number }[];
}

/** The budget at one checkpoint (t_s in s from the mission start). */
export interface CheckpointEntry {
  id: string;
  t_s: number;
  level: string;
  budgets: CheckpointBudgetEntry[];
}

/** The machine-readable result of `sigma-ledger run --json` (documented in the README). */
export interface JsonResult {
  format: 'sigma-ledger-result';
  formatVersion: 1;
  title: string;
  caution: string;
  mission: {
    duration_s: number; step_s: number;
    /** Steps between the series' points (1 keeps every step); verdicts are evaluated at every step regardless. */
    record_every: number;
    states: string[];
    sources: { id: string; sensor: string; kind: string; provenance?: string; assumed: boolean }[];
  };
  series: Record<string, number[]>;
  contributions: Record<string, Record<string, number[]>>;
  calibration: { state: string; unit: string; sigma: number[] }[];
  requirements: RequirementEntry[];
  checkpoints: CheckpointEntry[];
  noise: NoiseTrace;
  status: { healthy: boolean; issues: BudgetResult['history']['issues']; warnings: BudgetResult['warnings'] };
  /** Present when rows carry a filter design (`tuning`): see filter-design-json.ts. */
  filterDesign?: FilterDesignJson;
}

/**
 * Builds the JSON result. `every` keeps every n-th step (and always the
 * last) so long missions stay small; contributions are variances in the
 * display unit squared (deg², (m/s)², m²) and sum to the square of the
 * matching sigma series.
 */
export function buildJsonResult(result: BudgetResult, title: string, every = 1): JsonResult {
  const keep = keptSteps(result.series.tS.length, every);
  const pick = (a: ArrayLike<number>) => keep.map((k) => a[k]);
  const series = sigmaSeries(result.series, keep);
  const contributions = varianceShares(result.series, result.model, keep);
  return {
    format: 'sigma-ledger-result', formatVersion: 1, title, caution: CAUTION,
    mission: {
      duration_s: result.mission.durationS, step_s: result.trajectory.stepS, record_every: result.recordEvery * Math.max(1, Math.floor(every)),
      states: result.model.states.map((s) => s.name),
      sources: result.model.sources.map((s) => ({ id: s.id, sensor: s.sensorId, kind: s.kind, provenance: s.provenance, assumed: s.assumed })),
    },
    series, contributions,
    calibration: result.history.calibrationStates.map((i, c) => ({
      state: result.model.states[i].name, unit: result.model.states[i].unitSI, sigma: pick(result.history.calibrationSigma[c]),
    })),
    requirements: result.requirements.map(requirementEntry),
    checkpoints: result.checkpoints.map((c) => ({
      id: c.id, t_s: c.tS, level: result.reportLevel,
      budgets: c.quantities.map((qb) => {
        const toDisplay = Math.sqrt(varianceFactor(qb.quantity));
        const atLevel = toDisplay * (qb.quantity === 'drms' ? 1 : confidenceFactor1D(result.reportLevel));
        return {
          quantity: resultKeys(qb.quantity).contributions, unit: DISPLAY[qb.quantity].unit,
          sigma: toDisplay * qb.totalSigmaSI, atLevel: atLevel * qb.totalSigmaSI,
          sources: qb.shares.map((s) => ({ id: s.sourceId, sigma: toDisplay * s.sigmaSI, atLevel: atLevel * s.sigmaSI, share: s.fraction })),
        };
      }),
    })),
    noise: traceNoise(result.model),
    status: { healthy: result.history.issues.length === 0, issues: result.history.issues, warnings: result.warnings },
  };
}

/** The sigma series (display units) at the kept steps, with CEP and R95 where there is position. Throws nothing. */
export function sigmaSeries(series: BudgetSeries, keep: number[]): Record<string, number[]> {
  const out: Record<string, number[]> = { t_s: keep.map((k) => series.tS[k]) };
  for (const q of VARIANCE_QUANTITIES) {
    const s = series.quantities[q];
    if (!s) continue;
    const f = varianceFactor(q);
    out[resultKeys(q).series] = keep.map((k) => Math.sqrt(Math.max(0, s.total[k] * f)));
  }
  if (series.quantities.drms) {
    out.cep_m = keep.map((k) => series.cepM[k]);
    out.r95_m = keep.map((k) => series.r95M[k]);
  }
  return out;
}

/** Each source's share of each variance (display units²) at the kept steps, by the model's source ids. Throws nothing. */
export function varianceShares(series: BudgetSeries, model: ErrorModel, keep: number[]): Record<string, Record<string, number[]>> {
  const out: Record<string, Record<string, number[]>> = {};
  for (const q of VARIANCE_QUANTITIES) {
    const s = series.quantities[q];
    if (!s) continue;
    const f = varianceFactor(q);
    out[resultKeys(q).contributions] = Object.fromEntries(s.bySource.map((b, i) => [model.sources[i].id, keep.map((k) => b[k] * f)]));
  }
  return out;
}

/** One requirement's JSON entry. Throws nothing. */
export function requirementEntry(r: RequirementResult<string>): RequirementEntry {
  return {
    id: r.id, quantity: r.quantity, level: r.level, limit: r.limit.value, unit: r.limit.unit, verdict: r.verdict, margin: r.margin,
    worst: r.worstValue, worst_t_s: r.worstTimeS, window_s: [r.windowStartS, r.windowEndS],
    outages: r.outages.map((o) => ({ sensor: o.sensorId, outage: o.outageId, start_s: o.startS, end_s: o.endS, timeToExceed_s: o.timeToExceedS })),
  };
}

/** Indices of every `every`-th step from 0, plus the last step. */
export function keptSteps(count: number, every: number): number[] {
  const stride = Math.max(1, Math.floor(every));
  const keep: number[] = [];
  for (let k = 0; k < count; k += stride) keep.push(k);
  if (keep[keep.length - 1] !== count - 1) keep.push(count - 1);
  return keep;
}
