import type { ReportSection } from '../review-report';
import { fmt, levelLabel, writtenCell, type ReviewContext } from '../review-context';
import { SENSOR_KINDS } from '../../../sensors/registry';

/** Title, purpose (the document's description), the scenario (legs, sensors, outages) and the caution. */
export function overviewSection(ctx: ReviewContext): ReportSection {
  const doc = ctx.document;
  const verdicts = ctx.json.requirements;
  const held = verdicts.filter((r) => r.verdict === 'pass').length;
  return {
    id: 'overview',
    title: 'Purpose and scenario',
    blocks: [
      ...(ctx.problems.length ? [{ kind: 'caution' as const, text: `PARTIAL: ${ctx.problems.length} cell(s) failed and were left out, so the verdicts cannot be trusted: ${ctx.problems.join('; ')}` }] : []),
      { kind: 'paragraph', text: doc.description ?? 'The document states no purpose (its "description" is empty).' },
      {
        kind: 'definitions',
        items: [
          ['Verdict', verdicts.length ? `${held} of ${verdicts.length} requirements hold` : 'no requirements given'],
          ['Mission', `${fmt(ctx.json.mission.duration_s)} s in ${doc.mission.segments.length} legs${doc.mission.note ? `: ${doc.mission.note}` : ''}`],
          ['Start', `north ${writtenCell(ctx, doc.mission.start.north, 'mission.start.north')}, east ${writtenCell(ctx, doc.mission.start.east, 'mission.start.east')}, heading ${writtenCell(ctx, doc.mission.start.heading, 'mission.start.heading')}`],
          ['Budget tables', `at ${levelLabel(ctx.result.reportLevel)} (DRMS always at 1σ)`],
        ],
      },
      {
        kind: 'table', id: 'legs', caption: 'Legs of the nominal path',
        columns: ['Leg', 'Starts at (s)', 'Duration', 'Speed', 'Speed at end', 'Turn rate'], numericColumns: [1],
        rows: doc.mission.segments.map((seg, i) => {
          const p = `mission.segments[${i}]`;
          return [seg.id ?? `leg ${i + 1}`, fmt(ctx.result.mission.segments[i]?.startS ?? NaN), writtenCell(ctx, seg.duration, `${p}.duration`),
            writtenCell(ctx, seg.speed, `${p}.speed`), seg.speedEnd ? writtenCell(ctx, seg.speedEnd, `${p}.speedEnd`) : 'same', writtenCell(ctx, seg.turnRate, `${p}.turnRate`)];
        }),
      },
      {
        kind: 'table', id: 'sensors', caption: 'Sensors and their outages',
        columns: ['Sensor', 'Kind', 'Rate', 'Outages (s from the start)', 'Note'],
        rows: doc.sensors.map((s, i) => [
          s.id, SENSOR_KINDS[s.kind]?.label ?? s.kind, writtenCell(ctx, s.rate, `sensors[${i}].rate`),
          ctx.json.requirements.length || s.outages?.length ? outageText(ctx, s.id) : '', s.note ?? '',
        ]),
      },
    ],
  };
}

function outageText(ctx: ReviewContext, sensorId: string): string {
  const stream = ctx.result.model.streams.find((s) => s.sensorId === sensorId);
  if (!stream || stream.outages.length === 0) return 'none';
  return stream.outages.map((o) => `${o.id}: ${fmt(o.startS)} to ${fmt(o.endS)}`).join('\n');
}
