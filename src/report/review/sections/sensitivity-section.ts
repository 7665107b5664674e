import type { ReportSection } from '../review-report';
import { fmt, type ReviewContext } from '../review-context';

/** Bars shown in the ranking chart (the table lists every entry). */
const CHART_BARS = 20;

/**
 * Which assumptions matter, when asked for: every value marked assumed (and
 * the rows picked) scaled over the range one at a time, ranked by the change
 * in each requirement's worst value relative to its base (the numbers of
 * `sigma-ledger sensitivity --json`).
 */
export function sensitivitySection(ctx: ReviewContext): ReportSection | undefined {
  const s = ctx.sensitivity;
  if (!s) return undefined;
  const title = 'Sensitivity to the assumptions';
  if ('problem' in s) return { id: 'sensitivity', title, blocks: [{ kind: 'paragraph', text: `Not run: ${s.problem}` }] };
  const range = `×${fmt(s.range[0])} to ×${fmt(s.range[1])}`;
  if (s.entries.length === 0) {
    return { id: 'sensitivity', title, blocks: [{ kind: 'paragraph', text: `No value is marked assumed and no row was picked, so nothing was varied (range ${range}).` }] };
  }
  return {
    id: 'sensitivity', title,
    blocks: [
      { kind: 'paragraph', text: `Each value is scaled from ${range} on its own, everything else as written; a correlation time is varied apart from its magnitude. With a filter design the requirement is judged on the actual error.` },
      {
        kind: 'bars', caption: `Largest change in each requirement's worst value, as a percentage of its base worst value, largest first (the first ${Math.min(CHART_BARS, s.entries.length)}).`,
        chart: {
          title: 'Which assumptions matter', xLabel: 'largest change in the worst value (% of the base worst)',
          bars: s.entries.slice(0, CHART_BARS).map((e) => ({ label: `${e.target} → ${e.requirementId}`, value: 100 * e.relativeChange })),
        },
      },
      {
        kind: 'table', id: 'sensitivity', caption: 'Every varied value against every requirement, largest relative change first',
        columns: ['Value', 'Requirement', 'Base worst', 'At low', 'At high', 'Largest change', 'Relative change'], numericColumns: [2, 3, 4, 5, 6],
        rows: s.entries.map((e) => [
          `${e.target}${e.assumed ? ' (assumed)' : ' (picked)'}`, e.requirementId,
          { text: `${fmt(e.baseWorst)} ${e.unit}`, value: e.baseWorst },
          { text: `${fmt(e.byScale[0].worst)} ${e.unit}`, value: e.byScale[0].worst },
          { text: `${fmt(e.byScale[e.byScale.length - 1].worst)} ${e.unit}`, value: e.byScale[e.byScale.length - 1].worst },
          { text: `${fmt(e.change)} ${e.unit}`, value: e.change },
          { text: `${(100 * e.relativeChange).toFixed(1)} %`, value: e.relativeChange },
        ]),
      },
    ],
  };
}
