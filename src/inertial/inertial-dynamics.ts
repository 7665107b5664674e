import { ATTITUDE, POSITION, VELOCITY, type InertialModel, type InertialNoise } from './inertial-model';
import type { NominalRow } from './inertial-trajectory';

/** Adds −[a×] into the 3 x 3 block of f at (row0, col0), n columns: −[a×] b = b × a. */
function addMinusSkew(f: Float64Array, n: number, row0: number, col0: number, a: readonly number[], scale = 1): void {
  f[row0 * n + col0 + 1] += scale * a[2];
  f[row0 * n + col0 + 2] -= scale * a[1];
  f[(row0 + 1) * n + col0] -= scale * a[2];
  f[(row0 + 1) * n + col0 + 2] += scale * a[0];
  f[(row0 + 2) * n + col0] += scale * a[1];
  f[(row0 + 2) * n + col0 + 1] -= scale * a[0];
}

/**
 * The continuous error dynamics F at a nominal instant (docs/inertial-model.md §4,
 * after Groves 2013, ch. 14, local-navigation-frame form), row-major n x n, 1/s:
 *   δṙ = δv
 *   δv̇ = −[f^n×] δψ + C_b^n δf^b − [(2ω_ie + ω_en)×] δv + (0, 0, 2g δr_D / R)
 *   δψ̇ = −[ω_in×] δψ + C_b^n δω_ib^b − δω_en,  δω_en = (δv_E, −δv_N, −δv_E tan L)/(R + h)
 * with δω_ib^b and δf^b the IMU error states of each axis (a bias adds, a
 * scale factor multiplies ω_ib^b or f^b), and Gauss-Markov decay on the
 * diagonal.
 */
export function inertialDynamics(model: InertialModel, row: NominalRow): Float64Array {
  const n = model.states.length;
  const f = new Float64Array(n * n);
  const { radiusM, rateRadps, gravityMps2 } = model.earth;
  const rh = radiusM + row.heightM;
  const lat = row.latitudeRad, tanL = Math.tan(lat);
  const [vN, vE] = row.velocityNed;
  const wie = [rateRadps * Math.cos(lat), 0, -rateRadps * Math.sin(lat)];
  const wen = [vE / rh, -vN / rh, (-vE * tanL) / rh];
  for (let i = 0; i < 3; i++) f[(POSITION + i) * n + VELOCITY + i] = 1;
  addMinusSkew(f, n, VELOCITY, ATTITUDE, row.specificForceNed);
  addMinusSkew(f, n, VELOCITY, VELOCITY, [0, 1, 2].map((i) => 2 * wie[i] + wen[i]));
  f[(VELOCITY + 2) * n + POSITION + 2] += (2 * gravityMps2) / radiusM;
  addMinusSkew(f, n, ATTITUDE, ATTITUDE, [0, 1, 2].map((i) => wie[i] + wen[i]));
  f[ATTITUDE * n + VELOCITY + 1] -= 1 / rh;
  f[(ATTITUDE + 1) * n + VELOCITY] += 1 / rh;
  f[(ATTITUDE + 2) * n + VELOCITY + 1] += tanL / rh;
  const c = row.bodyToNav;
  for (const s of model.imuStates) {
    const gyro = s.instrument === 'gyro';
    const block = gyro ? ATTITUDE : VELOCITY;
    const scale = s.effect === 'bias' ? 1 : gyro ? row.bodyRateRadps[s.axis] : row.specificForceBody[s.axis];
    for (let i = 0; i < 3; i++) f[(block + i) * n + s.state] += c[3 * i + s.axis] * scale;
  }
  model.states.forEach((st, i) => { if (st.decayPerS) f[i * n + i] -= st.decayPerS; });
  return f;
}

/** The state-space column G of a noise input at a nominal instant: a unit column, or C_b^n e_axis on its block. */
export function noiseColumn(model: InertialModel, noise: InertialNoise, row: NominalRow): Float64Array {
  const g = new Float64Array(model.states.length);
  if (noise.on === 'state') g[noise.state] = 1;
  else {
    const block = noise.block === 'attitude' ? ATTITUDE : VELOCITY;
    for (let i = 0; i < 3; i++) g[block + i] = row.bodyToNav[3 * i + noise.axis];
  }
  return g;
}

/** Key shared by noise inputs with the same column (so each column is discretised once per step). */
export function noiseColumnKey(noise: InertialNoise): string {
  return noise.on === 'state' ? `s${noise.state}` : `${noise.block}${noise.axis}`;
}
