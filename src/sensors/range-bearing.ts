import { InputError } from '../errors';
import { positiveToSI, quantityToSI, requireArray, requireId, requireOneOf } from '../inputs/checks';
import type { SensorInput, SourceInput } from '../inputs/budget-input';
import { emptySource, type ModelBuilder } from '../covariance/model-builder';
import type { MeasurementGeometry, ModelSource, ScalarMeasurement } from '../covariance/error-model';
import { pickDimension, type RowOptionSpec } from '../sources/source-kind';
import { resolveRandomConstant } from '../sources/turn-on-bias';
import { resolveWhiteNoise } from '../sources/white-noise';
import { defineSensorKind, eachRow, resolveOutages, sensorRateHz, type Placement, type SensorContext, type SensorKindSpec } from './sensor-kind';

/** The range and bearing bias states, when rows model them. */
export interface RangeBearingStates {
  rangeBias?: number;
  bearingBias?: number;
}

declare module '../inputs/budget-input' {
  interface SensorKindMap {
    'range-bearing': RangeBearingStates;
  }
}

/** A landmark closer than this to the nominal path makes range and bearing singular. */
const MIN_LANDMARK_RANGE_M = 1e-3;

interface Landmark { id: string; northM: number; eastM: number; path: string }

/** Which observable a row belongs to; by default the one its unit says (a length is a range). */
const COMPONENT: RowOptionSpec = {
  field: 'component', label: 'component',
  choices: [{ value: 'range', label: 'range' }, { value: 'bearing', label: 'bearing' }],
  fallback: (dim) => (dim === 'angle' ? 'bearing' : 'range'),
};

/**
 * Range and bearing (relative to heading) to known landmarks within a maximum
 * range and field of view (docs/planar-model.md §5):
 * range = |L - p| + br + r, bearing = atan2(dE_L, dN_L) - psi + bb + r.
 */
export const rangeBearing: SensorKindSpec<'range-bearing'> = defineSensorKind({
  kind: 'range-bearing',
  label: 'range-bearing sensor',
  role: 'aiding',
  defaults: { id: 'ranger', rateHz: 5 },
  rows: { 'white-noise': ['length', 'angle'], 'turn-on-bias': ['angle', 'length'] },
  rowOptions: { 'white-noise': COMPONENT, 'turn-on-bias': COMPONENT },
  settings: [
    {
      type: 'choice', field: 'observables', label: 'Observables', fallback: 'range-bearing',
      choices: [{ value: 'range-bearing', label: 'range and bearing' }, { value: 'range', label: 'range only' }, { value: 'bearing', label: 'bearing only' }],
    },
    { type: 'quantity', field: 'maxRange', label: 'Maximum range', dimensions: ['length'], optional: true },
    { type: 'quantity', field: 'fieldOfView', label: 'Field of view', dimensions: ['angle'], optional: true },
    { type: 'landmarks' },
  ],
  measurements: [{ key: 'range', unitSI: 'm' }, { key: 'bearing', unitSI: 'rad' }],
  suite: { needs: { input: 'speed', because: 'it observes position' } },
  place(b: ModelBuilder, sensor: SensorInput, ctx: SensorContext): Placement<'range-bearing'> {
    const rateHz = sensorRateHz(sensor, ctx.path);
    const outages = resolveOutages(sensor, ctx);
    const landmarks = resolveLandmarks(sensor, ctx.path);
    const maxRangeM = sensor.maxRange === undefined ? Infinity : positiveToSI(sensor.maxRange, 'length', `${ctx.path}.maxRange`);
    const fovRad = sensor.fieldOfView === undefined ? 2 * Math.PI : positiveToSI(sensor.fieldOfView, 'angle', `${ctx.path}.fieldOfView`);
    if (fovRad > 2 * Math.PI + 1e-9) throw new InputError(`${ctx.path}.fieldOfView`, 'must be at most 360 deg');
    const observables = requireOneOf(sensor.observables ?? 'range-bearing', ['range', 'bearing', 'range-bearing'] as const, `${ctx.path}.observables`);
    const bias = { range: [] as [number, number][], bearing: [] as [number, number][] };
    eachRow(rangeBearing, sensor, ctx, (row, path) => {
      const src = emptySource(`${sensor.id}.${row.id}`, sensor.id, row.kind, row.id, row);
      placeRow(b, src, sensor.id, row, rateHz, path, bias);
      b.sources.push(src);
    });
    const geometryRows = (g: MeasurementGeometry): ScalarMeasurement[] => {
      const rows: ScalarMeasurement[] = [];
      for (const lm of landmarks) {
        const dN = lm.northM - g.northM, dE = lm.eastM - g.eastM;
        const r = Math.hypot(dN, dE);
        if (r > maxRangeM) continue;
        if (Math.abs(wrapAngle(Math.atan2(dE, dN) - g.headingRad)) > fovRad / 2 + 1e-12) continue;
        if (r < MIN_LANDMARK_RANGE_M) throw new InputError(lm.path, `lies on the vehicle's nominal path (range ${r.toExponential(2)} m); move it off the path`);
        if (observables !== 'bearing') {
          rows.push({ key: `${sensor.id}.range.${lm.id}`, noiseKey: `${sensor.id}.range`, hNorth: -dN / r, hEast: -dE / r, hStates: bias.range });
        }
        if (observables !== 'range') {
          rows.push({
            key: `${sensor.id}.bearing.${lm.id}`, noiseKey: `${sensor.id}.bearing`,
            hNorth: dE / (r * r), hEast: -dN / (r * r), hStates: [[b.core.heading, -1], ...bias.bearing],
          });
        }
      }
      return rows;
    };
    return {
      states: { rangeBias: b.stateIndex(`${sensor.id}#range-bias`), bearingBias: b.stateIndex(`${sensor.id}#bearing-bias`) },
      measurements: (builder) => builder.streams.push({ sensorId: sensor.id, rateHz, outages, rowsAt: geometryRows }),
    };
  },
});

