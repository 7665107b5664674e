/**
 * 3 x 3 rotations for the 3-D truth model, row-major Float64Arrays. The
 * exponential and logarithm of the rotation group by Rodrigues' formula
 * (Groves, Principles of GNSS, Inertial, and Multisensor Integrated Navigation
 * Systems, 2nd ed., 2013, §2.2.1 and eq. 5.73, from memory): ml-matrix has no
 * rotation-vector maps, and a 3 x 3 product is three lines.
 */

/** a · b for 3 x 3 row-major matrices, into out (which may not alias a or b). */
export function multiply3(a: Float64Array, b: Float64Array, out: Float64Array): Float64Array {
  for (let i = 0; i < 3; i++) {
    for (let j = 0; j < 3; j++) out[3 * i + j] = a[3 * i] * b[j] + a[3 * i + 1] * b[3 + j] + a[3 * i + 2] * b[6 + j];
  }
  return out;
}

/** exp([φ×]) = I + sin|φ|/|φ| [φ×] + (1 − cos|φ|)/|φ|² [φ×]², into out (series for |φ| < 1e-4). */
export function rotationFromVector(x: number, y: number, z: number, out: Float64Array): Float64Array {
  const t2 = x * x + y * y + z * z, t = Math.sqrt(t2);
  const a = t < 1e-4 ? 1 - t2 / 6 : Math.sin(t) / t;
  const b = t < 1e-4 ? 0.5 - t2 / 24 : (1 - Math.cos(t)) / t2;
  out[0] = 1 - b * (y * y + z * z); out[1] = -a * z + b * x * y; out[2] = a * y + b * x * z;
  out[3] = a * z + b * x * y; out[4] = 1 - b * (x * x + z * z); out[5] = -a * x + b * y * z;
  out[6] = -a * y + b * x * z; out[7] = a * x + b * y * z; out[8] = 1 - b * (x * x + y * y);
  return out;
}

/** The rotation vector φ of a rotation R (|φ| < π): φ = θ/(2 sin θ) · vee(R − Rᵀ), cos θ = (tr R − 1)/2. */
export function vectorFromRotation(r: Float64Array, out: Float64Array): Float64Array {
  const vx = r[7] - r[5], vy = r[2] - r[6], vz = r[3] - r[1];
  const c = Math.min(1, Math.max(-1, (r[0] + r[4] + r[8] - 1) / 2));
  const theta = Math.acos(c), s = Math.sin(theta);
  const k = theta < 1e-6 ? 0.5 + (theta * theta) / 12 : theta / (2 * s);
  out[0] = k * vx; out[1] = k * vy; out[2] = k * vz;
  return out;
}

/** Yaw, pitch and roll of C_b^n = R_z(ψ) R_y(θ) R_x(φ) (docs/inertial-model.md §1), rad. */
export function eulerFromRotation(c: Float64Array, out: Float64Array): Float64Array {
  out[0] = Math.atan2(c[3], c[0]);
  out[1] = Math.asin(Math.max(-1, Math.min(1, -c[6])));
  out[2] = Math.atan2(c[7], c[8]);
  return out;
}
