import type { ReportBlock, ReportSection } from '../review-report';
import type { ReviewContext } from '../review-context';
import {
  candidateCharts,
  cheapestText,
  compareCandidates,
  comparisonTable,
  type SlotComparison,
} from '../../../compare';

/**
 * The document's candidates side by side (src/compare/): one table per
 * sensor with each candidate's price, verdicts, margins and times to exceed,
 * the cheapest that passes, and one chart per requirement with every
 * candidate's curve over its limit. Each candidate is a full run, made here.
 */
export function candidatesSection(ctx: ReviewContext): ReportSection | undefined {
  if (!ctx.document.candidates?.length) return undefined;
  const comparison = compareCandidates(ctx.document, { fileName: ctx.fileName });
  const blocks: ReportBlock[] = [
    {
      kind: 'paragraph',
      text:
        "Each candidate's rows replace its sensor's rows, with the mission, the other sensors and the " +
        'requirements as written; each is one full covariance run.',
    },
  ];
  for (const slot of comparison.slots) blocks.push(...slotBlocks(slot));
  return { id: 'candidates', title: 'Candidates compared', blocks };
}

function slotBlocks(slot: SlotComparison): ReportBlock[] {
  const table = comparisonTable(slot);
  const blocks: ReportBlock[] = [
    {
      kind: 'table',
      id: `candidates-${slot.sensorId}`,
      caption: `Candidates for ${slot.sensorId}${slot.note ? ` (${slot.note})` : ''}`,
      columns: ['', ...table.candidates],
      numericColumns: table.candidates.map((_, i) => i + 1),
      rows: table.rows.map((r) => [r.label, ...r.cells]),
    },
    { kind: 'paragraph', text: cheapestText(slot) },
  ];
  const problems = slot.outcomes.flatMap((o) => o.problems.map((p) => `${o.candidateId}: ${p}`));
  if (problems.length) blocks.push({ kind: 'list', items: problems });
  for (const chart of candidateCharts(slot)) {
    blocks.push({
      kind: 'chart',
      chart,
      caption:
        `${chart.title} over the mission, one line per candidate; ` +
        'the thick line is the limit, hatched spans are outages.',
    });
  }
  return blocks;
}
