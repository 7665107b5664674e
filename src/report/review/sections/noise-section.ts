import type { ReportCell, ReportSection, ReportTable } from '../review-report';
import { fmt, type ReviewContext } from '../review-context';
import type { TracedEntry } from '../../noise-trace';
import { withUnit } from '../../../units';

/**
 * Every R, Q and P0 entry with the chain from its row through each unit
 * conversion and the formula applied to the SI value, one table row per
 * piece (an entry several rows share has one table row per row).
 */
export function noiseSection(ctx: ReviewContext): ReportSection {
  const { r, q, p0 } = ctx.json.noise;
  return {
    id: 'noise', title: 'R, Q and P0 traced to rows',
    blocks: [
      { kind: 'paragraph', text: 'R is the variance of each scalar measurement; Q the continuous power spectral density of each noise input (discretised per step by Van Loan\'s method); P0 the initial variance of each state. Each piece names its row, shows the row as written, each unit conversion to SI and the formula that gives the piece.' },
      entryTable(ctx, 'noise-r', 'R: measurement noise variance per scalar measurement', r),
      entryTable(ctx, 'noise-q', 'Q: continuous PSD per noise input', q),
      entryTable(ctx, 'noise-p0', 'P0: initial variance per state', p0),
    ],
  };
}

function entryTable(ctx: ReviewContext, id: string, caption: string, entries: TracedEntry[]): ReportTable {
  const sources = new Map(ctx.json.mission.sources.map((s) => [s.id, s]));
  const rows: ReportCell[][] = entries.flatMap((e) => e.pieces.map((p) => {
    const src = sources.get(p.sourceId);
    const chain = [...p.conversions, p.derivation].join('\n→ ');
    const origin = [p.sourceId, src?.provenance ? `“${src.provenance}”` : '(no provenance)', src?.assumed ? 'ASSUMED' : ''].filter(Boolean).join('\n');
    return [e.name, { text: withUnit(fmt(e.totalSI), e.unitSI), value: e.totalSI }, origin, chain, { text: withUnit(fmt(p.valueSI), e.unitSI), value: p.valueSI }];
  }));
  return {
    kind: 'table', id, caption, numericColumns: [1, 4],
    columns: ['Entry', 'Total (SI)', 'Row, provenance, assumed?', 'Row value → unit conversions → formula', 'Piece (SI)'],
    rows: rows.length ? rows : [['none', '', '', '', '']],
  };
}

