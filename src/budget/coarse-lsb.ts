/**
 * A quantisation row is modelled as white noise of variance q²/12 per
 * sample (Widrow, Kollár & Liu 1996), which holds only when the input moves
 * across many LSBs between samples. An LSB larger than the motion the
 * sensor must resolve (a rate LSB of 4.3 deg/s on a vehicle that turns at
 * 1.5 deg/s) turns the error into a bias of up to q/2 that does not
 * average out, so the budget is optimistic; the analysis still runs and
 * says so in its status.
 */
import type { SensorInput } from '../inputs/budget-input';
import type { ResolvedMission } from '../mission/resolve-mission';
import { formatSignificant, fromSI, toSI, unitDimension } from '../units';

/** A caution about a row that the analysis ran with but does not model well. */
export interface ModelWarning {
  /** The row, as sensorId.rowId. */
  source: string;
  message: string;
}

/** What each dead-reckoning sensor's LSB resolves, from the mission. */
function largestMotion(mission: ResolvedMission): { 'angular-rate': number; speed: number } {
  let rate = 0, speed = 0;
  for (const s of mission.segments) {
    rate = Math.max(rate, Math.abs(s.turnRateRadps));
    speed = Math.max(speed, s.speedStartMps, s.speedEndMps);
  }
  return { 'angular-rate': rate, speed };
}

/**
 * A warning for every rate or speed LSB larger than the mission's fastest
 * turn or speed (none when the mission never turns, or never moves).
 * Rows whose value does not convert are skipped: the engine refuses them
 * at their field. Throws nothing.
 */
export function coarseLsbWarnings(sensors: SensorInput[], mission: ResolvedMission): ModelWarning[] {
  const motion = largestMotion(mission);
  const warnings: ModelWarning[] = [];
  for (const sensor of sensors) {
    for (const row of sensor.sources ?? []) {
      if (row.kind !== 'quantisation') continue;
      const dim = unitDimension(row.value?.unit);
      if (dim !== 'angular-rate' && dim !== 'speed') continue;
      let lsbSI: number;
      try {
        lsbSI = toSI(row.value.value, row.value.unit, dim, '');
      } catch {
        continue;
      }
      const largest = motion[dim];
      if (!(largest > 0) || lsbSI <= largest) continue;
      const u = row.value.unit, show = (si: number) => `${formatSignificant(fromSI(si, u, dim, ''), 3)} ${u}`;
      const what = dim === 'speed' ? 'the highest speed' : 'the fastest turn';
      warnings.push({
        source: `${sensor.id}.${row.id}`,
        message: `the LSB ${show(lsbSI)} is larger than ${what} of the mission, ${show(largest)}: motion below one LSB reads as a constant, an error of up to q/2 = ${show(lsbSI / 2)} that does not average out, so the white-noise model (q²/12 per sample) is optimistic here; use a finer LSB, or add a turn-on bias row of q/2`,
      });
    }
  }
  return warnings;
}
