import type { JsonResult } from '../../src/report/json-result';

/** How long one requirement holds after an aiding sensor's outage begins (times in s from the mission start). */
export interface OutageHoldEntry {
  sensor: string;
  outage: string;
  start_s: number;
  end_s: number;
  /** Seconds from the outage's start until the requirement first breaks; null when it holds throughout. */
  timeToExceed_s: number | null;
}

/** One requirement's verdict as `buildJsonResult` writes it; limit, margin and worst are in `unit`. */
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

/** One quantity's budget at a checkpoint: σ in `unit`, sources sorted by share of variance (0 to 1). */
export interface CheckpointBudgetEntry {
  quantity: string;
  unit: string;
  sigma: number;
  sources: { id: string; sigma: number; share: number }[];
}

/** The budget at one checkpoint (t_s in s from the mission start). */
export interface CheckpointEntry {
  id: string;
  t_s: number;
  budgets: CheckpointBudgetEntry[];
}

/** The result's requirements with their shape (JsonResult types them `unknown[]`). */
export function requirementsOf(result: JsonResult): RequirementEntry[] {
  return result.requirements as RequirementEntry[];
}

/** The result's checkpoints with their shape (JsonResult types them `unknown[]`). */
export function checkpointsOf(result: JsonResult): CheckpointEntry[] {
  return result.checkpoints as CheckpointEntry[];
}
