import type { ResultCheckpointEntry as CheckpointEntry, JsonResult, ResultRequirementEntry as RequirementEntry } from '../../src';

export type { CheckpointBudgetEntry, ResultCheckpointEntry as CheckpointEntry, OutageHoldEntry, ResultRequirementEntry as RequirementEntry } from '../../src';

/** The result's requirements (kept as a function so components read them one way). */
export function requirementsOf(result: JsonResult): RequirementEntry[] {
  return result.requirements;
}

/** The result's checkpoints. */
export function checkpointsOf(result: JsonResult): CheckpointEntry[] {
  return result.checkpoints;
}
