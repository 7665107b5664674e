import type { ReportSection } from '../review-report';
import type { ReviewContext } from '../review-context';

/** Every value flagged as assumed (nobody measured it or read it from a datasheet): the verdicts rest on these. */
export function assumedSection(ctx: ReviewContext): ReportSection {
  const assumed = ctx.result.model.sources.filter((s) => s.assumed);
  return {
    id: 'assumed', title: 'Assumed values',
    blocks: assumed.length === 0
      ? [{ kind: 'paragraph', text: 'No row is marked as assumed.' }]
      : [
        { kind: 'paragraph', text: `${assumed.length} of ${ctx.result.model.sources.length} sources are assumptions; confirm them before relying on the verdicts.` },
        { kind: 'definitions', items: assumed.map((s) => [s.id, s.provenance || '(no provenance given)']) },
      ],
  };
}
