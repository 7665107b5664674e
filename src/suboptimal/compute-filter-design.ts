/**
 * Filter model versus truth for one budget: what the filter believes (its
 * own P), what its error actually is (the truth propagated with its gains),
 * each truth source's share of the actual error, requirements judged on the
 * actual error, and the filter's normalised innovation variance.
 */
import type { BudgetInput } from '../inputs/budget-input';
import type { ErrorModel } from '../covariance/error-model';
import type { BudgetResult } from '../pipeline';
import { buildBudgetSeries, type BudgetSeries } from '../budget/budget-series';
import { evaluateRequirement, resolveRequirements, type RequirementResult } from '../budget/requirements';
import { buildFilterModel, type RScale } from './filter-model';
import { runTruthVersusFilter, type InnovationRatios, type TruthVersusFilterHistory } from './run-truth-versus-filter';
import { confidenceVerdicts, type ConfidenceVerdict } from './confidence-verdict';

/** One side of the comparison: series and requirement verdicts. */
export interface FilterView {
  series: BudgetSeries;
  requirements: RequirementResult[];
}

/** Everything the suboptimal-filter analysis adds to a budget's result. */
export interface FilterDesignResult {
  filterModel: ErrorModel;
  history: TruthVersusFilterHistory;
  /** The filter's own covariance; no contributions (its sources are the filter's). */
  believed: FilterView;
  /** The actual error, with each truth source's share (indexed like the truth model's sources). */
  actual: FilterView;
  /** Believed versus actual sigma of each quantity, with a plain verdict. */
  confidence: ConfidenceVerdict[];
  /** Per aiding sensor: mean and largest normalised innovation variance. */
  innovations: (InnovationRatios & { mean: number; max: number })[];
}

/** Options of {@link computeFilterDesign}. */
export interface FilterDesignOptions {
  contributions?: boolean;
  /** A filter-only scale on one sensor's R (the R sweep). */
  rScale?: RScale;
}

/**
 * Runs the suboptimal-filter analysis of `input` next to its optimal result
 * `base` (whose mission, truth model and trajectory it reuses).
 * @throws InputError naming the row's `tuning` field when the filter cannot be built.
 */
export function computeFilterDesign(input: BudgetInput, base: BudgetResult, options: FilterDesignOptions = {}): FilterDesignResult {
  const { model: filterModel, truthMap } = buildFilterModel(input.sensors, base.mission, input.mission.initialSigmaNotes, base.model, options.rScale);
  const history = runTruthVersusFilter(base.model, filterModel, truthMap, base.trajectory, { contributions: options.contributions });
  const specs = resolveRequirements(input.requirements, base.mission.durationS);
  const view = (model: ErrorModel, h: TruthVersusFilterHistory['actual']): FilterView => {
    const series = buildBudgetSeries(model, base.trajectory, h);
    return { series, requirements: specs.map((r) => evaluateRequirement(r, series, model.streams)) };
  };
  const believed = view(filterModel, history.believed);
  const actual = view(base.model, history.actual);
  return {
    filterModel, history, believed, actual,
    confidence: confidenceVerdicts(believed.series, actual.series),
    innovations: history.innovations.map((r) => ({
      ...r, mean: r.ratio.reduce((a, b) => a + b, 0) / Math.max(1, r.ratio.length), max: r.ratio.reduce((a, b) => Math.max(a, b), 0),
    })),
  };
}
