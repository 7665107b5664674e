/**
 * One chart per requirement with every candidate's curve over the same
 * limit, for the review report and the page (both draw it with the report's
 * SVG line chart, so they look alike).
 */
import type { LineChart } from '../report/review/svg-line-chart';
import { formatSignificant } from '../units';
import type { SlotComparison } from './compare-candidates';

/**
 * The overlaid charts of one slot, in the document's requirement order;
 * outages shaded as the first run that has them gives.
 */
export function candidateCharts(slot: SlotComparison): LineChart[] {
  const ids = [...new Set(slot.outcomes.flatMap((o) => o.curves.map((c) => c.requirementId)))];
  const bands = (slot.outcomes.find((o) => o.outages.length > 0)?.outages ?? []).map((o) => ({
    label: o.label,
    from: o.fromS,
    to: o.toS,
  }));
  return ids.map((id) => {
    const curves = slot.outcomes.flatMap((o) => o.curves.filter((c) => c.requirementId === id).map((c) => ({ o, c })));
    const { unit, limit } = curves[0].c;
    return {
      title: `${id}: candidates for ${slot.sensorId}`,
      xLabel: 'mission time (s)',
      yLabel: `${id} (${unit})`,
      series: curves.map(({ o, c }) => ({ label: o.candidateId, x: c.tS, y: c.values })),
      limits: [{ label: `${id} limit ${formatSignificant(limit, 4)} ${unit}`, value: limit }],
      bands,
    };
  });
}
