import { resolveScaleFactor } from '../../sources/scale-factor';
import { readMagnitude } from '../../sources/source-kind';
import type { SourceInput } from '../../inputs/budget-input';
import { ATTITUDE, VELOCITY } from '../inertial-model';
import { bodyVelocityRow, refuseRowKind, rowSource, type AidingContext, type AidingResolver } from './aiding-context';

/** White-noise rows (speed per sample) own R on `key`. */
function whiteSpeedRows(ctx: AidingContext, key: string, label: string, allowed: readonly string[]): void {
  ctx.sensor.rows.forEach((row, r) => {
    refuseRowKind(ctx, row, r, allowed);
    if (row.kind !== 'white-noise') return;
    const src = rowSource(ctx, row, label);
    const sigma = readMagnitude(row.value, 'speed', `${ctx.path}.rows[${r}].value`, src.conversions);
    src.measurementNoise.push({ measurement: key, varianceSI: sigma * sigma, derivation: 'R = σ² per sample (an assumed pseudo-measurement sigma)' });
  });
}

/**
 * Zero-velocity update (docs/inertial-model.md §5): v = 0 on all three axes,
 * H = I on δv, taken at a boundary where the nominal motion has v = 0 and v_up = 0.
 */
export const resolveZeroVelocity: AidingResolver = (ctx) => {
  const key = `${ctx.sensor.id}.velocity`;
  whiteSpeedRows(ctx, key, 'zupt', ['white-noise']);
  return (row) => (row.speedMps === 0 && row.verticalSpeedMps === 0
    ? [0, 1, 2].map((i) => ({ key: `${key}.${i}`, noiseKey: key, h: [[VELOCITY + i, 1]] as [number, number][] }))
    : []);
};

/**
 * Non-holonomic constraint (docs/inertial-model.md §5): v^b_y = 0 and
 * v^b_z = 0, rows y and z of C_n^b [I on δv, [v^n×] on δψ], only while v > 0
 * (parked, the zero-velocity update already holds that information).
 */
export const resolveMotionConstraint: AidingResolver = (ctx) => {
  const key = `${ctx.sensor.id}.lateral`;
  whiteSpeedRows(ctx, key, 'nhc', ['white-noise']);
  return (row) => (row.speedMps > 0
    ? [1, 2].map((j) => ({ key: `${key}.${j}`, noiseKey: key, h: bodyVelocityRow(row, j, VELOCITY, ATTITUDE).filter(([, x]) => x !== 0) }))
    : []);
};

/**
 * Odometer (docs/inertial-model.md §5): y = (1 + s_o) v^b_x + noise, row x
 * of C_n^b [I on δv, [v^n×] on δψ] and v^b_x on the scale factor, while v > 0.
 */
export const resolveOdometer: AidingResolver = (ctx) => {
  const key = `${ctx.sensor.id}.speed`;
  whiteSpeedRows(ctx, key, 'odometer white noise', ['white-noise', 'scale-factor']);
  let scale = -1;
  ctx.sensor.rows.forEach((row, r) => {
    if (row.kind !== 'scale-factor') return;
    const src = rowSource(ctx, row, 'odometer scale factor');
    const sf = resolveScaleFactor(row as unknown as SourceInput, `${ctx.path}.rows[${r}]`);
    src.conversions.push(...sf.conversions);
    scale = ctx.addState(src.id, '1', 0);
    src.initialVariance.push({ state: scale, varianceSI: sf.varianceSI });
  });
  return (row) => {
    if (!(row.speedMps > 0)) return [];
    const c = row.bodyToNav, v = row.velocityNed;
    const h = bodyVelocityRow(row, 0, VELOCITY, ATTITUDE);
    if (scale >= 0) h.push([scale, c[0] * v[0] + c[3] * v[1] + c[6] * v[2]]);
    return [{ key, noiseKey: key, h: h.filter(([, x]) => x !== 0) }];
  };
};
