/**
 * Which steps of a covariance run keep their per-source entries. A 10-hour
 * mission at 0.1 s with 14 sources has 360,000 steps; keeping every source's
 * entries at every step costs about 1.5 KB a step through the budget series,
 * so long runs keep every N-th step, the steps that must be read exactly
 * (checkpoints, the last step) and nothing else. The total's entries, which
 * the requirement verdicts need, are kept at every step regardless (a few
 * bytes a step), so verdicts and times-to-exceed never come from a thinned
 * series.
 */
export interface RecordPlan {
  /** Steps in the run. */
  steps: number;
  /** Recorded steps, increasing; always holds the first and the last. */
  recordedSteps: Int32Array;
  /** Per step: its row among the recorded steps, or -1 when not recorded. */
  rowOfStep: Int32Array;
}

/**
 * Most source-step entries (sources + 1 times recorded steps) a run keeps
 * when no stride is asked for: about 80 MB of history and 110 MB of series,
 * so nothing a budget can describe runs out of memory by surprise.
 */
export const MAX_RECORDED_ENTRIES = 2_000_000;

/**
 * A plan keeping every `every`-th step from 0, the last step and `mustKeep`
 * (step indices, any order; out-of-range ones are ignored).
 * @param every stride >= 1 (fractions are floored).
 */
export function planRecording(steps: number, every: number, mustKeep: Iterable<number> = []): RecordPlan {
  const stride = Math.max(1, Math.floor(every));
  const rowOfStep = new Int32Array(steps).fill(-1);
  for (let k = 0; k < steps; k += stride) rowOfStep[k] = 0;
  if (steps > 0) rowOfStep[steps - 1] = 0;
  for (const k of mustKeep) if (k >= 0 && k < steps) rowOfStep[k] = 0;
  let rows = 0;
  for (let k = 0; k < steps; k++) if (rowOfStep[k] === 0) rowOfStep[k] = rows++;
  const recordedSteps = new Int32Array(rows);
  for (let k = 0; k < steps; k++) if (rowOfStep[k] >= 0) recordedSteps[rowOfStep[k]] = k;
  return { steps, recordedSteps, rowOfStep };
}

/** The plan that records every step (what a short mission uses). */
export function recordEveryStep(steps: number): RecordPlan {
  return planRecording(steps, 1);
}

/**
 * The stride a run uses when the caller asks for `every` (1 when not given):
 * the larger of that and the smallest stride keeping at most
 * {@link MAX_RECORDED_ENTRIES} source-step entries.
 */
export function recordingStride(steps: number, sources: number, every = 1): number {
  const bounded = Math.ceil(((sources + 1) * steps) / MAX_RECORDED_ENTRIES);
  return Math.max(1, Math.floor(every), bounded);
}

/** True when the plan keeps every step. */
export function recordsEveryStep(plan: RecordPlan): boolean {
  return plan.recordedSteps.length === plan.steps;
}
