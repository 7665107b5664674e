/** The comparison as plain text for the terminal: one block per slot, candidates in columns. */
import { CAUTION } from '../report/caution';
import type { CandidateComparison } from './compare-candidates';
import { cheapestText, comparisonTable } from './comparison-table';

/** Widest a candidate's column gets before its cells are cut short. */
const MAX_COLUMN = 16;

/** The whole comparison: a table per slot, the cheapest passing candidate, problems, the caution. */
export function formatComparison(comparison: CandidateComparison, title: string): string {
  const lines = [`${title}: candidates compared`, ''];
  if (comparison.requirementIds.length === 0)
    lines.push(
      'The document gives no requirements, so no candidate can pass; add requirements to compare verdicts.',
      '',
    );
  for (const slot of comparison.slots) {
    const table = comparisonTable(slot);
    lines.push(`Candidates for ${slot.sensorId}${slot.note ? ` (${slot.note})` : ''}`);
    const labelWidth = Math.max(...table.rows.map((r) => r.label.length));
    const widths = table.candidates.map((c, i) =>
      Math.min(MAX_COLUMN, Math.max(c.length, ...table.rows.map((r) => r.cells[i].length))),
    );
    const cell = (text: string, i: number) =>
      text.length > widths[i] ? `${text.slice(0, widths[i] - 1)}…` : text.padStart(widths[i]);
    lines.push(`  ${''.padEnd(labelWidth)}  ${table.candidates.map(cell).join('  ')}`);
    for (const r of table.rows) lines.push(`  ${r.label.padEnd(labelWidth)}  ${r.cells.map(cell).join('  ')}`);
    lines.push(cheapestText(slot));
    for (const o of slot.outcomes) for (const p of o.problems) lines.push(`  ${o.candidateId}: ${p}`);
    lines.push('');
  }
  lines.push(CAUTION, '');
  return lines.join('\n');
}
