import { CAUTION } from '../caution';
import { escapeHtml } from './escape-html';
import { cellText, type ReportBlock, type ReportCell, type ReportTable, type ReviewReport } from './review-report';
import { REPORT_CSS } from './report-stylesheet';
import { renderLineChartSvg } from './svg-line-chart';
import { renderBarChartSvg } from './svg-bar-chart';

/**
 * The report as one self-contained HTML file: inline stylesheet, inline SVG
 * charts, no scripts and no external references (the favicon is an empty
 * data URI, so a browser asks for nothing). Every document text is escaped.
 */
export function renderReviewHtml(report: ReviewReport): string {
  return [
    '<!doctype html>',
    '<html lang="en"><head><meta charset="utf-8">',
    '<meta name="viewport" content="width=device-width, initial-scale=1">',
    `<title>${escapeHtml(report.title)} · design review</title>`,
    '<link rel="icon" href="data:,">',
    `<style>${REPORT_CSS}</style>`,
    '</head><body>',
    `<header><h1>${escapeHtml(report.title)}</h1><p class="subtitle">${escapeHtml(report.subtitle)}</p>`,
    `<p class="caution" role="note">${escapeHtml(CAUTION)}</p></header>`,
    `<nav aria-label="Contents"><ol>${report.sections.map((s) => `<li><a href="#${s.id}">${escapeHtml(s.title)}</a></li>`).join('')}</ol></nav>`,
    ...report.sections.map((s) => `<section id="${s.id}"><h2>${escapeHtml(s.title)}</h2>\n${s.blocks.map((b, i) => blockHtml(b, `${s.id}-${i}`)).join('\n')}</section>`),
    '</body></html>',
    '',
  ].join('\n');
}

function blockHtml(b: ReportBlock, id: string): string {
  switch (b.kind) {
    case 'paragraph':
      return `<p>${escapeHtml(b.text)}</p>`;
    case 'caution':
      return `<p class="caution">${escapeHtml(b.text)}</p>`;
    case 'list':
      return `<ul>${b.items.map((i) => `<li>${escapeHtml(i)}</li>`).join('')}</ul>`;
    case 'definitions':
      return `<dl>${b.items.map(([t, d]) => `<dt>${escapeHtml(t)}</dt><dd>${escapeHtml(d)}</dd>`).join('')}</dl>`;
    case 'table':
      return tableHtml(b);
    case 'chart':
      return `<figure>${renderLineChartSvg(b.chart, id)}<figcaption>${escapeHtml(b.caption)}</figcaption></figure>`;
    case 'bars':
      return `<figure>${renderBarChartSvg(b.chart)}<figcaption>${escapeHtml(b.caption)}</figcaption></figure>`;
  }
}

function tableHtml(t: ReportTable): string {
  const numeric = new Set(t.numericColumns ?? []);
  const cell = (c: ReportCell, i: number) => {
    const value = typeof c === 'string' ? '' : ` data-value="${c.value}"`;
    return `<td${numeric.has(i) ? ' class="num"' : ''}${value}>${escapeHtml(cellText(c))}</td>`;
  };
  return [
    `<table${t.id ? ` id="${escapeHtml(t.id)}"` : ''}><caption>${escapeHtml(t.caption)}</caption>`,
    `<thead><tr>${t.columns.map((c) => `<th scope="col">${escapeHtml(c)}</th>`).join('')}</tr></thead>`,
    `<tbody>${t.rows.map((r) => `<tr>${r.map(cell).join('')}</tr>`).join('\n')}</tbody></table>`,
  ].join('\n');
}
