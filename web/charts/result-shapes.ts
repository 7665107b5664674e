import type { CheckpointEntry, JsonResult, RequirementEntry } from '../../src/report/json-result';

export type { CheckpointBudgetEntry, CheckpointEntry, OutageHoldEntry, RequirementEntry } from '../../src/report/json-result';

/** The result's requirements (kept as a function so components read them one way). */
export function requirementsOf(result: JsonResult): RequirementEntry[] {
  return result.requirements;
}

/** The result's checkpoints. */
export function checkpointsOf(result: JsonResult): CheckpointEntry[] {
  return result.checkpoints;
}
