/**
 * Windows of use of an aiding sensor (a zero-velocity update at declared
 * stops only, budgets/FORMAT.md "3-D budgets"): each window must lie where
 * the nominal motion is at rest, and the sensor is unavailable outside its
 * windows, which the schedule reads as half-open gaps like outages.
 */
import { InputError } from '../../errors';
import type { SensorInput } from '../../inputs/budget-input';
import { TIME_SLACK_S } from '../../mission/nominal-trajectory';
import { resolveOutages } from '../../sensors/sensor-kind';
import { WINDOW_KINDS, type AidingInput } from '../inertial-input';
import type { ResolvedInertialMission } from '../inertial-mission';
import type { InertialStream } from '../inertial-model';

/** The first segment overlapping [startS, endS) in which the vehicle moves, or undefined. */
function movingSegment(m: ResolvedInertialMission, startS: number, endS: number): number | undefined {
  const i = m.segments.findIndex((s, k) => s.endS > startS + TIME_SLACK_S && s.startS < endS - TIME_SLACK_S
    && (s.speedStartMps !== 0 || s.speedEndMps !== 0 || m.verticalSpeedMps[k] !== 0));
  return i < 0 ? undefined : i;
}

/**
 * The gaps between a sensor's windows of use, within the mission (none
 * without windows).
 * @throws InputError naming the window: one outside the mission, empty, or
 *   overlapping a segment with motion (speed or vertical speed not zero);
 *   or `windows` on a kind that takes none.
 */
export function windowGaps(sensor: AidingInput, path: string, m: ResolvedInertialMission): InertialStream['outages'] {
  if (sensor.windows === undefined) return [];
  if (!WINDOW_KINDS.includes(sensor.kind)) {
    throw new InputError(`${path}.windows`, `only ${WINDOW_KINDS.join(', ')} sensors have windows of use`);
  }
  // Windows are spans like outages: the same checks, with the same messages.
  const spans = resolveOutages(sensor as unknown as SensorInput, { path, missionDurationS: m.durationS }, 'windows').map((w, i) => ({ ...w, index: i }));
  for (const w of spans) {
    const k = movingSegment(m, w.startS, w.endS);
    if (k !== undefined) {
      const s = m.segments[k];
      throw new InputError(`${path}.windows[${w.index}]`, `${w.startS} to ${w.endS} s overlaps ${s.label} (${s.startS} to ${s.endS} s), where the vehicle moves; a zero-velocity update holds only at a stop (speed and vertical speed zero)`);
    }
  }
  const sorted = [...spans].sort((a, b) => a.startS - b.startS);
  const gaps: InertialStream['outages'] = [];
  let fromS = 0;
  for (const w of sorted) {
    if (w.startS > fromS + TIME_SLACK_S) gaps.push({ id: `before window ${w.index + 1}`, startS: fromS, endS: w.startS, gap: true });
    fromS = Math.max(fromS, w.endS);
  }
  // The last boundary counts as inside the mission, so the gap runs past it (outages are half-open).
  if (fromS < m.durationS + TIME_SLACK_S) gaps.push({ id: 'after the last window', startS: fromS, endS: m.durationS + 1, gap: true });
  return gaps;
}
