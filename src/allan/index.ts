/**
 * Allan variance of sensor logs, in data-flow order: parse a log, compute
 * the curve, read and fit the IEEE Std 952 noise terms, label them in trade
 * units. Pure TypeScript; the CLI reads files and feeds text chunks.
 */
export { SensorLogReader, parseSensorLog, MAX_LINE_CHARS, type LogParseOptions, type SensorLogTable } from './parse-log';
export { checkTimeAxis, DEFAULT_GAP_TOLERANCE, type TimeAxis } from './time-axis';
export {
  angleAllanVariance, anglesFromIncrements, centredCumulativeSum, nonOverlappingAllanVariance, overlappingAllanVariance,
} from './allan-estimators';
export { DEFAULT_POINTS_PER_DECADE, logSpacedClusterSizes } from './cluster-sizes';
export { allanPercentageError } from './percentage-error';
export {
  allanDeviationCurve, allanDeviationCurveFromIncrements, MIN_ALLAN_SAMPLES,
  type AllanCurve, type AllanCurveOptions, type AllanEstimator,
} from './allan-curve';
export { NOISE_TERMS, noiseTerm, termDeviation, type NoiseTermId, type NoiseTermShape } from './noise-terms';
export { localLogLogSlopes, fixedSlopeLineAt, type CurvePoints } from './log-log-lines';
export { readTermBySlope, type TermReading, type SlopeReadOptions } from './slope-readoff';
export { readBiasInstabilityFloor } from './floor-reading';
export { fitNoiseTerms, type FittedTerm, type TermFit } from './term-fit';
export { nonNegativeLeastSquares, type NnlsSolution } from './nnls-subsets';
export { ALLAN_SENSOR_KINDS, SENSOR_TERM_UNITS, kindFromDimension, type AllanSensorKind, type TermLabel } from './sensor-term-units';
export { analyseAllanCurve, type AllanAnalysis, type NoiseTermRow, type BiasInstabilityRow } from './allan-analysis';
export { analyseLogColumn, resolveLogKind, type LogAllanRequest, type LogAllanResult, type AllanPoint } from './log-allan';
