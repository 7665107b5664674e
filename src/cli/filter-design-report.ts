/**
 * What `run` adds when rows carry a filter design: the suboptimal-filter
 * analysis, as text after the summary or as `filterDesign` in the JSON; the
 * exit code then follows the requirements judged on the actual error.
 */
import type { BudgetInput } from '../inputs/budget-input';
import type { BudgetResult } from '../pipeline';
import { computeFilterDesign, type FilterDesignResult } from '../suboptimal/compute-filter-design';
import { hasFilterDesign } from '../suboptimal/filter-rows';
import { formatFilterDesign } from '../report/filter-design-text';
import { buildFilterDesignJson, type FilterDesignJson } from '../report/filter-design-json';

/** The design's analysis and its two renderings, or undefined when no row carries a `tuning`. */
export interface FilterDesignReport {
  design: FilterDesignResult;
  text: () => string;
  json: (every: number) => FilterDesignJson;
  /** True when every requirement holds on the actual error. */
  holds: boolean;
}

/**
 * Runs the analysis when the input has a filter design.
 * @throws InputError naming the row's `tuning` field when the filter cannot be built.
 */
export function filterDesignReport(input: BudgetInput, result: BudgetResult): FilterDesignReport | undefined {
  if (!hasFilterDesign(input.sensors)) return undefined;
  const design = computeFilterDesign(input, result);
  return {
    design,
    text: () => formatFilterDesign(design, result.model, input),
    json: (every) => buildFilterDesignJson(design, result.model, input, every),
    holds: design.actual.requirements.every((r) => r.verdict === 'pass'),
  };
}
