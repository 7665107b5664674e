import type { SensorInput, SourceInput } from '../inputs/budget-input';
import { emptySource, type ModelBuilder } from '../covariance/model-builder';
import type { ModelSource } from '../covariance/error-model';
import { resolveBiasInstability } from '../sources/bias-instability';
import { resolveQuantisation } from '../sources/quantisation';
import { resolveRateRandomWalk } from '../sources/rate-random-walk';
import { resolveScaleFactor } from '../sources/scale-factor';
import { pickDimension } from '../sources/source-kind';
import { GYRO_ROW_DIMENSIONS } from '../units/gyro-row-dimensions';
import { resolveRandomConstant } from '../sources/turn-on-bias';
import { resolveWhiteNoise } from '../sources/white-noise';
import { defineSensorKind, eachRow, refuseOutages, sensorRateHz, type Placement, type SensorContext, type SensorKindSpec } from './sensor-kind';

/** The gyro's calibration states other sensors may reach (undefined when no row models them). */
export interface YawGyroStates {
  turnOnBias?: number;
  scaleFactor?: number;
}

declare module '../inputs/budget-input' {
  interface SensorKindMap {
    'yaw-gyro': YawGyroStates;
  }
}

/**
 * The yaw-rate gyro, integrated for heading (docs/planar-model.md §3):
 * dpsi' = bc + bbi + brw + w sg + ng.
 */
export const yawGyro: SensorKindSpec<'yaw-gyro'> = defineSensorKind({
  kind: 'yaw-gyro',
  label: 'yaw-rate gyro',
  role: 'dead-reckoning',
  model: 'drives heading with the measured turn rate; its noise enters Q of the heading error, its biases and scale factor are states',
  defaults: { id: 'gyro', rateHz: 100 },
  rows: GYRO_ROW_DIMENSIONS,
  rowOptions: {
    quantisation: {
      field: 'quantum', label: 'quantum',
      choices: [{ value: 'rate', label: 'rate LSB' }, { value: 'angle', label: 'angle LSB' }],
      fallback: (dim) => (dim === 'angle' ? 'angle' : 'rate'),
    },
  },
  logs: { allan: 'gyro', calibration: ['angular-rate'] },
  measurements: [],
  suite: { min: 1, max: 1, provides: ['heading-rate'] },
  place(b: ModelBuilder, sensor: SensorInput, ctx: SensorContext): Placement<'yaw-gyro'> {
    refuseOutages(sensor, ctx.path);
    const rateHz = sensorRateHz(sensor, ctx.path);
    b.deadReckoningRateHz.gyro = rateHz;
    eachRow(yawGyro, sensor, ctx, (row, path) => {
      const src = emptySource(`${sensor.id}.${row.id}`, sensor.id, row.kind, row.id, row);
      placeGyroRow(b, src, sensor.id, row, rateHz, path);
      b.sources.push(src);
    });
    return { states: { turnOnBias: b.stateIndex(`${sensor.id}#bias`), scaleFactor: b.stateIndex(`${sensor.id}#sf`) } };
  },
});

function placeGyroRow(b: ModelBuilder, src: ModelSource, sensorId: string, row: SourceInput, rateHz: number, path: string): void {
  const h = b.core.heading;
  switch (row.kind) {
    case 'white-noise': {
      const r = resolveWhiteNoise(row, { density: 'angle-random-walk', perSample: 'angular-rate' }, rateHz, path);
      src.noise.push({ channel: b.channel('gyro rate noise', h), psdSI: r.psdSI, onlyWhileMoving: false, derivation: r.derivation });
      src.conversions.push(...r.conversions);
      return;
    }
    case 'bias-instability': {
      const r = resolveBiasInstability(row, 'angular-rate', path);
      const s = b.state(`${src.id}#gm`, { name: `gyro bias instability (${row.id})`, unitSI: 'rad/s', calibration: true });
      b.term(h, s, { constant: 1 });
      b.term(s, s, { constant: -1 / r.correlationTimeS });
      src.initialVariance.push({ state: s, varianceSI: r.sigmaSI * r.sigmaSI });
      src.noise.push({ channel: b.channel(`${src.id} driving noise`, s), psdSI: r.psdSI, onlyWhileMoving: false, derivation: r.derivation });
      src.conversions.push(...r.conversions);
      return;
    }
    case 'rate-random-walk': {
      const r = resolveRateRandomWalk(row, path);
      const s = b.sharedState(`${sensorId}#rrw`, 'gyro rate random walk bias', 'rad/s', (i) => b.term(h, i, { constant: 1 }));
      src.noise.push({ channel: b.channel('gyro rate random walk', s), psdSI: r.psdSI, onlyWhileMoving: false, derivation: r.derivation });
      src.conversions.push(...r.conversions);
      return;
    }
    case 'turn-on-bias': {
      const r = resolveRandomConstant(row, 'angular-rate', path);
      const s = b.sharedState(`${sensorId}#bias`, 'gyro turn-on bias', 'rad/s', (i) => b.term(h, i, { constant: 1 }));
      src.initialVariance.push({ state: s, varianceSI: r.varianceSI });
      src.conversions.push(...r.conversions);
      return;
    }
    case 'scale-factor': {
      const r = resolveScaleFactor(row, path);
      const s = b.sharedState(`${sensorId}#sf`, 'gyro scale factor', '1', (i) => b.term(h, i, { perTurnRate: 1 }));
      src.initialVariance.push({ state: s, varianceSI: r.varianceSI });
      src.conversions.push(...r.conversions);
      return;
    }
    case 'quantisation': {
      const dim = pickDimension(row.value, [...yawGyro.rows.quantisation!], `${path}.value`);
      const r = resolveQuantisation(row, dim, rateHz, path);
      src.quantumSI = Math.sqrt(12 * r.perSampleVarianceSI);
      if (dim === 'angle') src.headingOutputVarianceSI += r.perSampleVarianceSI;
      else src.noise.push({ channel: b.channel('gyro rate noise', h), psdSI: r.psdSI, onlyWhileMoving: false, derivation: r.derivation });
      src.conversions.push(...r.conversions);
      return;
    }
  }
}
