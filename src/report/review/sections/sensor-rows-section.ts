import type { ReportSection, ReportTable } from '../review-report';
import { writtenCell, type ReviewContext } from '../review-context';

const assumedText = (a: boolean) => (a ? 'ASSUMED' : 'no');

/** Every error-source row as written: value (formula and its number), unit, extra cells, provenance and the assumed flag; the start pose first. */
export function sensorRowsSection(ctx: ReviewContext): ReportSection {
  const m = ctx.document.mission;
  const start: ReportTable = {
    kind: 'table', id: 'rows-mission', caption: 'mission: start-pose uncertainty (1σ)',
    columns: ['Row', 'Kind', 'Value', 'Other cells', 'Provenance', 'Assumed'],
    rows: [
      ['mission.initialPosition', 'initial position (per axis)', writtenCell(ctx, m.initialPosition, 'mission.initialPosition'), '', m.initialPosition.provenance, assumedText(m.initialPosition.assumed)],
      ['mission.initialHeading', 'initial heading', writtenCell(ctx, m.initialHeading, 'mission.initialHeading'), '', m.initialHeading.provenance, assumedText(m.initialHeading.assumed)],
    ],
  };
  const sensors: ReportTable[] = ctx.document.sensors.map((s, i) => ({
    kind: 'table', id: `rows-${s.id}`, caption: `${s.id}: error sources`,
    columns: ['Row', 'Kind', 'Value', 'Other cells', 'Provenance', 'Assumed'],
    rows: s.sources.map((row, j) => {
      const p = `sensors[${i}].sources[${j}]`;
      const other = [
        row.correlationTime && `correlation time ${writtenCell(ctx, row.correlationTime, `${p}.correlationTime`)}`,
        row.rate && `rate ${writtenCell(ctx, row.rate, `${p}.rate`)}`,
        row.biasForm && `given as ${row.biasForm}`, row.densitySides && `${row.densitySides}-sided density`,
        row.quantum && `${row.quantum} quantum`, row.multipathModel && `multipath ${row.multipathModel}`, row.component && `component ${row.component}`,
      ].filter(Boolean);
      return [`${s.id}.${row.id}`, row.kind, writtenCell(ctx, row, p), other.join('\n'), row.provenance + (row.note ? `\n(${row.note})` : ''), assumedText(row.assumed)];
    }),
  }));
  return {
    id: 'rows', title: 'Sensor rows as written',
    blocks: [
      { kind: 'paragraph', text: 'Each row exactly as the document holds it; a formula is shown with the number it gave, in the cell\'s own unit.' },
      start, ...sensors,
    ],
  };
}
