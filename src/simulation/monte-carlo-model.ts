import type { RunRandom } from './run-random';

/** A quantity whose error is simulated and compared with the budget (SI inside). */
export interface SimulatedQuantity {
  /** Key, e.g. "cross-track" (the budget's VarianceQuantity names where they exist). */
  id: string;
  /** Words for messages, e.g. "cross-track". */
  label: string;
  /** SI unit of the error, e.g. "m", "rad", "m/s". */
  unitSI: string;
}

/** A block of the state whose normalised estimation error squared (NEES) is averaged. */
export interface NeesGroup {
  id: string;
  label: string;
}

/** An aiding sensor's outage, for saying where in the mission a flag falls. */
export interface SimulatedOutage {
  sensorId: string;
  id: string;
  startS: number;
  endS: number;
}

/** What one run hands over at every output step. */
export interface RunSink {
  /**
   * @param k step index.
   * @param errors estimate - truth of each quantity, SI (angles wrapped to (-π, π]).
   * @param variances the filter's own variance of each quantity, SI².
   * @param nees NEES of each group (x̃ᵀ P⁻¹ x̃ over the group's states).
   * @param neesDof states in each group's NEES at this step (states with zero variance are left out).
   */
  step(k: number, errors: Float64Array, variances: Float64Array, nees: Float64Array, neesDof: Float64Array): void;
}

/**
 * A truth model and filter pair that the Monte Carlo study can run: the planar
 * model implements it (planar-simulation.ts), and so can a 3-D inertial model.
 * The study only draws generators, passes them in run-index order and sums
 * what the sink receives; everything model-specific stays behind `simulate`.
 */
export interface MonteCarloModel {
  /** Output step times, s. */
  stepTimesS: Float64Array;
  quantities: SimulatedQuantity[];
  neesGroups: NeesGroup[];
  /** The linearised budget's variance of each quantity at each step (indexed like `quantities`), SI². */
  budgetVariance: Float64Array[];
  outages: SimulatedOutage[];
  /**
   * Draws one realisation from `rng` alone (so a run replays from its seed),
   * runs truth and filter over the mission and calls `sink.step` once per
   * step in increasing k. Must not keep state between runs.
   */
  simulate(rng: RunRandom, sink: RunSink): void;
}

/**
 * What the statistics read of a model: everything but `simulate`. Plain data,
 * so a worker that built the model can hand it to the thread that sums.
 */
export type StudyShape = Omit<MonteCarloModel, 'simulate'>;
