import { readMagnitude } from '../../sources/source-kind';
import type { DimensionName } from '../../units';
import { ATTITUDE, POSITION } from '../inertial-model';
import { refuseRowKind, rowSource, type AidingContext } from './aiding-context';
import type { AidingResolver } from './aiding-context';

/** White-noise rows own R on `key`; bias rows (random constants) get a state; returns the bias state or −1. */
function whiteAndBias(ctx: AidingContext, key: string, dim: DimensionName, unitSI: string): number {
  let bias = -1;
  ctx.sensor.rows.forEach((row, r) => {
    const p = `${ctx.path}.rows[${r}]`;
    refuseRowKind(ctx, row, r, ['white-noise', 'turn-on-bias']);
    const src = rowSource(ctx, row, `${ctx.sensor.kind.replace('-', ' ')} ${row.kind === 'white-noise' ? 'white noise' : 'bias'}`);
    const sigma = readMagnitude(row.value, dim, `${p}.value`, src.conversions);
    if (row.kind === 'white-noise') {
      src.measurementNoise.push({ measurement: key, varianceSI: sigma * sigma, derivation: 'R = σ² per sample' });
    } else {
      bias = ctx.addState(src.id, unitSI, 0);
      src.initialVariance.push({ state: bias, varianceSI: sigma * sigma });
    }
  });
  return bias;
}

/** Barometric height (docs/inertial-model.md §5): y = h + b_baro + noise, H = −1 on δr_D, 1 on the bias. */
export const resolveBarometer: AidingResolver = (ctx) => {
  const key = `${ctx.sensor.id}.height`;
  const bias = whiteAndBias(ctx, key, 'length', 'm');
  return () => [{ key, noiseKey: key, h: [[POSITION + 2, -1], ...(bias >= 0 ? [[bias, 1] as [number, number]] : [])] }];
};

/**
 * Heading aid, magnetometer or two-antenna GNSS (docs/inertial-model.md §5):
 * y = yaw + bias + noise, H = (tan θ cos ψ, tan θ sin ψ, 1) on δψ, 1 on the bias.
 */
export const resolveHeadingAid: AidingResolver = (ctx) => {
  const key = `${ctx.sensor.id}.yaw`;
  const bias = whiteAndBias(ctx, key, 'angle', 'rad');
  return (row) => {
    const t = Math.tan(row.pitchRad);
    const h: [number, number][] = [[ATTITUDE, t * Math.cos(row.yawRad)], [ATTITUDE + 1, t * Math.sin(row.yawRad)], [ATTITUDE + 2, 1]];
    if (bias >= 0) h.push([bias, 1]);
    return [{ key, noiseKey: key, h: h.filter(([, x]) => x !== 0) }];
  };
};
