import type { ReportSection } from '../review-report';
import type { ReviewContext } from '../review-context';

/** What a reviewer needs to rerun the analysis: the file, its SHA-256, the tool's version, the numerical status. */
export function rerunSection(ctx: ReviewContext): ReportSection {
  const issues = ctx.json.status.issues;
  return {
    id: 'rerun', title: 'How to rerun',
    blocks: [
      {
        kind: 'definitions',
        items: [
          ['File', ctx.fileName],
          ['SHA-256', ctx.documentSha256],
          ['Tool', `Sigma Ledger ${ctx.toolVersion}`],
          ['Rerun', `sigma-ledger run ${ctx.fileName} --json (the numbers of this report, at full precision)`],
          ['Numerical status', issues.length === 0 ? 'the covariance stayed finite, symmetric and positive semi-definite' : issues.map((i) => `${i.kind} at ${i.tS} s: ${i.detail}`).join('; ')],
        ],
      },
    ],
  };
}
