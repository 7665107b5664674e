/**
 * Sigma Ledger's engine, exported in pipeline order: input types and units,
 * error sources and sensors, the mission, the covariance analysis, then the
 * budget (series, requirements, checkpoints, sizing). Pure TypeScript with no
 * DOM or Node APIs, so the browser worker, the CLI and the tests share it.
 */
export { SigmaLedgerError, InputError } from './errors';
export type * from './inputs/budget-input';
export * from './units';
export { SOURCE_KINDS, SOURCE_KIND_NAMES } from './sources/registry';
export type { SourceKindSpec, ParameterSpec } from './sources/source-kind';
export {
  gaussMarkovAllanVariance, gaussMarkovSigmaFromAllanFloor, flickerCoefficientToFloor, GM_ALLAN_PEAK_RATIO, GM_ALLAN_PEAK_U,
  FLICKER_FLOOR_FACTOR,
} from './sources/gauss-markov-allan';
export { SENSOR_KINDS, SENSOR_KIND_NAMES } from './sensors/registry';
export { INITIAL_POSITION_ID, INITIAL_HEADING_ID, buildErrorModel } from './sensors/build-error-model';
export { resolveMission, type ResolvedMission, type ResolvedSegment } from './mission/resolve-mission';
export { buildNominalTrajectory, type NominalTrajectory } from './mission/nominal-trajectory';
export type { ErrorModel, ModelSource, StateInfo } from './covariance/error-model';
export { discretiseVanLoan } from './covariance/van-loan';
export { expm } from './covariance/matrix-exponential';
export {
  runCovariance, runCovarianceProblem, type CovarianceHistory, type CovarianceProblem, type CovarianceRun, type DiscretisationProvider,
} from './covariance/run-covariance';
export type { CovarianceIssue } from './covariance/covariance-health';
export { buildBudgetSeries, VARIANCE_QUANTITIES, type BudgetSeries, type VarianceQuantity } from './budget/budget-series';
export { radiusForProbability, probabilityInsideCircle } from './budget/horizontal-accuracy';
export { normalQuantile, confidenceFactor1D } from './budget/confidence';
export { LEVELS, QUANTITY_NAMES, levelSeries, limitDimension } from './budget/levels';
export type { RequirementResult, OutageHold } from './budget/requirements';
export type { CheckpointBudget, QuantityBudget, SourceShare } from './budget/checkpoints';
export { sizeSource, type SizingResult } from './budget/sizing';
export { computeBudget, MAX_STEPS, type BudgetResult } from './pipeline';
export * from './inertial';
export type { MonteCarloModel, RunSink, SimulatedQuantity, NeesGroup, SimulatedOutage } from './simulation/monte-carlo-model';
export { RunRandom } from './simulation/run-random';
export { planarSimulation } from './simulation/planar-study';
export { runBlocks, type BlockRange } from './simulation/run-blocks';
export { RUNS_PER_BLOCK, blockCount, shardBlocks, reduceNodes, type BlockNode } from './simulation/block-tree';
export { studyStatistics, type StudyStatistics, type QuantityStatistics, type NeesStatistics } from './simulation/study-statistics';
export { findFlags, type SimulationFlag } from './simulation/study-flags';
export { simulationVerdict, simulationJson, formatSimulationSummary, type StudyIdentity } from './simulation/simulation-report';
