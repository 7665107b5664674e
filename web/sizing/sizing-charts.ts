import type { LineChart } from '../../src/index';
import { formatSignificant } from '../../src';
import type { OutageAnswer, RowAnswer } from './sizing-protocol';

/**
 * Charts of a sizing answer, as the report's SVG line chart draws them:
 * each requirement's worst value against the swept magnitude (or outage
 * length), with its limit. Requirements in different units are drawn as a
 * fraction of their limit, against one limit line at 1.
 */
export function sizingChart(answer: RowAnswer | OutageAnswer): LineChart {
  const reqs = answer.kind === 'row' ? answer.sweep.requirements : answer.requirements;
  const x = answer.kind === 'row' ? answer.sweep.points.map((p) => p.value) : answer.lengthsS;
  const worstAt = (k: number, i: number) => (answer.kind === 'row' ? answer.sweep.points[k].worst[i] : answer.worst[k][i]);
  const oneUnit = new Set(reqs.map((r) => r.unit)).size === 1;
  const scale = (i: number) => (oneUnit ? 1 : 1 / reqs[i].limit);
  return {
    title: answer.kind === 'row' ? `Worst value against ${answer.rowId}` : `Worst value against the length of ${answer.sensorId} ${answer.outageId}`,
    xLabel: answer.kind === 'row' ? `${answer.rowId} (${answer.unit})` : `length of the outage (s)`,
    yLabel: oneUnit ? `worst value (${reqs[0].unit})` : 'worst value / limit',
    series: reqs.map((r, i) => ({ label: `${r.id} worst`, x, y: x.map((_, k) => worstAt(k, i) * scale(i)) })),
    limits: oneUnit
      ? reqs.map((r) => ({ label: `${r.id} limit ${formatSignificant(r.limit, 4)} ${r.unit}`, value: r.limit }))
      : [{ label: 'limit (each requirement)', value: 1 }],
    bands: [],
  };
}
