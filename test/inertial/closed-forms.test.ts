import { describe, expect, it } from 'vitest';
import { runInertialBudget } from '../../src/inertial/run-inertial';
import { EARTH, schulerPeriodS } from '../../src/inertial/earth';
import type { EarthModel } from '../../src/inertial/earth';
import type { ImuRowInput, InertialBudgetInput } from '../../src/inertial/inertial-input';
import { FLAT_EARTH, STILL_EARTH, imuRow, inertialBudget, still } from '../fixtures/small-inertial';

// Closed forms of docs/checks.md §4 (computed there with sympy / solve_ivp). They are exact
// solutions of the linear error model, so the covariance run reproduces them to round-off.
// §4.8-4.11 hold exactly only without the Schuler feedback: those use a test-only Earth
// radius of 1e15 m (docs/inertial-model.md §7); the Schuler rows use the real radius.
const DEG = Math.PI / 180;
const G = 9.80665;

function sigmaAt(b: InertialBudgetInput, id: string, tS: number, earth: EarthModel): number {
  const run = runInertialBudget(b, { earth, contributions: false });
  return run.series[id].sigma[Math.round(tS / (b.step.value))];
}
/** An IMU needs a row; this one contributes nothing. */
const NO_ERROR = imuRow('gyro', 'turn-on-bias', 0, 'deg/h');
const rel = (a: number, e: number) => Math.abs(a / e - 1);
const one = (row: ImuRowInput, durationS: number, earth = FLAT_EARTH, sigma = {}) =>
  (id: string, tS = durationS) => sigmaAt(inertialBudget(still(durationS), [row], 1, sigma), id, tS, earth);

describe('1-D error growth without Schuler feedback (docs/checks.md §4.8-4.11, radius 1e15 m)', () => {
  it('accelerometer bias gives b t²/2 (§4.8: 1 mg, 60 s -> 17.65197 m)', () => {
    const n = one(imuRow('accelerometer', 'turn-on-bias', 1, 'mg', { axis: 'x' }), 60)('north');
    expect(rel(n, (1e-3 * G * 60 ** 2) / 2)).toBeLessThan(1e-9);
    expect(n).toBeCloseTo(17.65197, 4);
  });

  it('velocity random walk gives VRW √t and VRW t^1.5/√3 (§4.9: 0.1 m/s/√h, 600 s -> 0.04082482905 m/s, 14.14213562 m)', () => {
    const s = one(imuRow('accelerometer', 'white-noise', 0.1, 'm/s/√h', { axis: 'x' }), 600);
    expect(rel(s('velocityNorth'), 0.04082482905)).toBeLessThan(1e-9);
    expect(rel(s('north'), 14.14213562)).toBeLessThan(1e-9);
  });

  it('tilt from a gyro bias gives g b t³/6 (§4.10: 1 deg/h, 60 s -> 1.711583311 m)', () => {
    expect(rel(one(imuRow('gyro', 'turn-on-bias', 1, 'deg/h', { axis: 'y' }), 60)('north'), 1.711583311)).toBeLessThan(1e-9);
  });

  it('tilt from gyro angle random walk gives g N t^2.5/√20 (§4.11: 0.1 deg/√h, 60 s -> 1.778729554 m)', () => {
    expect(rel(one(imuRow('gyro', 'white-noise', 0.1, 'deg/√h', { axis: 'y' }), 60)('north'), 1.778729554)).toBeLessThan(1e-9);
  });

  it('with the real radius the VRW law is already 8.6 % off in velocity at 600 s (docs/inertial-model.md §7)', () => {
    const v = one(imuRow('accelerometer', 'white-noise', 0.1, 'm/s/√h', { axis: 'x' }), 600, STILL_EARTH)('velocityNorth');
    expect(Math.abs(v / 0.04082482905 - 1)).toBeGreaterThan(0.08);
    expect(Math.abs(v / 0.04082482905 - 1)).toBeLessThan(0.09);
  });
});

