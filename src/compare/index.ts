/** Comparing candidate rows for a sensor against one mission and its requirements. */
export { readCandidateSlots, type CandidateEntry, type CandidateSlot } from './candidate-entries';
export { withCandidateRows } from './substitute-rows';
export {
  analyseCandidateDocument,
  MAX_CURVE_POINTS,
  type CandidateAnalyser,
  type CandidateAnalysis,
  type RequirementCurve as CandidateCurve,
} from './candidate-analysis';
export {
  assembleComparison,
  candidateRuns,
  compareCandidates,
  runCandidate,
  type CandidateComparison,
  type CandidateOutcome,
  type CandidateRun,
  type CompareOptions,
  type SlotComparison,
} from './compare-candidates';
export { comparisonTable, cheapestText, type ComparisonRow, type ComparisonTable } from './comparison-table';
export { formatComparison } from './comparison-text';
export { candidateCharts } from './candidate-charts';
export { keepRowsAsCandidate } from './candidate-edits';
