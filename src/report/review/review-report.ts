/**
 * The design-review report as data: an ordered list of sections, each a list
 * of blocks (paragraphs, tables, charts, lists). The HTML and Markdown
 * renderers read only this, so a section added to REVIEW_SECTIONS appears
 * in both formats without touching either renderer.
 */
import type { LineChart } from './svg-line-chart';
import type { BarChart } from './svg-bar-chart';

/** A table cell: text, or a number shown as `text` whose full value is kept for checks. */
export type ReportCell = string | { text: string; value: number };

/** A table with a caption; `rows` are cells in column order. */
export interface ReportTable {
  kind: 'table';
  caption: string;
  columns: string[];
  /** Indices of columns holding numbers (right-aligned). */
  numericColumns?: number[];
  rows: ReportCell[][];
  /** Stable id for tests and anchors, e.g. "noise-r". */
  id?: string;
}

/** A block of a section. */
export type ReportBlock =
  | { kind: 'paragraph'; text: string }
  | { kind: 'caution'; text: string }
  | { kind: 'list'; items: string[] }
  | { kind: 'definitions'; items: [term: string, text: string][] }
  | ReportTable
  | { kind: 'chart'; chart: LineChart; caption: string }
  | { kind: 'bars'; chart: BarChart; caption: string };

/** One section of the report; `id` is its anchor. */
export interface ReportSection {
  id: string;
  title: string;
  blocks: ReportBlock[];
}

/** The whole report, ready to render. */
export interface ReviewReport {
  title: string;
  /** One line under the title: file, hash, tool version. */
  subtitle: string;
  sections: ReportSection[];
}

/** The text of a cell. */
export function cellText(c: ReportCell): string {
  return typeof c === 'string' ? c : c.text;
}
