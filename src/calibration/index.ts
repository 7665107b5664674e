/**
 * Calibration from a log against known truth: offset and scale factor by
 * least squares, and a check that the residuals are white.
 */
export { fitOffsetAndScaleFactor, type LinearCalibration } from './linear-calibration';
export { checkResidualWhiteness, sampleAutocorrelations, type WhitenessCheck } from './residual-whiteness';
export { chiSquareUpperTail, logGamma } from './chi-square-tail';
export { calibrationReport, checkCalibrationUnit, formatCalibrationText, type CalibrationReport, type ReportedValue } from './calibration-report';