describe('single-channel Schuler loops with the real radius (docs/checks.md §4, Schuler rows)', () => {
  it('has the Schuler period 2π√(R/g) = 84.405760 min', () => {
    expect(Math.abs(schulerPeriodS(EARTH) - 5064.345577)).toBeLessThan(1e-6);
    expect(schulerPeriodS(EARTH) / 60).toBeCloseTo(84.40576, 6);
  });

  it('accelerometer bias: (b/ω_s²)(1 − cos ω_s t), 100 µg -> 168.517472 m at 600 s', () => {
    expect(rel(one(imuRow('accelerometer', 'turn-on-bias', 100, 'µg', { axis: 'x' }), 600, STILL_EARTH)('north'), 168.517472)).toBeLessThan(1e-8);
  });

  it('gyro bias: R ε (t − sin(ω_s t)/ω_s), 0.01 deg/h -> 1353.41367837 m at 3600 s', () => {
    expect(rel(one(imuRow('gyro', 'turn-on-bias', 0.01, 'deg/h', { axis: 'y' }), 3600, STILL_EARTH)('north'), 1353.41367837)).toBeLessThan(1e-8);
  });

  it('initial tilt: R φ₀ (1 − cos ω_s t), 1 mrad -> 5849.217522162 m at 1200 s', () => {
    const b = inertialBudget(still(1200), [NO_ERROR], 1, { tilt: 1e-3 });
    expect(rel(sigmaAt(b, 'north', 1200, STILL_EARTH), 5849.217522162)).toBeLessThan(1e-8);
  });

  it('the vertical channel grows as cosh(t/τ) with τ = √(R/2g) (docs/inertial-model.md §4)', () => {
    const tau = Math.sqrt(EARTH.radiusM / (2 * G));
    const b = inertialBudget(still(1800), [NO_ERROR], 1, { verticalPosition: 1 });
    const run = runInertialBudget(b, { earth: STILL_EARTH, contributions: false });
    for (const t of [600, 1200, 1800]) expect(rel(run.series.down.sigma[t], Math.cosh(t / tau))).toBeLessThan(1e-9);
  });
});

describe('yaw from a level z-gyro equals the planar heading, Earth rotation off (docs/checks.md §4.1-4.3)', () => {
  const yaw = (row: ImuRowInput) => one(row, 600, FLAT_EARTH)('yaw') / DEG;
  it('angle random walk: N √t (0.5 deg/√h, 600 s -> 0.2041241452 deg)', () => {
    expect(rel(yaw(imuRow('gyro', 'white-noise', 0.5, 'deg/√h', { axis: 'z' })), 0.2041241452)).toBeLessThan(1e-9);
  });
  it('constant bias: b t (10 deg/h, 600 s -> 1.666666667 deg)', () => {
    expect(rel(yaw(imuRow('gyro', 'turn-on-bias', 10, 'deg/h', { axis: 'z' })), 10 / 6)).toBeLessThan(1e-9);
  });
  it('rate random walk: K t^1.5/√3 (10 deg/h/√h, 600 s -> 0.39284 deg)', () => {
    const kSI = (10 * DEG) / 3600 / 60;
    expect(rel(yaw(imuRow('gyro', 'rate-random-walk', 10, 'deg/h/√h', { axis: 'z' })) * DEG, (kSI * 600 ** 1.5) / Math.sqrt(3))).toBeLessThan(1e-9);
  });
});

describe('random walks and scale factors on their axes (radius 1e15 m, Earth rotation off)', () => {
  it('accelerometer bias random walk K gives a velocity sigma K t^1.5/√3 (Itô isometry, docs/checks.md §4: Var ∫W = t³/3)', () => {
    const kSI = 10 * 9.80665e-6 / 60; // 10 µg/√h
    const v = one(imuRow('accelerometer', 'rate-random-walk', 10, 'µg/√h', { axis: 'x' }), 600)('velocityNorth');
    expect(rel(v, (kSI * 600 ** 1.5) / Math.sqrt(3))).toBeLessThan(1e-9);
  });

  it('a z-gyro scale factor of 1000 ppm over a full turn gives 0.36 deg of yaw (docs/checks.md §2)', () => {
    const turn = [{ duration: { value: 36, unit: 's' }, speed: { value: 0, unit: 'm/s' }, turnRate: { value: 10, unit: 'deg/s' } }];
    const b = inertialBudget(turn, [imuRow('gyro', 'scale-factor', 1000, 'ppm', { axis: 'z' })], 0.1);
    expect(rel(sigmaAt(b, 'yaw', 36, FLAT_EARTH) / DEG, 0.36)).toBeLessThan(1e-9);
  });

  it('a z-accelerometer scale factor s on a level vehicle reads g too much or little: σ_vD = s g t (common practice, no source)', () => {
    const v = one(imuRow('accelerometer', 'scale-factor', 1000, 'ppm', { axis: 'z' }), 60)('velocityDown');
    expect(rel(v, 1e-3 * G * 60)).toBeLessThan(1e-9);
  });
});
