import type { ReportSection } from '../review-report';
import { fmt, type ReviewContext } from '../review-context';
import type { SizingResult } from '../../../budget/sizing';
import { withUnit } from '../../../units';
import { formatToTolerance } from '../../tolerance-text';

/** The sizing runs the document asks for: each row's largest value that still meets its requirement. */
export function sizingSection(ctx: ReviewContext): ReportSection | undefined {
  if (ctx.sizing.length === 0) return undefined;
  return {
    id: 'sizing', title: 'Largest allowable values',
    blocks: [
      { kind: 'paragraph', text: 'Each row\'s magnitude is bisected with everything else as written (docs/planar-model.md §9); valid because the covariance of an optimal filter never decreases when a noise magnitude grows.' },
      {
        kind: 'table', id: 'sizing', caption: 'Sizing runs', columns: ['Row', 'Requirement', 'Written', 'Largest passing', 'Worst there', 'Outcome'], numericColumns: [3],
        rows: ctx.sizing.map((s) => ('problem' in s
          ? [s.sourceId, s.requirementId, '', '', '', `not run: ${s.problem}`]
          : [s.sourceId, s.requirementId, writtenValue(ctx, s), sizedCell(s), worstText(s), outcomeText(s)])),
      },
    ],
  };
}

function writtenValue(ctx: ReviewContext, s: SizingResult): string {
  const [sensorId, rowId] = [s.sourceId.slice(0, s.sourceId.indexOf('.')), s.sourceId.slice(s.sourceId.indexOf('.') + 1)];
  const row = ctx.input.sensors.find((x) => x.id === sensorId)?.sources.find((r) => r.id === rowId);
  return row ? withUnit(fmt(row.value.value), row.value.unit) : '';
}

function worstText(s: SizingResult): string {
  const r = s.atLargestPassing;
  return r ? `${fmt(r.worstValue)} ${r.limit.unit} (limit ${fmt(r.limit.value)})` : '';
}

function outcomeText(s: SizingResult): string {
  if (s.outcome === 'never-passes') return 'fails even at zero: other sources must improve first';
  if (s.outcome === 'always-passes') return `holds for every value tried (${s.stoppedBecause})`;
  return `fails from ${fmt(s.smallestFailing!)} (${s.trials} runs)`;
}

function sizedCell(s: SizingResult) {
  const t = formatToTolerance(s.largestPassing, s.tolerance);
  return { text: s.tolerance > 0 ? `${withUnit(t.value, s.unit)} ± ${t.tolerance}` : withUnit(fmt(s.largestPassing), s.unit), value: s.largestPassing };
}
