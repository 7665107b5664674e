import { InputError } from '../errors';
import { requireArray, requireId, requireOneOf } from '../inputs/checks';
import { readMagnitude, readPositive } from '../sources/source-kind';
import { resolveWhiteNoise, type WhiteNoiseForms } from '../sources/white-noise';
import { resolveBiasInstability } from '../sources/bias-instability';
import { resolveRateRandomWalk } from '../sources/rate-random-walk';
import { resolveRandomConstant } from '../sources/turn-on-bias';
import { resolveScaleFactor } from '../sources/scale-factor';
import { resolveQuantisation } from '../sources/quantisation';
import type { ConversionStep } from '../covariance/error-model';
import type { DimensionName } from '../units';
import type { ImuInput, ImuRowInput } from './inertial-input';
import type { ImuErrorState, InertialNoise, InertialSource, InertialState } from './inertial-model';

const AXES = ['x', 'y', 'z'] as const;
const KINDS = ['white-noise', 'bias-instability', 'rate-random-walk', 'turn-on-bias', 'scale-factor', 'quantisation'] as const;

/** SI forms of each instrument's rows. */
const FORMS: Record<ImuRowInput['instrument'], { white: WhiteNoiseForms; rate: DimensionName; walk: DimensionName; block: 'attitude' | 'velocity' }> = {
  gyro: { white: { density: 'angle-random-walk', perSample: 'angular-rate' }, rate: 'angular-rate', walk: 'rate-random-walk', block: 'attitude' },
  accelerometer: {
    white: { density: 'velocity-random-walk', perSample: 'acceleration' }, rate: 'acceleration', walk: 'acceleration-random-walk', block: 'velocity',
  },
};

/** States and sources the IMU rows add. */
export interface ImuErrors {
  states: InertialState[];
  imuStates: ImuErrorState[];
  sources: InertialSource[];
}

/**
 * Resolves the IMU rows (docs/inertial-model.md §3, §4): one state per axis
 * for every bias, Gauss-Markov, random-walk and scale-factor row; white
 * noise and quantisation as noise on the attitude or velocity block through
 * C_b^n. A row applies to x, y and z unless it names an axis; a row naming an
 * axis replaces the all-axes row of the same instrument and kind there.
 * @param firstState index the IMU's first state gets.
 * @throws InputError naming the row: a duplicate, an axis not x/y/z, a value
 *   of the wrong dimension, a missing correlation time.
 */
export function resolveImuErrors(imu: ImuInput, firstState: number, path = 'imu'): ImuErrors {
  const imuId = requireId(imu?.id, `${path}.id`);
  const rateHz = readPositive(imu.rate, 'frequency', `${path}.rate`, 'rate', []);
  const rows = requireArray(imu.rows, `${path}.rows`);
  const axesOf = rowAxes(rows, path);
  const out: ImuErrors = { states: [], imuStates: [], sources: [] };
  rows.forEach((row, r) => {
    const p = `${path}.rows[${r}]`;
    const forms = FORMS[row.instrument];
    const conversions: ConversionStep[] = [];
    const source: InertialSource = {
      id: `${imuId}.${row.id}`, sensorId: imuId, kind: row.kind, axis: row.axis,
      label: `${row.instrument === 'gyro' ? 'gyro' : 'accel'} ${row.kind.replace(/-/g, ' ')}${row.axis ? ` (${row.axis})` : ''}`,
      initialVariance: [], noise: [], measurementNoise: [], conversions, assumptions: [], provenance: row.provenance, assumed: row.assumed === true,
    };
    const addState = (axis: number, decayPerS: number, effect: ImuErrorState['effect'], unitSI: string): number => {
      const state = firstState + out.states.length;
      out.states.push({ name: `${source.id}.${AXES[axis]}`, unitSI, calibration: true, decayPerS });
      out.imuStates.push({ state, instrument: row.instrument, axis, effect });
      return state;
    };
    const rateUnit = row.instrument === 'gyro' ? 'rad/s' : 'm/s²';
    for (const axis of axesOf[r]) {
      switch (row.kind) {
        case 'white-noise': case 'quantisation': {
          const w = row.kind === 'white-noise' ? resolveWhiteNoise(row, forms.white, rateHz, p) : resolveQuantisation(row, forms.rate, rateHz, p);
          if (axis === axesOf[r][0]) conversions.push(...w.conversions);
          source.noise.push({ on: 'body', block: forms.block, axis, psdSI: w.psdSI, derivation: w.derivation });
          break;
        }
        case 'bias-instability': {
          const gm = resolveBiasInstability(row, forms.rate, p);
          if (axis === axesOf[r][0]) conversions.push(...gm.conversions);
          const s = addState(axis, 1 / gm.correlationTimeS, 'bias', rateUnit);
          source.initialVariance.push({ state: s, varianceSI: gm.sigmaSI ** 2 });
          source.noise.push({ on: 'state', state: s, psdSI: gm.psdSI, derivation: gm.derivation });
          break;
        }
        case 'rate-random-walk': {
          const psdSI = row.instrument === 'gyro'
            ? resolveRateRandomWalk(row, p).psdSI
            : readMagnitude(row.value, 'acceleration-random-walk', `${p}.value`, conversions) ** 2;
          source.noise.push({ on: 'state', state: addState(axis, 0, 'bias', rateUnit), psdSI, derivation: 'PSD = K²' } as InertialNoise);
          break;
        }
        case 'turn-on-bias': case 'scale-factor': {
          const rc = row.kind === 'turn-on-bias' ? resolveRandomConstant(row, forms.rate, p) : resolveScaleFactor(row, p);
          if (axis === axesOf[r][0]) conversions.push(...rc.conversions);
          const s = addState(axis, 0, row.kind === 'turn-on-bias' ? 'bias' : 'scale-factor', row.kind === 'turn-on-bias' ? rateUnit : '1');
          source.initialVariance.push({ state: s, varianceSI: rc.varianceSI });
          break;
        }
      }
    }
    out.sources.push(source);
  });
  return out;
}

/** The axes each row acts on, after axis rows replace all-axes rows of their instrument and kind. */
function rowAxes(rows: ImuRowInput[], path: string): number[][] {
  const seen = new Map<string, number>();
  const ids = new Set<string>();
  rows.forEach((row, r) => {
    const p = `${path}.rows[${r}]`;
    requireId(row?.id, `${p}.id`);
    if (ids.has(row.id)) throw new InputError(`${p}.id`, `"${row.id}" is used by another IMU row; row ids must be unique in the IMU`);
    ids.add(row.id);
    requireOneOf(row.instrument, ['gyro', 'accelerometer'] as const, `${p}.instrument`);
    requireOneOf(row.kind, KINDS, `${p}.kind`);
    if (row.axis !== undefined) requireOneOf(row.axis, AXES, `${p}.axis`);
    const key = `${row.instrument}|${row.kind}|${row.axis ?? 'all'}`;
    if (seen.has(key)) {
      throw new InputError(`${p}.axis`, `repeats rows[${seen.get(key)}]: one ${row.instrument} ${row.kind} row per axis (or one for all axes)`);
    }
    seen.set(key, r);
  });
  return rows.map((row) => {
    if (row.axis) return [AXES.indexOf(row.axis)];
    return [0, 1, 2].filter((a) => !seen.has(`${row.instrument}|${row.kind}|${AXES[a]}`));
  });
}
