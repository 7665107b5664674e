import { InputError } from '../../errors';
import { quantityToSI, requireId } from '../../inputs/checks';
import type { SensorInput } from '../../inputs/budget-input';
import { resolveOutages } from '../../sensors/sensor-kind';
import { readMagnitude, readPositive } from '../../sources/source-kind';
import type { ConversionStep } from '../../covariance/error-model';
import type { DimensionName } from '../../units';
import type { AidingInput, AidingRowInput } from '../inertial-input';
import type { InertialMeasurementRow, InertialSource, InertialState, InertialStream } from '../inertial-model';
import type { NominalRow } from '../inertial-trajectory';

/** What an aiding kind's resolver works with: its input, ids, and where new states and sources go. */
export interface AidingContext {
  sensor: AidingInput;
  path: string;
  rateHz: number;
  outages: InertialStream['outages'];
  /** Adds a state after the ones already in the model; returns its index. */
  addState(name: string, unitSI: string, decayPerS: number): number;
  sources: InertialSource[];
}

/** What an aiding kind adds: its sources went into the context; this is its schedule's row builder. */
export type AidingResolver = (ctx: AidingContext) => (row: NominalRow) => InertialMeasurementRow[];

/** The shared start of every aiding resolver: id, rate and outages checked. */
export function aidingContext(
  sensor: AidingInput, path: string, missionDurationS: number, states: InertialState[], firstState: number, sources: InertialSource[],
): AidingContext {
  requireId(sensor?.id, `${path}.id`);
  const rateHz = readPositive(sensor.rate, 'frequency', `${path}.rate`, 'rate', []);
  if (!Array.isArray(sensor.rows)) throw new InputError(`${path}.rows`, 'must be a list of rows');
  const outages = resolveOutages(sensor as unknown as SensorInput, { path, missionDurationS });
  return {
    sensor, path, rateHz, outages, sources,
    addState: (name, unitSI, decayPerS) => {
      states.push({ name, unitSI, calibration: true, decayPerS });
      return firstState + states.length - 1;
    },
  };
}

/** A new source for a row, pushed into the context. */
export function rowSource(ctx: AidingContext, row: AidingRowInput, label: string): InertialSource {
  const src: InertialSource = {
    id: `${ctx.sensor.id}.${row.id}`, sensorId: ctx.sensor.id, kind: row.kind, label,
    initialVariance: [], noise: [], measurementNoise: [], conversions: [], assumptions: [],
    provenance: row.provenance, assumed: row.assumed === true,
  };
  ctx.sources.push(src);
  return src;
}

/** Reads a row's sigma (and, for GNSS rows, its vertical sigma, default the same), SI. */
export function rowSigmas(row: AidingRowInput, dim: DimensionName, path: string, conversions: ConversionStep[]): [number, number] {
  const h = readMagnitude(row.value, dim, `${path}.value`, conversions);
  const v = row.vertical === undefined ? h : readMagnitude(row.vertical, dim, `${path}.vertical`, conversions);
  return [h, v];
}

/** Throws for a row kind the sensor does not take. */
export function refuseRowKind(ctx: AidingContext, row: AidingRowInput, r: number, allowed: readonly string[]): void {
  if (!allowed.includes(row?.kind)) {
    throw new InputError(`${ctx.path}.rows[${r}].kind`,
      `a ${ctx.sensor.kind} sensor takes ${allowed.map((a) => `"${a}"`).join(', ')} rows, got ${JSON.stringify(row?.kind)}`);
  }
  requireId(row.id, `${ctx.path}.rows[${r}].id`);
}

/**
 * The body-axis velocity row j of C_n^b [I on δv, [v^n×] on δψ] (docs/inertial-model.md §5):
 * δv^b = C_n^b (δv + [v^n×] δψ), so row j is c_j on δv and c_j × v^n on δψ, c_j = column j of C_b^n.
 */
export function bodyVelocityRow(row: NominalRow, j: number, velocityState: number, attitudeState: number): [number, number][] {
  const c = [row.bodyToNav[j], row.bodyToNav[3 + j], row.bodyToNav[6 + j]];
  const v = row.velocityNed;
  const cross = [c[1] * v[2] - c[2] * v[1], c[2] * v[0] - c[0] * v[2], c[0] * v[1] - c[1] * v[0]];
  return [0, 1, 2].flatMap((i): [number, number][] => [[velocityState + i, c[i]], [attitudeState + i, cross[i]]]);
}

/** A lever-arm component in the body frame, m; absurd lengths (over 100 m) are refused. */
export function leverArmM(q: AidingInput['leverArm'], path: string): [number, number, number] {
  if (q === undefined) return [0, 0, 0];
  const arm = (['x', 'y', 'z'] as const).map((a) => quantityToSI(q[a], 'length', `${path}.leverArm.${a}`)) as [number, number, number];
  if (Math.hypot(...arm) > 100) {
    throw new InputError(`${path}.leverArm`, `is ${Math.hypot(...arm).toFixed(1)} m long; an antenna lever arm is at most a few metres (check the unit)`);
  }
  return arm;
}
