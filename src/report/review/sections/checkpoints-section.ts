import type { ReportCell, ReportSection, ReportTable } from '../review-report';
import { fmt, levelLabel, numCell, type ReviewContext } from '../review-context';
import type { CheckpointEntry } from '../../json-result';

/** The budget at each checkpoint: every quantity's σ and value at the report level, and every source's share of the variance. */
export function checkpointsSection(ctx: ReviewContext): ReportSection {
  const cps = ctx.json.checkpoints;
  return {
    id: 'checkpoints', title: 'Budgets at checkpoints',
    blocks: cps.length === 0
      ? [{ kind: 'paragraph', text: 'The document names no checkpoints.' }]
      : [
        { kind: 'paragraph', text: `Values "at level" are at ${levelLabel(ctx.result.reportLevel)} (DRMS stays at 1σ). A source's share is its fraction of the variance; the shares of a quantity add up to 100 %.` },
        ...cps.map(checkpointTable),
      ],
  };
}

function checkpointTable(cp: CheckpointEntry): ReportTable {
  const rows: ReportCell[][] = cp.budgets.flatMap((b) => [
    [b.quantity, `total (${b.unit})`, numCell(b.sigma), numCell(b.atLevel), '100 %'],
    ...b.sources.map((s): ReportCell[] => [b.quantity, s.id, numCell(s.sigma), numCell(s.atLevel), { text: `${fmt(100 * s.share)} %`, value: s.share }]),
  ]);
  return {
    kind: 'table', id: `checkpoint-${cp.id}`, caption: `${cp.id} at t = ${numCell(cp.t_s).text} s`,
    columns: ['Quantity', 'Source', 'σ', `At ${levelLabel(cp.level)}`, 'Share of variance'], numericColumns: [2, 3, 4], rows,
  };
}
