import { resolveMultipath } from '../../sources/multipath';
import type { SourceInput } from '../../inputs/budget-input';
import { readMagnitude } from '../../sources/source-kind';
import { ATTITUDE, POSITION, VELOCITY } from '../inertial-model';
import { leverArmM, refuseRowKind, rowSigmas, rowSource, type AidingResolver } from './aiding-context';

const AXIS_NAMES = ['north', 'east', 'down'];

/**
 * GNSS position (docs/inertial-model.md §5): y = r + C_b^n l^b + m + noise,
 * H = I on δr, −[(C_b^n l^b)×] on δψ, I on the multipath states (when
 * modelled as states; folded multipath adds its σ² to R instead).
 */
export const resolveGnssPosition: AidingResolver = (ctx) => {
  const keys = AXIS_NAMES.map((a) => `${ctx.sensor.id}.${a}`);
  const arm = leverArmM(ctx.sensor.leverArm, ctx.path);
  let multipath: number[] = [];
  ctx.sensor.rows.forEach((row, r) => {
    const p = `${ctx.path}.rows[${r}]`;
    refuseRowKind(ctx, row, r, ['white-noise', 'multipath']);
    const src = rowSource(ctx, row, `${ctx.sensor.kind.replace('-', ' ')} ${row.kind.replace('-', ' ')}`);
    if (row.kind === 'white-noise') {
      const [h, v] = rowSigmas(row, 'length', p, src.conversions);
      [h, h, v].forEach((s, i) => src.measurementNoise.push({ measurement: keys[i], varianceSI: s * s, derivation: 'R = σ² per axis' }));
      return;
    }
    const mp = resolveMultipath({ ...row, value: row.value } as SourceInput, p);
    src.conversions.push(...mp.conversions);
    const v = row.vertical === undefined ? Math.sqrt(mp.varianceSI) : readMagnitude(row.vertical, 'length', `${p}.vertical`, src.conversions);
    const sig = [Math.sqrt(mp.varianceSI), Math.sqrt(mp.varianceSI), v];
    if (mp.model === 'folded') {
      sig.forEach((s, i) => src.measurementNoise.push({ measurement: keys[i], varianceSI: s * s, derivation: 'multipath folded into R: + σ_m²' }));
      return;
    }
    multipath = sig.map((s, i) => {
      const state = ctx.addState(`${src.id}.${AXIS_NAMES[i]}`, 'm', 1 / mp.correlationTimeS!);
      src.initialVariance.push({ state, varianceSI: s * s });
      src.noise.push({ on: 'state', state, psdSI: (2 * s * s) / mp.correlationTimeS!, derivation: 'PSD = 2σ²/T' });
      return state;
    });
  });
  return (nominal) => {
    const c = nominal.bodyToNav;
    const a = [0, 1, 2].map((i) => c[3 * i] * arm[0] + c[3 * i + 1] * arm[1] + c[3 * i + 2] * arm[2]);
    // Rows of −[a×].
    const skew = [[0, a[2], -a[1]], [-a[2], 0, a[0]], [a[1], -a[0], 0]];
    return [0, 1, 2].map((i) => {
      const h: [number, number][] = [[POSITION + i, 1], ...skew[i].map((x, j): [number, number] => [ATTITUDE + j, x])];
      if (multipath.length) h.push([multipath[i], 1]);
      return { key: keys[i], noiseKey: keys[i], h: h.filter(([, x]) => x !== 0) };
    });
  };
};

/** GNSS velocity (docs/inertial-model.md §5): y = v + noise, H = I on δv; no lever arm (a convention). */
export const resolveGnssVelocity: AidingResolver = (ctx) => {
  const keys = AXIS_NAMES.map((a) => `${ctx.sensor.id}.${a}`);
  ctx.sensor.rows.forEach((row, r) => {
    refuseRowKind(ctx, row, r, ['white-noise']);
    const src = rowSource(ctx, row, `${ctx.sensor.kind.replace('-', ' ')} ${row.kind.replace('-', ' ')}`);
    const [h, v] = rowSigmas(row, 'speed', `${ctx.path}.rows[${r}]`, src.conversions);
    [h, h, v].forEach((s, i) => src.measurementNoise.push({ measurement: keys[i], varianceSI: s * s, derivation: 'R = σ² per axis' }));
  });
  return () => [0, 1, 2].map((i) => ({ key: keys[i], noiseKey: keys[i], h: [[VELOCITY + i, 1]] }));
};
