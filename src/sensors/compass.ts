import type { SensorInput } from '../inputs/budget-input';
import { emptySource, type ModelBuilder } from '../covariance/model-builder';
import type { ScalarMeasurement } from '../covariance/error-model';
import { resolveRandomConstant } from '../sources/turn-on-bias';
import { resolveWhiteNoise } from '../sources/white-noise';
import { defineSensorKind, eachRow, resolveOutages, sensorRateHz, type Placement, type SensorContext, type SensorKindSpec } from './sensor-kind';

/** The compass's bias state, when a row models one. */
export interface CompassStates {
  bias?: number;
}

declare module '../inputs/budget-input' {
  interface SensorKindMap {
    compass: CompassStates;
  }
}

/** Compass heading, y = psi + bm + r (docs/planar-model.md §5). */
export const compass: SensorKindSpec<'compass'> = defineSensorKind({
  kind: 'compass',
  label: 'compass heading',
  role: 'aiding',
  defaults: { id: 'compass', rateHz: 10 },
  rows: { 'white-noise': ['angle'], 'turn-on-bias': ['angle'] },
  logs: { calibration: ['angle'] },
  measurements: [{ key: 'heading', unitSI: 'rad' }],
  suite: {},
  place(b: ModelBuilder, sensor: SensorInput, ctx: SensorContext): Placement<'compass'> {
    const rateHz = sensorRateHz(sensor, ctx.path);
    const outages = resolveOutages(sensor, ctx);
    const key = `${sensor.id}.heading`;
    const hStates: [number, number][] = [[b.core.heading, 1]];
    eachRow(compass, sensor, ctx, (row, path) => {
      const src = emptySource(`${sensor.id}.${row.id}`, sensor.id, row.kind, row.id, row);
      if (row.kind === 'white-noise') {
        const r = resolveWhiteNoise(row, { perSample: 'angle' }, rateHz, path);
        src.measurementNoise.push({ measurement: key, varianceSI: r.perSampleVarianceSI, derivation: 'R = σ²' });
        src.conversions.push(...r.conversions);
      } else {
        const r = resolveRandomConstant(row, 'angle', path);
        const s = b.sharedState(`${sensor.id}#bias`, `compass bias (${sensor.id})`, 'rad', (i) => hStates.push([i, 1]));
        src.initialVariance.push({ state: s, varianceSI: r.varianceSI });
        src.conversions.push(...r.conversions);
      }
      b.sources.push(src);
    });
    const rows: ScalarMeasurement[] = [{ key, noiseKey: key, hNorth: 0, hEast: 0, hStates }];
    return {
      states: { bias: b.stateIndex(`${sensor.id}#bias`) },
      measurements: (builder) => builder.streams.push({ sensorId: sensor.id, rateHz, outages, rowsAt: () => rows }),
    };
  },
});
