import type { SensorInput } from '../inputs/budget-input';
import { emptySource, type ModelBuilder } from '../covariance/model-builder';
import type { ScalarMeasurement } from '../covariance/error-model';
import { resolveMultipath } from '../sources/multipath';
import { resolveWhiteNoise } from '../sources/white-noise';
import { defineSensorKind, eachRow, resolveOutages, sensorRateHz, type Placement, type SensorContext, type SensorKindSpec } from './sensor-kind';

/** The multipath states per axis (empty when multipath is folded into R or not modelled). */
export interface GnssPositionStates {
  multipathNorth: readonly number[];
  multipathEast: readonly number[];
}

declare module '../inputs/budget-input' {
  interface SensorKindMap {
    'gnss-position': GnssPositionStates;
  }
}

/**
 * GNSS horizontal position, y = p + m + r per axis (docs/planar-model.md §5). Multipath
 * is either a Gauss-Markov state per axis (in H) or folded into R.
 */
export const gnssPosition: SensorKindSpec<'gnss-position'> = defineSensorKind({
  kind: 'gnss-position',
  label: 'GNSS position',
  role: 'aiding',
  defaults: { id: 'gnss', rateHz: 1 },
  rows: { 'white-noise': ['length'], multipath: ['length'] },
  measurements: [{ key: 'north', unitSI: 'm' }, { key: 'east', unitSI: 'm' }],
  suite: { needs: { input: 'speed', because: 'it observes position' } },
  place(b: ModelBuilder, sensor: SensorInput, ctx: SensorContext): Placement<'gnss-position'> {
    const rateHz = sensorRateHz(sensor, ctx.path);
    const outages = resolveOutages(sensor, ctx);
    const keyN = `${sensor.id}.north`;
    const keyE = `${sensor.id}.east`;
    const multipathN: number[] = [];
    const multipathE: number[] = [];
    eachRow(gnssPosition, sensor, ctx, (row, path) => {
      const src = emptySource(`${sensor.id}.${row.id}`, sensor.id, row.kind, row.id, row);
      if (row.kind === 'white-noise') {
        const r = resolveWhiteNoise(row, { perSample: 'length' }, rateHz, path);
        const derivation = 'R = σ² per axis';
        src.measurementNoise.push({ measurement: keyN, varianceSI: r.perSampleVarianceSI, derivation });
        src.measurementNoise.push({ measurement: keyE, varianceSI: r.perSampleVarianceSI, derivation });
        src.conversions.push(...r.conversions);
      } else {
        const r = resolveMultipath(row, path);
        src.conversions.push(...r.conversions);
        if (r.model === 'folded') {
          const derivation = 'folded into R: + σ_m² per axis';
          src.measurementNoise.push({ measurement: keyN, varianceSI: r.varianceSI, derivation });
          src.measurementNoise.push({ measurement: keyE, varianceSI: r.varianceSI, derivation });
        } else {
          for (const [axis, list] of [['north', multipathN], ['east', multipathE]] as const) {
            const s = b.state(`${src.id}#${axis}`, { name: `GNSS multipath ${axis} (${row.id})`, unitSI: 'm', calibration: true });
            b.term(s, s, { constant: -1 / r.correlationTimeS! });
            src.initialVariance.push({ state: s, varianceSI: r.varianceSI });
            src.noise.push({ channel: b.channel(`${src.id} ${axis}`, s), psdSI: r.psdSI, onlyWhileMoving: false, derivation: 'PSD = 2σ²/T' });
            list.push(s);
          }
        }
      }
      b.sources.push(src);
    });
    const rows: ScalarMeasurement[] = [
      { key: keyN, noiseKey: keyN, hNorth: 1, hEast: 0, hStates: multipathN.map((s) => [s, 1] as [number, number]) },
      { key: keyE, noiseKey: keyE, hNorth: 0, hEast: 1, hStates: multipathE.map((s) => [s, 1] as [number, number]) },
    ];
    return {
      states: { multipathNorth: multipathN, multipathEast: multipathE },
      measurements: (builder) => builder.streams.push({ sensorId: sensor.id, rateHz, outages, rowsAt: () => rows }),
    };
  },
});
