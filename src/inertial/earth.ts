/**
 * The Earth the inertial model uses (docs/inertial-model.md §1): a sphere of
 * radius 6 371 000 m (a convention of this project), rotating at the WGS 84
 * rate, with constant gravity magnitude. Tests may override the radius (to
 * switch the Schuler feedback off) or the rotation (to compare with the
 * planar model); documents cannot.
 */

/** Earth constants in SI. */
export interface EarthModel {
  /** Sphere radius, m. */
  radiusM: number;
  /** Rotation rate Ω, rad/s. */
  rateRadps: number;
  /** Gravity magnitude g, m/s², constant over the mission. */
  gravityMps2: number;
}

/** R = 6 371 000 m (project convention), Ω = 7.292115e-5 rad/s (WGS 84), g = 9.80665 m/s² (3rd CGPM, 1901). */
export const EARTH: EarthModel = Object.freeze({ radiusM: 6_371_000, rateRadps: 7.292115e-5, gravityMps2: 9.80665 });

/** Schuler period 2π √(R/g), s (docs/checks.md §4: 5064.345577 s with the project's R and g). */
export function schulerPeriodS(earth: EarthModel = EARTH): number {
  return 2 * Math.PI * Math.sqrt(earth.radiusM / earth.gravityMps2);
}
