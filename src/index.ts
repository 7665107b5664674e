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
export {
  buildReviewReport, renderReviewHtml, renderReviewMarkdown, REVIEW_SECTIONS, renderLineChartSvg, TOOL_VERSION,
  type ReviewReport, type ReportProvenance, type SizingRequest, type SectionBuilder, type LineChart,
} from './report/review';
export { linearTicks, formatTickValues, type AxisTicks } from './report/tick-labels';
export { sizableRowIds, requirementsWith } from './budget/sizing';
export { sweepRow, sweepValues, type RowSweep, type SweepPoint } from './budget/row-sweep';
export { longestOutage, requirementsWithOutage, outageSpan, type OutageLimit, type OutageRef } from './budget/outage-sizing';
export { formatToTolerance } from './report/tolerance-text';

// One function from document to result, for the command line, the page's worker and library users.
export { analyseDocument, type AnalyseOptions, type AnalysisBlock, type DocumentAnalysis } from './analyse-document';
export { analyseParsedDocument } from './analyse-parsed-document';

// Budget documents: types, parsing with validation, canonical writing, paths into them.
export * from './document';
export { getAtPath, joinSteps, setAtPath, splitPath } from './document/document-path';
export { BudgetWorkbook, evaluateBudgetDocument, documentPathOf } from './sheet';
export type { CellError, CellErrorKind, CellLocation, OmittedItem, SheetEvaluation } from './sheet';

// Reports: the JSON result (its entry types prefixed Result: the document has its own CheckpointEntry and
// RequirementEntry), the text summary, the caution, the page's view of a result.
export {
  buildJsonResult, keptSteps, type JsonResult, type CheckpointBudgetEntry, type OutageHoldEntry,
  type CheckpointEntry as ResultCheckpointEntry, type RequirementEntry as ResultRequirementEntry,
} from './report/json-result';
export { jsonChunks, type JsonChunkOptions } from './report/json-chunks';
export { formatSummary } from './report/text-summary';
export type { NoiseTrace, TracedEntry, TracedPiece } from './report/noise-trace';
export { CAUTION } from './report/caution';
export { computeView, viewFromSheet, MAX_CHART_POINTS, type ViewResult, type PlanView, type RequirementCurve } from './report/view-result';
export { ViewSession } from './report/view-session';

// Edits of a document shared by the page and the command line.
export { allanCandidates, type TermCandidate, type TermMethod, type WritableTermId } from './edits/allan-rows';
export { calibrationCandidates, whitenessClause, type CalibrationCandidate } from './edits/calibration-rows';
export { cellText, formatValue, isFormula, readCellText } from './edits/cell-text';
export { changeUnit } from './edits/change-unit';
export { idProblem, isTaken, sensorIdProblem, uniqueId, valueNameProblem } from './edits/ids';
export { ALLAN_TARGET_KIND, CALIBRATION_TARGET_KIND, sensorsOfKind, type TargetSensor } from './edits/log-targets';
export { isoDate } from './edits/provenance-text';
export { renameRowReferences, renameSensorReferences, renameValueReferences } from './edits/references';
export { sameSourceRows, writeRows, type RowPlan, type WrittenRow } from './edits/row-writer';
export { ALL_UNITS, defaultUnit, kindTakes, rowDimensions, unitGroups } from './edits/unit-choices';

// Sensor logs: Allan deviation and IEEE Std 952 terms, calibration against truth.
export type { NoiseTermRow } from './allan/allan-analysis';
export { analyseLogColumn, resolveLogKind, type LogAllanResult } from './allan/log-allan';
export { detectDelimiter, readHeader } from './allan/log-header';
export type { LogParseOptions, SensorLogTable } from './allan/log-table';
export { termDeviation } from './allan/noise-terms';
export { MAX_LINE_CHARS, SensorLogReader } from './allan/parse-log';
export { ALLAN_SENSOR_KINDS, SENSOR_TERM_UNITS, type AllanSensorKind } from './allan/sensor-term-units';
export { calibrationReport, checkCalibrationUnit, type CalibrationReport } from './calibration/calibration-report';
export { fitOffsetAndScaleFactor } from './calibration/linear-calibration';
export { checkResidualWhiteness } from './calibration/residual-whiteness';

// The rest of what the page uses (web/ imports the engine only from this entry: test/web-imports.test.ts).
export { QUANTITIES, quantitySpec, type QuantityId, type QuantitySpec } from './inputs/quantities';
export { OPTION_FIELDS, optionFieldsOf, rowOptionFor, type RowOption } from './edits/row-options';
export type { OptionField } from './sources/source-kind';
export { markdownText, neutraliseCell, restoreCell } from './report/spreadsheet-safe';
export { firstInvalidUtf8Byte, invalidUtf8Message } from './document/invalid-utf8';
export type { FilterDesignJson } from './report/filter-design-json';

// 3-D (inertial) budget documents: their workbook and evaluation to InertialBudgetInput.
export { CellSheet, InertialWorkbook, evaluateInertialDocument } from './sheet';
export type { InertialIndexMap, InertialSheetEvaluation, ReadCells } from './sheet';

// The page's view of 3-D budgets: series, shares, verdicts and path of an inertial document.
export {
  inertialViewFromSheet, type InertialView, type InertialLine, type InertialShareEntry, type InertialViewVerdict,
} from './report/inertial-view-result';
export { INERTIAL_REQUIREMENT_QUANTITIES } from './inertial/inertial-quantities';
export { inertialLimitDimension } from './budget/inertial-requirements';

// Comparing candidate rows for a sensor (src/compare/) and grade presets to start a sensor from.
export * from './compare';
export { GRADE_PRESETS, presetRows, presetsFor, type GradePreset, type AcceptedRows } from './presets/grade-presets';
// The Monte Carlo check's plain-data model shape, its JSON and its reader (the page's workers, report --simulation).
export type { StudyShape } from './simulation/monte-carlo-model';
export { readSimulationJson, type SimulationJson } from './simulation/simulation-json';
export type { StudySums } from './simulation/study-sums';
export { inertialSimulation, InertialSimulation } from './inertial/monte-carlo/inertial-simulation';

// Filter model versus truth on the page: the assumption sensitivity, the R sweep, the tuning editors' choices.
export { assumptionSensitivity, type SensitivityEntry, type SensitivityOptions } from './sensitivity/assumption-sensitivity';
export { sweepFilterR, DEFAULT_R_SCALES, type RSweep, type RSweepValue } from './suboptimal/r-sweep';
export { tuningModels, type TuningModelChoice } from './suboptimal/tuning-choices';
export { runTruthVersusFilterProblem, type TruthVersusFilterProblem, type TruthVersusFilterRun } from './suboptimal/run-truth-versus-filter-problem';
export { runInertialTruthVersusFilter, truthMapByName, type InertialTruthVersusFilter } from './suboptimal/inertial-truth-versus-filter';
