import { CAUTION } from '../caution';
import { cellText, type ReportBlock, type ReportTable, type ReviewReport } from './review-report';

/**
 * The report as Markdown (GitHub-flavoured tables). Charts cannot be drawn
 * in plain Markdown: each is replaced by its caption and its series' names,
 * and the numbers behind it are in the tables and in `run --json`.
 */
export function renderReviewMarkdown(report: ReviewReport): string {
  return [
    `# ${report.title}`, '', report.subtitle, '', `> **Caution.** ${CAUTION}`, '',
    ...report.sections.flatMap((s) => [`## ${s.title}`, '', ...s.blocks.flatMap((b) => [blockMarkdown(b), ''])]),
  ].join('\n');
}

/** Markdown-safe inline text: pipes escaped, line breaks as <br>. */
function inline(text: string): string {
  return text.replace(/\\/g, '\\\\').replace(/\|/g, '\\|').replace(/\n/g, '<br>');
}

function blockMarkdown(b: ReportBlock): string {
  switch (b.kind) {
    case 'paragraph':
      return b.text;
    case 'caution':
      return `> **${b.text}**`;
    case 'list':
      return b.items.map((i) => `- ${i}`).join('\n');
    case 'definitions':
      return b.items.map(([t, d]) => `- **${t}:** ${d}`).join('\n');
    case 'table':
      return tableMarkdown(b);
    case 'chart':
      return `*Chart (in the HTML report): ${b.chart.title}: ${b.chart.series.map((s) => s.label).join(', ')}. ${b.caption}*`;
    case 'bars':
      return `*Bar chart (in the HTML report): ${b.chart.title}. ${b.caption}*`;
  }
}

function tableMarkdown(t: ReportTable): string {
  const numeric = new Set(t.numericColumns ?? []);
  return [
    `**${inline(t.caption)}**`, '',
    `| ${t.columns.map(inline).join(' | ')} |`,
    `| ${t.columns.map((_, i) => (numeric.has(i) ? '---:' : '---')).join(' | ')} |`,
    ...t.rows.map((r) => `| ${r.map((c) => inline(cellText(c))).join(' | ')} |`),
  ].join('\n');
}
