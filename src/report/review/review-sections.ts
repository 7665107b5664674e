/**
 * The report's sections in reading order. Each builder reads the context and
 * returns one section (or nothing when it does not apply); a new result
 * (filter-vs-truth, simulation) adds its builder here with one line and both
 * renderers pick it up.
 */
import type { ReportSection } from './review-report';
import type { ReviewContext } from './review-context';
import { overviewSection } from './sections/overview-section';
import { requirementsSection } from './sections/requirements-section';
import { sigmaChartsSection } from './sections/sigma-charts-section';
import { checkpointsSection } from './sections/checkpoints-section';
import { sizingSection } from './sections/sizing-section';
import { modelSection } from './sections/model-section';
import { sensorRowsSection } from './sections/sensor-rows-section';
import { noiseSection } from './sections/noise-section';
import { calibrationSection } from './sections/calibration-section';
import { assumedSection } from './sections/assumed-section';
import { rerunSection } from './sections/rerun-section';
import { candidatesSection } from './sections/candidates-section';
import { monteCarloSection } from './sections/monte-carlo-section';
import { filterDesignSection } from './sections/filter-design-section';
import { sensitivitySection } from './sections/sensitivity-section';
import { rSweepSection } from './sections/r-sweep-section';

/** Builds one section from the context; undefined leaves it out. */
export type SectionBuilder = (ctx: ReviewContext) => ReportSection | undefined;

/** Every section, in the order the report shows them. */
export const REVIEW_SECTIONS: readonly SectionBuilder[] = [
  overviewSection,
  requirementsSection,
  sigmaChartsSection,
  checkpointsSection,
  sizingSection,
  candidatesSection,
  monteCarloSection,
  filterDesignSection,
  sensitivitySection,
  rSweepSection,
  modelSection,
  sensorRowsSection,
  noiseSection,
  calibrationSection,
  assumedSection,
  rerunSection,
];
