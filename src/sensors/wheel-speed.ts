import type { SensorInput } from '../inputs/budget-input';
import { emptySource, type ModelBuilder } from '../covariance/model-builder';
import { resolveQuantisation } from '../sources/quantisation';
import { resolveScaleFactor } from '../sources/scale-factor';
import { resolveWhiteNoise } from '../sources/white-noise';
import { defineSensorKind, eachRow, refuseOutages, sensorRateHz, type Placement, type SensorContext, type SensorKindSpec } from './sensor-kind';

/** The speed sensor's scale-factor state, when a row models one. */
export interface WheelSpeedStates {
  scaleFactor?: number;
}

declare module '../inputs/budget-input' {
  interface SensorKindMap {
    'wheel-speed': WheelSpeedStates;
  }
}

/**
 * Wheel speed / odometer (also a water-speed log, same model), integrated for
 * position: along' gets v so + nv (docs/planar-model.md §3). A parked wheel reads zero,
 * so its white noise is off while the speed is zero.
 */
export const wheelSpeed: SensorKindSpec<'wheel-speed'> = defineSensorKind({
  kind: 'wheel-speed',
  label: 'wheel-speed sensor',
  role: 'dead-reckoning',
  defaults: { id: 'wheel', rateHz: 20 },
  rows: { 'white-noise': ['length-random-walk', 'speed'], 'scale-factor': ['ratio'], quantisation: ['speed'] },
  logs: { allan: 'speed', calibration: ['speed'] },
  measurements: [],
  suite: { max: 1, provides: ['speed'] },
  place(b: ModelBuilder, sensor: SensorInput, ctx: SensorContext): Placement<'wheel-speed'> {
    refuseOutages(sensor, ctx.path);
    const rateHz = sensorRateHz(sensor, ctx.path);
    const along = b.core.along;
    b.hasSpeedInput = true;
    eachRow(wheelSpeed, sensor, ctx, (row, path) => {
      const src = emptySource(`${sensor.id}.${row.id}`, sensor.id, row.kind, row.id, row);
      if (row.kind === 'scale-factor') {
        const r = resolveScaleFactor(row, path);
        const s = b.sharedState(`${sensor.id}#sf`, 'speed scale factor', '1', (i) => b.term(along, i, { perSpeed: 1 }));
        b.core.speedScale = s;
        src.initialVariance.push({ state: s, varianceSI: r.varianceSI });
        src.conversions.push(...r.conversions);
      } else {
        const r = row.kind === 'white-noise'
          ? resolveWhiteNoise(row, { density: 'length-random-walk', perSample: 'speed' }, rateHz, path)
          : resolveQuantisation(row, 'speed', rateHz, path);
        src.noise.push({ channel: b.channel('speed noise', along), psdSI: r.psdSI, onlyWhileMoving: true, derivation: r.derivation });
        src.speedOutputVarianceSI += r.perSampleVarianceSI;
        src.conversions.push(...r.conversions);
      }
      b.sources.push(src);
    });
    return { states: { scaleFactor: b.stateIndex(`${sensor.id}#sf`) } };
  },
});
