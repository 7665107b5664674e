/**
 * Datasets of the 3-D findings' time plots: the chosen lines of an
 * InertialView in palette colours, each requirement on those quantities as
 * its quantity at its level (thin) and its limit as a dashed line over the
 * requirement's window.
 */
import type { InertialView, RequirementCurve } from '../../src';
import { LIMIT_DASH, seriesColour } from '../styles/palette';
import type { LineDataset } from './chart-controller';
import { levelText } from './findings-text';

/** One 3-D time plot: the lines it draws and the requirement quantities it carries. */
export interface InertialPlotSpec {
  key: string;
  title: string;
  unit: string;
  lines: string[];
  quantities: string[];
}

/** The 3-D time plots, in page order. */
export const INERTIAL_PLOTS: InertialPlotSpec[] = [
  {
    key: 'position',
    title: 'horizontal position σ (m)',
    unit: 'm',
    lines: ['north', 'east', 'drms', 'r95'],
    quantities: ['north', 'east', 'drms', 'horizontal', 'along', 'cross'],
  },
  { key: 'height', title: 'height σ (m)', unit: 'm', lines: ['height'], quantities: ['height', 'down', 'mrse'] },
  {
    key: 'attitude',
    title: 'attitude σ (deg)',
    unit: 'deg',
    lines: ['roll', 'pitch', 'yaw'],
    quantities: ['roll', 'pitch', 'yaw'],
  },
  {
    key: 'velocity',
    title: 'velocity σ (m/s)',
    unit: 'm/s',
    lines: ['velocityNorth', 'velocityEast', 'velocityDown'],
    quantities: ['velocityNorth', 'velocityEast', 'velocityDown', 'speed'],
  },
];

/**
 * The datasets of one plot; the requirement window comes from the view's
 * verdict of the same id (its worst time lies inside the window), so the
 * limit is drawn where the requirement applies: over the whole mission when
 * it has no window.
 */
export function inertialPlotDatasets(
  view: InertialView,
  curves: RequirementCurve[],
  spec: InertialPlotSpec,
  windows: Map<string, [number, number]>,
): LineDataset[] {
  const sets: LineDataset[] = spec.lines
    .filter((id) => view.lines[id])
    .map((id, i) => ({
      label: `${view.lines[id].label} ${id === 'r95' || id === 'cep' ? '' : '1σ'}`.trim(),
      data: view.lines[id].values,
      borderColor: seriesColour(i),
      backgroundColor: seriesColour(i),
      borderWidth: 1.6,
      pointRadius: 0,
    }));
  curves
    .filter((c) => spec.quantities.includes(c.quantity))
    .forEach((c, j) => {
      const colour = seriesColour(spec.lines.length + j);
      const [startS, endS] = windows.get(c.id) ?? [-Infinity, Infinity];
      const inside = (k: number) => view.t[k] >= startS && view.t[k] <= endS;
      if (c.level !== '1sigma' || !spec.lines.includes(c.quantity)) {
        sets.push({
          label: `${c.id}: ${c.quantity} ${levelText(c.level)}`,
          data: c.values,
          borderColor: colour,
          backgroundColor: colour,
          borderWidth: 1,
          pointRadius: 0,
        });
      }
      sets.push({
        label: `${c.id} limit ${c.limit} ${c.unit}`,
        data: view.t.map((_t, k) => (inside(k) ? c.limit : null)),
        borderColor: colour,
        backgroundColor: colour,
        borderDash: LIMIT_DASH,
        borderWidth: 1.2,
        pointRadius: 0,
      });
    });
  return sets;
}
