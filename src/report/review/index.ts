/** The design-review report: build it from a document, render it as HTML or Markdown. */
export { buildReviewReport, type ReviewAnalyses, type SizingRequest } from './build-review-report';
export { renderReviewHtml } from './render-review-html';
export { renderReviewMarkdown } from './render-review-markdown';
export type { ReviewReport, ReportSection, ReportBlock, ReportTable, ReportCell } from './review-report';
export type { ReportProvenance, ReviewContext } from './review-context';
export { REVIEW_SECTIONS, type SectionBuilder } from './review-sections';
export { renderLineChartSvg, type LineChart, type ChartSeries } from './svg-line-chart';
export { TOOL_VERSION } from '../tool-version';
export { renderBarChartSvg, type BarChart } from './svg-bar-chart';
