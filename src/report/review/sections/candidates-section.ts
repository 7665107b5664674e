import type { ReportBlock, ReportSection } from '../review-report';
import { fmt, type ReviewContext } from '../review-context';
import { cheapestText, compareCandidates, comparisonTable, type SlotComparison } from '../../../compare';
import type { LineChart } from '../svg-line-chart';
import { outageBands } from './sigma-charts-section';

/**
 * The document's candidates side by side (src/compare/): one table per
 * sensor with each candidate's price, verdicts, margins and times to exceed,
 * the cheapest that passes, and one chart per requirement with every
 * candidate's curve over its limit. Each candidate is a full run, made here.
 */
export function candidatesSection(ctx: ReviewContext): ReportSection | undefined {
  if (!ctx.document.candidates?.length) return undefined;
  const comparison = compareCandidates(ctx.document, { fileName: ctx.fileName });
  const blocks: ReportBlock[] = [{
    kind: 'paragraph',
    text: "Each candidate's rows replace its sensor's rows, with the mission, the other sensors and the requirements as written; each is one full covariance run.",
  }];
  for (const slot of comparison.slots) blocks.push(...slotBlocks(ctx, slot));
  return { id: 'candidates', title: 'Candidates compared', blocks };
}

function slotBlocks(ctx: ReviewContext, slot: SlotComparison): ReportBlock[] {
  const table = comparisonTable(slot);
  const blocks: ReportBlock[] = [
    {
      kind: 'table', id: `candidates-${slot.sensorId}`,
      caption: `Candidates for ${slot.sensorId}${slot.note ? ` (${slot.note})` : ''}`,
      columns: ['', ...table.candidates], rows: table.rows.map((r) => [r.label, ...r.cells]),
    },
    { kind: 'paragraph', text: cheapestText(slot) },
  ];
  const problems = slot.outcomes.flatMap((o) => o.problems.map((p) => `${o.candidateId}: ${p}`));
  if (problems.length) blocks.push({ kind: 'list', items: problems });
  for (const id of new Set(slot.outcomes.flatMap((o) => o.curves.map((c) => c.requirementId)))) {
    const curves = slot.outcomes.flatMap((o) => o.curves.filter((c) => c.requirementId === id).map((c) => ({ o, c })));
    const { unit, limit } = curves[0].c;
    const chart: LineChart = {
      title: `${id}: candidates for ${slot.sensorId}`, xLabel: 'mission time (s)', yLabel: `${id} (${unit})`,
      series: curves.map(({ o, c }) => ({ label: o.candidateId, x: c.tS, y: c.values })),
      limits: [{ label: `${id} limit ${fmt(limit)} ${unit}`, value: limit }],
      bands: outageBands(ctx),
    };
    blocks.push({ kind: 'chart', chart, caption: `${id} over the mission for each candidate for ${slot.sensorId} (${unit}); the thick line is the limit, hatched spans are outages.` });
  }
  return blocks;
}
