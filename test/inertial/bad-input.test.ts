import { describe, expect, it } from 'vitest';
import { runInertialBudget } from '../../src/inertial/run-inertial';
import { InputError } from '../../src/errors';
import { droneScenario, roverScenario } from '../fixtures/inertial-scenarios';

// Bad input gets a message naming the field (issue 10, "Bad input"); common practice, no source.
function refusal(change: (b: ReturnType<typeof droneScenario>) => void, scenario = droneScenario): InputError {
  const b = scenario();
  b.mission.segments = b.mission.segments.slice(0, 3);
  for (const a of b.aiding) a.outages = [];
  change(b);
  try {
    runInertialBudget(b, { contributions: false });
  } catch (e) {
    if (e instanceof InputError) return e;
    throw e;
  }
  throw new Error('no InputError');
}

describe('inertial input that makes no sense', () => {
  it('refuses a banked climb with no forward speed, naming the segment', () => {
    const e = refusal((b) => { b.mission.attitudeRule = 'banked'; });
    expect(e.path).toBe('mission.segments[0].verticalSpeed');
    expect(e.message).toMatch(/±90°/);
  });

  it('refuses a slope steeper than 60° under the ground rule', () => {
    const e = refusal((b) => { b.mission.attitudeRule = 'ground'; b.mission.segments[0].verticalSpeed = undefined; b.mission.segments[2].verticalSpeed = { value: 20, unit: 'm/s' }; });
    expect(e.path).toBe('mission.segments[2].verticalSpeed');
  });

  it('refuses an axis that is not x, y or z', () => {
    const e = refusal((b) => { b.imu.rows[0].axis = 'w' as never; });
    expect(e.path).toBe('imu.rows[0].axis');
  });

  it('refuses two rows of one kind on one axis', () => {
    const e = refusal((b) => { b.imu.rows.push({ ...b.imu.rows[2], id: 'again' }); });
    expect(e.path).toBe(`imu.rows[${droneScenario().imu.rows.length}].axis`);
  });

  it('refuses a lever arm of absurd length', () => {
    const e = refusal((b) => { b.aiding[0].leverArm!.x = { value: 150, unit: 'm' }; });
    expect(e.path).toBe('aiding[0].leverArm');
  });

  it('refuses a negative height sigma', () => {
    const e = refusal((b) => { b.mission.initialSigma.verticalPosition = { value: -1, unit: 'm' }; });
    expect(e.path).toBe('mission.initialSigma.verticalPosition.value');
  });

  it('refuses an accelerometer row with a gyro unit', () => {
    const e = refusal((b) => { b.imu.rows[5].value = { value: 0.1, unit: 'deg/√h' }; }, roverScenario);
    expect(e.path).toMatch(/^imu\.rows\[5\]\.value/);
  });
});

