/**
 * The `filterDesign` part of `sigma-ledger run --json` (keys documented in
 * the README): believed and actual sigma series, the actual error's truth
 * shares, requirements on both, the verdicts and innovation ratios.
 */
import type { ErrorModel } from '../covariance/error-model';
import type { BudgetInput, TuningInput } from '../inputs/budget-input';
import type { FilterDesignResult } from '../suboptimal/compute-filter-design';
import { resultKeys, keptSteps, requirementEntry, sigmaSeries, varianceShares, type RequirementEntry } from './json-result';

/** Believed or actual series: the same keys as the top-level `series` (sigma in display units). */
export interface FilterViewJson {
  series: Record<string, number[]>;
  requirements: RequirementEntry[];
}

/** The filter-design section of the JSON result. */
export interface FilterDesignJson {
  /** Each tuned row with its design, by full id. */
  tuning: Record<string, TuningInput>;
  believed: FilterViewJson;
  /** Also `contributions`: truth source id -> variance in display units², summing to the square of the actual series. */
  actual: FilterViewJson & { contributions: Record<string, Record<string, number[]>> };
  confidence: { quantity: string; unit: string; verdict: string; end: SigmaPairJson; mostOverconfident: SigmaPairJson; mostConservative: SigmaPairJson }[];
  innovations: { sensor: string; mean: number; max: number; count: number; t_s: number[]; ratio: number[] }[];
}

/** Believed and actual sigma at one time (display units); ratio = actual / believed. */
export interface SigmaPairJson {
  t_s: number;
  believed: number;
  actual: number;
  ratio: number | null;
}

/** Builds the section; `every` thins the series as the top-level ones are. Throws nothing. */
export function buildFilterDesignJson(design: FilterDesignResult, truth: ErrorModel, input: BudgetInput, every = 1): FilterDesignJson {
  const keep = keptSteps(design.actual.series.tS.length, every);
  const pair = (p: FilterDesignResult['confidence'][number]['atEnd']): SigmaPairJson => ({
    t_s: p.tS, believed: p.believedSigma, actual: p.actualSigma, ratio: Number.isFinite(p.ratio) ? p.ratio : null,
  });
  return {
    tuning: Object.fromEntries(input.sensors.flatMap((s) => s.sources.flatMap((r) => (r.tuning ? [[`${s.id}.${r.id}`, r.tuning]] : [])))),
    believed: { series: sigmaSeries(design.believed.series, keep), requirements: design.believed.requirements.map(requirementEntry) },
    actual: {
      series: sigmaSeries(design.actual.series, keep), requirements: design.actual.requirements.map(requirementEntry),
      contributions: varianceShares(design.actual.series, truth, keep),
    },
    confidence: design.confidence.map((c) => ({
      quantity: resultKeys(c.quantity).contributions, unit: c.unit, verdict: c.verdict,
      end: pair(c.atEnd), mostOverconfident: pair(c.mostOverconfident), mostConservative: pair(c.mostConservative),
    })),
    innovations: design.innovations.map((r) => ({ sensor: r.sensorId, mean: r.mean, max: r.max, count: r.ratio.length, t_s: r.tS, ratio: r.ratio })),
  };
}