function placeRow(
  b: ModelBuilder, src: ModelSource, sensorId: string, row: SourceInput, rateHz: number, path: string,
  bias: { range: [number, number][]; bearing: [number, number][] },
): void {
  const dim = pickDimension(row.value, ['length', 'angle'], `${path}.value`);
  const component = dim === 'length' ? 'range' : 'bearing';
  if (row.component !== undefined && row.component !== component) {
    throw new InputError(`${path}.component`, `is "${row.component}" but the unit '${row.value.unit}' is ${dim === 'length' ? 'a length (a range)' : 'an angle (a bearing)'}`);
  }
  if (row.kind === 'white-noise') {
    const r = resolveWhiteNoise(row, { perSample: dim }, rateHz, path);
    src.measurementNoise.push({ measurement: `${sensorId}.${component}`, varianceSI: r.perSampleVarianceSI, derivation: 'R = σ²' });
    src.conversions.push(...r.conversions);
    return;
  }
  const r = resolveRandomConstant(row, dim, path);
  const s = b.sharedState(`${sensorId}#${component}-bias`, `${component} bias (${sensorId})`, dim === 'length' ? 'm' : 'rad',
    (i) => bias[component].push([i, 1]));
  src.initialVariance.push({ state: s, varianceSI: r.varianceSI });
  src.conversions.push(...r.conversions);
}

function resolveLandmarks(sensor: SensorInput, path: string): Landmark[] {
  if (sensor.landmarks === undefined) throw new InputError(`${path}.landmarks`, 'a range-bearing sensor needs a list of landmarks with id, north and east');
  const list = requireArray(sensor.landmarks, `${path}.landmarks`);
  const seen = new Set<string>();
  return list.map((lm, i) => {
    const p = `${path}.landmarks[${i}]`;
    const id = requireId(lm?.id, `${p}.id`);
    if (seen.has(id)) throw new InputError(`${p}.id`, `"${id}" is used twice in this sensor; landmark ids must be unique`);
    seen.add(id);
    return { id, northM: quantityToSI(lm.north, 'length', `${p}.north`), eastM: quantityToSI(lm.east, 'length', `${p}.east`), path: p };
  });
}

/** Wraps an angle to (-pi, pi]. */
export function wrapAngle(a: number): number {
  const w = a - 2 * Math.PI * Math.floor((a + Math.PI) / (2 * Math.PI));
  return w === -Math.PI ? Math.PI : w;
}
